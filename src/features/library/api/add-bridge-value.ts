import { type bridgeValueInputSchema, bridgeValueSchema } from '@shared/schemas/assembly';
import type { z } from 'zod';
import { libraryKeys } from '../../../lib/query-keys';
import { useAddToFirmList } from './firm-list';

export type BridgeValueInput = z.input<typeof bridgeValueInputSchema>;

/** `POST /api/organisations/:orgId/bridge-values` → 201 the χ or ψ value (a source is required). */
export const useAddBridgeValue = () =>
  useAddToFirmList<typeof bridgeValueSchema, BridgeValueInput>(
    'bridge-values',
    bridgeValueSchema,
    libraryKeys.bridgeValues,
  );
