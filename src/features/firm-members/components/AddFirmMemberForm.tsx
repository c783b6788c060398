import { FIRM_ROLE_LABELS, FIRM_ROLES } from '@shared/auth/permissions';
import { firmMemberAddSchema } from '@shared/schemas/firm-members';
import { EmailRoleForm } from '../../../components/ui/EmailRoleForm';
import { useAddFirmMember } from '../api/add-firm-member';

/** Add someone who already has an account to the firm, by their e-mail address; they are told by e-mail. */
export function AddFirmMemberForm({ orgId, firmName }: { orgId: string; firmName: string }) {
  const add = useAddFirmMember(orgId);
  return (
    <EmailRoleForm
      schema={firmMemberAddSchema}
      title={`Add someone to ${firmName}`}
      intro="They need a Skinwright account first (they sign up with this address); they get an e-mail saying they were added."
      roleLabel="Firm role"
      roles={FIRM_ROLES}
      roleLabels={FIRM_ROLE_LABELS}
      defaultRole="reader"
      submitLabel="Add to firm"
      busyLabel="Adding…"
      onSend={async (values) => {
        const member = await add.mutateAsync(values);
        return `${member.name} (${member.email}) is in ${firmName} as ${FIRM_ROLE_LABELS[member.role]}.`;
      }}
    />
  );
}
