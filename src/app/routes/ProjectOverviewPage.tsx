import { can } from '@shared/auth/permissions';
import { useParams, useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { AssembliesOverview } from '../../features/assemblies/components/AssembliesOverview';
import { useProject } from '../../features/projects/api/get-project';
import { ArchiveControl } from '../../features/projects/components/ArchiveControl';
import { DuplicateProject } from '../../features/projects/components/DuplicateProject';
import { ProjectEditor } from '../../features/projects/components/ProjectEditor';
import { ProjectTitleBlock } from '../../features/projects/components/ProjectTitleBlock';

export function ProjectOverviewPage() {
  const { projectId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const { data: project } = useProject(projectId);
  if (!project) return null;

  const archived = project.archivedAt !== null;
  const mayEdit = can(project.myRole, 'project.update') && !archived;
  const editing = mayEdit && params.get('edit') === '1';
  const setEditing = (on: boolean) => setParams(on ? { edit: '1' } : {}, { replace: false });

  return (
    <div className="flex flex-col gap-10">
      <section aria-labelledby="site-heading" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="site-heading" className="text-2xl">
            Site data
          </h2>
          {mayEdit && !editing ? (
            <Button variant="secondary" onClick={() => setEditing(true)}>
              Edit site data
            </Button>
          ) : null}
        </div>
        {editing ? (
          <div className="max-w-form">
            <ProjectEditor project={project} onDone={() => setEditing(false)} />
          </div>
        ) : (
          <ProjectTitleBlock project={project} />
        )}
      </section>

      <section aria-labelledby="assemblies-heading" className="flex flex-col gap-3">
        <h2 id="assemblies-heading" className="border-b border-ink pb-2 text-2xl">
          Assemblies
        </h2>
        <AssembliesOverview
          projectId={project.id}
          mayWrite={can(project.myRole, 'assembly.write') && !archived}
        />
      </section>

      {can(project.myRole, 'project.update') && !archived && !editing ? (
        <section
          aria-labelledby="duplicate-heading"
          className="flex flex-col gap-3 border-t border-rule pt-6"
        >
          <h2 id="duplicate-heading" className="text-lg">
            Duplicate
          </h2>
          <DuplicateProject project={project} />
        </section>
      ) : null}

      {can(project.myRole, 'project.archive') && !editing ? (
        <section aria-labelledby="archive-heading" className="flex flex-col gap-3 border-t border-rule pt-6">
          <h2 id="archive-heading" className="text-lg">
            {archived ? 'Restore' : 'Archive'}
          </h2>
          <ArchiveControl project={project} />
        </section>
      ) : null}
    </div>
  );
}
