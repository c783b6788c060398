import { useInspections } from '../../inspections/api/get-inspections';
import { scopeText } from '../../inspections/scope';
import { AttachChoice, type AttachWords } from './AttachChoice';

const words: AttachWords = {
  label: 'Field report of an inspection',
  hint: 'The report as it stands now; a later answer makes a new report with a new code.',
  fieldClassName: 'min-w-0 flex-1 basis-72',
  placeholder: 'Choose an inspection…',
  add: 'Add the field report',
};

/** Add the field report (PDF, as it stands now) of an inspection of the project, as a file item. */
export function AttachFieldReport({ projectId, submittalId }: { projectId: string; submittalId: string }) {
  const inspections = useInspections(projectId);
  const all = inspections.data ?? [];
  return (
    <AttachChoice
      submittalId={submittalId}
      list={inspections}
      none={
        inspections.data && all.length === 0
          ? "No inspection to report on: start one on the project's Inspections tab first."
          : null
      }
      choices={all.map((i) => ({
        value: i.id,
        label: `Inspection ${i.number} — ${i.title} — ${scopeText(i.scope)} — ${i.status === 'closed' ? 'closed' : 'in progress'}`,
      }))}
      words={words}
      step={(inspectionId) => ({ kind: 'report', inspectionId })}
    />
  );
}
