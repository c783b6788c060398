import {
  bridgeValueInputSchema,
  bridgeValueSchema,
  orgMaterialInputSchema,
  orgMaterialSchema,
} from '@shared/schemas/assembly';
import { attachmentProductInputSchema, attachmentProductSchema } from '@shared/schemas/attachment-library';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { firm, routeGroup } from '../http/route-group';
import { receiveUpload, sendStoredFile } from '../http/upload';
import { firmLibraryRoutes } from './firm-library';

const route = routeGroup('Libraries', refusals('firmLibrary', 'firm or item'));

export const libraryRoutes = [
  ...firmLibraryRoutes({
    segment: 'materials',
    entry: 'item',
    list: {
      summary: 'The firm’s own materials',
      description: 'Materials',
      schema: z.object({ materials: z.array(orgMaterialSchema) }),
      read: async (services, orgId) => ({ materials: await services.library.materials(orgId) }),
    },
    add: {
      summary: 'Add a material to the firm’s library (with its source)',
      description: 'The material',
      schema: orgMaterialSchema,
      body: orgMaterialInputSchema,
      example: {
        name: 'Panel core PIR (maker data sheet)',
        conductivity: 0.022,
        density: 40,
        vapourResistanceFactor: 60,
        source: 'Maker data sheet, rev. 3',
      },
      write: (services, orgId, body) => services.library.addMaterial(orgId, body),
    },
    remove: {
      summary: 'Remove a material from the firm’s library',
      write: (services, orgId, itemId) => services.library.remove('material', orgId, itemId),
    },
  }),
  ...firmLibraryRoutes({
    segment: 'bridge-values',
    entry: 'item',
    list: {
      summary: 'The firm’s own χ and ψ values',
      description: 'Bridge values',
      schema: z.object({ bridgeValues: z.array(bridgeValueSchema) }),
      read: async (services, orgId) => ({ bridgeValues: await services.library.bridgeValues(orgId) }),
    },
    add: {
      summary: 'Add a χ or ψ value with its source (test report, published catalogue, calculation)',
      description: 'The value',
      schema: bridgeValueSchema,
      body: bridgeValueInputSchema,
      example: {
        name: 'Thermally broken clip, 50 mm',
        kind: 'point',
        value: 0.02,
        sourceType: 'test_report',
        source: 'Lab report no. 123',
        notes: '',
      },
      write: (services, orgId, body) => services.library.addBridgeValue(orgId, body),
    },
    remove: {
      summary: 'Remove a χ or ψ value from the firm’s library',
      write: (services, orgId, itemId) => services.library.remove('bridge', orgId, itemId),
    },
  }),
  ...firmLibraryRoutes({
    segment: 'attachment-products',
    entry: 'item',
    list: {
      summary: 'The firm’s panel load–span tables and clip capacities for the wind check',
      description: 'Panel tables and clips',
      schema: z.object({ products: z.array(attachmentProductSchema) }),
      read: async (services, orgId) => ({ products: await services.library.attachmentProducts(orgId) }),
    },
    add: {
      summary:
        'Add a panel load–span table (kind "panel") or a clip capacity (kind "clip") with its source; ASD values in SI',
      description: 'The entry',
      schema: attachmentProductSchema,
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
      write: (services, orgId, body, userId) => services.library.addAttachmentProduct(orgId, userId, body),
    },
    remove: {
      summary: 'Remove an entry and its data sheet (assemblies keep the values they took from it)',
      write: (services, orgId, itemId) => services.library.removeAttachmentProduct(orgId, itemId),
    },
  }),
  route.post('/organisations/:orgId/attachment-products/:itemId/data-sheet', firm('firm.write'), {
    summary:
      'Upload the maker’s data sheet of an entry (multipart/form-data, field "files", one PDF, PNG or JPEG by content); replaces the one before',
    responses: {
      201: { description: 'The entry with its data sheet', schema: attachmentProductSchema },
      413: errorResponse('The file is too large, or the firm’s library storage is full'),
      415: errorResponse('Not multipart, or not a PDF, PNG or JPEG by content'),
      503: errorResponse('Too many uploads at once: try again after `Retry-After` seconds'),
    },
    handler: async ({ req, res, params, services }) =>
      services.library.uploadDataSheet(params.orgId, params.itemId, receiveUpload(req, res)),
  }),
  route.get('/organisations/:orgId/attachment-products/:itemId/data-sheet', firm('firm.read'), {
    summary: 'Download the data sheet of an entry, byte for byte',
    responses: {
      200: { description: 'The file', contentType: 'application/octet-stream', schema: z.string() },
    },
    handler: async ({ params, res, services }) =>
      sendStoredFile(res, await services.library.dataSheet(params.orgId, params.itemId)),
  }),
];
