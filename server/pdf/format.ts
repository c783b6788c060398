import type { Check, Verdict } from '@shared/checks/report';
import {
  type QuantityFormatter,
  quantityFormatter,
  STATUS_WORDS,
  VERDICT_WORDS as WORDS,
} from '@shared/format';

/*
 * The sheet's figures are worded by shared/format — the same functions as the screens — so a figure of a stored
 * run prints the same value and unit on the checks page and on the sheet (tests/verification/
 * screen-and-sheet.verification.test.ts compares them on the demo assemblies). Dates are the sheet's own (UTC).
 */

export { num } from '@shared/format';

export type Formatter = QuantityFormatter;
export const formatter = quantityFormatter;

export const STATUS_WORD = (status: Check['status']): string => STATUS_WORDS[status].word;

/** The verdict as the sheet prints it: the word in capitals ("PASS"), the same sentence as the screen. */
export const VERDICT_WORDS = Object.fromEntries(
  Object.entries(WORDS).map(([k, v]) => [k, { word: v.word.toUpperCase(), sentence: v.sentence }]),
) as Record<Verdict, { word: string; sentence: string }>;

export const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "2 Dec 2026" in UTC — the sheet prints the same date wherever it is produced. */
export function sheetDate(iso: string): string {
  const d = new Date(iso);
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

export function sheetDateTime(iso: string): string {
  const d = new Date(iso);
  const hh = String(d.getUTCHours()).padStart(2, '0');
  const mm = String(d.getUTCMinutes()).padStart(2, '0');
  return `${sheetDate(iso)}, ${hh}:${mm} UTC`;
}
