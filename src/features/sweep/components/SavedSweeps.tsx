import type { Assembly } from '@shared/schemas/assembly';
import type { SweepSave } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { formatDateTime } from '../../../lib/format';
import { useSavedSweeps } from '../api/get-saved-sweeps';
import { useSaveSweep } from '../api/save-sweep';
import { PrintSweep } from './PrintSweep';
import { SweepComparison } from './SweepComparison';
import { resultText, StaleMark } from './SweepFacts';
import { SweepSection } from './SweepSection';

/** What the page's finished run would save, or why there is nothing to save. */
export type ToSave = { body: SweepSave } | { reason: string };

/**
 * The assembly's saved sweeps: save the finished one (the server runs it again on the current revision and keeps
 * a summary), the list with who, when, revision and code table version — stale ones marked — reopen one, compare
 * two, and print one as the appendix of a compliance sheet.
 */
export function SavedSweeps({
  assembly,
  mayWrite,
  system,
  toSave,
  reopened,
  onReopen,
}: {
  assembly: Assembly;
  mayWrite: boolean;
  system: UnitSystem;
  toSave: ToSave;
  reopened: string | null;
  onReopen: (sweepId: string) => void;
}) {
  const list = useSavedSweeps(assembly.id);
  const save = useSaveSweep();
  const [name, setName] = useState('');
  const sweeps = list.data ?? [];
  return (
    <div className="flex flex-col gap-5">
      {mayWrite ? (
        'body' in toSave ? (
          <form
            className="flex flex-col gap-3"
            aria-label="Save this sweep"
            onSubmit={submitting(async () => {
              await save.mutateAsync({
                assemblyId: assembly.id,
                body: { ...toSave.body, name: name.trim() },
              });
              setName('');
            })}
          >
            <Field
              label="Name of the saved sweep"
              hint="The server runs the same parameters again on this revision and keeps the counts, the chart points and the cheapest variants."
              className="max-w-xl"
            >
              {(c) => (
                <TextInput {...c} value={name} maxLength={200} onChange={(e) => setName(e.target.value)} />
              )}
            </Field>
            <Button
              type="submit"
              variant="primary"
              className="self-start"
              busy={save.isPending}
              busyLabel="Saving (the server runs it)…"
              disabled={name.trim() === ''}
            >
              Save the sweep
            </Button>
            {save.error ? <Notice tone="caution" title={errorMessage(save.error)} live /> : null}
            {save.isSuccess ? (
              <Notice
                tone="info"
                title={`Saved “${save.data.name}”: ${resultText(
                  {
                    count: save.data.summary.count,
                    verdicts: save.data.summary.verdicts,
                    cheapest: save.data.summary.ranking?.top[0] ?? null,
                  },
                  system,
                )}.`}
                live
              />
            ) : null}
          </form>
        ) : (
          <p className="text-sm text-ink-muted">{toSave.reason}</p>
        )
      ) : (
        <p className="text-sm text-ink-muted">
          Your role on this project reads saved sweeps; it does not save them.
        </p>
      )}

      <SweepSection id="saved-sweeps-heading" title="Saved sweeps of this assembly" tight>
        {list.isPending ? (
          <p className="text-sm text-ink-muted">Loading the saved sweeps…</p>
        ) : list.isError ? (
          <Notice tone="caution" title={errorMessage(list.error)} live />
        ) : sweeps.length === 0 ? (
          <p className="text-sm text-ink-muted">No sweep of this assembly has been saved yet.</p>
        ) : (
          <ul className="flex flex-col" data-testid="saved-sweeps">
            {sweeps.map((s) => (
              <li
                key={s.id}
                className="flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b border-rule py-2"
              >
                <span className="font-semibold [overflow-wrap:anywhere]">{s.name}</span>
                <span className="text-sm text-ink-muted">
                  {formatDateTime(s.createdAt)}
                  {s.createdBy ? ` by ${s.createdBy}` : ''} · revision {s.assemblyRevision} · “
                  {s.criteriaSetName}” version {s.criteriaSetVersion} · {resultText(s, system)}
                </span>
                <StaleMark sweep={s} />
                {reopened === s.id ? (
                  <span className="text-sm font-semibold">Open</span>
                ) : (
                  <Button variant="quiet" className="px-2 py-1" onClick={() => onReopen(s.id)}>
                    Reopen<span className="sr-only"> “{s.name}”</span>
                  </Button>
                )}
              </li>
            ))}
          </ul>
        )}
      </SweepSection>

      {sweeps.length > 1 ? (
        <SweepComparison assemblyId={assembly.id} sweeps={sweeps} system={system} />
      ) : null}
      {sweeps.length > 0 ? (
        <PrintSweep assembly={assembly} sweeps={sweeps} preferred={reopened} system={system} />
      ) : null}
    </div>
  );
}
