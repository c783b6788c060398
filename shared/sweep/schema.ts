import { z } from 'zod';
import { computedBridgeSchema } from '../calc/bridge/computed';
import { movementClassSchema } from '../calc/joints/schema';
import { valueSourceSchema } from '../calc/source';
import { criteriaRowsSchema } from '../checks/criteria';
import { verdictSchema } from '../checks/report';
import { assemblyInputSchema, orgMaterialInputSchema } from '../schemas/assembly';
import { projectClimateSchema, projectSiteSchema, projectWindSchema } from '../schemas/project';

/*
 * A sweep: one to three parameters of an assembly, each a range or a list; every combination (a variant) is
 * checked by the compliance runner against the rows of one code table version. SI throughout. Whether a
 * parameter exists on the assembly, steps, empty lists and the variant cap are the engine's refusals
 * (`planSweep`, CalcInputError naming the field), so the client's worker gets the same words as the API.
 */

/** Most values one list may name. */
export const SWEEP_MAX_LIST = 1000;

const bound = z
  .number()
  .min(-1e6)
  .max(1e6)
  .describe('SI value of the parameter (the bounds of the field it varies apply: see the parameter)');

/** start, start + step, … up to stop (stop included when it falls on a step). */
const rangeSchema = z
  .object({ start: bound, stop: bound, step: bound.describe('Step, SI, greater than 0') })
  .describe('start, start + step, … up to stop');
const index = (what: string) =>
  z.number().int().min(0).max(99).describe(`Index of the ${what} in the assembly, counted from 0`);

/** A numeric parameter: where it sits, and a range or a list of its values (one of the two). */
const numeric = <K extends string, S extends z.ZodRawShape>(kind: K, what: string, target: S) =>
  z
    .object({
      kind: z.literal(kind),
      ...target,
      range: rangeSchema.optional(),
      list: z.array(bound).max(SWEEP_MAX_LIST).optional().describe('The values, SI, one or more'),
    })
    .describe(`${what}; give a range or a list`);

/** One insulation product: the firm library's material fields; the entry it was taken from, when it was. */
export const sweepProductSchema = orgMaterialInputSchema
  .extend({
    libraryEntryId: z
      .uuid()
      .optional()
      .describe(
        'The firm library material it was taken from: a saved sweep reads the entry’s values (a deleted one is refused at this field)',
      ),
  })
  .describe('An insulation product: its name (the variant’s label), λ, μ (s_d = μ·d) and source');
export type SweepProduct = z.infer<typeof sweepProductSchema>;

/** One clip type: its χ, name (the variant's label) and source — a firm library entry or a solved bridge. */
export const sweepClipEntrySchema = z
  .object({
    name: z
      .string()
      .min(1)
      .max(120)
      .describe('Name of the clip type (the variant’s label and the bridge’s name)'),
    chi: z.number().min(0).max(10).describe('χ, W/K (0–10)'),
    source: valueSourceSchema
      .extend({ computed: computedBridgeSchema.optional().describe('The solve that gave the value') })
      .optional()
      .describe(
        'Where χ comes from (`libraryEntryId`: the firm library entry — a saved sweep reads its values, a deleted one is refused at this field; `computed`: the bridge solver’s detail and solve, whose surface f_Rsi the moisture check reads)',
      ),
  })
  .describe('A clip type with its χ and source');
export type SweepClipEntry = z.infer<typeof sweepClipEntrySchema>;

export const sweepParameterSchema = z.discriminatedUnion('kind', [
  numeric('insulationThickness', 'Thickness of one homogeneous or framed layer, m', {
    layer: index('layer'),
  }),
  numeric(
    'girtSpacing',
    'Design girt spacing, m; the girt bridges (ψ by spacing, and the clips’ spacing across the girts) follow it',
    {},
  ),
  numeric(
    'clipSpacing',
    'Design clip spacing along a girt, m; the clip bridges’ spacing along the girts follows it',
    {},
  ),
  z
    .object({
      kind: z.literal('insulationProduct'),
      layer: index('layer'),
      products: z
        .array(sweepProductSchema)
        .max(SWEEP_MAX_LIST)
        .describe('The products, one or more, each with its own name'),
    })
    .describe(
      'Insulation product of one homogeneous layer, or of the insulation (lowest-λ section) of a framed layer: λ, μ and the name change in every check; a product without μ leaves the layer’s vapour data unentered (the moisture check is then not evaluated)',
    ),
  numeric('clipChi', 'χ of one point bridge (a clip), W/K; or clip types with their χ, name and source', {
    bridge: index('bridge'),
    entries: z
      .array(sweepClipEntrySchema)
      .max(SWEEP_MAX_LIST)
      .optional()
      .describe('Clip types from the firm library or the bridge solver, instead of a range or list'),
  }),
  numeric('studSpacing', 'Member spacing of one metal-framed layer, m; the framing fractions follow it', {
    layer: index('layer'),
  }),
  numeric(
    'panelModule',
    'Panel module width, m (the wind panel’s tributary width, and the takeoff’s module)',
    {},
  ),
  z
    .object({
      kind: z.literal('sealantClass'),
      joint: index('joint').optional().describe('Index of the joint; omitted: every joint'),
      list: z.array(movementClassSchema).max(SWEEP_MAX_LIST).describe('ASTM C920 movement classes'),
    })
    .describe('Sealant movement class of one joint or of every joint'),
]);
export type SweepParameter = z.infer<typeof sweepParameterSchema>;
export type SweepParameterKind = SweepParameter['kind'];

export const sweepParametersSchema = z
  .array(sweepParameterSchema)
  .min(1, 'choose at least one parameter to vary')
  .max(3, 'at most three parameters at once');

/** The project data the checks read (a stored project's, without its records). */
export const projectForChecksSchema = projectSiteSchema.omit({ siteAddress: true }).extend({
  wind: projectWindSchema.nullable(),
  climate: projectClimateSchema.nullable(),
});

/** Costs of what varies, each per unit, in the firm's currency (any one currency for all). */
export const sweepCostsSchema = z.object({
  insulation: z
    .number()
    .min(0)
    .max(1e6)
    .optional()
    .describe('Insulation: cost per m² of wall per 25 mm of thickness'),
  insulationProducts: z
    .record(z.string().min(1).max(120), z.number().min(0).max(1e6))
    .optional()
    .describe(
      'Insulation products by name (the product parameter’s values): cost per m² of wall per 25 mm of each; the product’s layer is priced here, not at `insulation`',
    ),
  clip: z.number().min(0).max(1e6).optional().describe('Cost per clip'),
  girt: z.number().min(0).max(1e6).optional().describe('Cost per m of girt'),
  sealant: z
    .object({
      perMetre: z
        .partialRecord(movementClassSchema, z.number().min(0).max(1e6))
        .describe('Cost per m by class'),
      metresPerSquareMetre: z.number().min(0).max(1000).describe('Metres of sealant per m² of wall, m/m²'),
    })
    .optional(),
});
export type SweepCosts = z.infer<typeof sweepCostsSchema>;

/** `POST /api/v1/calc/sweep`: an assembly, its project, the rows of a code table version and what to vary. */
export const sweepRequestSchema = z.object({
  assembly: assemblyInputSchema,
  project: projectForChecksSchema,
  rows: criteriaRowsSchema.describe('The rows of the code table version to check against'),
  parameters: sweepParametersSchema,
  costs: sweepCostsSchema
    .optional()
    .describe('Given: the passing variants ranked by the cost of what varies'),
  mode: z
    .enum(['exhaustive', 'search'])
    .optional()
    .describe(
      '`search`: when the parameters name more variants than may be run, search them (bounded, leaning on "more insulation never raises U") instead of refusing; the answer’s `exploration` says what was and was not explored',
    ),
});
export type SweepRequest = z.infer<typeof sweepRequestSchema>;

const marginSchema = z.object({
  id: z.string(),
  status: z.enum(['pass', 'fail', 'not_evaluated']),
  margin: z.number().nullable().describe('Signed, SI, in the criterion’s direction: ≥ 0 meets'),
  marginRatio: z.number().nullable().describe('margin / |required|'),
});
export const sweepVariantResultSchema = z.object({
  index: z.number().int().describe('Position in the enumeration (the last parameter varies fastest)'),
  values: z.array(z.union([z.number(), z.string()])).describe('One value per parameter, in their order'),
  verdict: verdictSchema,
  governing: marginSchema
    .extend({ label: z.string() })
    .nullable()
    .describe('The check that decides: the worst failing, else one not evaluated, else the tightest passing'),
  checks: z.array(marginSchema),
});
export type SweepVariantResult = z.infer<typeof sweepVariantResultSchema>;

export const rankedVariantSchema = z.object({
  index: z.number().int(),
  values: z.array(z.union([z.number(), z.string()])),
  cost: z.number().describe('Cost of what varies per m² of wall'),
  governing: sweepVariantResultSchema.shape.governing,
});
export const sweepRankingSchema = z.object({
  ranked: z.array(rankedVariantSchema).describe('Passing variants, cheapest first'),
  runnerUp: z
    .object({
      costDifference: z.number().describe('Runner-up cost − cheapest cost, per m² of wall'),
      costRatio: z.number().nullable().describe('costDifference / cheapest cost (null when it costs 0)'),
    })
    .nullable(),
  notPassing: z.number().int().describe('Variants left out: failing or incomplete'),
});
export type SweepRanking = z.infer<typeof sweepRankingSchema>;

/** What a sweep ran and what it left out (shared/sweep/search.ts). */
export const sweepExplorationSchema = z.object({
  mode: z.enum(['exhaustive', 'bounded']).describe('`exhaustive`: every variant ran; `bounded`: searched'),
  combinations: z.number().int().describe('Variants the parameters name'),
  evaluated: z.number().int().describe('Variants run (these are `variants`)'),
  provenFailing: z
    .number()
    .int()
    .describe('Not run: thinner than a thickness whose thermal criteria fail, so they fail too'),
  costlier: z
    .number()
    .int()
    .describe('Not run: thicker than the thinnest passing variant of the same other values'),
  unexplored: z.number().int().describe('Not run and not ruled out: the budget ran out'),
  notes: z.array(z.string()).describe('What was done, in words'),
});
export type SweepExploration = z.infer<typeof sweepExplorationSchema>;

export const sweepResultSchema = z.object({
  count: z.number().int(),
  parameters: z.array(z.object({ kind: z.string(), values: z.array(z.union([z.number(), z.string()])) })),
  variants: z.array(sweepVariantResultSchema),
  ranking: sweepRankingSchema.nullable(),
  exploration: sweepExplorationSchema
    .optional()
    .describe('With `mode: "search"`: what was run, ruled out and left unexplored'),
});
export type SweepResult = z.infer<typeof sweepResultSchema>;
