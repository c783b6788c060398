import type { FirmRole } from '@shared/auth/permissions';
import { firmMemberSchema } from '@shared/schemas/firm-members';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { firmMemberKeys, meKeys } from '../../../lib/query-keys';

/** `PUT /api/organisations/:orgId/members/:userId` `{ role }` → FirmMember. */
export const updateFirmMemberRole = ({
  orgId,
  userId,
  role,
}: {
  orgId: string;
  userId: string;
  role: FirmRole;
}) =>
  apiRequest(
    `/api/organisations/${encodeURIComponent(orgId)}/members/${encodeURIComponent(userId)}`,
    firmMemberSchema,
    { method: 'PUT', body: { role } },
  );

export function useUpdateFirmMemberRole(orgId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { userId: string; role: FirmRole }) => updateFirmMemberRole({ orgId, ...v }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: firmMemberKeys.list(orgId) });
      // One's own firm role decides what the library and code table pages offer.
      void qc.invalidateQueries({ queryKey: meKeys.all });
    },
  });
}
