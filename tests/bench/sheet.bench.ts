import { demoSheetData } from '../../server/pdf/fixtures';
import { renderComplianceSheet } from '../../server/pdf/sheet';

const WARMUP = 5;
const RUNS = 25;

/**
 * Median time to produce the demo compliance sheet (the invented demo assembly checked against the demo
 * firm's illustrative code table, SI): the whole PDF — layout, section, charts, font subsets, compression —
 * from a stored-run object to bytes, each render timed on its own with performance.now(). The cache of
 * rendered sheets in the sheet service is not involved. Target: ≤ 250 ms.
 */
export function benchSheet(): { name: string; medianMicros: number; perSecond: number } {
  const data = demoSheetData('SI');
  let bytes = 0;
  for (let i = 0; i < WARMUP; i++) bytes = renderComplianceSheet(data).length;
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    bytes = renderComplianceSheet(data).length;
    times.push((performance.now() - t0) * 1000);
  }
  times.sort((a, b) => a - b);
  const medianMicros = times[(RUNS - 1) >> 1]!;
  return {
    name: `sheet: demo compliance sheet PDF (${Math.round(bytes / 1024)} kB)`,
    medianMicros,
    perSecond: 1e6 / medianMicros,
  };
}
