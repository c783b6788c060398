import { type UnitSystem, unitsOf } from '@shared/units';
import { trimmedFixed } from '@shared/units/rounding';
import type { InputMeasure, ParsedEntry } from '../../lib/input-measure';

/**
 * The quantities of the wind page and how each crosses the SI/IP edge. Stored values are SI (m/s, m, Pa, N, m²);
 * only what is shown and typed is converted. `factor` is the SI value of one shown unit: shown = SI / factor.
 * Longer lengths (heights, spans, girt spacing, end-zone width) read in m / ft; shorter ones (clip spacing,
 * module width) in mm / in.
 */
export type WindMeasure =
  | 'speed'
  | 'length'
  | 'span'
  | 'spacing'
  | 'pressure'
  | 'force'
  | 'area'
  | 'angle'
  | 'ratio'
  | 'count';

interface Spec {
  unit: Record<UnitSystem, string>;
  factor: Record<UnitSystem, number>;
  /** Decimals shown in results (trailing zeros kept, tabular). */
  decimals: Record<UnitSystem, number>;
  /** Decimals shown in an editable box (trailing zeros trimmed). */
  inputDecimals: Record<UnitSystem, number>;
}

export const WIND_MEASURES: Record<WindMeasure, Spec> = {
  speed: {
    ...unitsOf('speed'),
    decimals: { SI: 1, IP: 0 },
    inputDecimals: { SI: 2, IP: 1 },
  },
  length: {
    ...unitsOf('length'),
    decimals: { SI: 2, IP: 1 },
    inputDecimals: { SI: 3, IP: 2 },
  },
  span: {
    ...unitsOf('length'),
    decimals: { SI: 3, IP: 2 },
    inputDecimals: { SI: 3, IP: 3 },
  },
  spacing: {
    ...unitsOf('shortLength'),
    decimals: { SI: 0, IP: 1 },
    inputDecimals: { SI: 1, IP: 2 },
  },
  pressure: {
    ...unitsOf('pressure', 'kPa'),
    decimals: { SI: 3, IP: 1 },
    inputDecimals: { SI: 4, IP: 2 },
  },
  force: {
    ...unitsOf('force'),
    decimals: { SI: 0, IP: 1 },
    inputDecimals: { SI: 1, IP: 2 },
  },
  area: {
    ...unitsOf('area'),
    decimals: { SI: 3, IP: 2 },
    inputDecimals: { SI: 3, IP: 2 },
  },
  angle: {
    unit: { SI: '°', IP: '°' },
    factor: { SI: 1, IP: 1 },
    decimals: { SI: 1, IP: 1 },
    inputDecimals: { SI: 2, IP: 2 },
  },
  ratio: {
    unit: { SI: '', IP: '' },
    factor: { SI: 1, IP: 1 },
    decimals: { SI: 3, IP: 3 },
    inputDecimals: { SI: 3, IP: 3 },
  },
  count: {
    unit: { SI: '', IP: '' },
    factor: { SI: 1, IP: 1 },
    decimals: { SI: 0, IP: 0 },
    inputDecimals: { SI: 0, IP: 0 },
  },
};

export const windUnit = (m: WindMeasure, system: UnitSystem) => WIND_MEASURES[m].unit[system];
export const toShownWind = (si: number, m: WindMeasure, system: UnitSystem) =>
  si / WIND_MEASURES[m].factor[system];

const minus = (text: string) => text.replace(/^-/, '\u2212');

/** Trim trailing zeros; "" for a non-number (never "NaN"). */
export function trimNumber(value: number, decimals: number): string {
  return trimmedFixed(value, decimals);
}

/** The number as it goes into an editable box. */
export function windInputText(si: number | null | undefined, m: WindMeasure, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '';
  return trimNumber(toShownWind(si, m, system), WIND_MEASURES[m].inputDecimals[system]);
}

export type WindRounding = 'nearest' | 'down';

/**
 * The number as it is read in a result: fixed decimals (columns line up), typographic minus, narrow space, unit;
 * "—" when there is no number. `down` rounds toward zero — for maximum spacings, so a shown maximum is never
 * more than the computed one.
 */
export function formatWind(
  si: number | null | undefined,
  m: WindMeasure,
  system: UnitSystem,
  {
    decimals,
    rounding = 'nearest',
    unit = true,
  }: { decimals?: number; rounding?: WindRounding; unit?: boolean } = {},
): string {
  if (si == null || !Number.isFinite(si)) return '—';
  const d = decimals ?? WIND_MEASURES[m].decimals[system];
  let shown = toShownWind(si, m, system);
  if (rounding === 'down') {
    const k = 10 ** d;
    // A hair of tolerance so that 1.2 m shown in m stays 1.200, not 1.199.
    shown = Math.trunc(shown * k + (shown >= 0 ? 1e-9 : -1e-9)) / k;
  }
  const text = minus(shown.toFixed(d) === `-${(0).toFixed(d)}` ? (0).toFixed(d) : shown.toFixed(d));
  const u = WIND_MEASURES[m].unit[system];
  if (!unit || u === '') return text;
  return u === '°' ? `${text}°` : `${text}\u202f${u}`;
}

export type ParsedWind = ParsedEntry;

/** Read what was typed: digits, one point, optional sign (ASCII or typographic); nothing else is guessed. */
export function parseWind(text: string, m: WindMeasure, system: UnitSystem): ParsedWind {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return { kind: 'invalid' };
  const si = Number(t) * WIND_MEASURES[m].factor[system];
  return Number.isFinite(si) ? { kind: 'ok', si } : { kind: 'invalid' };
}

/** A wind measure as a number box (`QuantityInput`) shows and reads it. */
export const windInput = (m: WindMeasure): InputMeasure => ({
  unit: (system) => windUnit(m, system),
  toText: (si, system) => windInputText(si, m, system),
  parse: (text, system) => parseWind(text, m, system),
});

/** A ratio 0–∞ as a whole percentage: "68 %". */
export const formatPercent = (ratio: number | null | undefined) =>
  ratio == null || !Number.isFinite(ratio) ? '—' : `${Math.round(ratio * 100)}\u202f%`;
