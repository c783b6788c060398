import { type FirmMemberAdd, firmMemberSchema } from '@shared/schemas/firm-members';
import { apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { firmMemberKeys } from '../../../lib/query-keys';
import { firmMembersPath } from './paths';

/** `POST /api/organisations/:orgId/members` `{ email, role }` → 201 FirmMember; the server e-mails them. */
export const useAddFirmMember = (orgId: string) =>
  useApiMutation(
    (input: FirmMemberAdd) =>
      apiRequest(firmMembersPath(orgId), firmMemberSchema, { method: 'POST', body: input }),
    { stale: () => [firmMemberKeys.list(orgId)] },
  );
