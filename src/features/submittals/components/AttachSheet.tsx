import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDateTime } from '../../../lib/format';
import { useCheckRuns } from '../../checks/api/get-check-runs';
import { AttachChoice, type AttachWords } from './AttachChoice';

const words: AttachWords = {
  label: 'Compliance sheet of a check run',
  fieldClassName: 'min-w-72 flex-1',
  placeholder: 'Choose a run…',
  add: 'Add the sheet',
};

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
  const available = (runs.data ?? []).filter((r) => !attached.includes(r.id));

  return (
    <AttachChoice
      submittalId={submittalId}
      list={runs}
      none={
        runs.data && available.length === 0 ? (
          <>
            No stored check run to attach{runs.data.length > 0 ? ' that is not attached already' : ''}: run
            the checks of an assembly first (its Checks tab).
          </>
        ) : null
      }
      choices={available.map((r) => ({
        value: r.id,
        label: (
          <>
            {r.assemblyName} rev {r.assemblyRevision} — {r.criteriaSetName} v{r.criteriaSetVersion} —{' '}
            {VERDICT_TEXT[r.verdict].word} — {formatDateTime(r.createdAt)}
          </>
        ),
      }))}
      words={words}
      step={(checkRunId) => ({ kind: 'sheet', checkRunId })}
    />
  );
}
