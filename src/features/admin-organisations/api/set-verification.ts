import { adminOrganisationSchema } from '@shared/schemas/organisations';
import { apiPath, apiRequest } from '../../../lib/api';
import { useApiMutation } from '../../../lib/api-cache';
import { adminOrganisationKeys, meKeys, verificationKeys } from '../../../lib/query-keys';

/** `PUT /api/admin/organisations/:orgId/verification` `{ verified }` → the firm as it now stands. */
export const useSetVerification = () =>
  useApiMutation(
    ({ orgId, ...body }: { orgId: string; verified: boolean }) =>
      apiRequest(apiPath`/api/admin/organisations/${orgId}/verification`, adminOrganisationSchema, {
        method: 'PUT',
        body,
      }),
    // The firm's standing shows on verification pages and on its members' settings.
    { stale: () => [adminOrganisationKeys.all, verificationKeys.all, meKeys.all] },
  );
