import { can } from '@shared/auth/permissions';
import { Link, useParams, useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Notice } from '../../components/ui/Notice';
import { ClimateEditor } from '../../features/climate/components/ClimateEditor';
import { ClimateSummary } from '../../features/climate/components/ClimateSummary';
import { useProject } from '../../features/projects/api/get-project';

/** The project's monthly climate and interior conditions, read by the moisture page of every assembly. */
export function ProjectClimatePage() {
  const { projectId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const { data: project } = useProject(projectId);
  if (!project) return null;

  const archived = project.archivedAt !== null;
  const mayEdit = can(project.myRole, 'project.climate.update') && !archived;
  const editing = mayEdit && params.get('edit') === '1';
  const setEditing = (on: boolean) => setParams(on ? { edit: '1' } : {}, { replace: false });
  const indoorHref =
    can(project.myRole, 'project.update') && !archived ? `/projects/${project.id}?edit=1` : undefined;

  return (
    <section aria-labelledby="climate-heading" className="flex flex-col gap-6">
      <title>{`Climate · ${project.name} · Skinwright`}</title>
      <div className="flex flex-wrap items-end justify-between gap-3 border-b border-ink pb-2">
        <div>
          <h2 id="climate-heading" className="text-2xl">
            Monthly climate
          </h2>
          <p className="mt-1 max-w-prose text-sm text-ink-muted">
            Twelve monthly means outside and the conditions inside, as used by the moisture (condensation)
            page of every assembly in this project.
          </p>
        </div>
        {mayEdit && !editing ? (
          <Button variant="secondary" onClick={() => setEditing(true)}>
            {project.climate ? 'Edit the climate' : 'Enter the climate'}
          </Button>
        ) : null}
      </div>
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
