import { CRITERION_TYPES, type CriterionSpec } from '@shared/checks/criteria';
import type { Check, CheckStatus, Verdict } from '@shared/checks/report';
import { FOOT, INCH, type UnitSystem } from '@shared/units';
import { formatNumber } from './quantities';

/*
 * How the figures of code tables and check runs read on screen: SI values in, the person's unit system
 * out, and pass / fail in words and glyphs as well as colour.
 */

const specByUnit = new Map<string, CriterionSpec>(Object.values(CRITERION_TYPES).map((s) => [s.unit, s]));

const minus = (text: string) => text.replace(/^-/, '\u2212');

/** An SI value with its unit in the person's system: "0.307 W/(m²·K)", "0.054 Btu/(h·ft²·°F)", "77.3 %". */
export function formatSiValue(value: number | boolean | null, siUnit: string, system: UnitSystem): string {
  if (value === null) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (!Number.isFinite(value)) return '—';
  if (siUnit === 'L/x') return `L/${formatNumber(value, 0)}`;
  if (siUnit === 'm') {
    if (system === 'IP')
      return Math.abs(value) < 0.3
        ? `${minus(formatNumber(value / INCH, 2))}\u202fin`
        : `${minus(formatNumber(value / FOOT, 2))}\u202fft`;
    return Math.abs(value) < 0.1
      ? `${minus(formatNumber(value * 1000, 1))}\u202fmm`
      : `${minus(formatNumber(value, 3))}\u202fm`;
  }
  if (siUnit === '1' || siUnit === '') return minus(formatNumber(value, 3));
  const spec = specByUnit.get(siUnit);
  if (!spec) return `${minus(formatNumber(value, 3))}\u202f${siUnit}`;
  const d = spec.display[system];
  const shown = formatNumber(value / d.toSI, spec.decimals[system]);
  return d.symbol ? `${minus(shown)}\u202f${d.symbol}` : minus(shown);
}

export const STATUS_WORD: Record<CheckStatus, { glyph: string; word: string; cls: string }> = {
  pass: { glyph: '✓', word: 'meets', cls: 'text-meets' },
  fail: { glyph: '✕', word: 'fails', cls: 'text-caution' },
  not_evaluated: { glyph: '?', word: 'not evaluated', cls: 'text-warning' },
};

/** "meets — margin 12 %", "fails — short by 0.008 W/(m²·K)", "not evaluated — the project’s … is missing". */
export function checkResultText(c: Check, system: UnitSystem): string {
  const word = STATUS_WORD[c.status].word;
  if (c.status === 'not_evaluated') return `${word} — ${c.reason}`;
  if (c.margin === null) return word;
  if (c.status === 'fail') return `${word} — short by ${formatSiValue(Math.abs(c.margin), c.unit, system)}`;
  if (c.marginRatio !== null) return `${word} — margin ${formatNumber(c.marginRatio * 100, 0)}\u00a0%`;
  return `${word} — margin ${formatSiValue(c.margin, c.unit, system)}`;
}

export const VERDICT_TEXT: Record<Verdict, { glyph: string; word: string; sentence: string; cls: string }> = {
  pass: { glyph: '✓', word: 'Pass', sentence: 'every check is met', cls: 'text-meets border-meets' },
  fail: {
    glyph: '✕',
    word: 'Fail',
    sentence: 'at least one check fails',
    cls: 'text-caution border-caution',
  },
  incomplete: {
    glyph: '?',
    word: 'Incomplete',
    sentence: 'nothing fails, but some checks could not be evaluated',
    cls: 'text-warning border-warning',
  },
};
