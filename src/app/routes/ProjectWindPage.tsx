import { can } from '@shared/auth/permissions';
import { Link } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { ProjectWindForm } from '../../features/wind/components/ProjectWindForm';
import { BuildingDimensions, ProjectWindSummary } from '../../features/wind/components/ProjectWindSummary';
import { EditableHeading, useEditableProject } from './editable-project';

/** The project's ASCE 7 wind data, read by the attachment (wind) page of every assembly. */
export function ProjectWindPage() {
  const page = useEditableProject('project.wind.update');
  if (!page) return null;
  const { project, archived, mayEdit, editing, setEditing } = page;

  return (
    <section aria-labelledby="wind-heading" className="flex flex-col gap-6">
      <title>{`Wind data · ${project.name} · Skinwright`}</title>
      <EditableHeading
        id="wind-heading"
        title="Wind data"
        editLabel={project.wind ? 'Edit the wind data' : 'Enter the wind data'}
        page={page}
      >
        The ASCE 7 site parameters for components and cladding, as used by the attachment page of every
        assembly in this project. Height and plan come from the site data.
      </EditableHeading>
      {editing ? (
        <div className="max-w-3xl">
          <ProjectWindForm project={project} onDone={() => setEditing(false)} />
        </div>
      ) : (
        <>
          {project.wind ? (
            <ProjectWindSummary project={project} />
          ) : (
            <Notice tone="info" title="No wind data has been entered for this project yet.">
              <p>
                {mayEdit
                  ? 'Enter it once here; the attachment pages compute as soon as it is saved.'
                  : 'The project owner, architect or engineer enters it; until then the attachment pages cannot compute.'}
              </p>
            </Notice>
          )}
          <BuildingDimensions
            project={project}
            editable={can(project.myRole, 'project.update') && !archived}
          />
          <p className="text-sm">
            <Link to={`/projects/${project.id}/assemblies`}>Open an assembly</Link> and choose its Attachment
            &amp; wind page to see the girt and clip spacing with this wind data.
          </p>
        </>
      )}
    </section>
  );
}
