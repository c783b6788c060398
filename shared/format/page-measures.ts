import {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  INCH,
  QUANTITIES,
  type UnitSystem,
  unitsOf,
} from '../units';
import { fixed, trimmedFixed } from '../units/rounding';
import { exactFraction, inchFraction, parseInches } from './inches';
import { formatterFor } from './quantities';

/** What a number box read: nothing, something that is not a number, or a number (already SI). */
export type ParsedEntry = { kind: 'empty' } | { kind: 'invalid' } | { kind: 'ok'; si: number };

/*
 * The measures of the joints and takeoff pages (screen words: the joint schedule, the takeoff) and how each
 * crosses the SI/IP edge. Stored values
 * are SI (m, °C, 1/K, m³, m², fractions 0–1); only what is shown and typed is converted. Small lengths in IP
 * are read and written in inches with fractions (¾, 1 1/4, 13/16) as the trade draws them.
 */
export type PageMeasure =
  | 'joint'
  | 'spacing'
  | 'length'
  | 'temperature'
  | 'alpha'
  | 'percent'
  | 'volume'
  | 'area';

interface PageMeasureSpec {
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

export const PAGE_MEASURES: Record<PageMeasure, PageMeasureSpec> = {
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

export const pageMeasureUnit = (m: PageMeasure, system: UnitSystem) => PAGE_MEASURES[m].unit[system];

const minus = (t: string) => t.replace(/^-/, '\u2212');

/** Round to `decimals` and trim trailing zeros; "" (never "NaN") for a non-number. */
function trim(value: number, decimals: number): string {
  return trimmedFixed(value, decimals);
}

function fixedText(value: number, decimals: number): string {
  return fixed(value, decimals);
}

// ------------------------------------------------------------------------------------ text ⇄ SI

/** The number as it goes into an editable box (exact inch fractions written as fractions). */
export function pageInputText(si: number | null | undefined, m: PageMeasure, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '';
  const spec = PAGE_MEASURES[m];
  const shown = spec.toShown(si, system);
  if (spec.fractions && system === 'IP') {
    const f = exactFraction(shown);
    if (f !== null && !/^-?\d+$/.test(f)) return f;
  }
  // A box holds a little more than a table shows, so a typed value survives a unit switch and back.
  return trim(shown, spec.decimals[system] + 1);
}

/** Read what was typed: a plain number (sign, one point, exponent), or inch fractions where they apply. */
export function parsePageInput(text: string, m: PageMeasure, system: UnitSystem): ParsedEntry {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  const spec = PAGE_MEASURES[m];
  let shown: number | null = null;
  if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) shown = Number(t);
  else if (spec.fractions && system === 'IP') shown = parseInches(t);
  if (shown === null || !Number.isFinite(shown)) return { kind: 'invalid' };
  const si = spec.fromShown(shown, system);
  return Number.isFinite(si) ? { kind: 'ok', si } : { kind: 'invalid' };
}

/** The figure as it is read: typographic minus, narrow space, unit; "—" when there is no number. */
export function formatPageMeasure(
  si: number | null | undefined,
  m: PageMeasure,
  system: UnitSystem,
  decimals?: number,
): string {
  // A joint dimension reads as the length formatter words it, here and on the sheet (one rule).
  if (m === 'joint' && decimals === undefined) return formatJointDimension(si, system);
  if (si == null || !Number.isFinite(si)) return '—';
  const spec = PAGE_MEASURES[m];
  const shown = spec.toShown(si, system);
  const d = decimals ?? spec.decimals[system];
  const text = spec.fixed ? fixedText(shown, d) : trim(shown, d);
  // α reads "23.76 × 10⁻⁶/K": the power of ten belongs to the unit, the × to the reader.
  return `${minus(text)}${m === 'alpha' ? ' × ' : '\u202f'}${spec.unit[system]}`;
}

/** A range with its unit once: "−25 to 80 °C". */
export function formatPageRange(min: number, max: number, m: PageMeasure, system: UnitSystem): string {
  const lo = formatPageMeasure(min, m, system);
  const hi = formatPageMeasure(max, m, system);
  const unit = PAGE_MEASURES[m].unit[system];
  return lo === '—' || hi === '—' ? `${lo} to ${hi}` : `${lo.slice(0, -unit.length).trimEnd()} to ${hi}`;
}

/**
 * A joint dimension as the trade writes it, on the joints and takeoff pages and on the sheet alike: the
 * length formatter with inch fractions ("20 mm"; in IP the exact fraction when there is one, "3/4 in", else
 * decimal inches, "0.79 in").
 */
export function formatJointDimension(si: number | null | undefined, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '—';
  return formatterFor(system).length(si, { inchFractions: true });
}

/** The next 1/16 in at or above a width, for the IP reader: "11/16 in"; null in SI. */
export function nextSixteenth(si: number, system: UnitSystem): string | null {
  if (system !== 'IP' || !Number.isFinite(si)) return null;
  return `${inchFraction(si / INCH, 16, 'up')}\u202fin`;
}

/** A limit from a schema in the person's units, four significant figures ("200 mm", "7.874 in"). */
export function formatPageBound(si: number, m: PageMeasure, system: UnitSystem): string {
  const spec = PAGE_MEASURES[m];
  const shown = Number(spec.toShown(si, system).toPrecision(4));
  return `${minus(String(shown))}\u202f${spec.unit[system]}`;
}
