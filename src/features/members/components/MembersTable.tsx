import {
  can,
  grantableRoles,
  mayRemove,
  PROJECT_ROLE_LABELS,
  type ProjectRole,
} from '@shared/auth/permissions';
import type { Member } from '@shared/schemas/members';
import { useState } from 'react';
import { InlineConfirm } from '../../../components/ui/InlineConfirm';
import { RoleSelect } from '../../../components/ui/RoleSelect';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMemberRole } from '../api/update-member-role';

interface MembersTableProps {
  projectId: string;
  members: Member[];
  /** The signed-in person's role on this project: decides which actions are shown. */
  myRole: ProjectRole;
  myUserId: string | undefined;
}

/**
 * Everyone on the project with their firm and role. People whose role allows `members.manage` can change
 * another member's role to one they may grant, or remove them (never their own row: that needs another owner;
 * an owner's row only when they are an owner themselves — the rules of shared/auth).
 */
export function MembersTable({ projectId, members, myRole, myUserId }: MembersTableProps) {
  const manage = can(myRole, 'members.manage');
  return (
    <Table caption="People on this project">
      <thead>
        <tr>
          <Th>Name</Th>
          <Th>E-mail</Th>
          <Th>Firm</Th>
          <Th>Role</Th>
          {manage ? (
            <Th>
              <span className="sr-only">Remove</span>
            </Th>
          ) : null}
        </tr>
      </thead>
      <tbody>
        {members.map((m) => {
          const isMe = m.userId === myUserId;
          return manage && !isMe && mayRemove(myRole, m.role) ? (
            <ManagedRow key={m.id} projectId={projectId} member={m} myRole={myRole} />
          ) : (
            <tr key={m.id}>
              <Td>
                <span className="font-semibold">{m.name}</span>
                {isMe ? <span className="ml-2 text-ink-muted">(you)</span> : null}
              </Td>
              <Td className="break-all">{m.email}</Td>
              <Td>{m.organisationName ?? '—'}</Td>
              <Td className="whitespace-nowrap">{PROJECT_ROLE_LABELS[m.role]}</Td>
              {manage ? <Td /> : null}
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

function ManagedRow({
  projectId,
  member,
  myRole,
}: {
  projectId: string;
  member: Member;
  myRole: ProjectRole;
}) {
  const [role, setRole] = useState<ProjectRole>(member.role);
  // The roles this person may give the member; the member's own role stays shown even when it is not one.
  const grantable = grantableRoles(myRole, member.role);
  const options = grantable.includes(member.role) ? grantable : [member.role, ...grantable];
  const updateRole = useUpdateMemberRole(projectId);
  const remove = useRemoveMember(projectId);
  const error = updateRole.error ?? remove.error;

  return (
    <tr>
      <Td>
        <span className="font-semibold">{member.name}</span>
      </Td>
      <Td className="break-all">{member.email}</Td>
      <Td>{member.organisationName ?? '—'}</Td>
      <Td>
        <RoleSelect
          label={`Role for ${member.name}`}
          saved={member.role}
          value={role}
          onChange={setRole}
          roles={options}
          labels={PROJECT_ROLE_LABELS}
          saving={updateRole.isPending}
          onSave={(r) => updateRole.mutate({ memberId: member.id, role: r })}
        />
        {error ? (
          <p role="alert" className="mt-1 text-sm text-caution">
            {errorMessage(error)}
          </p>
        ) : null}
      </Td>
      <Td className="whitespace-nowrap">
        <InlineConfirm
          opener="Remove…"
          who={member.name}
          question={`Remove ${member.name} from this project?`}
          confirmLabel="Remove"
          busy={remove.isPending}
          busyLabel="Removing…"
          onConfirm={() => remove.mutate(member.id)}
        />
      </Td>
    </tr>
  );
}
