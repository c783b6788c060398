import type { CheckStatus, Verdict } from '@shared/checks/report';
import { STATUS_WORDS, VERDICT_WORDS } from '@shared/format';

/*
 * How the figures of code tables and check runs read on screen: the words and figures come from shared/format
 * (the compliance sheet prints the same); this file adds only the screen's colours.
 */

export { checkFigures, checkResultText, formatSiValue } from '@shared/format';

const STATUS_CLASS: Record<CheckStatus, string> = {
  pass: 'text-meets',
  fail: 'text-caution',
  not_evaluated: 'text-warning',
};

export const STATUS_WORD = Object.fromEntries(
  (Object.keys(STATUS_WORDS) as CheckStatus[]).map((s) => [s, { ...STATUS_WORDS[s], cls: STATUS_CLASS[s] }]),
) as Record<CheckStatus, { glyph: string; word: string; cls: string }>;

const VERDICT_CLASS: Record<Verdict, string> = {
  pass: 'text-meets border-meets',
  fail: 'text-caution border-caution',
  incomplete: 'text-warning border-warning',
};

export const VERDICT_TEXT = Object.fromEntries(
  (Object.keys(VERDICT_WORDS) as Verdict[]).map((v) => [v, { ...VERDICT_WORDS[v], cls: VERDICT_CLASS[v] }]),
) as Record<Verdict, { glyph: string; word: string; sentence: string; cls: string }>;
