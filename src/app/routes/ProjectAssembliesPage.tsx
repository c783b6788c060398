import { can } from '@shared/auth/permissions';
import { AssembliesOverview } from '../../features/assemblies/components/AssembliesOverview';
import { useAssemblyCopyTargets } from '../../features/projects/api/get-projects';
import { ProjectPage, useRouteProject } from './project-page';

export function ProjectAssembliesPage() {
  const { project } = useRouteProject();
  const targets = useAssemblyCopyTargets();
  if (!project) return null;
  const mayWrite = can(project.myRole, 'assembly.write') && project.archivedAt === null;

  return (
    <ProjectPage project={project} title="Assemblies" ruled={false} className="gap-4">
      <AssembliesOverview
        projectId={project.id}
        mayWrite={mayWrite}
        searchable
        duplicateTargets={project.archivedAt === null ? targets : []}
      />
    </ProjectPage>
  );
}
