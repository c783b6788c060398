import type { CheckStatus, Verdict } from '@shared/checks/report';
import { STATUS_WORDS, VERDICT_WORDS } from '@shared/format';

/*
 * How the figures of code tables and check runs read on screen: the words and figures come from shared/format
 * (the compliance sheet prints the same); this file adds only the screen's colours.
 */

export { checkFigures, checkResultText, formatSiValue } from '@shared/format';

/** Each entry of a word table with the screen's colour class of its key. */
function coloured<K extends string, W>(words: Record<K, W>, cls: Record<K, string>) {
  const entries = (Object.keys(words) as K[]).map((k) => [k, { ...words[k], cls: cls[k] }]);
  return Object.fromEntries(entries) as Record<K, W & { cls: string }>;
}

export const STATUS_WORD = coloured(STATUS_WORDS, {
  pass: 'text-meets',
  fail: 'text-caution',
  not_evaluated: 'text-warning',
} satisfies Record<CheckStatus, string>);

export const VERDICT_TEXT = coloured(VERDICT_WORDS, {
  pass: 'text-meets border-meets',
  fail: 'text-caution border-caution',
  incomplete: 'text-warning border-warning',
} satisfies Record<Verdict, string>);
