import { takeoffToCsv } from '@shared/calc/takeoff/csv';
import type { TakeoffResult } from '@shared/calc/takeoff/schema';
import type { UnitSystem } from '@shared/units';

/** "Metal rainscreen — north" → "metal-rainscreen-north-takeoff.csv" (ASCII letters, digits and hyphens). */
export function takeoffFileName(assemblyName: string): string {
  const slug = assemblyName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/, '');
  return `${slug || 'assembly'}-takeoff.csv`;
}

/**
 * The takeoff as an RFC 4180 CSV file in the person's units (the same text as
 * `POST /api/v1/calc/takeoff.csv?units=…`).
 */
export function takeoffCsvFile(
  result: TakeoffResult,
  assemblyName: string,
  units: UnitSystem = 'SI',
): { name: string; blob: Blob } {
  return {
    name: takeoffFileName(assemblyName),
    blob: new Blob([takeoffToCsv(result, units)], { type: 'text/csv;charset=utf-8' }),
  };
}

/** Hand the file to the browser as a download, generated here (no request to the server). */
export function downloadTakeoffCsv(result: TakeoffResult, assemblyName: string, units: UnitSystem): string {
  const { name, blob } = takeoffCsvFile(result, assemblyName, units);
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // Revoke after the click has been handled (Chromium reads the URL asynchronously).
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return name;
}
