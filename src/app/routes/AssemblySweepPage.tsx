import { can } from '@shared/auth/permissions';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useProjectCriteriaSets } from '../../features/criteria/api/get-project-criteria-sets';
import { useBridgeValues, useFirmMaterials } from '../../features/library/api/firm-lists';
import { useMe } from '../../features/me/api/get-me';
import { firmOf } from '../../features/me/firm';
import { SweepPage } from '../../features/sweep/components/SweepPage';
import { errorMessage } from '../../lib/api';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/** The sweep page of one assembly (its charts come only with this page's chunk). */
export function AssemblySweepPage() {
  const { project, assembly } = useAssemblyFrame();
  const sets = useProjectCriteriaSets(project.id);
  // The library the builder offers (the person's firm that owns the project, else their first firm).
  const org = firmOf(useMe().data, project.organisationId);
  const materials = useFirmMaterials(org?.id);
  const bridgeValues = useBridgeValues(org?.id);
  if (sets.isPending) return <Loading what="Loading the code tables" />;
  if (sets.isError) return <Notice tone="caution" title={errorMessage(sets.error)} live />;
  return (
    <SweepPage
      // A new revision starts a fresh form (its parameters read that revision's layers and bridges).
      key={assembly.id}
      project={project}
      assembly={assembly}
      sets={sets.data}
      mayWrite={can(project.myRole, 'assembly.write') && project.archivedAt === null}
      firmLibrary={{
        firmName: org?.name ?? null,
        materials: materials.data,
        bridgeValues: bridgeValues.data,
      }}
    />
  );
}
