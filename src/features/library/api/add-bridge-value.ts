import type { bridgeValueInputSchema } from '@shared/schemas/assembly';
import type { z } from 'zod';
import { bridgeValues } from './firm-lists';

export type BridgeValueInput = z.input<typeof bridgeValueInputSchema>;

/** `POST /api/organisations/:orgId/bridge-values` → 201 the χ or ψ value (a source is required). */
export const useAddBridgeValue = bridgeValues.useAdd;
