import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { useInspections } from '../../inspections/api/get-inspections';
import { scopeText } from '../../inspections/scope';
import { useSubmittalStep } from '../api/mutations';

/** Add the field report (PDF, as it stands now) of an inspection of the project, as a file item. */
export function AttachFieldReport({ projectId, submittalId }: { projectId: string; submittalId: string }) {
  const inspections = useInspections(projectId);
  const step = useSubmittalStep(submittalId);
  const [inspectionId, setInspectionId] = useState('');

  return (
    <div className="flex flex-col gap-3 border border-rule bg-paper-raised p-4">
      {inspections.isError ? <Notice tone="caution" title={errorMessage(inspections.error)} /> : null}
      {inspections.data && inspections.data.length === 0 ? (
        <p className="text-sm">
          No inspection to report on: start one on the project's Inspections tab first.
        </p>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <Field
            label="Field report of an inspection"
            hint="The report as it stands now; a later answer makes a new report with a new code."
            className="min-w-0 flex-1 basis-72"
          >
            {(c) => (
              <Select {...c} value={inspectionId} onChange={(e) => setInspectionId(e.target.value)}>
                <option value="">Choose an inspection…</option>
                {(inspections.data ?? []).map((i) => (
                  <option key={i.id} value={i.id}>
                    Inspection {i.number} — {i.title} — {scopeText(i.scope)} —{' '}
                    {i.status === 'closed' ? 'closed' : 'in progress'}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Button
            disabled={!inspectionId}
            busy={step.isPending}
            busyLabel="Adding…"
            onClick={() =>
              step.mutate({ kind: 'report', inspectionId }, { onSuccess: () => setInspectionId('') })
            }
          >
            Add the field report
          </Button>
        </div>
      )}
      {step.isError ? <Notice tone="caution" title={errorMessage(step.error)} live /> : null}
    </div>
  );
}
