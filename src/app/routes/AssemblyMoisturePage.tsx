import { useAssemblyRevisionApi } from '../../features/assemblies/api/update-assembly';
import { ClimateSummary } from '../../features/climate/components/ClimateSummary';
import { MoistureView } from '../../features/moisture/components/MoistureView';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/** The moisture (condensation) page of one assembly: inputs, conditions, method, result, cautions. */
export function AssemblyMoisturePage() {
  const { project, assembly } = useAssemblyFrame();
  const revisionApi = useAssemblyRevisionApi();
  return (
    <>
      <title>{`Moisture · ${assembly.name} · ${project.name} · Skinwright`}</title>
      <MoistureView
        key={assembly.id}
        project={project}
        assembly={assembly}
        climateSummary={project.climate ? <ClimateSummary project={project} /> : null}
        {...revisionApi}
      />
    </>
  );
}
