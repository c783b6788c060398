import { can } from '@shared/auth/permissions';
import { NavLink, Outlet, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';
import { formatDate } from '../../lib/format';

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `-mb-px border-b-2 px-1 pb-2 text-sm font-semibold no-underline ${isActive ? 'border-ink text-ink' : 'border-transparent text-ink-muted hover:text-ink'}`;

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
      <nav
        aria-label="Project pages"
        className="-mt-2 mb-6 flex flex-wrap gap-x-6 gap-y-2 border-b border-rule"
      >
        <NavLink to={`/projects/${p.id}`} end className={tabClass}>
          Overview
        </NavLink>
        <NavLink to={`/projects/${p.id}/assemblies`} className={tabClass}>
          Assemblies
        </NavLink>
        <NavLink to={`/projects/${p.id}/submittals`} className={tabClass}>
          Submittals
        </NavLink>
        <NavLink to={`/projects/${p.id}/climate`} className={tabClass}>
          Climate
        </NavLink>
        <NavLink to={`/projects/${p.id}/wind`} className={tabClass}>
          Wind
        </NavLink>
        <NavLink to={`/projects/${p.id}/members`} className={tabClass}>
          People
        </NavLink>
        {can(p.myRole, 'audit.read') ? (
          <NavLink to={`/projects/${p.id}/activity`} className={tabClass}>
            Activity
          </NavLink>
        ) : null}
      </nav>
      {p.archivedAt ? (
        <Notice tone="warning" title={`Archived on ${formatDate(p.archivedAt)}.`} className="mb-6">
          <p>The project is read-only until an owner restores it.</p>
        </Notice>
      ) : null}
      <Outlet />
    </>
  );
}
