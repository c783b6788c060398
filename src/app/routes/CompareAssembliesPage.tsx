import { useNavigate, useParams, useSearchParams } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { useAssemblies } from '../../features/assemblies/api/get-assemblies';
import { compareSearch, parseCompareParams } from '../../features/assemblies/compare-params';
import { AssemblyCompare } from '../../features/assemblies/components/AssemblyCompare';
import { useProject } from '../../features/projects/api/get-project';

export function CompareAssembliesPage() {
  const { projectId = '' } = useParams();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { data: project } = useProject(projectId);
  const list = useAssemblies(projectId);
  const items = parseCompareParams(params);
  if (!project) return null;

  return (
    <div className="flex flex-col gap-6">
      <title>{`Compare assemblies · ${project.name} · Skinwright`}</title>
      <div>
        <h2 className="text-2xl">Compare assemblies</h2>
        <p className="mt-1 max-w-prose text-ink-muted">
          Set two or more assemblies — or two revisions of one — side by side. Column A is the baseline; every
          figure that differs from it is marked ▲ higher or ▼ lower, with the difference in words.
        </p>
      </div>
      <Loaded
        query={list}
        what="Loading the assemblies"
        empty={<p className="text-ink-muted">This project has no assemblies yet.</p>}
      >
        {(data) => (
          <AssemblyCompare
            key={params.toString()}
            assemblies={data}
            items={items}
            onApply={(next) => navigate({ search: compareSearch(next) })}
          />
        )}
      </Loaded>
    </div>
  );
}
