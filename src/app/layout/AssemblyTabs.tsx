import { Link, NavLink } from 'react-router';

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `-mb-px border-b-2 px-1 pb-2 text-sm font-semibold no-underline ${isActive ? 'border-ink text-ink' : 'border-transparent text-ink-muted hover:text-ink'}`;

/**
 * The pages of one assembly: its build-up (thermal), moisture, attachment (wind), joints & quantities, checks;
 * on an older revision the breadcrumb goes on to it.
 */
export function AssemblyTabs({
  projectId,
  assemblyId,
  name,
  revision,
}: {
  projectId: string;
  assemblyId: string;
  name: string;
  /** The revision shown (its page), as in the address. */
  revision?: string;
}) {
  const base = `/projects/${projectId}/assemblies/${assemblyId}`;
  return (
    <div className="-mt-2 flex flex-col gap-3">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={`/projects/${projectId}/assemblies`}>Assemblies</Link> <span aria-hidden="true">/</span>{' '}
        {revision === undefined ? (
          name
        ) : (
          <>
            <Link to={base}>{name}</Link> <span aria-hidden="true">/</span> Revision {revision}
          </>
        )}
      </nav>
      <nav aria-label="Assembly pages" className="flex flex-wrap gap-x-6 gap-y-2 border-b border-rule">
        <NavLink to={base} end className={tabClass}>
          Build-up &amp; R-value
        </NavLink>
        <NavLink to={`${base}/moisture`} className={tabClass}>
          Moisture
        </NavLink>
        <NavLink to={`${base}/attachment`} className={tabClass}>
          Attachment &amp; wind
        </NavLink>
        <NavLink to={`${base}/joints`} className={tabClass}>
          Joints &amp; quantities
        </NavLink>
        <NavLink to={`${base}/checks`} className={tabClass}>
          Checks
        </NavLink>
      </nav>
    </div>
  );
}
