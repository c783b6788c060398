import { z } from 'zod';
import { movementClassSchema } from '../calc/joints/schema';
import { verdictSchema } from '../checks/report';
import {
  rankedVariantSchema,
  sweepCostsSchema,
  sweepExplorationSchema,
  sweepParametersSchema,
  sweepRankingSchema,
} from '../sweep/schema';
import { createdFields, int4, TEXT_MAX, text, versionedFields, wordedEnum } from './common';

/*
 * The API of a firm's sweep costs (library entries) and of saved sweeps (an assembly's, with the revision and
 * code table version they ran against). SI throughout; costs in the entry's currency.
 */

// ------------------------------------------------------------------ firm library: costs of what a sweep varies

/** Each kind with what one unit of it is: the screens and the sheet word the price with it. */
export const [COST_KINDS, costKindSchema, COST_UNITS] = wordedEnum({
  insulation: 'per m² of wall per 25 mm of thickness',
  clip: 'per clip',
  girt: 'per m of girt',
  sealant: 'per m of joint',
});
export type CostKind = z.infer<typeof costKindSchema>;

const costFields = {
  kind: costKindSchema.describe(
    'insulation: per m² of wall per 25 mm of thickness; clip: each; girt: per m; sealant: per m (of one movement class)',
  ),
  name: text(TEXT_MAX.name).min(1).describe('The product, e.g. "Mineral wool board 45 kg/m³"'),
  cost: z
    .number()
    .min(0, 'a cost cannot be negative')
    .max(1e6, 'at most 1 000 000 per unit')
    .describe('Cost per unit of the kind, in `currency`'),
  currency: z
    .string()
    .regex(/^[A-Z]{3}$/, 'a three-letter ISO 4217 code such as EUR, GBP or USD')
    .describe('ISO 4217 code'),
  movementClass: movementClassSchema
    .optional()
    .describe('Sealant only: the ASTM C920 movement class this price is for'),
  source: text(TEXT_MAX.line).default('').describe('Where the price comes from (quote, price list, date)'),
  notes: text(TEXT_MAX.note).default(''),
};
const sealantHasClass = (c: { kind: CostKind; movementClass?: string }, ctx: z.RefinementCtx) => {
  if (c.kind === 'sealant' && c.movementClass === undefined)
    ctx.addIssue({
      code: 'custom',
      path: ['movementClass'],
      message: 'a sealant price names its movement class',
    });
  if (c.kind !== 'sealant' && c.movementClass !== undefined)
    ctx.addIssue({
      code: 'custom',
      path: ['movementClass'],
      message: 'only a sealant price has a movement class',
    });
};

/** A new cost entry (editors and administrators of the firm). */
export const sweepCostInputSchema = z.object(costFields).superRefine(sealantHasClass);
export type SweepCostInput = z.infer<typeof sweepCostInputSchema>;
/** A changed cost entry: the whole entry with the version it was read at (409 with the current one if stale). */
export const sweepCostUpdateSchema = z
  .object({ ...costFields, version: int4() })
  .superRefine(sealantHasClass);
export const sweepCostSchema = z.object({
  ...costFields,
  id: z.uuid(),
  ...versionedFields,
});
export type SweepCost = z.infer<typeof sweepCostSchema>;
export const sweepCostListSchema = z.object({ costs: z.array(sweepCostSchema) });

// ------------------------------------------------------------------------------------------ saved sweeps

/**
 * Costs taken from the firm library by entry id (the project firm's or one of the caller's firms'): the server
 * reads their prices when the sweep runs and stores them with it. A deleted entry is refused (422, naming it).
 */
export const sweepCostEntriesSchema = z
  .object({
    insulation: z.uuid().optional().describe('An `insulation` entry'),
    clip: z.uuid().optional().describe('A `clip` entry'),
    girt: z.uuid().optional().describe('A `girt` entry'),
    sealant: z
      .object({
        entries: z.array(z.uuid()).min(1).max(5).describe('`sealant` entries, one per movement class'),
        metresPerSquareMetre: z.number().min(0).max(1000).describe('Metres of sealant per m² of wall, m/m²'),
      })
      .optional(),
  })
  .describe('Costs from the firm library, by entry id');
export type SweepCostEntries = z.infer<typeof sweepCostEntriesSchema>;

/** `POST /assemblies/:assemblyId/sweeps`: run a sweep of the current revision on the server and save it. */
export const sweepSaveSchema = z.object({
  name: text(TEXT_MAX.name).min(1),
  criteriaSetId: z.uuid().describe('The code table version to check against (frozen by the save)'),
  parameters: sweepParametersSchema,
  costs: sweepCostsSchema.optional().describe('Costs typed in; an entry in `costEntries` takes precedence'),
  costEntries: sweepCostEntriesSchema.optional(),
});
export type SweepSave = z.infer<typeof sweepSaveSchema>;

/** One point of a saved sweep's chart: a variant's values, verdict and the margin of what governs it. */
export const sweepPointSchema = z.object({
  values: z.array(z.union([z.number(), z.string()])),
  verdict: verdictSchema,
  governing: z.string().nullable().describe('Id of the governing check'),
  marginRatio: z.number().nullable().describe('The governing check’s margin / |required|'),
});
/** Most chart points a saved sweep keeps (the variants in enumeration order, evenly thinned above it). */
export const SWEEP_POINTS_MAX = 2000;

/** What a saved sweep keeps of its results (not every variant). */
export const sweepSummarySchema = z.object({
  count: z.number().int().describe('Variants the parameters name'),
  parameters: z.array(z.object({ kind: z.string(), values: z.array(z.union([z.number(), z.string()])) })),
  verdicts: z.object({ pass: z.number().int(), fail: z.number().int(), incomplete: z.number().int() }),
  exploration: sweepExplorationSchema,
  ranking: sweepRankingSchema
    .omit({ ranked: true })
    .extend({ top: z.array(rankedVariantSchema).describe('The cheapest passing variants, at most 10') })
    .nullable(),
  /** Labels of the governing checks named in `points` and `ranking`, by id. */
  labels: z.record(z.string(), z.string()),
  points: z.array(sweepPointSchema).describe(`At most ${SWEEP_POINTS_MAX}, for the chart`),
});
export type SweepSummary = z.infer<typeof sweepSummarySchema>;

const savedSweepHead = {
  id: z.uuid(),
  projectId: z.uuid(),
  assemblyId: z.uuid(),
  name: z.string(),
  assemblyRevision: z.number().int().describe('The revision the sweep ran against'),
  currentRevision: z.number().int().describe('The assembly’s revision now'),
  stale: z
    .boolean()
    .describe('The assembly has changed since the sweep ran (`currentRevision` ≠ `assemblyRevision`)'),
  criteriaSetId: z.uuid(),
  criteriaSetVersion: z.number().int(),
  criteriaSetName: z.string(),
  engineVersion: z.string(),
  ...createdFields,
};
export const savedSweepSummarySchema = z.object({
  ...savedSweepHead,
  count: z.number().int(),
  verdicts: sweepSummarySchema.shape.verdicts,
  cheapest: rankedVariantSchema.nullable(),
});
export type SavedSweepSummary = z.infer<typeof savedSweepSummarySchema>;
export const savedSweepSchema = z.object({
  ...savedSweepHead,
  parameters: sweepParametersSchema,
  costs: sweepCostsSchema
    .nullable()
    .describe('The prices it ranked by (from the library entries as they were)'),
  costEntries: sweepCostEntriesSchema.nullable(),
  summary: sweepSummarySchema,
});
export type SavedSweep = z.infer<typeof savedSweepSchema>;
export const savedSweepListSchema = z.object({ sweeps: z.array(savedSweepSummarySchema) });

export const sweepCompareQuerySchema = z.object({ from: z.uuid(), to: z.uuid() });
/** Two saved sweeps of one assembly side by side, with what changed between them. */
export const sweepComparisonSchema = z.object({
  from: savedSweepSummarySchema,
  to: savedSweepSummarySchema,
  sameParameters: z.boolean().describe('Both varied the same parameters over the same values'),
  changes: z.array(z.string()).describe('What differs, in words'),
  cheapestCostDifference: z
    .number()
    .nullable()
    .describe('to − from, per m² of wall (null unless both ranked)'),
  verdictChanges: z
    .array(
      z.object({
        values: z.array(z.union([z.number(), z.string()])),
        from: verdictSchema,
        to: verdictSchema,
      }),
    )
    .describe('Variants of the same values whose verdict differs (same parameters only; at most 200)'),
});
export type SweepComparison = z.infer<typeof sweepComparisonSchema>;
