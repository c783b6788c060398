import { CalcInputError } from '@shared/calc/errors';
import { sentence } from '@shared/format';
import type { UnitSystem } from '@shared/units';
import type { InputMeasure } from './input-measure';
import { formatSheetBound, type SheetMeasure } from './sheet-units';

/*
 * Why a value cannot be used, keyed by its dotted path (`joints.0.designWidth`, `takeoff.walls.1.length`).
 * A range problem keeps its SI bound, so the box that shows it words the bound in the person's units;
 * an engine reason (a CalcInputError) is shown as the engine wrote it.
 */
export type FieldProblem =
  | { kind: 'text'; text: string }
  | { kind: 'bound'; side: 'min' | 'max'; bound: number; inclusive: boolean };

export type FieldProblems = Record<string, FieldProblem>;

/** The subset of a zod 4 issue read here. */
export interface ZodIssueLike {
  code?: string;
  path?: PropertyKey[];
  input?: unknown;
  expected?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  origin?: string;
  message?: string;
  errors?: ZodIssueLike[][];
}

const text = (t: string): FieldProblem => ({ kind: 'text', text: t });

function problemOf(issue: ZodIssueLike): FieldProblem {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'int') return text('Enter a whole number.');
      return typeof issue.input === 'number' || issue.input == null
        ? text('Enter a number.')
        : text('Enter a value.');
    case 'too_small':
      if (issue.origin === 'string') return text('Enter a name.');
      if (issue.origin === 'array') return text(`Add at least ${String(issue.minimum)}.`);
      return { kind: 'bound', side: 'min', bound: Number(issue.minimum), inclusive: issue.inclusive ?? true };
    case 'too_big':
      if (issue.origin === 'string') return text(`Use at most ${String(issue.maximum)} characters.`);
      if (issue.origin === 'array') return text(`At most ${String(issue.maximum)}.`);
      return { kind: 'bound', side: 'max', bound: Number(issue.maximum), inclusive: issue.inclusive ?? true };
    case 'invalid_value':
      return text('Choose one of the listed options.');
    case 'not_multiple_of':
      return text('Enter a whole number.');
    default:
      return text(issue.message ?? 'Not accepted.');
  }
}

/** How badly a union branch fits: issues about the value as a whole weigh far more than inner ones. */
const misfit = (branch: ZodIssueLike[]) =>
  branch.reduce((n, i) => n + ((i.path?.length ?? 0) === 0 && i.code === 'invalid_type' ? 100 : 1), 0);

/** Flatten zod issues under `base` into path → problem; for a union keep the branch that fits best. */
export function collectIssues(
  issues: readonly ZodIssueLike[],
  base: readonly PropertyKey[],
  out: FieldProblems,
) {
  for (const issue of issues) {
    const path = [...base, ...(issue.path ?? [])];
    if (issue.code === 'invalid_union' && issue.errors && issue.errors.length > 0) {
      const best = issue.errors.reduce((a, b) => (misfit(b) < misfit(a) ? b : a));
      collectIssues(best, path, out);
      continue;
    }
    const key = path.map(String).join('.');
    if (!(key in out)) out[key] = problemOf(issue);
  }
}

/** A sentence: capital first letter, closing full stop, raw floats readable (shared/format). */
export { sentence };

/** An engine refusal as a problem at its path (prefixed, e.g. `takeoff.`); rethrows anything else. */
export function calcProblem(e: unknown, prefix = ''): [string, FieldProblem] {
  if (e instanceof CalcInputError) return [`${prefix}${e.field}`, text(sentence(e.reason))];
  return [
    prefix.replace(/\.$/, '') || 'calculation',
    text(e instanceof Error ? e.message : 'The calculation failed.'),
  ];
}

/** The problem in words; a bound is worded in the box's measure and the person's units. */
export function problemText(
  p: FieldProblem,
  measure: SheetMeasure | InputMeasure | undefined,
  system: UnitSystem,
): string {
  if (p.kind === 'text') return p.text;
  const bound =
    typeof measure === 'string'
      ? formatSheetBound(p.bound, measure, system)
      : (measure?.bound?.(p.bound, system) ?? String(p.bound));
  if (p.side === 'min') {
    if (p.bound === 0) return p.inclusive ? 'Must be 0 or more.' : 'Must be more than 0.';
    return p.inclusive ? `Must be at least ${bound}.` : `Must be more than ${bound}.`;
  }
  return p.inclusive ? `Must be at most ${bound}.` : `Must be less than ${bound}.`;
}

/** The DOM id of the box (or block) that shows a path's problem. */
export const fieldDomId = (path: string) => `f-${path.replace(/\./g, '-')}`;
