import { FOOT, QUANTITIES, type UnitSystem, unitsOf } from '@shared/units';
import { fixed, roundDecimal, trimmedFixed } from '@shared/units/rounding';
import type { InputMeasure, ParsedEntry } from '../../lib/input-measure';

/**
 * The quantities of an assembly and how each crosses the SI/IP edge. Stored values are SI (m, W/(m·K),
 * m²·K/W, W/K, 1/m², area fractions 0–1); only what is shown and typed is converted.
 * `factor` is the SI value of one shown unit: shown = SI / factor.
 */
export type Measure =
  | 'thickness'
  | 'spacing'
  | 'diameter'
  | 'conductivity'
  | 'resistance'
  | 'transmittance'
  | 'chi'
  | 'psi'
  | 'countPerArea'
  | 'lengthPerArea'
  | 'fraction'
  | 'emittance'
  | 'ventArea';

interface MeasureSpec {
  unit: Record<UnitSystem, string>;
  /** Spoken form for screen readers where the symbol reads badly. */
  spoken?: Record<UnitSystem, string>;
  factor: Record<UnitSystem, number>;
  /** Most decimals shown (trailing zeros trimmed). */
  decimals: Record<UnitSystem, number>;
}

export const MEASURES: Record<Measure, MeasureSpec> = {
  thickness: { ...unitsOf('shortLength'), decimals: { SI: 2, IP: 3 } },
  spacing: { ...unitsOf('shortLength'), decimals: { SI: 1, IP: 2 } },
  diameter: { ...unitsOf('shortLength'), decimals: { SI: 2, IP: 3 } },
  conductivity: { ...unitsOf('conductivity'), decimals: { SI: 4, IP: 4 } },
  resistance: { ...unitsOf('resistance'), decimals: { SI: 3, IP: 2 } },
  transmittance: { ...unitsOf('transmittance'), decimals: { SI: 3, IP: 4 } },
  chi: { ...unitsOf('chi'), decimals: { SI: 4, IP: 4 } },
  psi: { ...unitsOf('psi'), decimals: { SI: 4, IP: 4 } },
  countPerArea: {
    unit: { SI: 'per m²', IP: 'per ft²' },
    factor: { SI: 1, IP: 1 / (FOOT * FOOT) },
    decimals: { SI: 3, IP: 4 },
  },
  lengthPerArea: {
    unit: { SI: 'm/m²', IP: 'ft/ft²' },
    factor: { SI: 1, IP: 1 / FOOT },
    decimals: { SI: 3, IP: 4 },
  },
  fraction: { unit: { SI: '%', IP: '%' }, factor: { SI: 0.01, IP: 0.01 }, decimals: { SI: 4, IP: 4 } },
  emittance: { unit: { SI: '–', IP: '–' }, factor: { SI: 1, IP: 1 }, decimals: { SI: 3, IP: 3 } },
  /** Vent area per length of an air layer, stored in mm²/m as ISO 6946 §6.9.3 states it; 1 in²/ft = 2116.7 mm²/m. */
  ventArea: { ...unitsOf('ventArea'), decimals: { SI: 0, IP: 3 } },
};

export const measureUnit = (m: Measure, system: UnitSystem) => MEASURES[m].unit[system];

/** Round to at most `decimals` places and trim trailing zeros; "" (never "NaN") for a non-number. */
export function trimmed(value: number, decimals: number): string {
  return trimmedFixed(value, decimals);
}

export const toShown = (si: number, m: Measure, system: UnitSystem) => si / MEASURES[m].factor[system];
export const fromShown = (shown: number, m: Measure, system: UnitSystem) =>
  shown * MEASURES[m].factor[system];

/** The number as it goes into an editable box. */
export function measureInputText(si: number | null | undefined, m: Measure, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '';
  return trimmed(toShown(si, m, system), MEASURES[m].decimals[system]);
}

/** The number as it is read: typographic minus, narrow space, unit. "—" when there is no number. */
export function formatMeasure(
  si: number | null | undefined,
  m: Measure,
  system: UnitSystem,
  decimals?: number,
): string {
  if (si == null || !Number.isFinite(si)) return '—';
  const text = trimmed(toShown(si, m, system), decimals ?? MEASURES[m].decimals[system]);
  const unit = MEASURES[m].unit[system];
  return `${text.replace(/^-/, '\u2212')}${unit === '%' ? '\u202f%' : `\u202f${unit}`}`;
}

export type ParsedMeasure = ParsedEntry;

/** Read what was typed: digits, one point, optional sign (ASCII or typographic); nothing else is guessed. */
export function parseMeasure(text: string, m: Measure, system: UnitSystem): ParsedMeasure {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return { kind: 'invalid' };
  const si = fromShown(Number(t), m, system);
  return Number.isFinite(si) ? { kind: 'ok', si } : { kind: 'invalid' };
}

/** An assembly measure as a number box (`QuantityInput`) shows and reads it; '–' (no unit) is left out. */
export const measureInput = (m: Measure): InputMeasure => ({
  unit: (system) => (MEASURES[m].unit[system] === '–' ? '' : MEASURES[m].unit[system]),
  toText: (si, system) => measureInputText(si, m, system),
  parse: (text, system) => parseMeasure(text, m, system),
});

/** Unit of an R figure for a column head ("R-value" in IP carries its unit in the name). */
export const rUnit = (system: UnitSystem) => QUANTITIES.resistance[system].symbol;
export const uUnit = (system: UnitSystem) => QUANTITIES.transmittance[system].symbol;

/** Decimals of a share in per cent, everywhere it is printed (screens and sheet): 12.3 %. */
export const SHARE_DECIMALS = 1;
/** A share 0–1 as "12.3 %". */
export const formatShare = (share: number) =>
  Number.isFinite(share) ? `${fixed(share * 100, SHARE_DECIMALS)}\u202f%` : '—';
/** A share as the number printed, in per cent (what a difference between two shown shares is taken from). */
export const shownPercent = (share: number) => roundDecimal(share * 100, SHARE_DECIMALS);
