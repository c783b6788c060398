import type { SavedSweepSummary } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';
import { type ReactNode, useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useSweepComparison } from '../api/compare-sweeps';
import { resultText, StaleMark } from './SweepFacts';
import { SweepSection } from './SweepSection';

/** Two saved sweeps side by side (the server's comparison): what each ran on and found, and what changed. */
export function SweepComparison({
  assemblyId,
  sweeps,
  system,
}: {
  assemblyId: string;
  /** Newest first. */
  sweeps: SavedSweepSummary[];
  system: UnitSystem;
}) {
  const [from, setFrom] = useState(sweeps[1]?.id ?? '');
  const [to, setTo] = useState(sweeps[0]?.id ?? '');
  const compared = useSweepComparison(assemblyId, from, to);
  const pick = (label: string, value: string, set: (id: string) => void) => (
    <Field label={label} className="min-w-0 max-w-full sm:w-80">
      {(c) => (
        <Select {...c} value={value} onChange={(e) => set(e.target.value)}>
          {sweeps.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name} ({formatDateTime(s.createdAt)})
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
  const c = compared.data;
  const row = (label: string, of: (s: SavedSweepSummary) => ReactNode) =>
    c ? (
      <tr>
        <Th scope="row" className="border-b border-rule font-normal text-ink-muted">
          {label}
        </Th>
        <Td>{of(c.from)}</Td>
        <Td>{of(c.to)}</Td>
      </tr>
    ) : null;
  return (
    <SweepSection id="sweep-compare-heading" title="Compare two saved sweeps">
      <div className="flex flex-wrap gap-3">
        {pick('Earlier', from, setFrom)}
        {pick('Later', to, setTo)}
      </div>
      {from === to ? (
        <p className="text-sm text-ink-muted">Choose two different sweeps.</p>
      ) : compared.isError ? (
        <Notice tone="caution" title={errorMessage(compared.error)} live />
      ) : !c ? (
        <p className="text-sm text-ink-muted">Comparing…</p>
      ) : (
        <>
          <Table caption="The two sweeps side by side" captionHidden>
            <thead>
              <tr>
                <Th>
                  <span className="sr-only">What</span>
                </Th>
                <Th>{c.from.name}</Th>
                <Th>{c.to.name}</Th>
              </tr>
            </thead>
            <tbody>
              {row(
                'Saved',
                (s) => `${formatDateTime(s.createdAt)}${s.createdBy ? ` by ${s.createdBy}` : ''}`,
              )}
              {row('Ran on', (s) => (
                <>
                  revision {s.assemblyRevision} <StaleMark sweep={s} />
                </>
              ))}
              {row('Code table', (s) => `“${s.criteriaSetName}” version ${s.criteriaSetVersion}`)}
              {row('Found', (s) => resultText(s, system))}
            </tbody>
          </Table>
          <div data-testid="sweep-changes">
            {c.changes.length === 0 ? (
              <p className="text-sm">
                Nothing differs: the same parameters, revision, code table and results.
              </p>
            ) : (
              <ul className="list-disc pl-5 text-sm">
                {c.changes.map((x) => (
                  <li key={x}>{x.charAt(0).toUpperCase() + x.slice(1)}.</li>
                ))}
              </ul>
            )}
          </div>
        </>
      )}
    </SweepSection>
  );
}
