import { CalcInputError } from '@shared/calc/errors';
import { type ThermalResult, thermalInputSchema } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { sentence } from '@shared/format';
import type { UnitSystem } from '@shared/units';
import { issueErrorMap, issuesByPath, issueWords, type ZodIssueLike } from '../../lib/issue-words';
import { type Measure, measureUnit, toShown } from './units';

/** The DOM id of the control (or the block) that shows a form path's error (one rule for every page). */
export { fieldDomId } from '../../lib/field-problems';

/**
 * Runs the shared engine in the browser on what the form holds right now. Either a result, or the reasons
 * it cannot be computed keyed by the form path (`thermal.layers.6.sections`) so each reason is shown next
 * to its field — never a NaN.
 */
export interface Evaluation {
  result: ThermalResult | null;
  /** Form path → reason, in a practitioner's words. */
  errors: Record<string, string>;
}

/** Which measure a field holds, by the last segment of its path (to word range errors in the person's units). */
export const FIELD_MEASURES: Record<string, Measure> = {
  thickness: 'thickness',
  conductivity: 'conductivity',
  resistance: 'resistance',
  fraction: 'fraction',
  flangeWidth: 'spacing',
  spacing: 'spacing',
  spacingHorizontal: 'spacing',
  spacingVertical: 'spacing',
  chi: 'chi',
  psi: 'psi',
  countPerArea: 'countPerArea',
  lengthPerArea: 'lengthPerArea',
  diameter: 'diameter',
  recessDepth: 'thickness',
  emissivityFactor: 'emittance',
};

/** A bound in the person's unit of the field's measure: four significant figures, never a rounded 0. */
function showBound(key: string, system: UnitSystem) {
  const m = FIELD_MEASURES[key];
  return (si: number) => {
    if (!m) return String(si);
    const shown = Number(toShown(si, m, system).toPrecision(4));
    const unit = measureUnit(m, system);
    return unit === '–' ? String(shown) : `${shown}\u202f${unit}`;
  };
}

/** `thermal` as the form holds it (numbers may be NaN while a box is empty or unreadable). */
export function evaluateThermal(thermal: unknown, system: UnitSystem): Evaluation {
  const parsed = thermalInputSchema.safeParse(thermal);
  if (!parsed.success) {
    const errors: Record<string, string> = {};
    for (const [path, issue] of issuesByPath(parsed.error.issues, ['thermal']))
      errors[path] = issueWords(issue, showBound(path.slice(path.lastIndexOf('.') + 1), system));
    return { result: null, errors };
  }
  try {
    return { result: calculateThermal(parsed.data), errors: {} };
  } catch (e) {
    if (e instanceof CalcInputError)
      return { result: null, errors: { [`thermal.${e.field}`]: sentence(e.reason) } };
    return { result: null, errors: { thermal: e instanceof Error ? e.message : 'The calculation failed.' } };
  }
}

/**
 * Server field paths to form paths: a 422 names the engine's path (`layers.2.sections`, or with the
 * `thermal.` prefix), a 400 on update names the body path (`input.thermal.…`).
 */
export function toFormPath(serverPath: string): string {
  const p = serverPath.startsWith('input.') ? serverPath.slice('input.'.length) : serverPath;
  return /^(layers|bridges|heatFlow)(\.|$)/.test(p) ? `thermal.${p}` : p;
}

/**
 * A zod error map for `zodResolver(assemblyInputSchema, { error })`: the same plain words as the live
 * check. Messages written into the shared schema (e.g. "an assembly needs a name") take precedence.
 */
export function assemblyErrorMap(system: UnitSystem) {
  const words = issueErrorMap((issue) =>
    showBound(String(issue.path?.[issue.path.length - 1] ?? ''), system),
  );
  return (issue: ZodIssueLike): string | undefined =>
    issue.code === 'invalid_union' ? 'Check the values of this attachment.' : words(issue);
}
