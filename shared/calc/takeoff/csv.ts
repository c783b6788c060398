import { csvField } from '../../csv';
import type { TakeoffResult } from './schema';

/** The RFC 4180 field writer lives in shared/csv.ts; re-exported here for the takeoff's callers. */
export { csvField };

const HEADER = ['Item', 'Quantity', 'Unit', 'Formula', 'Source', 'Note'];

/** 12 significant digits: drops floating-point noise (0.30000000000000004 → 0.3), keeps every real digit. */
const quantity = (x: number): string => String(Number(x.toPrecision(12)));

/** The takeoff as CSV, one row per trace step (per wall, then the totals); CRLF line ends (RFC 4180). */
export function takeoffToCsv(result: TakeoffResult): string {
  const rows = result.trace.map((s) => [
    s.label,
    quantity(s.value),
    s.unit,
    s.formula,
    s.source,
    s.note ?? '',
  ]);
  return `${[HEADER, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n')}\r\n`;
}
