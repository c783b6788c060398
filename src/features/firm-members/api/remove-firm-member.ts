import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestEmpty } from '../../../lib/api';
import { firmMemberKeys, meKeys } from '../../../lib/query-keys';

/** `DELETE /api/organisations/:orgId/members/:userId` → 204. */
export const removeFirmMember = ({ orgId, userId }: { orgId: string; userId: string }) =>
  apiRequestEmpty(`/api/organisations/${encodeURIComponent(orgId)}/members/${encodeURIComponent(userId)}`, {
    method: 'DELETE',
  });

export function useRemoveFirmMember(orgId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeFirmMember({ orgId, userId }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: firmMemberKeys.list(orgId) });
      void qc.invalidateQueries({ queryKey: meKeys.all });
    },
  });
}
