import { Link } from 'react-router';
import { TabStrip } from '../../components/ui/TabStrip';

/**
 * The pages of one assembly: its build-up (thermal), moisture, attachment (wind), joints & quantities, checks, sweep;
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
      <TabStrip
        label="Assembly pages"
        tabs={[
          { to: base, label: 'Build-up & R-value', end: true },
          { to: `${base}/moisture`, label: 'Moisture' },
          { to: `${base}/attachment`, label: 'Attachment & wind' },
          { to: `${base}/joints`, label: 'Joints & quantities' },
          { to: `${base}/checks`, label: 'Checks' },
          { to: `${base}/sweep`, label: 'Sweep' },
        ]}
      />
    </div>
  );
}
