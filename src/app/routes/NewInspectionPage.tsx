import { useNavigate } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { useAssemblies } from '../../features/assemblies/api/get-assemblies';
import { useCreateInspection } from '../../features/inspections/api/mutations';
import { NewInspectionForm } from '../../features/inspections/components/NewInspectionForm';
import { ProjectPage, useRouteProject } from './project-page';

export function NewInspectionPage() {
  const { projectId, project } = useRouteProject();
  const navigate = useNavigate();
  const assemblies = useAssemblies(projectId);
  const create = useCreateInspection(projectId);
  if (!project) return null;
  return (
    <ProjectPage project={project} title="New inspection">
      <Loaded
        query={assemblies}
        what="Loading the assemblies"
        empty={<p className="text-ink-muted">The project has no assembly to inspect against yet.</p>}
      >
        {(data) => (
          <NewInspectionForm
            assemblies={data}
            busy={create.isPending}
            error={create.error}
            onCreate={(input) =>
              create.mutate(input, {
                onSuccess: (i) => navigate(`/projects/${projectId}/inspections/${i.id}`),
              })
            }
          />
        )}
      </Loaded>
    </ProjectPage>
  );
}
