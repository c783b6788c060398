import {
  bridgeValueInputSchema,
  bridgeValueSchema,
  orgMaterialInputSchema,
  orgMaterialSchema,
} from '@shared/schemas/assembly';
import { apiErrorSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { defineRoute } from '../http/route';

const orgParams = z.object({ orgId: z.uuid() });
const itemParams = orgParams.extend({ itemId: z.uuid() });
const errors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: { description: 'Firm administrators only', schema: apiErrorSchema },
  404: { description: 'No such firm or item, or you are not a member', schema: apiErrorSchema },
};

export const libraryRoutes = [
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/materials',
    summary: 'The firm’s own materials',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'member' },
    params: orgParams,
    responses: {
      200: { description: 'Materials', schema: z.object({ materials: z.array(orgMaterialSchema) }) },
      ...errors,
    },
    handler: async ({ params, services }) => ({ materials: await services.library.materials(params.orgId) }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/materials',
    summary: 'Add a material to the firm’s library (with its source)',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'member' },
    params: orgParams,
    body: orgMaterialInputSchema,
    example: {
      name: 'Panel core PIR (maker data sheet)',
      conductivity: 0.022,
      density: 40,
      vapourResistanceFactor: 60,
      source: 'Maker data sheet, rev. 3',
    },
    responses: { 201: { description: 'The material', schema: orgMaterialSchema }, ...errors },
    handler: ({ params, body, services }) => services.library.addMaterial(params.orgId, body),
  }),
  defineRoute({
    method: 'delete',
    path: '/organisations/:orgId/materials/:itemId',
    summary: 'Remove a material from the firm’s library',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'admin' },
    params: itemParams,
    responses: { 204: { description: 'Removed' }, ...errors },
    handler: async ({ params, services }) => {
      await services.library.remove('material', params.orgId, params.itemId);
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/bridge-values',
    summary: 'The firm’s own χ and ψ values',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'member' },
    params: orgParams,
    responses: {
      200: { description: 'Bridge values', schema: z.object({ bridgeValues: z.array(bridgeValueSchema) }) },
      ...errors,
    },
    handler: async ({ params, services }) => ({
      bridgeValues: await services.library.bridgeValues(params.orgId),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/bridge-values',
    summary: 'Add a χ or ψ value with its source (test report, published catalogue, calculation)',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'member' },
    params: orgParams,
    body: bridgeValueInputSchema,
    example: {
      name: 'Thermally broken clip, 50 mm',
      kind: 'point',
      value: 0.02,
      sourceType: 'test_report',
      source: 'Lab report no. 123',
      notes: '',
    },
    responses: { 201: { description: 'The value', schema: bridgeValueSchema }, ...errors },
    handler: ({ params, body, services }) => services.library.addBridgeValue(params.orgId, body),
  }),
  defineRoute({
    method: 'delete',
    path: '/organisations/:orgId/bridge-values/:itemId',
    summary: 'Remove a χ or ψ value from the firm’s library',
    tag: 'Libraries',
    access: { kind: 'organisation', role: 'admin' },
    params: itemParams,
    responses: { 204: { description: 'Removed' }, ...errors },
    handler: async ({ params, services }) => {
      await services.library.remove('bridge', params.orgId, params.itemId);
      return undefined;
    },
  }),
];
