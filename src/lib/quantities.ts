import { QUANTITIES as REGISTRY, toShown, toStored, type UnitSystem } from '@shared/units';
import { trimmedFixed } from '@shared/units/rounding';
import type { InputMeasure, ParsedEntry } from './input-measure';

/**
 * The quantities a form or a title block shows, and how each crosses the SI/IP edge.
 * Everything is stored in SI (m, °C, RH as a 0–1 fraction); only display text is converted.
 */
export type Quantity = 'length' | 'temperature' | 'relativeHumidity';

interface QuantitySpec {
  unit: Record<UnitSystem, string>;
  /** Decimals shown (trailing zeros trimmed). */
  decimals: Record<UnitSystem, number>;
  toDisplay: (si: number, system: UnitSystem) => number;
  fromDisplay: (shown: number, system: UnitSystem) => number;
}

/** A quantity of the registry as it is shown: its symbols, default decimals and conversion. */
const registered = (q: 'length' | 'temperature'): QuantitySpec => ({
  unit: { SI: REGISTRY[q].SI.symbol, IP: REGISTRY[q].IP.symbol },
  decimals: { SI: REGISTRY[q].SI.decimals, IP: REGISTRY[q].IP.decimals },
  toDisplay: (si, s) => toShown(si, q, s),
  fromDisplay: (v, s) => toStored(v, q, s),
});

export const QUANTITIES: Record<Quantity, QuantitySpec> = {
  length: registered('length'),
  temperature: registered('temperature'),
  relativeHumidity: {
    unit: { SI: '%', IP: '%' },
    decimals: { SI: 1, IP: 1 },
    toDisplay: (fraction) => fraction * 100,
    fromDisplay: (percent) => percent / 100,
  },
};

export const unitOf = (q: Quantity, system: UnitSystem) => QUANTITIES[q].unit[system];

/** Round to the quantity's decimals and trim trailing zeros; never returns "NaN" (returns "" instead). */
export function formatNumber(value: number, decimals: number): string {
  return trimmedFixed(value, decimals);
}

/** The number as it goes into an editable input (ASCII minus). */
export function toInputText(si: number | null | undefined, q: Quantity, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '';
  const spec = QUANTITIES[q];
  return formatNumber(spec.toDisplay(si, system), spec.decimals[system]);
}

/** The number as it is read (typographic minus, thin space before the unit). */
export function formatQuantity(si: number | null | undefined, q: Quantity, system: UnitSystem): string {
  const text = toInputText(si, q, system);
  if (text === '') return '—';
  const unit = unitOf(q, system);
  return `${text.replace(/^-/, '\u2212')}\u202f${unit}`;
}

export type ParseResult = ParsedEntry;

/**
 * Read what someone typed. Accepts an optional sign (ASCII or typographic minus), digits and one decimal
 * point; refuses anything else (thousands separators, units, letters) rather than guessing.
 */
export function parseInput(text: string, q: Quantity, system: UnitSystem): ParseResult {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return { kind: 'invalid' };
  const shown = Number(t);
  if (!Number.isFinite(shown)) return { kind: 'invalid' };
  const si = QUANTITIES[q].fromDisplay(shown, system);
  return Number.isFinite(si) ? { kind: 'ok', si } : { kind: 'invalid' };
}

/** A quantity as a number box (`QuantityInput`) shows and reads it. */
export const quantityInput = (q: Quantity): InputMeasure => ({
  unit: (system) => unitOf(q, system),
  toText: (si, system) => toInputText(si, q, system),
  parse: (text, system) => parseInput(text, q, system),
});
