import { apiRequestEmpty } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { firmMemberKeys, meKeys } from '../../../lib/query-keys';
import { firmMembersPath } from './paths';

/** `DELETE /api/organisations/:orgId/members/:userId` → 204. */
export const useRemoveFirmMember = (orgId: string) =>
  useApiMutation((userId: string) => apiRequestEmpty(firmMembersPath(orgId, userId), { method: 'DELETE' }), {
    stale: () => [firmMemberKeys.list(orgId), meKeys.all],
  });
