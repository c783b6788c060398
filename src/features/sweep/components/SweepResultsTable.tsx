import { num, STATUS_WORDS, VERDICT_WORDS } from '@shared/format';
import type { SweepParameterKind, SweepVariantResult } from '@shared/sweep/schema';
import type { UnitSystem } from '@shared/units';
import {
  type CellContext,
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createPaginatedRowModel,
  createSortedRowModel,
  filterFn_equals,
  rowPaginationFeature,
  rowSortingFeature,
  sortFn_basic,
  tableFeatures,
  useTable,
} from '@tanstack/react-table';
import { memo, useMemo } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Select } from '../../../components/ui/Select';
import { KIND_LABELS } from '../draft';
import { type DrawnCheck, valueText } from '../present';

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  rowPaginationFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  paginatedRowModel: createPaginatedRowModel(),
  sortFns: { basic: sortFn_basic },
  filterFns: { equals: filterFn_equals },
});
const helper = createColumnHelper<typeof features, SweepVariantResult>();
type Cell = CellContext<typeof features, SweepVariantResult, unknown>;

/** A margin as a share of the limit: whole per cent, a tenth below 1 % (so a near miss never reads −0 %). */
const percent = (ratio: number) => `${num(ratio * 100, Math.abs(ratio) < 0.01 ? 1 : 0)}\u00a0%`;
const colour = { pass: 'text-meets', fail: 'text-caution', not_evaluated: 'text-warning' } as const;

/** A check's outcome in a cell: the glyph, and the margin as a share of the limit (never colour alone). */
function Outcome({ status, ratio }: { status: keyof typeof STATUS_WORDS; ratio: number | null }) {
  const s = STATUS_WORDS[status];
  return (
    <span className={`whitespace-nowrap ${colour[status]}`}>
      <span aria-hidden="true">{s.glyph}</span> {ratio === null ? s.word : percent(ratio)}
      {ratio === null ? null : <span className="sr-only"> ({s.word})</span>}
    </span>
  );
}

/**
 * Every variant of the sweep: its values, verdict, the check that governs it and the margin of each code-table
 * check (share of the limit, ≥ 0 meets); sortable by any column, filtered by verdict and by what governs,
 * 25 to a page; "Choose" picks a variant for "Make this an assembly".
 */
export const SweepResultsTable = memo(function SweepResultsTable({
  variants,
  kinds,
  checks,
  labels,
  system,
  chosen,
  onChoose,
}: {
  variants: SweepVariantResult[];
  kinds: SweepParameterKind[];
  checks: DrawnCheck[];
  /** Governing checks' ids → their labels, for the filter. */
  labels: Map<string, string>;
  system: UnitSystem;
  chosen: number | null;
  onChoose: (index: number) => void;
}) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor((v) => v.index + 1, { id: 'n', header: 'Variant', sortFn: 'basic' }),
        ...kinds.map((kind, i) =>
          helper.accessor((v) => v.values[i], {
            id: `p${i}`,
            header: KIND_LABELS[kind],
            sortFn: 'basic',
            cell: (c: Cell) => valueText(kind, c.getValue() as number | string, system),
          }),
        ),
        helper.accessor((v) => v.verdict, {
          id: 'verdict',
          header: 'Verdict',
          filterFn: 'equals',
          cell: (c: Cell) => {
            const w = VERDICT_WORDS[c.row.original.verdict];
            return (
              <span
                className={`font-semibold ${colour[c.row.original.verdict === 'incomplete' ? 'not_evaluated' : c.row.original.verdict]}`}
              >
                <span aria-hidden="true">{w.glyph}</span> {w.word}
              </span>
            );
          },
        }),
        helper.accessor((v) => v.governing?.id ?? '', {
          id: 'governing',
          header: 'Governing check',
          filterFn: 'equals',
          cell: (c: Cell) => {
            const g = c.row.original.governing;
            return g ? (
              <span>
                {g.label} — <Outcome status={g.status} ratio={g.marginRatio} />
              </span>
            ) : (
              '—'
            );
          },
        }),
        ...checks.map((check) =>
          helper.accessor(
            (v) => v.checks.find((c) => c.id === check.id)?.marginRatio ?? Number.NEGATIVE_INFINITY,
            {
              id: check.id,
              header: `${check.label}: margin`,
              sortFn: 'basic',
              cell: (c: Cell) => {
                const m = c.row.original.checks.find((x) => x.id === check.id);
                return m ? <Outcome status={m.status} ratio={m.marginRatio} /> : '—';
              },
            },
          ),
        ),
        helper.display({
          id: 'choose',
          header: () => <span className="sr-only">Choose</span>,
          cell: (c: Cell) =>
            c.row.original.index === chosen ? (
              <span className="text-sm font-semibold">Chosen</span>
            ) : (
              <Button variant="quiet" className="px-2 py-1" onClick={() => onChoose(c.row.original.index)}>
                Choose<span className="sr-only"> variant {c.row.original.index + 1}</span>
              </Button>
            ),
        }),
      ]),
    [kinds, checks, system, chosen, onChoose],
  );
  const table = useTable({
    features,
    columns,
    data: variants,
    getRowId: (v) => String(v.index),
    autoResetPageIndex: false,
    initialState: { sorting: [{ id: 'n', desc: false }], pagination: { pageIndex: 0, pageSize: 25 } },
  });
  const filter = (id: string) => (table.getColumn(id)?.getFilterValue() as string | undefined) ?? '';
  const setFilter = (id: string, value: string) => {
    table.getColumn(id)?.setFilterValue(value === '' ? undefined : value);
    table.setPageIndex(0);
  };
  const shown = table.getFilteredRowModel().rows.length;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <Field label="Verdict" className="w-44">
          {(c) => (
            <Select {...c} value={filter('verdict')} onChange={(e) => setFilter('verdict', e.target.value)}>
              <option value="">Every verdict</option>
              {(['pass', 'fail', 'incomplete'] as const).map((v) => (
                <option key={v} value={v}>
                  {VERDICT_WORDS[v].glyph} {VERDICT_WORDS[v].word}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Governed by" className="min-w-56 max-w-md grow">
          {(c) => (
            <Select
              {...c}
              value={filter('governing')}
              onChange={(e) => setFilter('governing', e.target.value)}
            >
              <option value="">Any check</option>
              {[...labels].map(([id, label]) => (
                <option key={id} value={id}>
                  {label}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <p className="pb-2 text-sm text-ink-muted" aria-live="polite">
          {shown} of {variants.length} variants
        </p>
      </div>
      <div className="relative max-w-full overflow-x-auto">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Variants of the sweep: sort by a column’s heading</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const sortable = header.column.getCanSort();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
                      }
                      className="border-b-2 border-ink px-2 py-2 align-bottom font-semibold"
                    >
                      {header.isPlaceholder ? null : sortable ? (
                        <button
                          type="button"
                          className="text-left font-semibold underline-offset-2 hover:underline"
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          <table.FlexRender header={header} />
                          <span aria-hidden="true">
                            {sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}
                          </span>
                        </button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={row.original.index === chosen ? 'bg-paper-sunk' : undefined}>
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="num border-b border-rule px-2 py-1.5 align-top">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <Button onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
          Previous
        </Button>
        <span>
          Page {table.state.pagination.pageIndex + 1} of {Math.max(1, table.getPageCount())}
        </span>
        <Button onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
          Next
        </Button>
      </div>
    </div>
  );
});
