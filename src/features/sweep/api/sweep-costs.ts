import {
  type SweepCost,
  type SweepCostInput,
  sweepCostListSchema,
  sweepCostSchema,
} from '@shared/schemas/sweeps';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

const costsPath = (orgId: string) => `/api/organisations/${encodeURIComponent(orgId)}/sweep-costs`;

/** `GET /api/organisations/:orgId/sweep-costs` → the firm's prices of what a sweep varies (SI units). */
export const getSweepCosts = (orgId: string, signal?: AbortSignal) =>
  apiRequest(costsPath(orgId), sweepCostListSchema, { signal }).then((r) => r.costs);

export const sweepCostsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: libraryKeys.sweepCosts(orgId),
    queryFn: ({ signal }) => getSweepCosts(orgId, signal),
  });

/** Idle while the person is not a member of the firm (its library is not theirs to read). */
export const useSweepCosts = (orgId: string | undefined) =>
  useQuery({ ...sweepCostsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });

/**
 * A price saved to the firm library (editors and administrators): `POST …/sweep-costs` → 201 a new entry, or
 * `PUT …/sweep-costs/:itemId` with the version read → 200 (409 when someone changed it since).
 */
export const saveSweepCost = ({
  orgId,
  input,
  existing,
}: {
  orgId: string;
  input: SweepCostInput;
  existing?: Pick<SweepCost, 'id' | 'version'>;
}) =>
  existing
    ? apiRequest(`${costsPath(orgId)}/${encodeURIComponent(existing.id)}`, sweepCostSchema, {
        method: 'PUT',
        body: { ...input, version: existing.version },
      })
    : apiRequest(costsPath(orgId), sweepCostSchema, { method: 'POST', body: input });

export function useSaveSweepCost() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: saveSweepCost,
    onSuccess: (_cost, { orgId }) => qc.invalidateQueries({ queryKey: libraryKeys.sweepCosts(orgId) }),
  });
}
