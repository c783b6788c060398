import { can } from '@shared/auth/permissions';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useAudit } from '../../features/audit/api/get-audit';
import { AuditLog } from '../../features/audit/components/AuditLog';
import { errorMessage } from '../../lib/api';
import { ProjectPage, useRouteProject } from './project-page';

export function ProjectActivityPage() {
  const { project } = useRouteProject();
  if (!project) return null;
  return (
    <ProjectPage project={project} title="Activity" ruled={false} className="gap-3">
      {can(project.myRole, 'audit.read') ? (
        <AuditSection projectId={project.id} />
      ) : (
        <Notice tone="info" title="Your role on this project does not include the activity record." />
      )}
    </ProjectPage>
  );
}

function AuditSection({ projectId }: { projectId: string }) {
  const audit = useAudit(projectId);
  if (audit.isPending) return <Loading what="Loading activity" />;
  if (audit.isError) return <Notice tone="caution" title={errorMessage(audit.error)} live />;
  return (
    <>
      <p className="text-ink-muted">Every saved change on this project, who made it and what it changed.</p>
      <AuditLog projectId={projectId} entries={audit.data} />
    </>
  );
}
