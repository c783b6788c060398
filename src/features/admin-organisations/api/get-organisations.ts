import { adminOrganisationListSchema } from '@shared/schemas/organisations';
import { useQuery } from '@tanstack/react-query';
import { getQuery } from '../../../lib/api-cache';
import { adminOrganisationKeys } from '../../../lib/query-keys';

/** `GET /api/admin/organisations` — site admins only: every firm, firms of one name side by side. */
export const organisationsQueryOptions = () =>
  getQuery(adminOrganisationKeys.lists(), '/api/admin/organisations', adminOrganisationListSchema, {
    pick: (r) => r.organisations,
  });

export const useOrganisations = () => useQuery(organisationsQueryOptions());
