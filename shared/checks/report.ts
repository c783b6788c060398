import { z } from 'zod';
import { traceStepSchema } from '../calc/trace';
import { metricNoteSchema, storedMessageSchema } from '../format/message-schema';
import { wallCategorySchema } from '../schemas/assembly';
import { climateZoneSchema } from '../schemas/project';
import { fixed } from '../units/rounding';
import { criteriaZoneSchema } from './criteria';

/** The outcome of a compliance run, as stored in a check run and sent to the client. */

export const checkStatusSchema = z
  .enum(['pass', 'fail', 'not_evaluated'])
  .describe('pass: meets; fail: does not; not_evaluated: could not be checked (the reason says why)');
export type CheckStatus = z.infer<typeof checkStatusSchema>;

export const verdictSchema = z
  .enum(['pass', 'fail', 'incomplete'])
  .describe('fail if any check fails; incomplete if any is not evaluated and none fails; pass otherwise');
export type Verdict = z.infer<typeof verdictSchema>;

const checkValueSchema = z.union([z.number(), z.boolean()]).nullable();

/** Which calculation method the provided value comes from, why, and what the other methods give. */
export const checkMethodSchema = z.object({
  method: z.string().describe('The deciding method, e.g. energyCode, isoCombined, isothermalPlanes'),
  label: z.string(),
  kind: z
    .enum(['energyCode', 'standard', 'mostConservative'])
    .describe('The energy code’s own method, the standard that applies, or the lowest R offered'),
  text: z.string().describe('Why this method decides, in a sentence'),
  others: z
    .array(z.object({ method: z.string(), label: z.string(), R: z.number().describe('R_T, m²·K/W') }))
    .describe('The other methods offered, beside the deciding one'),
  spread: z.number().describe('(max − min)/mean of every method offered, dimensionless'),
});
export type CheckMethod = z.infer<typeof checkMethodSchema>;

/**
 * The deciding method as the checks page and the sheet print it: "Method: …. Why. Beside it: … (spread …)."
 * `rValue` formats an R in m²·K/W in the reader's units.
 */
export function methodText(m: CheckMethod, rValue: (R: number) => string): string {
  return `Method: ${m.label}. ${methodDetail(m, rValue)}`;
}

/** Why the method decides and what the others give — the body under "Method: …" on the checks page. */
export function methodDetail(m: CheckMethod, rValue: (R: number) => string): string {
  const others = m.others.map((o) => `${o.label} ${rValue(o.R)}`).join('; ');
  const spread = `${fixed(m.spread * 100, 1)} %`;
  return `${m.text}${others ? ` Beside it: ${others} (spread of the methods ${spread}).` : ''}`;
}

export const checkSchema = z.object({
  /** Stable within a run: `criterion.max_u_factor`, `wind.zone4.girtSpacing`, `joints.2`, `thermal.run`. */
  id: z.string(),
  source: z.enum(['criteria', 'module']).describe('A row of the code table, or a module’s own verdict'),
  /** The criterion type (criteria) or the module check's key. */
  criterion: z.string(),
  label: z.string(),
  required: checkValueSchema.describe('The limit, SI (null when there is none to show)'),
  provided: checkValueSchema.describe('What the assembly achieves, SI (null when not evaluated)'),
  unit: z.string().describe('SI unit of required/provided/margin'),
  direction: z.enum(['max', 'min', 'required']).nullable(),
  margin: z
    .number()
    .nullable()
    .describe('Signed, in the criterion’s direction: ≥ 0 meets, < 0 short by |margin| (SI unit)'),
  marginRatio: z.number().nullable().describe('margin / |required|, dimensionless (null when required is 0)'),
  status: checkStatusSchema,
  reason: storedMessageSchema
    .nullable()
    .describe(
      'Why not evaluated, what governs, what was compared: a message (`{ code, path, values }`) worded by the client (plain words in runs stored before); null when there is nothing to add',
    ),
  module: z.string(),
  traceStepIds: z.array(z.string()),
  row: z.object({ climateZone: criteriaZoneSchema, wallCategory: wallCategorySchema }).optional(),
  method: checkMethodSchema.optional(),
});
export type Check = z.infer<typeof checkSchema>;

export const metricSchema = z.object({
  value: z.union([z.number(), z.boolean()]),
  unit: z.string(),
  traceStepIds: z.array(z.string()),
  /** What was counted or read: a message (plain words in runs stored before). */
  note: z.union([metricNoteSchema, z.string()]).optional(),
  method: checkMethodSchema.optional(),
});
export type Metric = z.infer<typeof metricSchema>;
export const metricOutcomeSchema = z.union([
  metricSchema,
  z.object({
    value: z.null(),
    reason: storedMessageSchema.describe('Why there is no value (words in older runs)'),
  }),
]);
export type MetricOutcome = z.infer<typeof metricOutcomeSchema>;

export const moduleOutcomeSchema = z.object({
  id: z.string(),
  label: z.string(),
  status: z.enum(['ran', 'missing', 'error']),
  /** What is missing to build the module's input (status missing): messages; plain words in older runs. */
  missing: z.array(storedMessageSchema),
  /** The calculation's refusal (status error): a `calc_refused` message; "field: reason" in older runs. */
  error: storedMessageSchema.nullable(),
  /** The module's full result with its trace (status ran). */
  result: z.unknown(),
});
export type ModuleOutcome = z.infer<typeof moduleOutcomeSchema>;

export const checkReportSchema = z.object({
  climateZone: climateZoneSchema,
  wallCategory: wallCategorySchema,
  /** Rows of the criteria set that apply to this zone and category. */
  matchedRows: z.number().int(),
  modules: z.array(moduleOutcomeSchema),
  metrics: z.record(z.string(), metricOutcomeSchema),
  checks: z.array(checkSchema),
  verdict: verdictSchema,
  /** The verdict of the code-table rows alone. */
  criteriaVerdict: verdictSchema,
  /** The verdict of the modules' own checks alone (wind spacing, joints, surface humidity). */
  moduleVerdict: verdictSchema,
  /** Every trace step a check or metric refers to, in order of first reference. */
  steps: z.array(traceStepSchema),
  /** The modules' warnings (messages; words in runs stored before) and the fixed cautions (words). */
  cautions: z.array(storedMessageSchema),
});
export type CheckReport = z.infer<typeof checkReportSchema>;

/** fail if any check fails; incomplete if any is not evaluated and none fails; pass otherwise (and for none). */
export function verdictOf(checks: readonly Pick<Check, 'status'>[]): Verdict {
  if (checks.some((c) => c.status === 'fail')) return 'fail';
  if (checks.some((c) => c.status === 'not_evaluated')) return 'incomplete';
  return 'pass';
}
