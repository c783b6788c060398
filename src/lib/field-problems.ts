import { CalcInputError } from '@shared/calc/errors';
import { sentence } from '@shared/format';
import { formatPageBound, type PageMeasure } from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';
import type { InputMeasure } from './input-measure';
import { type IssueReason, issueReason, issuesByPath, reasonWords, type ZodIssueLike } from './issue-words';

/*
 * Why a value cannot be used, keyed by its dotted path (`joints.0.designWidth`, `takeoff.walls.1.length`).
 * A range problem keeps its SI bound, so the box that shows it words the bound in the person's units;
 * an engine reason (a CalcInputError) is shown as the engine wrote it.
 */
export type FieldProblem = IssueReason;

export type FieldProblems = Record<string, FieldProblem>;

export type { ZodIssueLike };

/** Zod issues under `base` into path → problem (issue-words.ts: the first per path, the union branch meant). */
export function collectIssues(
  issues: readonly ZodIssueLike[],
  base: readonly PropertyKey[],
  out: FieldProblems,
) {
  for (const [key, issue] of issuesByPath(issues, base)) if (!(key in out)) out[key] = issueReason(issue);
}

const text = (t: string): FieldProblem => ({ kind: 'text', text: t });

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
  measure: PageMeasure | InputMeasure | undefined,
  system: UnitSystem,
): string {
  if (p.kind === 'text') return p.text;
  return reasonWords(p, (si) =>
    typeof measure === 'string'
      ? formatPageBound(si, measure, system)
      : (measure?.bound?.(si, system) ?? String(si)),
  );
}

/** The DOM id of the box (or block) that shows a path's problem. */
export const fieldDomId = (path: string) => `f-${path.replace(/\./g, '-')}`;

/** Moves to the box of a field path and focuses it; false when the page has no such box. */
export function focusField(path: string): boolean {
  const el = document.getElementById(fieldDomId(path));
  if (!el) return false;
  el.scrollIntoView({ block: 'center' });
  el.focus?.();
  return true;
}
