import { metalPanelWall } from '@shared/calc/thermal/fixtures';
import { materialSchema, materials } from '@shared/calc/thermal/materials';
import { thermalInputSchema, thermalResultSchema } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { apiErrorSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { defineRoute } from '../http/route';

const calcErrors = {
  400: {
    description: 'The request does not match the schema; `fields` names each field and the reason',
    schema: apiErrorSchema,
  },
  422: {
    description: 'Physically impossible input; `fields` names the field and the reason',
    schema: apiErrorSchema,
  },
};

/** The public, stateless calculation API (versioned). */
export const calcRoutes = [
  defineRoute({
    method: 'post',
    path: '/v1/calc/thermal',
    summary:
      'Clear-field and effective R-value / U-factor of a wall with its clip, girt and fastener bridges',
    tag: 'Calculations',
    access: { kind: 'public' },
    body: thermalInputSchema,
    example: metalPanelWall(),
    responses: {
      200: { description: 'Result with a trace of every figure', schema: thermalResultSchema },
      ...calcErrors,
    },
    handler: async ({ body }) => calculateThermal(body),
  }),
  defineRoute({
    method: 'get',
    path: '/reference/materials',
    summary: 'Generic material library (λ, ρ, μ) with the published table each value comes from',
    tag: 'Calculations',
    access: { kind: 'public' },
    responses: {
      200: { description: 'Materials', schema: z.object({ materials: z.array(materialSchema) }) },
    },
    handler: async () => ({ materials }),
  }),
];
