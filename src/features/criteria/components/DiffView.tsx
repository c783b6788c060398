import {
  type CategoryLabels,
  type CriteriaRowInput,
  categoryLabel,
  criterionSpec,
  zoneLabel,
} from '@shared/checks/criteria';
import type { CriteriaDiff } from '@shared/schemas/criteria';
import type { UnitSystem } from '@shared/units';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatSiValue } from '../../../lib/check-format';

const FIELD_LABELS: Record<string, string> = {
  name: 'Name',
  jurisdiction: 'Jurisdiction',
  edition: 'Edition and amendments',
  effectiveDate: 'Effective date',
  notes: 'Notes',
  sourceReference: 'Source reference',
  categoryLabels: 'Names of the wall categories',
};

const show = (v: unknown) =>
  v === null || v === '' ? '—' : typeof v === 'object' ? JSON.stringify(v) : String(v);

function value(row: Pick<CriteriaRowInput, 'criterion' | 'value'>, system: UnitSystem) {
  return formatSiValue(row.value, criterionSpec(row.criterion).unit, system);
}

function Key({
  row,
  labels,
}: {
  row: Pick<CriteriaRowInput, 'climateZone' | 'wallCategory' | 'criterion'>;
  labels: CategoryLabels;
}) {
  return (
    <>
      <Td className="num">{zoneLabel(row.climateZone)}</Td>
      <Td>{categoryLabel(labels, row.wallCategory)}</Td>
      <Td>{criterionSpec(row.criterion).label}</Td>
    </>
  );
}

const KeyHead = () => (
  <>
    <Th>Climate zone</Th>
    <Th>Wall category</Th>
    <Th>Criterion</Th>
  </>
);

/** What changed between two versions: details, rows added, removed, changed — words and signs, not colour alone. */
export function DiffView({
  diff,
  system,
  labels,
}: {
  diff: CriteriaDiff;
  system: UnitSystem;
  labels: CategoryLabels;
}) {
  const nothing = diff.meta.length + diff.added.length + diff.removed.length + diff.changed.length === 0;
  return (
    <div className="flex flex-col gap-8">
      <p>
        {diff.changed.length} changed, {diff.added.length} added, {diff.removed.length} removed,{' '}
        {diff.unchanged} unchanged row{diff.unchanged === 1 ? '' : 's'}
        {diff.meta.length > 0
          ? `; ${diff.meta.length} detail${diff.meta.length === 1 ? '' : 's'} changed`
          : ''}
        .
      </p>
      {nothing ? <p className="text-ink-muted">The two versions hold the same rows and details.</p> : null}
      {diff.changed.length > 0 ? (
        <Table caption="Changed rows">
          <thead>
            <tr>
              <KeyHead />
              <Th numeric>Version {diff.from.version}</Th>
              <Th numeric>Version {diff.to.version}</Th>
              <Th>Note</Th>
            </tr>
          </thead>
          <tbody>
            {diff.changed.map((c) => (
              <tr key={`${c.climateZone}|${c.wallCategory}|${c.criterion}`}>
                <Key row={c} labels={labels} />
                <Td numeric>{value({ criterion: c.criterion, value: c.from.value }, system)}</Td>
                <Td numeric className="font-semibold">
                  <span aria-hidden="true">→ </span>
                  {value({ criterion: c.criterion, value: c.to.value }, system)}
                </Td>
                <Td>{c.from.note === c.to.note ? c.to.note : `${show(c.from.note)} → ${show(c.to.note)}`}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      ) : null}
      {(['added', 'removed'] as const).map((kind) =>
        diff[kind].length > 0 ? (
          <Table
            key={kind}
            caption={
              kind === 'added'
                ? `Added in version ${diff.to.version}`
                : `Removed in version ${diff.to.version}`
            }
          >
            <thead>
              <tr>
                <Th>
                  <span className="sr-only">Change</span>
                </Th>
                <KeyHead />
                <Th numeric>Value</Th>
                <Th>Note</Th>
              </tr>
            </thead>
            <tbody>
              {diff[kind].map((r) => (
                <tr key={`${r.climateZone}|${r.wallCategory}|${r.criterion}`}>
                  <Td className="num font-semibold">{kind === 'added' ? '+ added' : '− removed'}</Td>
                  <Key row={r} labels={labels} />
                  <Td numeric>{value(r, system)}</Td>
                  <Td>{r.note}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
        ) : null,
      )}
      {diff.meta.length > 0 ? (
        <Table
          caption="Changed details"
          head={['Detail', <>Version {diff.from.version}</>, <>Version {diff.to.version}</>]}
        >
          <tbody>
            {diff.meta.map((m) => (
              <tr key={m.field}>
                <Td>{FIELD_LABELS[m.field] ?? m.field}</Td>
                <Td>{show(m.from)}</Td>
                <Td className="font-semibold">{show(m.to)}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      ) : null}
    </div>
  );
}
