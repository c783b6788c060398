import type { SubmittalSummary } from '@shared/schemas/submittals';
import { Link } from 'react-router';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format';
import { StatusBadge } from './StatusBadge';

/** The project's submittals, latest revision of each. */
export function SubmittalTable({
  projectId,
  submittals,
}: {
  projectId: string;
  submittals: SubmittalSummary[];
}) {
  return (
    <Table
      caption="Submittals (latest revision of each)"
      captionHidden
      head={[
        'Number',
        'Title',
        'Specification section',
        numeric('Rev.'),
        'Status',
        'Submitter',
        'Due',
        numeric('Items'),
      ]}
    >
      <tbody>
        {submittals.map((s) => (
          <tr key={s.id} data-submittal={s.number}>
            <Td className="num whitespace-nowrap">
              <Link to={`/projects/${projectId}/submittals/${s.id}`}>{s.number}</Link>
            </Td>
            <Td>{s.title}</Td>
            <Td>
              <span className="num">{s.specSection}</span> {s.specTitle}
            </Td>
            <Td numeric>{s.revision}</Td>
            <Td>
              <StatusBadge status={s.status} />
            </Td>
            <Td>{s.submitter?.name ?? '—'}</Td>
            <Td className="whitespace-nowrap">{s.dueDate ? formatDate(s.dueDate) : '—'}</Td>
            <Td numeric>{s.itemCount}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
