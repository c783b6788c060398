import { FIRM_ROLE_LABELS, FIRM_ROLES, type FirmRole } from '@shared/auth/permissions';
import type { FirmMember } from '@shared/schemas/firm-members';
import { useState } from 'react';
import { InlineConfirm } from '../../../components/ui/InlineConfirm';
import { RoleSelect } from '../../../components/ui/RoleSelect';
import { Table, Td } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { useRemoveFirmMember } from '../api/remove-firm-member';
import { useUpdateFirmMemberRole } from '../api/update-firm-member-role';

interface Props {
  orgId: string;
  firmName: string;
  members: FirmMember[];
  /** Whether the signed-in person administers the firm: they change roles and remove people. */
  isAdmin: boolean;
  myUserId: string | undefined;
}

/**
 * The people of a firm with their firm role. An administrator changes another person's role or takes them out
 * of the firm (never on their own row: another administrator does that, so the firm keeps one).
 */
export function FirmMembersTable({ orgId, firmName, members, isAdmin, myUserId }: Props) {
  return (
    <Table caption={`People of ${firmName}`} head={['Person', 'Firm role']}>
      <tbody>
        {members.map((m) => {
          const isMe = m.userId === myUserId;
          return isAdmin && !isMe ? (
            <ManagedRow key={m.userId} orgId={orgId} firmName={firmName} member={m} />
          ) : (
            <tr key={m.userId}>
              <PersonCell member={m} isMe={isMe} />
              <Td>{FIRM_ROLE_LABELS[m.role]}</Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

/** Name above e-mail: two columns fit a phone's width. */
function PersonCell({ member, isMe = false }: { member: FirmMember; isMe?: boolean }) {
  return (
    <Td>
      <span className="font-semibold">{member.name}</span>
      {isMe ? <span className="ml-2 text-ink-muted">(you)</span> : null}
      <span className="block text-sm text-ink-muted [overflow-wrap:anywhere]">{member.email}</span>
    </Td>
  );
}

function ManagedRow({ orgId, firmName, member }: { orgId: string; firmName: string; member: FirmMember }) {
  const [role, setRole] = useState<FirmRole>(member.role);
  const updateRole = useUpdateFirmMemberRole(orgId);
  const remove = useRemoveFirmMember(orgId);
  const error = updateRole.error ?? remove.error;

  return (
    <tr className="align-top">
      <PersonCell member={member} />
      <Td>
        <RoleSelect
          label={`Firm role for ${member.name}`}
          saved={member.role}
          value={role}
          onChange={setRole}
          roles={FIRM_ROLES}
          labels={FIRM_ROLE_LABELS}
          saving={updateRole.isPending}
          onSave={(r) => updateRole.mutate({ userId: member.userId, role: r })}
        />
        {error ? (
          <p role="alert" className="mt-1 text-sm text-caution">
            {errorMessage(error)}
          </p>
        ) : null}
        <InlineConfirm
          opener="Remove from the firm…"
          who={member.name}
          question={`Take ${member.name} out of ${firmName}? What they entered stays.`}
          confirmLabel="Remove"
          busy={remove.isPending}
          busyLabel="Removing…"
          onConfirm={() => remove.mutate(member.userId)}
          className="mt-2 flex flex-wrap items-center gap-2"
          openerClassName="mt-1 px-0 py-1"
        />
      </Td>
    </tr>
  );
}
