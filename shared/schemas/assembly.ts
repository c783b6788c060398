import { z } from 'zod';
import { computedBridgeSchema } from '../calc/bridge/computed';
import { jointInputSchema } from '../calc/joints/schema';
import { vapourSchema } from '../calc/moisture/schema';
import { valueSourceSchema } from '../calc/source';
import { takeoffInputSchema } from '../calc/takeoff/schema';
import { MIN_CONDUCTIVITY, thermalInputSchema, thermalResultSchema } from '../calc/thermal/schema';
import { MIN_CLIP_SPACING, MIN_SPAN, panelSchema } from '../calc/wind/schema';
import type { Unbranded } from '../units/brands';
import { createdFields, int4, TEXT_MAX, text, wordedEnum } from './common';

/**
 * Wall categories a code table may key on. The list is deliberately short and generic; criteria sets
 * (code tables) refer to these keys.
 */
export const [WALL_CATEGORIES, wallCategorySchema, WALL_CATEGORY_LABELS] = wordedEnum({
  metal_building: 'Metal building wall',
  steel_framed: 'Steel-framed wall',
  mass: 'Mass wall',
  wood_framed: 'Wood-framed wall',
  other: 'Other',
});

/** How the cladding is held: descriptive data the drawings and the wind check read; the thermal effect sits in `thermal.bridges`. */
export const attachmentSchema = z.object({
  girtOrientation: z
    .enum(['horizontal', 'vertical'])
    .describe('Girts run horizontally (panels span vertically) or vertically'),
  clipType: text(TEXT_MAX.name).default('').describe('Clip or bracket product / description'),
  fastenerType: text(TEXT_MAX.name)
    .default('')
    .describe('Fastener description, e.g. "#14 self-drilling screw"'),
  girtSpacing: z
    .number()
    .min(MIN_SPAN, `at least ${MIN_SPAN} m — a closer girt spacing is a typing or unit slip`)
    .max(10)
    .optional()
    .describe(`Design girt spacing (panel span), m (at least ${MIN_SPAN}, at most 10)`),
  clipSpacing: z
    .number()
    .min(MIN_CLIP_SPACING, `at least ${MIN_CLIP_SPACING} m — a closer clip spacing is a typing or unit slip`)
    .max(10)
    .optional()
    .describe(`Design clip spacing along a girt, m (at least ${MIN_CLIP_SPACING}, at most 10)`),
});

/**
 * The panel's wind data for the attachment check; the girt orientation comes from `attachment`. `sources`
 * says where the load–span table and the clip value came from (shown beside them on the sheet).
 */
export const windPanelSchema = panelSchema.omit({ girtOrientation: true }).extend({
  sources: z
    .object({ loadSpanTable: valueSourceSchema.optional(), clip: valueSourceSchema.optional() })
    .optional()
    .describe('Source of the load–span table and of the clip capacity'),
});

export const assemblyInputSchema = z
  .object({
    name: text(TEXT_MAX.name).min(1, 'an assembly needs a name'),
    description: text(TEXT_MAX.note).default(''),
    wallCategory: wallCategorySchema,
    attachment: attachmentSchema,
    thermal: thermalInputSchema,
    /** Vapour data per layer, aligned with `thermal.layers` (null = not entered yet). */
    vapour: z.array(vapourSchema.nullable()).max(40).optional(),
    windPanel: windPanelSchema.optional(),
    joints: z.array(jointInputSchema).max(100).optional(),
    takeoff: takeoffInputSchema.optional(),
  })
  .refine((a) => a.vapour === undefined || a.vapour.length === a.thermal.layers.length, {
    path: ['vapour'],
    message: 'vapour data must list one entry per layer (null where not entered)',
  });
/** The assembly as the engines and pages take it (plain numbers); `assemblyInputSchema` parses it SI-branded. */
export type AssemblyInput = Unbranded<AssemblyInputSI>;
/** What `assemblyInputSchema` parses: lengths, λ, R and temperatures SI-branded (D-028). */
export type AssemblyInputSI = z.infer<typeof assemblyInputSchema>;

export const assemblyCreateSchema = assemblyInputSchema;
/** A copy of an assembly's current revision, into this project or `projectId`; named "<name> (copy)" by default. */
export const assemblyDuplicateSchema = z.object({
  projectId: z.uuid().optional(),
  name: text(TEXT_MAX.name).min(1, 'an assembly needs a name').optional(),
});
/** A save names the version it was based on; a stale one gets 409. */
export const assemblyUpdateSchema = z.object({
  version: int4(),
  note: text(TEXT_MAX.line).default(''),
  input: assemblyInputSchema,
});

/** What an assembly and its list entry share. */
const assemblyHeadSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  wallCategory: wallCategorySchema,
  revision: z.number().int(),
  version: z.number().int(),
  updatedAt: z.string(),
  Ueff: z.number().nullable(),
  Reff: z.number().nullable(),
});
export type AssemblyHead = z.infer<typeof assemblyHeadSchema>;

/** An assembly in its project's list, with the verdict of its last check run (null: never checked). */
export const assemblySummarySchema = assemblyHeadSchema.extend({
  lastRun: z
    .object({
      // The values of verdictSchema (shared/checks/report.ts, which imports this file).
      verdict: z.enum(['pass', 'fail', 'incomplete']),
      at: z.string(),
    })
    .nullable(),
});
export type AssemblySummary = z.infer<typeof assemblySummarySchema>;

export const assemblyRevisionSchema = z.object({
  revision: z.number().int(),
  note: z.string(),
  input: assemblyInputSchema,
  thermalResult: thermalResultSchema.nullable(),
  engineVersion: z.string(),
  ...createdFields,
});
export type AssemblyRevision = Unbranded<z.infer<typeof assemblyRevisionSchema>>;

export const assemblySchema = assemblyHeadSchema.extend({ current: assemblyRevisionSchema });
export type Assembly = Unbranded<z.infer<typeof assemblySchema>>;

export const revisionListSchema = z.object({
  revisions: z.array(
    assemblyRevisionSchema
      .pick({ revision: true, note: true, engineVersion: true, createdBy: true, createdAt: true })
      .extend({ Ueff: z.number().nullable() }),
  ),
});

/** An organisation's own material (SI). */
export const orgMaterialInputSchema = z.object({
  name: text(TEXT_MAX.name).min(1),
  conductivity: z
    .number()
    .min(MIN_CONDUCTIVITY, `at least ${MIN_CONDUCTIVITY} W/(m·K) — below vacuum insulation panels`)
    .max(1000)
    .describe(`λ, W/(m·K) (at least ${MIN_CONDUCTIVITY}, at most 1000)`),
  density: z
    .number()
    .min(1, 'at least 1 kg/m³ — lighter than any aerogel is a typing or unit slip')
    .max(25000)
    .optional()
    .describe('ρ, kg/m³ (at least 1, at most 25 000)'),
  vapourResistanceFactor: z.number().min(1).max(1e7).optional().describe('μ, dimensionless'),
  source: text(TEXT_MAX.line).min(1, 'name the source of the value (data sheet, test report, table)'),
});
export const orgMaterialSchema = orgMaterialInputSchema.extend({ id: z.uuid(), createdAt: z.string() });
export type OrgMaterial = z.infer<typeof orgMaterialSchema>;

/** An organisation's own χ or ψ value with where it came from. */
export const bridgeValueInputSchema = z.object({
  name: text(TEXT_MAX.name).min(1),
  kind: z.enum(['point', 'linear']).describe('point → χ in W/K; linear → ψ in W/(m·K)'),
  value: z.number().min(0).max(10).describe('χ (W/K) or ψ (W/(m·K))'),
  sourceType: z.enum(['test_report', 'catalogue', 'calculation']),
  source: text(TEXT_MAX.line).min(1, 'name the source of the value'),
  notes: text(TEXT_MAX.note).default(''),
  computed: computedBridgeSchema
    .optional()
    .describe('A computed value: the detail it was solved from, the solve and its map'),
});
export const bridgeValueSchema = bridgeValueInputSchema.extend({ id: z.uuid(), createdAt: z.string() });
export type BridgeValueInput = z.input<typeof bridgeValueInputSchema>;
export type BridgeValue = z.infer<typeof bridgeValueSchema>;
