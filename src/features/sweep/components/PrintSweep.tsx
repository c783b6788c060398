import type { Assembly } from '@shared/schemas/assembly';
import type { SavedSweepSummary } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Link } from 'react-router';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useCheckRuns } from '../../checks/api/get-check-runs';
import { sheetPdfUrl } from '../../sheets/components/SheetLink';
import { SweepSection } from './SweepSection';

/**
 * A saved sweep printed as the appendix of a compliance sheet: the sheet is a check run's, so the person picks
 * the sweep and the run of this assembly (the newest first) and downloads `sheet.pdf?sweep=`. Without a run,
 * says so and links to the checks page.
 */
export function PrintSweep({
  assembly,
  sweeps,
  preferred,
  system,
}: {
  assembly: Assembly;
  sweeps: SavedSweepSummary[];
  /** The sweep open on the page, if any. */
  preferred: string | null;
  system: UnitSystem;
}) {
  const runs = useCheckRuns(assembly.projectId, assembly.id);
  const [sweepId, setSweepId] = useState('');
  const [runId, setRunId] = useState('');
  const sweep = sweeps.find((s) => s.id === sweepId) ?? sweeps.find((s) => s.id === preferred) ?? sweeps[0]!;
  const list = runs.data ?? [];
  const run = list.find((r) => r.id === runId) ?? list[0];
  const checksPath = `/projects/${encodeURIComponent(assembly.projectId)}/assemblies/${encodeURIComponent(assembly.id)}/checks`;
  return (
    <SweepSection id="sweep-print-heading" title="Print a sweep on the compliance sheet">
      <p className="max-w-prose text-sm text-ink-muted">
        A saved sweep prints as an appendix (its chart and cheapest variants) of the compliance sheet of one
        check run of this assembly. The sheet still certifies only the assembly as checked.
      </p>
      {runs.isPending ? (
        <p className="text-sm text-ink-muted">Loading the check runs…</p>
      ) : runs.isError ? (
        <Notice tone="caution" title={errorMessage(runs.error)} live />
      ) : !run ? (
        <Notice
          tone="info"
          title="This assembly has no check run yet, so there is no compliance sheet to print on."
        >
          <Link to={checksPath}>Run its checks on the checks page</Link>, then come back to print the sweep.
        </Notice>
      ) : (
        <>
          <div className="flex flex-wrap gap-3">
            <Field label="Sweep" className="min-w-0 max-w-full sm:w-80">
              {(c) => (
                <Select {...c} value={sweep.id} onChange={(e) => setSweepId(e.target.value)}>
                  {sweeps.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.name} (revision {s.assemblyRevision})
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <Field label="Compliance sheet of the check run" className="min-w-0 max-w-full sm:w-80">
              {(c) => (
                <Select {...c} value={run.id} onChange={(e) => setRunId(e.target.value)}>
                  {list.map((r) => (
                    <option key={r.id} value={r.id}>
                      Revision {r.assemblyRevision}, {formatDateTime(r.createdAt)} — {r.verdict}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
          </div>
          {run.assemblyRevision !== sweep.assemblyRevision ? (
            <Notice
              tone="warning"
              title={`The check run is of revision ${run.assemblyRevision}; the sweep ran on revision ${sweep.assemblyRevision}.`}
            />
          ) : null}
          <a
            className="self-start font-semibold"
            href={`${sheetPdfUrl(run.id, system)}&sweep=${encodeURIComponent(sweep.id)}`}
            download
            data-testid="sweep-appendix-pdf"
          >
            Download the compliance sheet with “{sweep.name}” (PDF)
          </a>
        </>
      )}
    </SweepSection>
  );
}
