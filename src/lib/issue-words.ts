import { sentence } from '@shared/format';

/*
 * Why zod did not accept a value, in a practitioner's words — the one wording on every screen (build-up,
 * joints, takeoff, attachment, project and climate forms, library entries). A range keeps its SI bound until
 * a box words it in the person's units; a message the schema itself states (a refinement) is kept as written.
 */

/** The subset of a zod 4 issue read here. */
export interface ZodIssueLike {
  code?: string;
  path?: readonly PropertyKey[];
  input?: unknown;
  expected?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  origin?: string;
  message?: string;
  errors?: ZodIssueLike[][];
}

/** An issue as words, or as a range whose SI bound is worded later in the unit of the box that shows it. */
export type IssueReason =
  | { kind: 'text'; text: string }
  | { kind: 'bound'; side: 'min' | 'max'; bound: number; inclusive: boolean };

const text = (t: string): IssueReason => ({ kind: 'text', text: t });

export function issueReason(issue: ZodIssueLike): IssueReason {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'int') return text('Enter a whole number.');
      // A number box holds NaN while it is empty or unreadable.
      return issue.expected === 'number' || typeof issue.input === 'number'
        ? text('Enter a number.')
        : text('Enter a value.');
    case 'too_small':
      if (issue.origin === 'string') return text('Enter a value.');
      if (issue.origin === 'array')
        return text(`Add at least ${Number(issue.minimum) === 1 ? 'one' : String(issue.minimum)}.`);
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
      return text(issue.message ? sentence(issue.message) : 'Not accepted.');
  }
}

/** A reason in words; `show` words an SI bound in the person's units with its unit ("1968.5 ft"). */
export function reasonWords(r: IssueReason, show: (si: number) => string = String): string {
  if (r.kind === 'text') return r.text;
  if (r.side === 'min') {
    if (r.bound === 0) return r.inclusive ? 'Must be 0 or more.' : 'Must be more than 0.';
    return r.inclusive ? `Must be at least ${show(r.bound)}.` : `Must be more than ${show(r.bound)}.`;
  }
  return r.inclusive ? `Must be at most ${show(r.bound)}.` : `Must be less than ${show(r.bound)}.`;
}

/** One issue in words. */
export const issueWords = (issue: ZodIssueLike, show?: (si: number) => string) =>
  reasonWords(issueReason(issue), show);

/** Not the branch meant: the value is not of its type at all, or of another `kind`. */
const offBranch = (i: ZodIssueLike) =>
  ((i.path?.length ?? 0) === 0 && i.code === 'invalid_type') ||
  (i.path?.length === 1 && i.path[0] === 'kind');

/** How badly a union branch fits: an issue saying it is another branch weighs far more than inner ones. */
const misfit = (branch: readonly ZodIssueLike[]) => branch.reduce((n, i) => n + (offBranch(i) ? 100 : 1), 0);

/**
 * Every issue under `base` as (dotted path, issue), the first per path; of a union only the branch that fits
 * best (a union of kinds reports every branch).
 */
export function issuesByPath(
  issues: readonly ZodIssueLike[],
  base: readonly PropertyKey[] = [],
  out = new Map<string, ZodIssueLike>(),
): Map<string, ZodIssueLike> {
  for (const issue of issues) {
    const path = [...base, ...(issue.path ?? [])];
    if (issue.code === 'invalid_union' && issue.errors && issue.errors.length > 0) {
      const best = issue.errors.reduce((a, b) => (misfit(b) < misfit(a) ? b : a));
      issuesByPath(best, path, out);
      continue;
    }
    const key = path.map(String).join('.');
    if (!out.has(key)) out.set(key, issue);
  }
  return out;
}

/** In a list away from its box a range has no unit to be worded in: the schema's own reason (SI) then. */
function lineWords(issue: ZodIssueLike): string {
  const r = issueReason(issue);
  const own = issue.message && !/^(Too (small|big)|Invalid)/.test(issue.message);
  return r.kind === 'bound' && own ? sentence(issue.message as string) : reasonWords(r);
}

/** A whole refusal as lines "where: why", for a notice that lists them (`where` of the value itself: `whole`). */
export function issueLines(issues: readonly ZodIssueLike[], whole = 'entry'): string[] {
  return [...issuesByPath(issues)].map(([path, issue]) => `${path || whole}: ${lineWords(issue)}`);
}

const WORDED = new Set(['invalid_type', 'too_small', 'too_big', 'invalid_value', 'not_multiple_of']);

/**
 * A zod error map for a form (`zodResolver(schema, { error })`) in these words; `show` gives the wording of a
 * field's bound in the person's units (undefined: as a plain number). Issues it does not word (a format, a
 * refinement) keep the schema's own message, as do messages written into the schema, as zod intends.
 */
export function issueErrorMap(show: (issue: ZodIssueLike) => ((si: number) => string) | undefined) {
  return (issue: ZodIssueLike): string | undefined =>
    WORDED.has(issue.code ?? '') ? issueWords(issue, show(issue)) : undefined;
}
