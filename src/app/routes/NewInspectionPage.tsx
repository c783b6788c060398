import { useNavigate, useParams } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { useAssemblies } from '../../features/assemblies/api/get-assemblies';
import { useCreateInspection } from '../../features/inspections/api/mutations';
import { NewInspectionForm } from '../../features/inspections/components/NewInspectionForm';
import { useProject } from '../../features/projects/api/get-project';

export function NewInspectionPage() {
  const { projectId = '' } = useParams();
  const navigate = useNavigate();
  const { data: project } = useProject(projectId);
  const assemblies = useAssemblies(projectId);
  const create = useCreateInspection(projectId);
  if (!project) return null;
  return (
    <div className="flex flex-col gap-6">
      <title>{`New inspection · ${project.name} · Skinwright`}</title>
      <h2 className="border-b border-ink pb-2 text-2xl">New inspection</h2>
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
    </div>
  );
}
