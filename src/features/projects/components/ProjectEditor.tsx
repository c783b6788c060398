import type { Project, ProjectInput } from '@shared/schemas/project';
import { ConflictBanner, ConflictChoice, useConflictChoice } from '../../../components/ui/ConflictChoice';
import { editFormProps } from '../../../components/ui/EditForm';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format';
import {
  formatProjectFieldValue,
  PROJECT_INPUT_FIELDS,
  projectFieldLabel,
} from '../../../lib/project-fields';
import { useUnitSystem } from '../../../lib/unit-system';
import { useConflictEdit } from '../../../lib/use-conflict-edit';
import { conflictingProject, useUpdateProject } from '../api/update-project';
import { ProjectForm, type ProjectFormValues, projectToFormValues } from './ProjectForm';

type Field = keyof ProjectInput;

interface Conflict {
  /** The revision the edit started from. */
  base: Project;
  /** What the other person saved. */
  theirs: Project;
  /** The values this person tried to save. */
  mine: ProjectInput;
}

const same = (a: unknown, b: unknown) => String(a ?? '') === String(b ?? '');

/** Keep every field this person changed; take the saved revision's value everywhere else. */
export function mergeEdits({ base, theirs, mine }: Conflict): ProjectFormValues {
  const merged = projectToFormValues(theirs) as Record<Field, unknown>;
  for (const f of PROJECT_INPUT_FIELDS) if (!same(mine[f], base[f])) merged[f] = mine[f];
  return merged as ProjectFormValues;
}

/**
 * Edits a project's site data. Every save names the revision it started from. When someone else saved the
 * site data in between (a wind or climate save does not stand in the way), nothing is lost silently: the form keeps the person's edits, a table shows the starting
 * value, theirs and the saved one side by side, and the person chooses to carry their changes onto the
 * saved revision or to load the saved revision instead.
 */
export function ProjectEditor({ project, onDone }: { project: Project; onDone: () => void }) {
  const update = useUpdateProject();
  const system = useUnitSystem();
  const {
    values: formValues,
    formKey,
    conflict,
    save: saveVersion,
    restart,
  } = useConflictEdit<Project, ProjectFormValues, ProjectInput>(
    project,
    projectToFormValues,
    conflictingProject,
  );
  const choice = useConflictChoice(conflict, restart);

  const save = (values: ProjectInput) =>
    saveVersion(
      values,
      (version) => update.mutateAsync({ id: project.id, version, changes: values }),
      onDone,
    );

  const rows = conflict
    ? PROJECT_INPUT_FIELDS.filter((f) => !same(conflict.mine[f], conflict.theirs[f])).map((f) => ({
        field: f,
        mineChanged: !same(conflict.mine[f], conflict.base[f]),
        theirsChanged: !same(conflict.theirs[f], conflict.base[f]),
      }))
    : [];
  const bothChanged = rows.filter((r) => r.mineChanged && r.theirsChanged);

  const show = (f: Field, v: unknown) => formatProjectFieldValue(f, v, system);

  const banner = (
    <ConflictBanner choice={choice} title="Someone else saved the site data first." version="revision">
      {conflict ? (
        <>
          <p>
            Revision <span className="num">{conflict.theirs.version}</span> was saved at{' '}
            <span className="num">{formatDateTime(conflict.theirs.updatedAt)}</span> while you were editing
            revision <span className="num">{conflict.base.version}</span>. Nothing of yours has been saved
            yet, and your edits are still in the form above.
          </p>
          {rows.length > 0 ? (
            <Table
              caption="Where your edits and the saved revision differ"
              head={[
                'Field',
                <>You started from (rev. {conflict.base.version})</>,
                'Yours, not saved',
                <>Saved (rev. {conflict.theirs.version})</>,
              ]}
            >
              <tbody>
                {rows.map((r) => (
                  <tr key={r.field}>
                    <Th scope="row" className="border-b border-rule font-normal">
                      {projectFieldLabel(r.field)}
                      {r.mineChanged && r.theirsChanged ? (
                        <span className="block text-xs font-semibold">changed by both</span>
                      ) : null}
                    </Th>
                    <Td className="num">{show(r.field, conflict.base[r.field])}</Td>
                    <Td className={`num ${r.mineChanged ? 'font-semibold' : ''}`}>
                      {show(r.field, conflict.mine[r.field])}
                      {r.mineChanged ? <span className="sr-only"> (your change)</span> : null}
                    </Td>
                    <Td className={`num ${r.theirsChanged ? 'font-semibold' : ''}`}>
                      {show(r.field, conflict.theirs[r.field])}
                      {r.theirsChanged ? <span className="sr-only"> (their change)</span> : null}
                    </Td>
                  </tr>
                ))}
              </tbody>
            </Table>
          ) : (
            <p>Your values and the saved revision are the same.</p>
          )}
          <p>
            <strong>Carry my changes over</strong> puts your changes on top of the saved revision and keeps
            theirs elsewhere
            {bothChanged.length > 0
              ? `; where you both changed a field (${bothChanged.map((r) => projectFieldLabel(r.field)).join(', ')}), yours is kept`
              : ''}
            . Nothing is saved until you press Save.
          </p>
          <ConflictChoice
            onCarry={() => choice.carry(conflict.theirs, mergeEdits(conflict))}
            onLoad={() => choice.load(conflict.theirs, projectToFormValues(conflict.theirs))}
            loadLabel="Load the saved revision (discard my edits)"
          />
        </>
      ) : null}
    </ConflictBanner>
  );

  return (
    <ProjectForm
      key={formKey}
      submitLabel="Save site data"
      {...editFormProps(formValues, save, onDone, banner, conflict !== null)}
    />
  );
}
