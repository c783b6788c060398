import { type FirmMemberAdd, firmMemberSchema } from '@shared/schemas/firm-members';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { firmMemberKeys } from '../../../lib/query-keys';

/** `POST /api/organisations/:orgId/members` `{ email, role }` → 201 FirmMember; the server e-mails them. */
export const addFirmMember = ({ orgId, input }: { orgId: string; input: FirmMemberAdd }) =>
  apiRequest(`/api/organisations/${encodeURIComponent(orgId)}/members`, firmMemberSchema, {
    method: 'POST',
    body: input,
  });

export function useAddFirmMember(orgId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: FirmMemberAdd) => addFirmMember({ orgId, input }),
    onSuccess: () => void qc.invalidateQueries({ queryKey: firmMemberKeys.list(orgId) }),
  });
}
