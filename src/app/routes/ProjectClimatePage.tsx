import { can } from '@shared/auth/permissions';
import { Link } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { ClimateEditor } from '../../features/climate/components/ClimateEditor';
import { ClimateSummary } from '../../features/climate/components/ClimateSummary';
import { EditableHeading, useEditableProject } from './editable-project';

/** The project's monthly climate and interior conditions, read by the moisture page of every assembly. */
export function ProjectClimatePage() {
  const page = useEditableProject('project.climate.update');
  if (!page) return null;
  const { project, archived, mayEdit, editing, setEditing } = page;
  const indoorHref =
    can(project.myRole, 'project.update') && !archived ? `/projects/${project.id}?edit=1` : undefined;

  return (
    <section aria-labelledby="climate-heading" className="flex flex-col gap-6">
      <title>{`Climate · ${project.name} · Skinwright`}</title>
      <EditableHeading
        id="climate-heading"
        title="Monthly climate"
        editLabel={project.climate ? 'Edit the climate' : 'Enter the climate'}
        page={page}
      >
        Twelve monthly means outside and the conditions inside, as used by the moisture (condensation) page of
        every assembly in this project.
      </EditableHeading>
      {editing ? (
        <div className="max-w-3xl">
          <ClimateEditor project={project} onDone={() => setEditing(false)} indoorHref={indoorHref} />
        </div>
      ) : project.climate ? (
        <ClimateSummary project={project} />
      ) : (
        <Notice tone="info" title="No monthly climate has been entered for this project yet.">
          <p>
            {mayEdit
              ? 'Enter the 12 monthly means and their source; the moisture pages compute as soon as it is saved.'
              : 'The project owner, architect or envelope consultant enters it; until then the moisture pages cannot compute.'}
          </p>
        </Notice>
      )}
      {!editing ? (
        <p className="text-sm">
          <Link to={`/projects/${project.id}/assemblies`}>Open an assembly</Link> and choose its Moisture page
          to see the condensation check with this climate.
        </p>
      ) : null}
    </section>
  );
}
