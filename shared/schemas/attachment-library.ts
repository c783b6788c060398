import { z } from 'zod';
import { CalcInputError } from '../calc/errors';
import { valueSourceSchema } from '../calc/source';
import { tableColumns } from '../calc/wind/attachment';
import { clipSchema, loadSpanTableSchema, panelSchema } from '../calc/wind/schema';
import type { Unbranded } from '../units/brands';
import { TEXT_MAX, text } from './common';

/**
 * A firm's library of attachment data for the wind check: panel load–span tables and clip capacities, each
 * with where the values came from (the maker's data sheet or test report, named and dated) and, once
 * uploaded, the data sheet itself. The attachment sheet of an assembly copies an entry's values and its
 * source into the assembly (`windPanel.sources`, see calc/source.ts), so a later change to the library never changes a saved
 * revision.
 */

const nameSchema = text(TEXT_MAX.name)
  .min(1, 'name the product')
  .describe('Product, e.g. "80 mm insulated panel, 0.6 mm skins"');
const sourceSchema = valueSourceSchema.shape.text;
const notesSchema = text(TEXT_MAX.note).default('');

/** The engine's own rules for a load–span table (rows, increasing spans, allowables not rising), as zod issues. */
const checkedTable = loadSpanTableSchema.superRefine((table, ctx) => {
  try {
    tableColumns(table);
  } catch (e) {
    if (!(e instanceof CalcInputError)) throw e;
    ctx.addIssue({
      code: 'custom',
      path: e.field
        .replace(/^panel\.loadSpanTable\.?/, '')
        .split('.')
        .filter(Boolean),
      message: e.reason,
    });
  }
});

export const panelProductInputSchema = z.object({
  kind: z.literal('panel'),
  name: nameSchema,
  source: sourceSchema,
  notes: notesSchema,
  loadSpanTable: checkedTable,
  panelModuleWidth: panelSchema.shape.panelModuleWidth
    .optional()
    .describe('Panel module width (cover width), m (at least 0.1, at most 3)'),
});

export const clipProductInputSchema = z.object({
  kind: z.literal('clip'),
  name: nameSchema,
  source: sourceSchema,
  notes: notesSchema,
  clip: clipSchema,
});

export const attachmentProductInputSchema = z.discriminatedUnion('kind', [
  panelProductInputSchema,
  clipProductInputSchema,
]);

export const dataSheetSchema = z.object({
  name: z.string().describe('File name as shown and offered for download'),
  contentType: z.string().describe('Type detected from the content'),
  size: z.number().int().describe('Bytes'),
  sha256: z.string().describe('SHA-256 of the stored bytes, hex'),
  uploadedAt: z.string(),
});

const stored = { id: z.uuid(), createdAt: z.string(), dataSheet: dataSheetSchema.nullable() };
export const attachmentProductSchema = z.discriminatedUnion('kind', [
  panelProductInputSchema.extend(stored),
  clipProductInputSchema.extend(stored),
]);

export type AttachmentProductInput = Unbranded<z.infer<typeof attachmentProductInputSchema>>;
export type AttachmentProduct = Unbranded<z.infer<typeof attachmentProductSchema>>;
export type PanelProduct = Extract<AttachmentProduct, { kind: 'panel' }>;
export type ClipProduct = Extract<AttachmentProduct, { kind: 'clip' }>;
export type DataSheet = z.infer<typeof dataSheetSchema>;
