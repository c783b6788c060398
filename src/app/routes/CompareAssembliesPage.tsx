import { useNavigate, useSearchParams } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { useAssemblies } from '../../features/assemblies/api/get-assemblies';
import { compareSearch, parseCompareParams } from '../../features/assemblies/compare-params';
import { AssemblyCompare } from '../../features/assemblies/components/AssemblyCompare';
import { ProjectPage, useRouteProject } from './project-page';

export function CompareAssembliesPage() {
  const { projectId, project } = useRouteProject();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const list = useAssemblies(projectId);
  const items = parseCompareParams(params);
  if (!project) return null;

  return (
    <ProjectPage
      project={project}
      title="Compare assemblies"
      ruled={false}
      intro="Set two or more assemblies — or two revisions of one — side by side. Column A is the baseline; every figure that differs from it is marked ▲ higher or ▼ lower, with the difference in words."
    >
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
    </ProjectPage>
  );
}
