import type { Project, ProjectClimate } from '@shared/schemas/project';
import { ConflictBanner, ConflictChoice, useConflictChoice } from '../../../components/ui/ConflictChoice';
import { editFormProps } from '../../../components/ui/EditForm';
import { formatDateTime } from '../../../lib/format';
import { useConflictEdit } from '../../../lib/use-conflict-edit';
import { conflictingProject, useUpdateClimate } from '../api/update-climate';
import { type ClimateFormValues, climateToForm, mergeClimate } from '../climate-form';
import { ClimateForm } from './ClimateForm';

/**
 * Edits the project's climate. Every save names the project version it started from; when someone saved the
 * climate in between (a save of other project data does not stand in the way), nothing is overwritten
 * silently: the person carries their changed values onto the saved version, or loads it.
 */
export function ClimateEditor({
  project,
  onDone,
  indoorHref,
}: {
  project: Project;
  onDone: () => void;
  indoorHref?: string;
}) {
  const update = useUpdateClimate();
  const {
    base,
    values,
    formKey,
    conflict,
    save: saveVersion,
    restart,
  } = useConflictEdit<Project, ClimateFormValues, ProjectClimate>(
    project,
    (p) => climateToForm(p.climate),
    conflictingProject,
  );
  const choice = useConflictChoice(conflict, restart);

  const save = (climate: ProjectClimate) =>
    saveVersion(climate, (version) => update.mutateAsync({ id: project.id, version, climate }), onDone);

  const merge = conflict ? mergeClimate(conflict.base.climate, conflict.mine, conflict.theirs.climate) : null;

  const banner = (
    <ConflictBanner choice={choice} title="Someone else saved the climate first." version="version">
      {conflict && merge ? (
        <>
          <p>
            Version <span className="num">{conflict.theirs.version}</span> was saved at{' '}
            <span className="num">{formatDateTime(conflict.theirs.updatedAt)}</span> while you were editing
            version <span className="num">{conflict.base.version}</span>.{' '}
            {merge.theirsChanged.length === 0
              ? 'They saved the climate without changing a value.'
              : `They changed the climate: ${merge.theirsChanged.slice(0, 6).join(', ')}${merge.theirsChanged.length > 6 ? ` and ${merge.theirsChanged.length - 6} more` : ''}.`}{' '}
            Nothing of yours has been saved, and your entries are still in the form.
          </p>
          <p>
            <strong>Carry my changes over</strong> puts every value you changed on top of version{' '}
            {conflict.theirs.version} and keeps theirs elsewhere
            {merge.bothChanged.length > 0
              ? `; where you both changed a value (${merge.bothChanged.join(', ')}), yours is kept`
              : ''}
            . Nothing is saved until you press Save.
          </p>
          <ConflictChoice
            onCarry={() => choice.carry(conflict.theirs, climateToForm(merge.merged))}
            onLoad={() => choice.load(conflict.theirs, climateToForm(conflict.theirs.climate))}
            loadLabel="Load the saved climate (discard my edits)"
          />
        </>
      ) : null}
    </ConflictBanner>
  );

  return (
    <ClimateForm
      key={formKey}
      project={base}
      indoorHref={indoorHref}
      {...editFormProps(values, save, onDone, banner, conflict !== null)}
    />
  );
}
