import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Project } from '@shared/schemas/project';
import { Link } from 'react-router';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format';
import { formatQuantity } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';

export function ProjectTable({ projects, caption }: { projects: Project[]; caption: string }) {
  const system = useUnitSystem();
  return (
    <Table
      caption={caption}
      head={[
        'No.',
        'Project',
        'Firm',
        'Climate zone',
        numeric('Height h'),
        'Your role',
        numeric('Last saved'),
      ]}
    >
      <tbody>
        {projects.map((p) => (
          <tr key={p.id} className="hover:bg-paper-sunk">
            <Td className="num whitespace-nowrap">{p.number || '—'}</Td>
            <Td>
              <Link to={`/projects/${p.id}`} className="font-semibold">
                {p.name}
              </Link>
              {p.siteAddress ? (
                <span className="block truncate text-ink-muted sm:max-w-sm">
                  {p.siteAddress.split('\n')[0]}
                </span>
              ) : null}
            </Td>
            <Td>{p.organisationName}</Td>
            <Td className="num">{p.climateZone}</Td>
            <Td numeric className="whitespace-nowrap">
              {formatQuantity(p.buildingHeightM, 'length', system)}
            </Td>
            <Td className="whitespace-nowrap">{PROJECT_ROLE_LABELS[p.myRole]}</Td>
            <Td numeric className="whitespace-nowrap">
              {formatDate(p.updatedAt)}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
