import { CalcInputError } from '@shared/calc/errors';
import { type ThermalResult, thermalInputSchema } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import type { UnitSystem } from '@shared/units';
import { type Measure, measureUnit, toShown } from './units';

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

interface Issue {
  code?: string;
  path?: PropertyKey[];
  input?: unknown;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  origin?: string;
  message?: string;
  errors?: Issue[][];
}

function issueMessage(issue: Issue, key: string, system: UnitSystem): string {
  const m = FIELD_MEASURES[key];
  // Bounds can be tiny (0.000001 m): four significant figures in the person's unit, never a rounded 0.
  const bound = (b: number | bigint | undefined) => {
    const si = Number(b);
    if (!m) return String(si);
    const shown = Number(toShown(si, m, system).toPrecision(4));
    const unit = measureUnit(m, system);
    return unit === '–' ? String(shown) : `${shown}\u202f${unit}`;
  };
  switch (issue.code) {
    case 'invalid_type':
      return typeof issue.input === 'number' || issue.input === undefined || issue.input === null
        ? 'Enter a number.'
        : 'Enter a value.';
    case 'too_small':
      if (issue.origin === 'string') return 'Enter a name.';
      if (issue.origin === 'array') return key === 'layers' ? 'Add at least one layer.' : 'Add at least one.';
      if (Number(issue.minimum) === 0) return issue.inclusive ? 'Must be 0 or more.' : 'Must be more than 0.';
      return `Must be at least ${bound(issue.minimum)}.`;
    case 'too_big':
      if (issue.origin === 'string') return `Use at most ${String(issue.maximum)} characters.`;
      if (issue.origin === 'array') return `At most ${String(issue.maximum)}.`;
      return issue.inclusive
        ? `Must be at most ${bound(issue.maximum)}.`
        : `Must be less than ${bound(issue.maximum)}.`;
    case 'invalid_value':
      return 'Choose one of the listed options.';
    default:
      return issue.message ?? 'Not accepted.';
  }
}

/**
 * Flatten zod issues into path → message. A union (the attachment kinds) reports every branch; keep the
 * branch whose `kind` matched and that has the fewest complaints.
 */
function collect(
  issues: Issue[],
  base: PropertyKey[],
  system: UnitSystem,
  out: Record<string, string>,
): void {
  for (const issue of issues) {
    const path = [...base, ...(issue.path ?? [])];
    if (issue.code === 'invalid_union' && issue.errors && issue.errors.length > 0) {
      const branches = issue.errors.filter(
        (b) => !b.some((i) => i.path?.length === 1 && i.path[0] === 'kind') && b.length > 0,
      );
      const pool = branches.length > 0 ? branches : issue.errors;
      const best = pool.reduce((a, b) => (b.length < a.length ? b : a));
      collect(best, path, system, out);
      continue;
    }
    const key = path.map(String).join('.');
    if (!(key in out)) out[key] = issueMessage(issue, String(path[path.length - 1] ?? ''), system);
  }
}

/** `thermal` as the form holds it (numbers may be NaN while a box is empty or unreadable). */
export function evaluateThermal(thermal: unknown, system: UnitSystem): Evaluation {
  const parsed = thermalInputSchema.safeParse(thermal);
  if (!parsed.success) {
    const errors: Record<string, string> = {};
    collect(parsed.error.issues as Issue[], ['thermal'], system, errors);
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

/** Engine reasons carry raw floats ("got 0.5027093596059113"); six significant figures are plenty to read. */
const tidyNumbers = (t: string) => t.replace(/\d+\.\d{7,}/g, (x) => String(Number(Number(x).toPrecision(6))));

const sentence = (raw: string) => {
  const t = tidyNumbers(raw);
  const s = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
};

/**
 * Server field paths to form paths: a 422 names the engine's path (`layers.2.sections`, or with the
 * `thermal.` prefix), a 400 on update names the body path (`input.thermal.…`).
 */
export function toFormPath(serverPath: string): string {
  const p = serverPath.startsWith('input.') ? serverPath.slice('input.'.length) : serverPath;
  return /^(layers|bridges|heatFlow)(\.|$)/.test(p) ? `thermal.${p}` : p;
}

/** The DOM id of the control (or the block) that shows a form path's error. */
export const fieldDomId = (path: string) => `f-${path.replace(/\./g, '-')}`;

/**
 * A zod error map for `zodResolver(assemblyInputSchema, { error })`: the same plain words as the live
 * check. Messages written into the shared schema (e.g. "an assembly needs a name") take precedence.
 */
export function assemblyErrorMap(system: UnitSystem) {
  return (issue: Issue): string | undefined => {
    const key = String(issue.path?.[issue.path.length - 1] ?? '');
    if (issue.code === 'invalid_union') return 'Check the values of this attachment.';
    return issueMessage(issue, key, system);
  };
}
