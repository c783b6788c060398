import { useAssemblyRevisionApi } from '../../features/assemblies/api/update-assembly';
import { JointsView } from '../../features/joints/components/JointsView';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/** The joints & quantities page of one assembly: joint schedule and takeoff, computed in the browser. */
export function AssemblyJointsPage() {
  const { project, assembly } = useAssemblyFrame();
  const revisionApi = useAssemblyRevisionApi();
  return (
    <>
      <title>{`Joints & quantities · ${assembly.name} · Skinwright`}</title>
      <JointsView key={assembly.id} project={project} assembly={assembly} {...revisionApi} />
    </>
  );
}
