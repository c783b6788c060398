import { bridgeValueSchema } from '@shared/schemas/assembly';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { libraryKeys } from '../../../lib/query-keys';
import { firmListQuery } from './firm-list';

/** `GET /api/organisations/:orgId/bridge-values` → the firm's χ and ψ values with where each came from. */
export const bridgeValuesQueryOptions = firmListQuery(
  'bridge-values',
  libraryKeys.bridgeValues,
  z.object({ bridgeValues: z.array(bridgeValueSchema) }),
  (r) => r.bridgeValues,
);

/** Disabled (idle) while no firm is known. */
export const useBridgeValues = (orgId: string | undefined) =>
  useQuery({ ...bridgeValuesQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });
