import { can } from '@shared/auth/permissions';
import { Outlet, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { TabStrip } from '../../components/ui/TabStrip';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';
import { formatDate } from '../../lib/format';

/** The frame around every project page: its name, the page index (overview / assemblies / climate / people / activity). */
export function ProjectLayout() {
  const { projectId = '' } = useParams();
  const project = useProject(projectId);

  if (project.isPending) return <Loading what="Loading the project" />;
  if (project.isError) return <Notice tone="caution" title={errorMessage(project.error)} live />;

  const p = project.data;
  const eyebrow = [p.number && `No. ${p.number}`, p.organisationName].filter(Boolean).join(' · ');
  return (
    <>
      <title>{`${p.name} · Skinwright`}</title>
      <PageHeader eyebrow={eyebrow} title={p.name} />
      <TabStrip
        label="Project pages"
        className="-mt-2 mb-6"
        tabs={[
          { to: `/projects/${p.id}`, label: 'Overview', end: true },
          { to: `/projects/${p.id}/assemblies`, label: 'Assemblies' },
          { to: `/projects/${p.id}/submittals`, label: 'Submittals' },
          { to: `/projects/${p.id}/inspections`, label: 'Inspections' },
          { to: `/projects/${p.id}/climate`, label: 'Climate' },
          { to: `/projects/${p.id}/wind`, label: 'Wind' },
          { to: `/projects/${p.id}/members`, label: 'People' },
          ...(can(p.myRole, 'audit.read') ? [{ to: `/projects/${p.id}/activity`, label: 'Activity' }] : []),
        ]}
      />
      {p.archivedAt ? (
        <Notice tone="warning" title={`Archived on ${formatDate(p.archivedAt)}.`} className="mb-6">
          <p>The project is read-only until an owner restores it.</p>
        </Notice>
      ) : null}
      <Outlet />
    </>
  );
}
