import { DELTA_0 } from '@shared/calc/moisture/glaser';
import { MONTH_NAMES } from '@shared/calc/moisture/monthly';
import {
  INCH,
  OZ_PER_FT2_TO_KG_PER_M2,
  PERM_0C_TO_SI,
  PERM_23C_TO_SI,
  QUANTITIES,
  toShown,
  type UnitSystem,
} from '@shared/units';
import { formatNumber, formatQuantity } from '../../lib/quantities';

export { MONTH_NAMES };

/*
 * How the moisture page's figures read. Everything arrives in SI (m, °C, Pa, kg/m²); only the text is
 * converted. Vapour pressures stay in Pa in both systems (the unit of the ISO 13788 method); water is shown
 * in g/m² (SI) or oz/ft² (IP), temperatures in °C or °F.
 */

const minus = (text: string) => text.replace(/^-/, '\u2212');

/** Layer thickness: "100 mm", "0.15 mm" (SI) or "3.937 in" (IP); "—" for a layer without one. */
export function formatThickness(m: number | undefined, system: UnitSystem): string {
  if (m === undefined || !Number.isFinite(m)) return '—';
  if (system === 'IP') return `${formatNumber(m / INCH, m / INCH < 0.1 ? 4 : 3)}\u202fin`;
  const mm = m * 1000;
  return `${formatNumber(mm, mm < 1 ? 2 : 1)}\u202fmm`;
}

/** A position through the wall for the chart's axis, in mm or in. */
export const lengthUnit = (system: UnitSystem) => (system === 'IP' ? 'in' : 'mm');
export const toShownLength = (m: number, system: UnitSystem) => (system === 'IP' ? m / INCH : m * 1000);
export const fromShownLength = (shown: number, system: UnitSystem) =>
  system === 'IP' ? shown * INCH : shown / 1000;

/** Temperature in the person's units: "−12 °C" / "10.4 °F". */
export const formatTemperature = (c: number, system: UnitSystem) => formatQuantity(c, 'temperature', system);

/** A temperature difference (margin), K or °F. */
export function formatTemperatureDifference(k: number, system: UnitSystem): string {
  if (!Number.isFinite(k)) return '—';
  return system === 'IP'
    ? `${minus(formatNumber(toShown(k, 'temperatureDifference', 'IP'), 1))}\u202f°F`
    : `${minus(formatNumber(k, 1))}\u202fK`;
}

/** Vapour pressure, Pa (both systems). */
export const formatPressure = (pa: number) => (Number.isFinite(pa) ? `${minus(pa.toFixed(0))}\u202fPa` : '—');

/** Water per area in the chart's unit: g/m² (SI) or oz/ft² (IP). */
export const waterUnit = (system: UnitSystem) => (system === 'IP' ? 'oz/ft²' : 'g/m²');
export const toShownWater = (kg: number, system: UnitSystem) =>
  system === 'IP' ? kg / OZ_PER_FT2_TO_KG_PER_M2 : kg * 1000;

/**
 * Water held or moved per square metre of wall: "1.34 kg/m²", "497 g/m²", "3.2 g/m²" (SI);
 * "4.39 oz/ft²" (IP). Never NaN.
 */
export function formatWater(kg: number, system: UnitSystem): string {
  if (!Number.isFinite(kg)) return '—';
  if (system === 'IP') {
    const oz = kg / OZ_PER_FT2_TO_KG_PER_M2;
    return `${formatNumber(oz, oz < 0.1 ? 3 : 2)}\u202foz/ft²`;
  }
  if (kg >= 1) return `${formatNumber(kg, 2)}\u202fkg/m²`;
  const g = kg * 1000;
  return `${formatNumber(g, g < 10 ? 1 : 0)}\u202fg/m²`;
}

/** Water in a table column: always g/m² (SI) or oz/ft² (IP), so the figures compare down the column. */
export function formatWaterInColumn(kg: number, system: UnitSystem): string {
  if (!Number.isFinite(kg)) return '—';
  if (system === 'IP') return formatWater(kg, system);
  const g = kg * 1000;
  return `${formatNumber(g, g < 10 ? 1 : 0)}\u202fg/m²`;
}

/** s_d, m, to three significant figures or so: "15 m", "0.0696 m", "1500 m". */
export function formatSd(m: number): string {
  if (!Number.isFinite(m)) return '—';
  const decimals = m >= 100 ? 0 : m >= 10 ? 1 : m >= 1 ? 2 : m >= 0.01 ? 4 : 6;
  return `${formatNumber(m, decimals)}\u202fm`;
}

/** The US perm (23 °C) that a given s_d amounts to: W = δ₀/s_d. */
export const sdToPerm = (sd: number) => DELTA_0 / sd / PERM_23C_TO_SI;

/** A perm in ng/(Pa·s·m²) as NIST SP 811 prints it: 57.4525 (23 °C), 57.2135 (0 °C). */
export const PERM_IN_NG = {
  '23C': formatNumber(PERM_23C_TO_SI / QUANTITIES.vapourPermeance.SI.scale, 4),
  '0C': formatNumber(PERM_0C_TO_SI / QUANTITIES.vapourPermeance.SI.scale, 4),
};

/** "≈ 50 perm" for the IP reader, to two or three significant figures. */
export function formatPerm(sd: number): string {
  if (!(sd > 0) || !Number.isFinite(sd)) return '—';
  const perm = sdToPerm(sd);
  const decimals = perm >= 100 ? 0 : perm >= 10 ? 1 : perm >= 1 ? 2 : perm >= 0.01 ? 3 : 5;
  return `${formatNumber(perm, decimals)}\u202fperm`;
}

/** A dimensionless factor (f_Rsi), three decimals. */
export const formatFactor = (f: number | null) =>
  f === null || !Number.isFinite(f) ? '—' : minus(f.toFixed(3));

export const monthName = (month: number) => MONTH_NAMES[(month - 1 + 12) % 12]!;
export const monthShort = (month: number) => monthName(month).slice(0, 3);
