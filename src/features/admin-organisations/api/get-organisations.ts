import { adminOrganisationListSchema } from '@shared/schemas/organisations';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { adminOrganisationKeys } from '../../../lib/query-keys';

/** `GET /api/admin/organisations` — site admins only: every firm, firms of one name side by side. */
export const getOrganisations = (signal?: AbortSignal) =>
  apiRequest('/api/admin/organisations', adminOrganisationListSchema, { signal }).then(
    (r) => r.organisations,
  );

export const organisationsQueryOptions = () =>
  queryOptions({
    queryKey: adminOrganisationKeys.lists(),
    queryFn: ({ signal }) => getOrganisations(signal),
  });

export const useOrganisations = () => useQuery(organisationsQueryOptions());
