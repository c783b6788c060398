import {
  type CategoryLabels,
  CRITERIA_ZONES,
  CRITERION_TYPE_KEYS,
  type CriterionType,
  categoryLabel,
  criterionSpec,
  zoneLabel,
} from '@shared/checks/criteria';
import { WALL_CATEGORIES } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { type CellContext, createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { createContext, useContext } from 'react';
import { Button } from '../../../components/ui/Button';
import { Options } from '../../../components/ui/Options';
import { TableScroller } from '../../../components/ui/Table';
import type { DraftErrors, DraftField, DraftRow } from '../draft';

/*
 * The editable grid of a code table: one row per criterion (zone × wall category × criterion type), values
 * in the unit system the grid was opened in. Built on TanStack Table v9 (`useTable`, headless): the table
 * supplies rows and cells, the markup is a plain, keyboard-reachable <table> of labelled form controls.
 */

interface GridState {
  readOnly: boolean;
  system: UnitSystem;
  labels: CategoryLabels;
  errors: DraftErrors;
  update: (key: string, patch: Partial<DraftRow>) => void;
  remove: (key: string) => void;
  rowNumber: (key: string) => number;
}
const GridContext = createContext<GridState | null>(null);
const useGrid = () => useContext(GridContext)!;

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, DraftRow>();
type Ctx = CellContext<typeof features, DraftRow, unknown>;

const cellControl =
  'w-full min-w-0 rounded-sm border border-rule-strong bg-paper-raised px-2 py-1 text-sm text-ink ' +
  'aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution';

function errorId(key: string, field: DraftField) {
  return `grid-${key}-${field}-error`;
}

function CellError({ rowKey, field }: { rowKey: string; field: DraftField }) {
  const { errors } = useGrid();
  const message = errors[rowKey]?.[field];
  if (!message) return null;
  return (
    <p id={errorId(rowKey, field)} className="mt-1 flex gap-1 text-xs font-medium text-caution">
      <span aria-hidden="true">✕</span>
      <span>{message}</span>
    </p>
  );
}

type ChoiceField = 'climateZone' | 'wallCategory';

/** The closed lists a cell picks from: what the box is, the choices, their words (read-only, the words alone). */
const CHOICES: {
  [K in ChoiceField]: {
    what: string;
    values: readonly DraftRow[K][];
    words: (value: DraftRow[K], labels: CategoryLabels) => string;
    readOnlyClass?: string;
  };
} = {
  climateZone: { what: 'climate zone', values: CRITERIA_ZONES, words: zoneLabel, readOnlyClass: 'num' },
  wallCategory: {
    what: 'wall category',
    values: WALL_CATEGORIES,
    words: (c, labels) => categoryLabel(labels, c),
  },
};

function ChoiceCell<K extends ChoiceField>({ draft: d, field }: { draft: DraftRow; field: K }) {
  const g = useGrid();
  const { what, values, words, readOnlyClass } = CHOICES[field];
  const word = (value: DraftRow[K]) => words(value, g.labels);
  if (g.readOnly) return <span className={readOnlyClass}>{word(d[field])}</span>;
  return (
    <select
      aria-label={`Row ${g.rowNumber(d.key)}: ${what}`}
      className={cellControl}
      value={d[field]}
      onChange={(e) => g.update(d.key, { [field]: e.target.value })}
    >
      <Options values={values} labels={word} />
    </select>
  );
}

function CriterionCell({ row }: Ctx) {
  const g = useGrid();
  const d = row.original;
  const spec = criterionSpec(d.criterion);
  if (g.readOnly)
    return (
      <span>
        {spec.label}
        <CellError rowKey={d.key} field="row" />
      </span>
    );
  return (
    <div>
      <select
        aria-label={`Row ${g.rowNumber(d.key)}: criterion`}
        aria-invalid={Boolean(g.errors[d.key]?.row)}
        aria-describedby={g.errors[d.key]?.row ? errorId(d.key, 'row') : undefined}
        className={cellControl}
        value={d.criterion}
        onChange={(e) => {
          const next = e.target.value as CriterionType;
          const kindChanged = criterionSpec(next).kind !== spec.kind;
          g.update(d.key, {
            criterion: next,
            ...(kindChanged ? { valueText: criterionSpec(next).kind === 'boolean' ? 'yes' : '' } : {}),
          });
        }}
      >
        {CRITERION_TYPE_KEYS.map((t) => (
          <option key={t} value={t}>
            {criterionSpec(t).label}
          </option>
        ))}
      </select>
      <CellError rowKey={d.key} field="row" />
    </div>
  );
}

function ValueCell({ row }: Ctx) {
  const g = useGrid();
  const d = row.original;
  const spec = criterionSpec(d.criterion);
  const unit = spec.display[g.system].symbol;
  const error = g.errors[d.key]?.value;
  const label = `Row ${g.rowNumber(d.key)}: value${unit ? ` in ${unit}` : ''}`;
  if (g.readOnly) return <span className="num">{d.valueText}</span>;
  return (
    <div>
      {spec.kind === 'boolean' ? (
        <select
          aria-label={label}
          aria-invalid={Boolean(error)}
          aria-describedby={error ? errorId(d.key, 'value') : undefined}
          className={cellControl}
          value={d.valueText}
          onChange={(e) => g.update(d.key, { valueText: e.target.value })}
        >
          <option value="">—</option>
          <option value="yes">yes</option>
          <option value="no">no</option>
        </select>
      ) : (
        <input
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          aria-label={label}
          aria-invalid={Boolean(error)}
          aria-describedby={error ? errorId(d.key, 'value') : undefined}
          className={`num text-right ${cellControl}`}
          value={d.valueText}
          onChange={(e) => g.update(d.key, { valueText: e.target.value })}
        />
      )}
      <CellError rowKey={d.key} field="value" />
    </div>
  );
}

function UnitCell({ row }: Ctx) {
  const g = useGrid();
  const unit = criterionSpec(row.original.criterion).display[g.system].symbol;
  return <span className="num whitespace-nowrap text-ink-muted">{unit || '—'}</span>;
}

function NoteCell({ row }: Ctx) {
  const g = useGrid();
  const d = row.original;
  if (g.readOnly) return <span className="text-ink-muted">{d.note}</span>;
  return (
    <div>
      <input
        type="text"
        aria-label={`Row ${g.rowNumber(d.key)}: note`}
        aria-invalid={Boolean(g.errors[d.key]?.note)}
        className={cellControl}
        value={d.note}
        maxLength={600}
        onChange={(e) => g.update(d.key, { note: e.target.value })}
      />
      <CellError rowKey={d.key} field="note" />
    </div>
  );
}

function RemoveCell({ row }: Ctx) {
  const g = useGrid();
  if (g.readOnly) return null;
  return (
    <Button variant="quiet" className="px-2 py-1" onClick={() => g.remove(row.original.key)}>
      Remove<span className="sr-only"> row {g.rowNumber(row.original.key)}</span>
    </Button>
  );
}

const columns = helper.columns([
  helper.display({
    id: 'zone',
    header: 'Climate zone',
    cell: ({ row }) => <ChoiceCell draft={row.original} field="climateZone" />,
  }),
  helper.display({
    id: 'category',
    header: 'Wall category',
    cell: ({ row }) => <ChoiceCell draft={row.original} field="wallCategory" />,
  }),
  helper.display({ id: 'criterion', header: 'Criterion', cell: CriterionCell }),
  helper.display({ id: 'value', header: 'Value', cell: ValueCell }),
  helper.display({ id: 'unit', header: 'Unit', cell: UnitCell }),
  helper.display({ id: 'note', header: 'Note', cell: NoteCell }),
  helper.display({ id: 'actions', header: () => <span className="sr-only">Actions</span>, cell: RemoveCell }),
]);

interface CriteriaGridProps {
  drafts: DraftRow[];
  system: UnitSystem;
  labels: CategoryLabels;
  errors: DraftErrors;
  readOnly: boolean;
  onChange: (drafts: DraftRow[]) => void;
  caption: string;
}

export function CriteriaGrid({
  drafts,
  system,
  labels,
  errors,
  readOnly,
  onChange,
  caption,
}: CriteriaGridProps) {
  const table = useTable({ features, columns, data: drafts, getRowId: (r) => r.key });
  const state: GridState = {
    readOnly,
    system,
    labels,
    errors,
    update: (key, patch) => onChange(drafts.map((d) => (d.key === key ? { ...d, ...patch } : d))),
    remove: (key) => onChange(drafts.filter((d) => d.key !== key)),
    rowNumber: (key) => drafts.findIndex((d) => d.key === key) + 1,
  };
  return (
    <GridContext.Provider value={state}>
      <TableScroller>
        <table className="w-full border-collapse text-left text-sm">
          <caption className="label-caps pb-2 text-left">{caption}</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                <th scope="col" className="border-b-2 border-ink px-2 py-2 text-right font-semibold">
                  <span className="sr-only">Row</span>
                  <span aria-hidden="true">#</span>
                </th>
                {group.headers.map((header) => (
                  <th
                    key={header.id}
                    scope="col"
                    className={`border-b-2 border-ink px-2 py-2 align-bottom font-semibold ${header.column.id === 'value' ? 'text-right' : ''}`}
                  >
                    {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row, i) => (
              <tr key={row.id} className={errors[row.original.key] ? 'bg-caution-wash' : undefined}>
                <td className="num border-b border-rule px-2 py-2 text-right align-top text-ink-muted">
                  {i + 1}
                </td>
                {row.getAllCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={`border-b border-rule px-2 py-2 align-top ${cell.column.id === 'value' ? 'w-32 text-right' : ''} ${cell.column.id === 'criterion' ? 'min-w-56' : ''} ${cell.column.id === 'category' ? 'min-w-44' : ''} ${cell.column.id === 'note' ? 'min-w-40' : ''}`}
                  >
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
            {drafts.length === 0 ? (
              <tr>
                <td colSpan={8} className="border-b border-rule px-2 py-4 text-ink-muted">
                  No rows yet.{readOnly ? '' : ' Add a row, or import a CSV file.'}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </TableScroller>
    </GridContext.Provider>
  );
}
