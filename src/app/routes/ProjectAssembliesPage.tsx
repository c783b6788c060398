import { can } from '@shared/auth/permissions';
import { useParams } from 'react-router';
import { AssembliesOverview } from '../../features/assemblies/components/AssembliesOverview';
import { useProject } from '../../features/projects/api/get-project';
import { useAssemblyCopyTargets } from '../../features/projects/api/get-projects';

export function ProjectAssembliesPage() {
  const { projectId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const targets = useAssemblyCopyTargets();
  if (!project) return null;
  const mayWrite = can(project.myRole, 'assembly.write') && project.archivedAt === null;

  return (
    <section aria-labelledby="assemblies-heading" className="flex flex-col gap-4">
      <title>{`Assemblies · ${project.name} · Skinwright`}</title>
      <h2 id="assemblies-heading" className="text-2xl">
        Assemblies
      </h2>
      <AssembliesOverview
        projectId={project.id}
        mayWrite={mayWrite}
        searchable
        duplicateTargets={project.archivedAt === null ? targets : []}
      />
    </section>
  );
}
