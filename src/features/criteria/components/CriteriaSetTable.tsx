import type { CriteriaSetSummary } from '@shared/schemas/criteria';
import { Link } from 'react-router';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format';

/** A firm's code tables (latest version of each). */
export function CriteriaSetTable({ sets, caption }: { sets: CriteriaSetSummary[]; caption: string }) {
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Code table</Th>
          <Th>Jurisdiction</Th>
          <Th>Edition</Th>
          <Th numeric>Version</Th>
          <Th numeric>Rows</Th>
          <Th numeric>Last saved</Th>
        </tr>
      </thead>
      <tbody>
        {sets.map((s) => (
          <tr key={s.id} className="hover:bg-paper-sunk">
            <Td>
              <Link to={`/code-tables/${s.id}`} className="font-semibold">
                {s.name}
              </Link>
              {s.frozenAt ? (
                <span className="block text-xs text-ink-muted">frozen — used by a check run</span>
              ) : null}
            </Td>
            <Td>{s.jurisdiction || '—'}</Td>
            <Td>{s.edition || '—'}</Td>
            <Td numeric>{s.version}</Td>
            <Td numeric>{s.rowCount}</Td>
            <Td numeric className="whitespace-nowrap">
              {formatDate(s.updatedAt)}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
