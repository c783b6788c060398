import {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  INCH,
  QUANTITIES,
  type UnitSystem,
  unitsOf,
} from '@shared/units';
import { fixed, trimmedFixed } from '@shared/units/rounding';
import type { InputMeasure, ParsedEntry } from './input-measure';

/*
 * The quantities of the joint schedule and the takeoff, and how each crosses the SI/IP edge. Stored values
 * are SI (m, °C, 1/K, m³, m², fractions 0–1); only what is shown and typed is converted. Small lengths in IP
 * are read and written in inches with fractions (¾, 1 1/4, 13/16) as the trade draws them.
 */
export type SheetMeasure =
  | 'joint'
  | 'spacing'
  | 'length'
  | 'temperature'
  | 'alpha'
  | 'percent'
  | 'volume'
  | 'area';

interface SheetMeasureSpec {
  unit: Record<UnitSystem, string>;
  /** Decimals shown in tables (and most decimals typed back into a box). */
  decimals: Record<UnitSystem, number>;
  /** Tables keep trailing zeros (figures line up); otherwise they are trimmed. */
  fixed?: boolean;
  /** Inch fractions are accepted and, where exact, written back (IP only). */
  fractions?: boolean;
  toShown: (si: number, system: UnitSystem) => number;
  fromShown: (shown: number, system: UnitSystem) => number;
}

const scaled = (si: number, ip: number) => ({
  toShown: (v: number, s: UnitSystem) => v / (s === 'IP' ? ip : si),
  fromShown: (v: number, s: UnitSystem) => v * (s === 'IP' ? ip : si),
});
/** A registry quantity's symbols and factors (`unitsOf`) as a sheet measure's unit and conversion. */
const registered = (q: Parameters<typeof unitsOf>[0]) => {
  const { unit, factor } = unitsOf(q);
  return { unit, ...scaled(factor.SI, factor.IP) };
};

export const SHEET_MEASURES: Record<SheetMeasure, SheetMeasureSpec> = {
  joint: { ...registered('shortLength'), decimals: { SI: 1, IP: 3 }, fixed: true, fractions: true },
  spacing: { ...registered('shortLength'), decimals: { SI: 0, IP: 2 }, fractions: true },
  length: { ...registered('length'), decimals: { SI: 3, IP: 2 } },
  temperature: {
    unit: { SI: '°C', IP: '°F' },
    decimals: { SI: 1, IP: 1 },
    toShown: (c, s) => (s === 'IP' ? celsiusToFahrenheit(c) : c),
    fromShown: (v, s) => (s === 'IP' ? fahrenheitToCelsius(v) : v),
  },
  // α per kelvin ⇄ per degree Fahrenheit: 1/°F = (5/9)/K, so 1 × 10⁻⁶/°F = 1.8 × 10⁻⁶/K.
  alpha: {
    unit: { SI: '10⁻⁶/K', IP: '10⁻⁶/°F' },
    decimals: { SI: 2, IP: 2 },
    ...scaled(1e-6, 1e-6 * QUANTITIES.expansion.IP.scale),
  },
  percent: { unit: { SI: '%', IP: '%' }, decimals: { SI: 1, IP: 1 }, ...scaled(0.01, 0.01) },
  volume: { ...registered('volume'), decimals: { SI: 2, IP: 2 }, fixed: true },
  area: { ...registered('area'), decimals: { SI: 2, IP: 1 }, fixed: true },
};

export const sheetUnit = (m: SheetMeasure, system: UnitSystem) => SHEET_MEASURES[m].unit[system];

const minus = (t: string) => t.replace(/^-/, '\u2212');

/** Round to `decimals` and trim trailing zeros; "" (never "NaN") for a non-number. */
function trim(value: number, decimals: number): string {
  return trimmedFixed(value, decimals);
}

function fixedText(value: number, decimals: number): string {
  return fixed(value, decimals);
}

// --------------------------------------------------------------------------------------- fractions

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** Inches as a trade fraction: 0.75 → "3/4", 1.25 → "1 1/4", 2 → "2". `denominator` sets the step. */
export function inchFraction(inches: number, denominator = 16, mode: 'nearest' | 'up' = 'nearest'): string {
  if (!Number.isFinite(inches)) return '';
  const sign = inches < 0 ? '-' : '';
  const a = Math.abs(inches);
  const n = mode === 'up' ? Math.ceil(a * denominator - 1e-9) : Math.round(a * denominator);
  const whole = Math.floor(n / denominator);
  const rest = n % denominator;
  if (rest === 0) return `${sign}${whole}`;
  const g = gcd(rest, denominator);
  const frac = `${rest / g}/${denominator / g}`;
  return `${sign}${whole > 0 ? `${whole} ` : ''}${frac}`;
}

/** The fraction when `inches` is a whole number of 64ths (to 1e-6 in), else null. */
function exactFraction(inches: number): string | null {
  const n = inches * 64;
  return Math.abs(n - Math.round(n)) < 64e-6 ? inchFraction(inches, 64) : null;
}

const VULGAR: Record<string, string> = {
  '¼': '1/4',
  '½': '1/2',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
  '⅙': '1/6',
  '⅓': '1/3',
  '⅔': '2/3',
};

/** Read "3/4", "1 1/4", "1-1/4", "1¼", ".75", "0.75" (an optional trailing ″, " or in); null otherwise. */
export function parseInches(text: string): number | null {
  let t = text.trim().replace(/\u2212/g, '-');
  t = t.replace(/(in\.?|["″])$/i, '').trim();
  t = t.replace(/(\d)?\s*([¼½¾⅛⅜⅝⅞⅙⅓⅔])/g, (_, d: string | undefined, v: string) =>
    d ? `${d} ${VULGAR[v]}` : (VULGAR[v] ?? v),
  );
  const sign = t.startsWith('-') ? -1 : 1;
  t = t.replace(/^[-+]/, '').trim();
  if (/^(\d+\.?\d*|\.\d+)$/.test(t)) return sign * Number(t);
  const m = /^(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)$/.exec(t);
  if (!m) return null;
  const whole = m[1] ? Number(m[1]) : 0;
  const num = Number(m[2]);
  const den = Number(m[3]);
  if (den === 0) return null;
  return sign * (whole + num / den);
}

// ------------------------------------------------------------------------------------ text ⇄ SI

/** The number as it goes into an editable box (exact inch fractions written as fractions). */
export function sheetInputText(si: number | null | undefined, m: SheetMeasure, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '';
  const spec = SHEET_MEASURES[m];
  const shown = spec.toShown(si, system);
  if (spec.fractions && system === 'IP') {
    const f = exactFraction(shown);
    if (f !== null && !/^-?\d+$/.test(f)) return f;
  }
  // A box holds a little more than a table shows, so a typed value survives a unit switch and back.
  return trim(shown, spec.decimals[system] + 1);
}

export type SheetParse = ParsedEntry;

/** Read what was typed: a plain number (sign, one point, exponent), or inch fractions where they apply. */
export function parseSheetInput(text: string, m: SheetMeasure, system: UnitSystem): SheetParse {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  const spec = SHEET_MEASURES[m];
  let shown: number | null = null;
  if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) shown = Number(t);
  else if (spec.fractions && system === 'IP') shown = parseInches(t);
  if (shown === null || !Number.isFinite(shown)) return { kind: 'invalid' };
  const si = spec.fromShown(shown, system);
  return Number.isFinite(si) ? { kind: 'ok', si } : { kind: 'invalid' };
}

/** The figure as it is read: typographic minus, narrow space, unit; "—" when there is no number. */
export function formatSheet(
  si: number | null | undefined,
  m: SheetMeasure,
  system: UnitSystem,
  decimals?: number,
): string {
  if (si == null || !Number.isFinite(si)) return '—';
  const spec = SHEET_MEASURES[m];
  const shown = spec.toShown(si, system);
  const d = decimals ?? spec.decimals[system];
  const text = spec.fixed ? fixedText(shown, d) : trim(shown, d);
  // α reads "23.76 × 10⁻⁶/K": the power of ten belongs to the unit, the × to the reader.
  return `${minus(text)}${m === 'alpha' ? ' × ' : '\u202f'}${spec.unit[system]}`;
}

/** A range with its unit once: "−25 to 80 °C". */
export function formatSheetRange(min: number, max: number, m: SheetMeasure, system: UnitSystem): string {
  const lo = formatSheet(min, m, system);
  const hi = formatSheet(max, m, system);
  const unit = SHEET_MEASURES[m].unit[system];
  return lo === '—' || hi === '—' ? `${lo} to ${hi}` : `${lo.slice(0, -unit.length).trimEnd()} to ${hi}`;
}

/**
 * A joint dimension as the trade writes it: "20.0 mm"; in IP the exact fraction when there is one
 * ("3/4 in"), else decimal inches ("0.787 in").
 */
export function formatJointDimension(si: number | null | undefined, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '—';
  if (system === 'IP') {
    const f = exactFraction(si / INCH);
    if (f !== null) return `${minus(f)}\u202fin`;
  }
  return formatSheet(si, 'joint', system);
}

/** The next 1/16 in at or above a width, for the IP reader: "11/16 in"; null in SI. */
export function nextSixteenth(si: number, system: UnitSystem): string | null {
  if (system !== 'IP' || !Number.isFinite(si)) return null;
  return `${inchFraction(si / INCH, 16, 'up')}\u202fin`;
}

/** A limit from a schema in the person's units, four significant figures ("200 mm", "7.874 in"). */
export function formatSheetBound(si: number, m: SheetMeasure, system: UnitSystem): string {
  const spec = SHEET_MEASURES[m];
  const shown = Number(spec.toShown(si, system).toPrecision(4));
  return `${minus(String(shown))}\u202f${spec.unit[system]}`;
}

/**
 * A sheet measure as a number box (`QuantityInput`) shows and reads it: range problems worded in its units,
 * inch fractions typed where they apply (a keyboard with space and slash).
 */
export const sheetInput = (m: SheetMeasure): InputMeasure => ({
  unit: (system) => sheetUnit(m, system),
  toText: (si, system) => sheetInputText(si, m, system),
  parse: (text, system) => parseSheetInput(text, m, system),
  bound: (si, system) => formatSheetBound(si, m, system),
  example: (system) => (m === 'joint' && system === 'IP' ? '3/4 or 0.75' : '12.5'),
  inputMode: SHEET_MEASURES[m].fractions ? 'text' : 'decimal',
});
