import type { CriteriaSetSummary } from '@shared/schemas/criteria';
import { Link } from 'react-router';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format';

/** A firm's code tables (latest version of each). */
export function CriteriaSetTable({ sets, caption }: { sets: CriteriaSetSummary[]; caption: string }) {
  return (
    <Table
      caption={caption}
      head={[
        'Code table',
        'Jurisdiction',
        'Edition',
        numeric('Version'),
        numeric('Rows'),
        numeric('Last saved'),
      ]}
    >
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
