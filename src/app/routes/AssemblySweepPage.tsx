import { can } from '@shared/auth/permissions';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useProjectCriteriaSets } from '../../features/criteria/api/get-project-criteria-sets';
import { SweepPage } from '../../features/sweep/components/SweepPage';
import { errorMessage } from '../../lib/api';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/** The sweep page of one assembly (its charts come only with this page's chunk). */
export function AssemblySweepPage() {
  const { project, assembly } = useAssemblyFrame();
  const sets = useProjectCriteriaSets(project.id);
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
    />
  );
}
