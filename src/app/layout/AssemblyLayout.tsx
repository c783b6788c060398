import type { Assembly } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { Outlet, useOutletContext, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useAssembly } from '../../features/assemblies/api/get-assembly';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';
import { AssemblyTabs } from './AssemblyTabs';

/** What the assembly frame hands to the page inside it: the project and the assembly, both loaded. */
export interface AssemblyFrame {
  project: Project;
  assembly: Assembly;
}

/**
 * The frame around every page of one assembly (`/projects/:projectId/assemblies/:assemblyId/…`): the breadcrumb
 * and the page tabs above the page. Its loader (src/app/router.tsx) has loaded the project and the assembly
 * into the cache with the same query options and refused an assembly of another project, so the page inside
 * reads both from `useAssemblyFrame()` and kept up to date by these queries.
 */
export function AssemblyLayout() {
  const { projectId = '', assemblyId = '', revision } = useParams();
  const project = useProject(projectId);
  const assembly = useAssembly(assemblyId);

  if (project.isPending || assembly.isPending) return <Loading what="Loading the assembly" />;
  if (project.isError) return <Notice tone="caution" title={errorMessage(project.error)} live />;
  if (assembly.isError) return <Notice tone="caution" title={errorMessage(assembly.error)} live />;

  const frame: AssemblyFrame = { project: project.data, assembly: assembly.data };
  return (
    <div className="flex flex-col gap-10">
      <AssemblyTabs
        projectId={frame.project.id}
        assemblyId={frame.assembly.id}
        name={frame.assembly.name}
        revision={revision}
      />
      <Outlet context={frame} />
    </div>
  );
}

/** The project and assembly of the page, from the assembly frame it is drawn in. */
export const useAssemblyFrame = () => useOutletContext<AssemblyFrame>();
