import { can } from '@shared/auth/permissions';
import { Link, useParams, useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Notice } from '../../components/ui/Notice';
import { useProject } from '../../features/projects/api/get-project';
import { ProjectWindForm } from '../../features/wind/components/ProjectWindForm';
import { BuildingDimensions, ProjectWindSummary } from '../../features/wind/components/ProjectWindSummary';

/** The project's ASCE 7 wind data, read by the attachment (wind) page of every assembly. */
export function ProjectWindPage() {
  const { projectId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const { data: project } = useProject(projectId);
  if (!project) return null;

  const archived = project.archivedAt !== null;
  const mayEdit = can(project.myRole, 'project.wind.update') && !archived;
  const editing = mayEdit && params.get('edit') === '1';
  const setEditing = (on: boolean) => setParams(on ? { edit: '1' } : {}, { replace: false });

  return (
    <section aria-labelledby="wind-heading" className="flex flex-col gap-6">
      <title>{`Wind data · ${project.name} · Skinwright`}</title>
      <div className="flex flex-wrap items-end justify-between gap-3 border-b border-ink pb-2">
        <div>
          <h2 id="wind-heading" className="text-2xl">
            Wind data
          </h2>
          <p className="mt-1 max-w-prose text-sm text-ink-muted">
            The ASCE 7 site parameters for components and cladding, as used by the attachment page of every
            assembly in this project. Height and plan come from the site data.
          </p>
        </div>
        {mayEdit && !editing ? (
          <Button variant="secondary" onClick={() => setEditing(true)}>
            {project.wind ? 'Edit the wind data' : 'Enter the wind data'}
          </Button>
        ) : null}
      </div>
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
