import { grantableRoles, PROJECT_ROLE_LABELS, type ProjectRole } from '@shared/auth/permissions';
import { invitationInputSchema } from '@shared/schemas/members';
import { EmailRoleForm } from '../../../components/ui/EmailRoleForm';
import { useInviteMember } from '../api/invite-member';

/**
 * Invite someone by e-mail with a role; they get a link that works once they sign in with that address. Only
 * the roles the inviter may grant are offered (`grantableRoles`, the rule the server enforces).
 */
export function InviteForm({ projectId, myRole }: { projectId: string; myRole: ProjectRole }) {
  const invite = useInviteMember(projectId);
  return (
    <EmailRoleForm
      schema={invitationInputSchema}
      title="Invite someone"
      roleLabel="Role on this project"
      roles={grantableRoles(myRole)}
      roleLabels={PROJECT_ROLE_LABELS}
      defaultRole="viewer"
      submitLabel="Send invitation"
      busyLabel="Sending…"
      onSend={async (values) => `Invitation sent to ${(await invite.mutateAsync(values)).email}.`}
    />
  );
}
