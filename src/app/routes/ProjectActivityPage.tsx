import { can } from '@shared/auth/permissions';
import { useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useAudit } from '../../features/audit/api/get-audit';
import { AuditLog } from '../../features/audit/components/AuditLog';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';

export function ProjectActivityPage() {
  const { projectId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const allowed = can(project?.myRole, 'audit.read');
  if (!project) return null;
  return (
    <section aria-labelledby="activity-heading" className="flex flex-col gap-3">
      <title>{`Activity · ${project.name} · Skinwright`}</title>
      <h2 id="activity-heading" className="text-2xl">
        Activity
      </h2>
      {allowed ? (
        <AuditSection projectId={projectId} />
      ) : (
        <Notice tone="info" title="Your role on this project does not include the activity record." />
      )}
    </section>
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
