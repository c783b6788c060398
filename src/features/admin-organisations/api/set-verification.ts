import { adminOrganisationSchema } from '@shared/schemas/organisations';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { adminOrganisationKeys, meKeys, verificationKeys } from '../../../lib/query-keys';

/** `PUT /api/admin/organisations/:orgId/verification` `{ verified }` → the firm as it now stands. */
export const setVerification = ({ orgId, verified }: { orgId: string; verified: boolean }) =>
  apiRequest(`/api/admin/organisations/${encodeURIComponent(orgId)}/verification`, adminOrganisationSchema, {
    method: 'PUT',
    body: { verified },
  });

export function useSetVerification() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: setVerification,
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: adminOrganisationKeys.all });
      // The firm's standing shows on verification pages and on its members' settings.
      void qc.invalidateQueries({ queryKey: verificationKeys.all });
      void qc.invalidateQueries({ queryKey: meKeys.all });
    },
  });
}
