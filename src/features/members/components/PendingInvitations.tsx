import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Invitation } from '@shared/schemas/members';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format';

/** Invitations not yet accepted; expired ones are marked in words, not only by colour. */
export function PendingInvitations({
  invitations,
  now = new Date(),
}: {
  invitations: Invitation[];
  now?: Date;
}) {
  const pending = invitations.filter((i) => i.acceptedAt === null);
  if (pending.length === 0) return <p className="text-ink-muted">No invitations waiting for an answer.</p>;
  return (
    <Table
      caption="Invitations waiting for an answer"
      head={['E-mail', 'Role', numeric('Sent'), numeric('Expires')]}
    >
      <tbody>
        {pending.map((i) => {
          const expired = new Date(i.expiresAt).getTime() <= now.getTime();
          return (
            <tr key={i.id}>
              <Td className="break-all">{i.email}</Td>
              <Td>{PROJECT_ROLE_LABELS[i.role]}</Td>
              <Td numeric>{formatDateTime(i.createdAt)}</Td>
              <Td numeric className={expired ? 'text-caution' : ''}>
                {expired ? <span className="font-sans font-semibold">Expired </span> : null}
                {formatDateTime(i.expiresAt)}
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
