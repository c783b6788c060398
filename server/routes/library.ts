import {
  bridgeValueInputSchema,
  bridgeValueSchema,
  orgMaterialInputSchema,
  orgMaterialSchema,
} from '@shared/schemas/assembly';
import { attachmentProductInputSchema, attachmentProductSchema } from '@shared/schemas/attachment-library';
import { apiErrorSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { defineRoute } from '../http/route';
import { receiveUpload, sendStoredFile } from '../http/upload';

const orgParams = z.object({ orgId: z.uuid() });
const itemParams = orgParams.extend({ itemId: z.uuid() });
const errors = {
  400: { description: 'Invalid fields', schema: apiErrorSchema },
  401: { description: 'Not signed in', schema: apiErrorSchema },
  403: {
    description:
      'Your firm role does not allow this (writing: editors and administrators; deleting: administrators)',
    schema: apiErrorSchema,
  },
  404: { description: 'No such firm or item, or you are not a member', schema: apiErrorSchema },
};

export const libraryRoutes = [
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/materials',
    summary: 'The firm’s own materials',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.read' },
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
    access: { kind: 'organisation', action: 'firm.write' },
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
    access: { kind: 'organisation', action: 'firm.admin' },
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
    access: { kind: 'organisation', action: 'firm.read' },
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
    access: { kind: 'organisation', action: 'firm.write' },
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
    access: { kind: 'organisation', action: 'firm.admin' },
    params: itemParams,
    responses: { 204: { description: 'Removed' }, ...errors },
    handler: async ({ params, services }) => {
      await services.library.remove('bridge', params.orgId, params.itemId);
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/attachment-products',
    summary: 'The firm’s panel load–span tables and clip capacities for the wind check',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.read' },
    params: orgParams,
    responses: {
      200: {
        description: 'Panel tables and clips',
        schema: z.object({ products: z.array(attachmentProductSchema) }),
      },
      ...errors,
    },
    handler: async ({ params, services }) => ({
      products: await services.library.attachmentProducts(params.orgId),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/attachment-products',
    summary:
      'Add a panel load–span table (kind "panel") or a clip capacity (kind "clip") with its source; ASD values in SI',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.write' },
    params: orgParams,
    body: attachmentProductInputSchema,
    example: {
      kind: 'panel',
      name: 'Example 75 mm insulated panel, 0.5 mm skins',
      source: 'Maker data sheet, rev. 2 (example)',
      notes: '',
      panelModuleWidth: 1.0,
      loadSpanTable: {
        spanCondition: 'double',
        deflectionLimit: 'L/180',
        rows: [
          { span: 1.5, allowableInward: 3000, allowableOutward: 2600 },
          { span: 2.5, allowableInward: 1800, allowableOutward: 1500 },
        ],
      },
    },
    responses: { 201: { description: 'The entry', schema: attachmentProductSchema }, ...errors },
    handler: ({ params, body, user, services }) =>
      services.library.addAttachmentProduct(params.orgId, user.id, body),
  }),
  defineRoute({
    method: 'post',
    path: '/organisations/:orgId/attachment-products/:itemId/data-sheet',
    summary:
      'Upload the maker’s data sheet of an entry (multipart/form-data, field "files", one PDF, PNG or JPEG by content); replaces the one before',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.write' },
    params: itemParams,
    responses: {
      201: { description: 'The entry with its data sheet', schema: attachmentProductSchema },
      ...errors,
      413: {
        description: 'The file is too large, or the firm’s library storage is full',
        schema: apiErrorSchema,
      },
      415: { description: 'Not multipart, or not a PDF, PNG or JPEG by content', schema: apiErrorSchema },
      503: {
        description: 'Too many uploads at once: try again after `Retry-After` seconds',
        schema: apiErrorSchema,
      },
    },
    handler: async ({ req, res, params, services }) =>
      services.library.uploadDataSheet(params.orgId, params.itemId, receiveUpload(req, res)),
  }),
  defineRoute({
    method: 'get',
    path: '/organisations/:orgId/attachment-products/:itemId/data-sheet',
    summary: 'Download the data sheet of an entry, byte for byte',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.read' },
    params: itemParams,
    responses: {
      200: { description: 'The file', contentType: 'application/octet-stream', schema: z.string() },
      ...errors,
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.library.dataSheet(params.orgId, params.itemId)),
  }),
  defineRoute({
    method: 'delete',
    path: '/organisations/:orgId/attachment-products/:itemId',
    summary: 'Remove an entry and its data sheet (assemblies keep the values they took from it)',
    tag: 'Libraries',
    access: { kind: 'organisation', action: 'firm.admin' },
    params: itemParams,
    responses: { 204: { description: 'Removed' }, ...errors },
    handler: async ({ params, services }) => {
      await services.library.removeAttachmentProduct(params.orgId, params.itemId);
      return undefined;
    },
  }),
];
