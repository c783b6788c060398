import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Project } from '@shared/schemas/project';
import { Link } from 'react-router';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format';
import { formatQuantity } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';

export function ProjectTable({ projects, caption }: { projects: Project[]; caption: string }) {
  const system = useUnitSystem();
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>No.</Th>
          <Th>Project</Th>
          <Th>Firm</Th>
          <Th>Climate zone</Th>
          <Th numeric>Height h</Th>
          <Th>Your role</Th>
          <Th numeric>Last saved</Th>
        </tr>
      </thead>
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
