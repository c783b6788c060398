import { z } from 'zod';
import { categoryLabelsSchema, criteriaRowInputSchema, criteriaRowsSchema } from '../checks/criteria';
import { CSV_COLUMNS } from '../checks/criteria-csv';
import { calendarDate, createdFields, int4, int4Param, TEXT_MAX, text, unitSystemSchema } from './common';

/** API contracts of code tables (criteria sets). Values in rows are SI; see shared/checks/criteria.ts. */

export const criteriaSetMetaSchema = z.object({
  name: text(TEXT_MAX.name).min(1, 'a code table needs a name'),
  jurisdiction: text(TEXT_MAX.name).default('').describe('Where the table applies, as the firm names it'),
  edition: text(TEXT_MAX.name).default('').describe('Code edition and the amendments adopted'),
  effectiveDate: calendarDate().nullable().default(null).describe('Date the adopted edition takes effect'),
  notes: text(TEXT_MAX.note).default(''),
  sourceReference: text(1000).default('').describe('Where the values come from (code section, table)'),
  categoryLabels: categoryLabelsSchema.default({}),
});
export type CriteriaSetMeta = z.infer<typeof criteriaSetMetaSchema>;

export const criteriaSetCreateSchema = criteriaSetMetaSchema.extend({ rows: criteriaRowsSchema.default([]) });
export type CriteriaSetCreate = z.infer<typeof criteriaSetCreateSchema>;

/**
 * Edits name the `revision` they were based on (optimistic concurrency; a stale one gets 409). Editing a
 * frozen version (used by a stored check run) creates the next version instead.
 */
export const criteriaSetMetaUpdateSchema = z.object({
  revision: int4(),
  changes: criteriaSetMetaSchema,
});
export const criteriaRowsUpdateSchema = z.object({
  revision: int4(),
  rows: criteriaRowsSchema,
});

export const criteriaImportBodySchema = z.union([
  z.string().max(1_000_000).describe('CSV text (Content-Type: text/csv)'),
  z.object({ csv: z.string().max(1_000_000) }),
]);
export const criteriaImportQuerySchema = z.object({
  revision: int4Param().optional().describe('Revision the import replaces (409 if stale)'),
});
export const criteriaExportQuerySchema = z.object({ units: unitSystemSchema.default('SI') });

export const criteriaRowSchema = criteriaRowInputSchema.extend({ id: z.uuid() });
export type CriteriaRow = z.infer<typeof criteriaRowSchema>;

export const criteriaAccessSchema = z
  .enum(['read', 'write', 'admin'])
  .describe('What the caller may do with the table: read, edit, or edit and delete');
export type CriteriaAccess = z.infer<typeof criteriaAccessSchema>;
const ACCESS_RANK: Record<CriteriaAccess, number> = { read: 1, write: 2, admin: 3 };
/** True when `held` covers `need` (admin ⊃ write ⊃ read). */
export const criteriaAllows = (held: CriteriaAccess, need: CriteriaAccess) =>
  ACCESS_RANK[held] >= ACCESS_RANK[need];

export const criteriaSetSummarySchema = z.object({
  id: z.uuid(),
  organisationId: z.uuid(),
  organisationName: z.string(),
  /** Id of version 1: every version of one table shares it. */
  lineageId: z.uuid(),
  version: z.number().int().describe('Version of the table (a frozen version is never changed)'),
  previousVersionId: z.uuid().nullable(),
  revision: z.number().int().describe('Edit counter of this version (optimistic concurrency)'),
  name: z.string(),
  jurisdiction: z.string(),
  edition: z.string(),
  effectiveDate: z.string().nullable(),
  frozenAt: z.string().nullable().describe('When a stored check run first used this version'),
  isLatest: z.boolean(),
  rowCount: z.number().int(),
  ...createdFields,
  updatedAt: z.string(),
});
export type CriteriaSetSummary = z.infer<typeof criteriaSetSummarySchema>;

export const criteriaSetSchema = criteriaSetSummarySchema.extend({
  notes: z.string(),
  sourceReference: z.string(),
  categoryLabels: categoryLabelsSchema,
  rows: z.array(criteriaRowSchema),
  myAccess: criteriaAccessSchema,
});
export type CriteriaSet = z.infer<typeof criteriaSetSchema>;

/** The answer to an edit: the table as saved, and whether the edit created a new version. */
export const criteriaSaveSchema = criteriaSetSchema.extend({
  versionCreated: z
    .boolean()
    .describe('True when the edited version was frozen and this is the new version holding the edit'),
});
export type CriteriaSave = z.infer<typeof criteriaSaveSchema>;

export const criteriaSetListSchema = z.object({ criteriaSets: z.array(criteriaSetSummarySchema) });
export const criteriaVersionListSchema = z.object({ versions: z.array(criteriaSetSummarySchema) });

export const csvIssueSchema = z.object({
  line: z.number().int(),
  field: z.enum([...CSV_COLUMNS, 'row', 'file']),
  reason: z.string(),
});
/** 422 body of an import that was refused: every problem with its line; nothing was written. */
export const csvImportErrorSchema = z.object({
  error: z.object({ code: z.literal('invalid_csv'), message: z.string() }),
  errors: z.array(csvIssueSchema),
});

export const criteriaDiffQuerySchema = z.object({
  from: int4Param().describe('Version number to compare from'),
  to: int4Param().describe('Version number to compare to'),
});

const rowValue = criteriaRowInputSchema.pick({ value: true, note: true });
export const criteriaDiffSchema = z.object({
  lineageId: z.uuid(),
  from: criteriaSetSummarySchema,
  to: criteriaSetSummarySchema,
  meta: z.array(z.object({ field: z.string(), from: z.unknown(), to: z.unknown() })),
  added: z.array(criteriaRowInputSchema),
  removed: z.array(criteriaRowInputSchema),
  changed: z.array(
    criteriaRowInputSchema
      .pick({ climateZone: true, wallCategory: true, criterion: true })
      .extend({ from: rowValue, to: rowValue }),
  ),
  unchanged: z.number().int(),
});
export type CriteriaDiff = z.infer<typeof criteriaDiffSchema>;
