import type { FirmRole } from '@shared/auth/permissions';
import { firmMemberSchema } from '@shared/schemas/firm-members';
import { apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { firmMemberKeys, meKeys } from '../../../lib/query-keys';
import { firmMembersPath } from './paths';

/** `PUT /api/organisations/:orgId/members/:userId` `{ role }` → FirmMember. */
export const useUpdateFirmMemberRole = (orgId: string) =>
  useApiMutation(
    ({ userId, role }: { userId: string; role: FirmRole }) =>
      apiRequest(firmMembersPath(orgId, userId), firmMemberSchema, { method: 'PUT', body: { role } }),
    // One's own firm role decides what the library and code table pages offer.
    { stale: () => [firmMemberKeys.list(orgId), meKeys.all] },
  );
