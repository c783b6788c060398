import { SUBMITTAL_STATUSES, type SubmittalStatus } from '@shared/schemas/submittals';

/*
 * What a page reads from its address besides the path's names, read the same way by its loader
 * (src/app/loaders.ts) and by the page, so that both ask for the same query.
 */

/** `?status=` of the submittals list; null (all) for anything else. */
export function submittalStatusOf(search: URLSearchParams): SubmittalStatus | null {
  const s = search.get('status');
  return (SUBMITTAL_STATUSES as readonly (string | null)[]).includes(s) ? (s as SubmittalStatus) : null;
}

/** `?from=&to=` of a code table's changes: two version numbers, or null when either is not one. */
export function diffVersionsOf(search: URLSearchParams): { from: number; to: number } | null {
  const from = Number(search.get('from'));
  const to = Number(search.get('to'));
  return Number.isInteger(from) && Number.isInteger(to) && from > 0 && to > 0 ? { from, to } : null;
}

/** `:revision` of an assembly's older revision: a whole number from 1, or null. */
export function revisionOf(param: string | undefined): number | null {
  const n = Number(param);
  return Number.isInteger(n) && n > 0 ? n : null;
}
