import { z } from 'zod';

/**
 * One step of a calculation as it is shown to the reviewer ("show the work") and printed on the sheet:
 * what was computed, by which formula, from which clause of which source, from which inputs, to what value.
 * Every value is in SI; the client converts at the edge.
 */
export const traceInputSchema = z.object({ value: z.number(), unit: z.string() });
export const traceStepSchema = z.object({
  /** Stable identifier within one result, e.g. `thermal.R_T.upper`. */
  id: z.string(),
  /** What a practitioner calls it: "Upper limit of total resistance R′T". */
  label: z.string(),
  /** The formula as plain text with the symbols of the source, e.g. `1/R′T = Σ f_j / R_Tj`. */
  formula: z.string(),
  /** Standard or handbook, edition, clause/table/equation. */
  source: z.string(),
  inputs: z.record(z.string(), traceInputSchema),
  value: z.number(),
  unit: z.string(),
  /** Optional caution or note tied to this step (method limits, scope exclusions). */
  note: z.string().optional(),
});
export type TraceStep = z.infer<typeof traceStepSchema>;
export type TraceInput = z.infer<typeof traceInputSchema>;

/** Build a trace step; small helper so that calculation code reads like the sheet. */
export function step(
  id: string,
  label: string,
  formula: string,
  source: string,
  inputs: Record<string, TraceInput>,
  value: number,
  unit: string,
  note?: string,
): TraceStep {
  return note === undefined
    ? { id, label, formula, source, inputs, value, unit }
    : { id, label, formula, source, inputs, value, unit, note };
}

/** Shorthand for a trace input: `v(0.13, 'm²·K/W')`. */
export const v = (value: number, unit: string): TraceInput => ({ value, unit });

/** Version of the shared calculation engine; stored with every result and printed on every sheet. */
export const ENGINE_VERSION = '0.6.0';

/**
 * The same result without its trace steps: every `trace` member, at any depth (a joint schedule has one per
 * joint, the wind check one per part), left out; everything else kept as it is. What the public calculation
 * routes answer unless `?trace=true` asks for the steps (D-029).
 */
export function withoutTrace<T>(result: T): T {
  if (Array.isArray(result)) return result.map(withoutTrace) as T;
  if (result === null || typeof result !== 'object') return result;
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(result)) if (key !== 'trace') out[key] = withoutTrace(value);
  return out as T;
}
