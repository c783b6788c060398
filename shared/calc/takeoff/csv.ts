import { csvField } from '../../csv';
import { FOOT, type UnitSystem, US_GALLON } from '../../units';
import type { TakeoffResult } from './schema';

/** The RFC 4180 field writer lives in shared/csv.ts; re-exported here for the takeoff's callers. */
export { csvField };

const HEADER = ['Item', 'Quantity', 'Unit', 'Formula', 'Source', 'Note'];

/** 12 significant digits: drops floating-point noise (0.30000000000000004 → 0.3), keeps every real digit. */
const quantity = (x: number): string => String(Number(x.toPrecision(12)));

/** The IP unit of each SI unit of the takeoff's trace and SI per IP unit (ft, ft², US gal; counts stay). */
const IP_UNITS: Record<string, { unit: string; si: number }> = {
  m: { unit: 'ft', si: FOOT },
  'm²': { unit: 'ft²', si: FOOT * FOOT },
  'm³': { unit: 'US gal', si: US_GALLON },
};

/** One trace value in the chosen system: SI as stored, IP divided by the exact factor of its unit. */
function shown(value: number, unit: string, units: UnitSystem): [number, string] {
  const ip = units === 'IP' ? IP_UNITS[unit] : undefined;
  return ip ? [value / ip.si, ip.unit] : [value, unit];
}

/**
 * The takeoff as CSV, one row per trace step (per wall, then the totals), in SI or IP; CRLF line ends
 * (RFC 4180).
 */
export function takeoffToCsv(result: TakeoffResult, units: UnitSystem = 'SI'): string {
  const rows = result.trace.map((s) => {
    const [value, unit] = shown(s.value, s.unit, units);
    return [s.label, quantity(value), unit, s.formula, s.source, s.note ?? ''];
  });
  return `${[HEADER, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n')}\r\n`;
}
