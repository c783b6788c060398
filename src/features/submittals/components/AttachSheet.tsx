import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDateTime } from '../../../lib/format';
import { useCheckRuns } from '../../checks/api/get-check-runs';
import { useSubmittalStep } from '../api/mutations';

/** Add the compliance sheet of a stored check run of the project. */
export function AttachSheet({
  projectId,
  submittalId,
  attached,
}: {
  projectId: string;
  submittalId: string;
  attached: string[];
}) {
  const runs = useCheckRuns(projectId, null);
  const step = useSubmittalStep(submittalId);
  const [runId, setRunId] = useState('');
  const available = (runs.data ?? []).filter((r) => !attached.includes(r.id));

  return (
    <div className="flex flex-col gap-3 border border-rule bg-paper-raised p-4">
      {runs.isError ? <Notice tone="caution" title={errorMessage(runs.error)} /> : null}
      {runs.data && available.length === 0 ? (
        <p className="text-sm">
          No stored check run to attach{runs.data.length > 0 ? ' that is not attached already' : ''}: run the
          checks of an assembly first (its Checks tab).
        </p>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <Field label="Compliance sheet of a check run" className="min-w-72 flex-1">
            {(c) => (
              <Select {...c} value={runId} onChange={(e) => setRunId(e.target.value)}>
                <option value="">Choose a run…</option>
                {available.map((r) => (
                  <option key={r.id} value={r.id}>
                    {r.assemblyName} rev {r.assemblyRevision} — {r.criteriaSetName} v{r.criteriaSetVersion} —{' '}
                    {VERDICT_TEXT[r.verdict].word} — {formatDateTime(r.createdAt)}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Button
            disabled={!runId}
            busy={step.isPending}
            busyLabel="Adding…"
            onClick={() =>
              step.mutate({ kind: 'sheet', checkRunId: runId }, { onSuccess: () => setRunId('') })
            }
          >
            Add the sheet
          </Button>
        </div>
      )}
      {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
    </div>
  );
}
