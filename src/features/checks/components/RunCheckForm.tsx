import type { CriteriaSetSummary } from '@shared/schemas/criteria';
import { useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { useRunCheck } from '../api/run-check';

/** Pick a code table (grouped by firm) and run every check against it; the run is stored. */
export function RunCheckForm({
  assemblyId,
  sets,
  onRun,
}: {
  assemblyId: string;
  sets: CriteriaSetSummary[];
  onRun: (runId: string) => void;
}) {
  const [chosen, setChosen] = useState<string>('');
  const run = useRunCheck();
  const setId = sets.some((s) => s.id === chosen) ? chosen : (sets[0]?.id ?? '');
  const firms = [...new Map(sets.map((s) => [s.organisationId, s.organisationName])).entries()];
  return (
    <form
      className="flex flex-wrap items-end gap-4"
      onSubmit={submitting(async () => {
        onRun((await run.mutateAsync({ assemblyId, criteriaSetId: setId })).id);
      })}
    >
      <Field label="Code table" className="min-w-72 max-w-xl grow">
        {(c) => (
          <Select {...c} value={setId} onChange={(e) => setChosen(e.target.value)}>
            {firms.map(([orgId, name]) => (
              <optgroup key={orgId} label={name}>
                {sets
                  .filter((s) => s.organisationId === orgId)
                  .map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.name} — version {s.version} ({s.rowCount} row{s.rowCount === 1 ? '' : 's'})
                    </option>
                  ))}
              </optgroup>
            ))}
          </Select>
        )}
      </Field>
      <Button
        type="submit"
        variant="primary"
        busy={run.isPending}
        busyLabel="Running the checks…"
        disabled={!setId}
      >
        Run the checks
      </Button>
      {setId ? (
        <Link to={`/code-tables/${setId}`} className="pb-2 text-sm">
          Open this code table
        </Link>
      ) : null}
      {run.isError ? (
        <Notice tone="caution" title={errorMessage(run.error)} live className="basis-full" />
      ) : null}
    </form>
  );
}
