import type { CriteriaSetSummary } from '@shared/schemas/criteria';
import { Link } from 'react-router';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format';

/** Every version of a table, newest first, with links to each and to what changed from the one before. */
export function VersionList({ versions, currentId }: { versions: CriteriaSetSummary[]; currentId: string }) {
  return (
    <Table caption="Versions" head={[numeric('Version'), 'Status', numeric('Rows'), 'Created', 'Changes']}>
      <tbody>
        {versions.map((v) => (
          <tr key={v.id} className={v.id === currentId ? 'bg-paper-sunk' : undefined}>
            <Td numeric>
              {v.id === currentId ? (
                <span aria-current="page" className="font-semibold">
                  {v.version} (shown)
                </span>
              ) : (
                <Link to={`/code-tables/${v.id}`}>Version {v.version}</Link>
              )}
            </Td>
            <Td>
              {v.frozenAt ? `frozen ${formatDateTime(v.frozenAt)} — used by a check run` : 'editable'}
              {v.isLatest ? ' · latest' : ''}
            </Td>
            <Td numeric>{v.rowCount}</Td>
            <Td>
              {formatDateTime(v.createdAt)}
              {v.createdBy ? ` by ${v.createdBy}` : ''}
            </Td>
            <Td>
              {v.version > 1 ? (
                <Link to={`/code-tables/${v.id}/diff?from=${v.version - 1}&to=${v.version}`}>
                  What changed from version {v.version - 1}
                </Link>
              ) : (
                '—'
              )}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
