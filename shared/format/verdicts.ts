import type { Check, CheckStatus, Verdict } from '../checks/report';
import type { UnitSystem } from '../units';
import { storedMessageText } from './messages';
import { formatterFor } from './quantities';

/*
 * Pass and fail in words, the same on the checks page and the compliance sheet: each status has a glyph and a
 * word, each verdict a word and a sentence; the result of a check reads "meets — margin 12 %",
 * "fails — short by 0.008 W/(m²·K)" or "not evaluated — <why>".
 */

export const STATUS_WORDS: Record<CheckStatus, { glyph: string; word: string }> = {
  pass: { glyph: '✓', word: 'meets' },
  fail: { glyph: '✕', word: 'fails' },
  not_evaluated: { glyph: '?', word: 'not evaluated' },
};

export const VERDICT_WORDS: Record<Verdict, { glyph: string; word: string; sentence: string }> = {
  pass: { glyph: '✓', word: 'Pass', sentence: 'every check is met' },
  fail: { glyph: '✕', word: 'Fail', sentence: 'at least one check fails' },
  incomplete: {
    glyph: '?',
    word: 'Incomplete',
    sentence: 'nothing fails, but some checks could not be evaluated',
  },
};

/** "meets — margin 12 %" (or the margin in the check's unit when there is no ratio), "fails — short by …". */
export function checkResultText(c: Check, system: UnitSystem): string {
  const f = formatterFor(system);
  const word = STATUS_WORDS[c.status].word;
  if (c.status === 'not_evaluated') return `${word} — ${storedMessageText(c.reason, system)}`;
  if (c.margin === null) return word;
  if (c.status === 'fail') return `${word} — short by ${f.siValue(Math.abs(c.margin), c.unit)}`;
  if (c.marginRatio !== null) return `${word} — margin ${f.percent(c.marginRatio)}`;
  return `${word} — margin ${f.siValue(c.margin, c.unit)}`;
}

/**
 * The figures of one check as the checks page and the sheet print them: required (with ≤ / ≥), provided, result,
 * and `reason` — what governs or was compared, in words ('' for a check not evaluated: its result says why).
 */
export function checkFigures(
  c: Check,
  system: UnitSystem,
): { required: string; provided: string; result: string; reason: string } {
  const f = formatterFor(system);
  const dir = c.direction === 'max' ? '≤ ' : c.direction === 'min' ? '≥ ' : '';
  return {
    required: c.required === null ? '—' : `${dir}${f.siValue(c.required, c.unit)}`,
    provided: f.siValue(c.provided, c.unit),
    result: checkResultText(c, system),
    reason: c.status === 'not_evaluated' ? '' : storedMessageText(c.reason, system),
  };
}
