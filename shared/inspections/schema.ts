import { z } from 'zod';
import { projectRoleSchema } from '../auth/permissions';
import {
  calendarDate,
  createdFields,
  int4,
  TEXT_MAX,
  text,
  unitSystemSchema,
  versionedFields,
  wordedEnum,
} from '../schemas/common';
import { QUANTITIES, type Quantity } from '../units/registry';

/**
 * Field inspections: one assembly at a stated revision, walked over part of the building (an elevation and a
 * range of grid lines or a wind zone), against a checklist generated from what was proved (generate.ts) plus the
 * firm's own items. Each item is answered pass / fail / not applicable (or stays not yet seen), with a measured
 * value judged against its tolerance (tolerance.ts); a failed item opens a deficiency that goes
 * open → corrected (with a photo) → accepted, or is reopened. All values SI; conversion at the edges.
 */

// ------------------------------------------------------------------------------------------------ scope

/** Wall zones an inspector names; ASCE 7 walls have two: zone 4 (field) and zone 5 (the end zones at corners). */
export const INSPECTION_ZONES = ['field', 'edge', 'corner'] as const;
export const inspectionZoneSchema = z.enum(INSPECTION_ZONES);
export type InspectionZone = z.infer<typeof inspectionZoneSchema>;

/** Grid-line labels as drawings write them ("A", "12", "C.5"). */
const gridLine = text(20).min(1, 'name the grid line');

export const inspectionAreaSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('grid'), from: gridLine, to: gridLine }),
  z.object({ kind: z.literal('zone'), zone: inspectionZoneSchema }),
]);
export type InspectionArea = z.infer<typeof inspectionAreaSchema>;

export const inspectionScopeSchema = z.object({
  assemblyId: z.uuid(),
  revision: int4().describe('The assembly revision the wall is inspected against'),
  elevation: text(120).min(1, 'name the elevation, e.g. "North elevation"'),
  area: inspectionAreaSchema,
});
export type InspectionScope = z.infer<typeof inspectionScopeSchema>;

// ------------------------------------------------------------------------------------------------ items

/** Each state with plain words and a glyph, so it reads without colour. */
export const [ITEM_STATES, itemStateSchema, ITEM_STATE_TEXT] = wordedEnum({
  unseen: { label: 'Not yet seen', glyph: '○' },
  pass: { label: 'Pass', glyph: '✓' },
  fail: { label: 'Fail', glyph: '✕' },
  na: { label: 'Not applicable', glyph: '–' },
});
export type ItemState = z.infer<typeof itemStateSchema>;

export const itemKindSchema = z.enum([
  'girt_spacing',
  'clip_spacing',
  'clip_type',
  'fastener_type',
  'fasteners_per_clip',
  'insulation_type',
  'insulation_thickness',
  'joint_width',
  'sealant_depth',
  'bead_size',
  'backer_rod',
  'base_trim',
  'sill_flashing',
  'barrier_laps',
  'barrier_tape',
  'barrier_corners',
  'opening_head',
  'opening_jamb',
  'opening_sill',
  'panel_module',
  'joint_alignment',
  'firm',
]);
export type ItemKind = z.infer<typeof itemKindSchema>;

export const itemGroupSchema = z.enum([
  'attachment',
  'insulation',
  'joints',
  'barrier',
  'trim',
  'openings',
  'panels',
  'firm',
]);
export type ItemGroup = z.infer<typeof itemGroupSchema>;

const quantityNames = Object.keys(QUANTITIES) as [Quantity, ...Quantity[]];
/** The quantity of a measured value: one of shared/units (stored SI), or a plain count. */
export const itemQuantitySchema = z.enum([...quantityNames, 'count']);
export type ItemQuantity = z.infer<typeof itemQuantitySchema>;

/** Acceptance limits of a measured value, SI, in the item's quantity (null: no limit that side). */
export const toleranceSchema = z.object({
  min: z.number().nullable(),
  max: z.number().nullable(),
  basis: z.string().describe('Where the limits come from, in words'),
});
export type Tolerance = z.infer<typeof toleranceSchema>;

/** The assembly pages a design value is read from. */
export const SOURCE_PAGES = ['build-up', 'attachment', 'joints', 'firm-template'] as const;

/** Where a generated item's design value came from: the revision, the page and field, the check run and its sheet. */
export const itemSourceSchema = z.object({
  revision: z.number().int(),
  page: z.enum(SOURCE_PAGES),
  field: z.string().describe('Path of the value in the assembly input (or the firm template item)'),
  checkRunId: z.uuid().nullable().describe('The check run of this revision that proved it, if any'),
  sheetCode: z.string().nullable().describe('Verification code of that run’s compliance sheet'),
  text: z.string().describe('The citation in words'),
});
export type ItemSource = z.infer<typeof itemSourceSchema>;

/** A checklist item as generated (before anyone answers it). */
export const generatedItemSchema = z.object({
  kind: itemKindSchema,
  group: itemGroupSchema,
  label: z.string(),
  /** What to look for, in words (the type, the detail); always present, also where there is a number. */
  designText: z.string(),
  quantity: itemQuantitySchema
    .nullable()
    .describe('Quantity of the design and measured value; null: seen, not measured'),
  designValue: z
    .number()
    .nullable()
    .describe('Design value, SI (null when the design is a range or a description)'),
  tolerance: toleranceSchema.nullable(),
  source: itemSourceSchema,
});
export type GeneratedItem = z.infer<typeof generatedItemSchema>;

/** The automatic check of a measured value against the tolerance (tolerance.ts). */
export const measuredCheckSchema = z.object({
  status: z.enum(['within', 'below', 'above', 'none']),
  text: z.string(),
});
export type MeasuredCheck = z.infer<typeof measuredCheckSchema>;

export const photoSchema = z.object({
  id: z.uuid(),
  itemId: z.uuid(),
  contentType: z.string(),
  size: z.number().int(),
  name: z.string(),
  ...createdFields,
  url: z.string().describe('GET address of the image'),
});
export type Photo = z.infer<typeof photoSchema>;

export const inspectionItemSchema = generatedItemSchema.extend({
  id: z.uuid(),
  inspectionId: z.uuid(),
  position: z.number().int(),
  state: itemStateSchema,
  measured: z.number().nullable().describe('Measured value, SI, in the item’s quantity'),
  check: measuredCheckSchema,
  note: z.string(),
  location: z.string().describe('Where on the wall, in words (grid, level, panel mark)'),
  version: z.number().int().describe('Concurrency token of this item'),
  answeredBy: z.string().nullable(),
  answeredByName: z.string().nullable(),
  answeredAt: z.string().nullable(),
  photos: z.array(photoSchema),
});
export type InspectionItem = z.infer<typeof inspectionItemSchema>;

/** A measured value: finite, within ± 10⁶ of its SI unit (far beyond any wall dimension or count). */
const measured = z
  .number()
  .refine(Number.isFinite, 'must be a finite number')
  .refine((v) => Math.abs(v) <= 1e6, 'at most 10⁶ in its SI unit — a typing or unit slip');

/** An answer names the item version it was based on; a stale one gets 409 with the current item. */
export const itemAnswerSchema = z.object({
  version: int4(),
  state: itemStateSchema,
  measured: measured.nullable().optional().describe('Measured value, SI; null clears it; absent keeps it'),
  note: text(TEXT_MAX.note).optional(),
  location: text(TEXT_MAX.line).optional(),
});
export type ItemAnswer = z.infer<typeof itemAnswerSchema>;

// ------------------------------------------------------------------------------------------------ deficiencies

export const [DEFICIENCY_STATES, deficiencyStateSchema, DEFICIENCY_STATE_TEXT] = wordedEnum({
  open: { label: 'Open', glyph: '!' },
  corrected: { label: 'Corrected — to be accepted', glyph: '→' },
  accepted: { label: 'Accepted', glyph: '✓' },
  reopened: { label: 'Reopened', glyph: '↻' },
});
export type DeficiencyState = z.infer<typeof deficiencyStateSchema>;
/** A deficiency is open (still to be dealt with) until the inspector accepts it. */
export const isDeficiencyOpen = (s: DeficiencyState) => s !== 'accepted';

/** The transitions and who may take them (the permission table names the roles). */
export const DEFICIENCY_TRANSITIONS = {
  correct: { from: ['open', 'reopened'], to: 'corrected' },
  accept: { from: ['corrected'], to: 'accepted' },
  reopen: { from: ['corrected', 'accepted'], to: 'reopened' },
} as const satisfies Record<string, { from: readonly DeficiencyState[]; to: DeficiencyState }>;
export type DeficiencyTransition = keyof typeof DEFICIENCY_TRANSITIONS;

export const deficiencySchema = z.object({
  id: z.uuid(),
  inspectionId: z.uuid(),
  itemId: z.uuid(),
  itemLabel: z.string(),
  number: z.number().int().describe('1, 2, … within the inspection'),
  state: deficiencyStateSchema,
  description: z.string(),
  ownerId: z.string().nullable(),
  ownerName: z.string().nullable(),
  dueDate: z.string().nullable().describe('YYYY-MM-DD'),
  correctionPhotoId: z.uuid().nullable(),
  note: z.string().describe('The latest note of a transition'),
  ...versionedFields,
});
export type Deficiency = z.infer<typeof deficiencySchema>;

export const deficiencyUpdateSchema = z.object({
  version: int4(),
  ownerId: z.string().min(1).max(100).nullable().optional().describe('User id of a project member'),
  dueDate: calendarDate().nullable().optional(),
  description: text(TEXT_MAX.note).optional(),
});
export const deficiencyCorrectSchema = z.object({
  version: int4(),
  photoId: z
    .uuid()
    .describe('A photo of the item, taken after the deficiency was opened, showing the correction'),
  note: text(TEXT_MAX.note).default(''),
});
export const deficiencyAcceptSchema = z.object({ version: int4(), note: text(TEXT_MAX.note).default('') });
export const deficiencyReopenSchema = z.object({
  version: int4(),
  note: text(TEXT_MAX.note).min(1, 'say what is still wrong'),
});

// ------------------------------------------------------------------------------------------------ inspection

export const inspectionStatusSchema = z.enum(['in_progress', 'closed']);

export const inspectionCreateSchema = z.object({
  assemblyId: z.uuid(),
  revision: int4().optional().describe('Assembly revision; absent: the current one'),
  elevation: inspectionScopeSchema.shape.elevation,
  area: inspectionAreaSchema,
  title: text(TEXT_MAX.name).optional(),
});
export type InspectionCreate = z.infer<typeof inspectionCreateSchema>;

export const signatureSchema = z.object({
  name: z.string(),
  role: projectRoleSchema,
  at: z.string(),
  what: z.enum(['created', 'closed']),
});

export const inspectionSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  number: z.number().int(),
  title: z.string(),
  status: inspectionStatusSchema,
  scope: inspectionScopeSchema,
  assemblyName: z.string(),
  checkRunId: z.uuid().nullable(),
  sheetCode: z.string().nullable(),
  counts: z.object({
    items: z.number().int(),
    unseen: z.number().int(),
    pass: z.number().int(),
    fail: z.number().int(),
    na: z.number().int(),
    openDeficiencies: z.number().int(),
  }),
  version: z.number().int(),
  createdBy: z.string().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  closedAt: z.string().nullable(),
  closedByName: z.string().nullable(),
});
export type InspectionSummary = z.infer<typeof inspectionSummarySchema>;

export const inspectionSchema = inspectionSummarySchema.extend({
  items: z.array(inspectionItemSchema),
  deficiencies: z.array(deficiencySchema),
  signatures: z.array(signatureSchema),
});
export type Inspection = z.infer<typeof inspectionSchema>;

export const inspectionListSchema = z.object({ inspections: z.array(inspectionSummarySchema) });

export const inspectionCloseSchema = z.object({ version: int4() });
/** The closed inspection and the deficiencies still open at sign-off. */
export const inspectionCloseResultSchema = z.object({
  inspection: inspectionSchema,
  openDeficiencies: z.array(deficiencySchema),
});

// ------------------------------------------------------------------------------------------------ firm template

/** An item a firm adds to every generated checklist (seen, not measured). */
export const templateItemSchema = z.object({
  group: itemGroupSchema.default('firm'),
  label: text(TEXT_MAX.name).min(1, 'name the item'),
  designText: text(TEXT_MAX.line).default(''),
});
export type TemplateItem = z.infer<typeof templateItemSchema>;

/** The most items a firm's checklist template holds. */
export const TEMPLATE_MAX_ITEMS = 100;
export const inspectionTemplateInputSchema = z.object({
  items: z.array(templateItemSchema).max(TEMPLATE_MAX_ITEMS),
});

/** One version of a firm's checklist template; a version used by an inspection is frozen (edits make the next). */
export const inspectionTemplateSchema = z.object({
  id: z.uuid(),
  organisationId: z.uuid(),
  version: z.number().int(),
  items: z.array(templateItemSchema),
  frozen: z.boolean(),
  revision: z.number().int().describe('Concurrency token of an unfrozen version'),
  createdAt: z.string(),
});
export type InspectionTemplate = z.infer<typeof inspectionTemplateSchema>;
export const inspectionTemplateUpdateSchema = inspectionTemplateInputSchema.extend({
  revision: int4().optional().describe('The revision read (absent: creating the firm’s first template)'),
});

// ------------------------------------------------------------------------------------------------ answers of the routes

/** An answered item, and the deficiency its failure opened (null: none opened by this answer). */
export const itemAnswerResultSchema = z.object({
  item: inspectionItemSchema,
  openedDeficiency: deficiencySchema.nullable(),
});
export type ItemAnswerResult = z.infer<typeof itemAnswerResultSchema>;

/** Photos are images (PNG or JPEG by their bytes), at most this large each, a few per upload. */
export const PHOTO_LIMITS = { maxFileBytes: 15 * 1024 * 1024, maxFiles: 5 } as const;
export const photoUploadResultSchema = z.object({ photos: z.array(photoSchema), item: inspectionItemSchema });
/** A firm's checklist template, or null before its first save. */
export const inspectionTemplateAnswerSchema = z.object({ template: inspectionTemplateSchema.nullable() });

/** The field report of an inspection of the submittal's project, added to a draft as a PDF file item. */
export const attachReportSchema = z.object({
  inspectionId: z.uuid(),
  units: unitSystemSchema.optional().describe('Units of the report (default: yours)'),
});
