import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { demoWindSchedule } from '@shared/calc/wind/examples';

const BATCHES = 50;
const RUNS_PER_BATCH = 200;
const WARMUP_RUNS = 2_000;

/**
 * Median time of one full wind schedule: the demo wall (ASCE 7-16, exposure C, two-span panel with a deflection
 * column), zones 4 and 5, each with three fixed-point girt-spacing searches and a clip-spacing search, timed in
 * 50 batches of 200 runs (10 000 runs) with performance.now(); the figure is the median of the batch means.
 * Target: ≤ 50 µs in Node.
 */
export function benchWind(): { name: string; medianMicros: number; perSecond: number } {
  const input = demoWindSchedule();
  let sink = 0;
  for (let i = 0; i < WARMUP_RUNS; i++) sink += calculateWindSchedule(input).zones[0]!.girtSpacing ?? 0;
  const means: number[] = [];
  for (let b = 0; b < BATCHES; b++) {
    const t0 = performance.now();
    for (let i = 0; i < RUNS_PER_BATCH; i++) sink += calculateWindSchedule(input).zones[1]!.girtSpacing ?? 0;
    means.push(((performance.now() - t0) * 1000) / RUNS_PER_BATCH);
  }
  if (!Number.isFinite(sink)) throw new Error('wind bench produced a non-finite result');
  means.sort((a, b) => a - b);
  const medianMicros = (means[(BATCHES - 1) >> 1]! + means[BATCHES >> 1]!) / 2;
  return { name: 'wind: 2-zone girt and clip schedule', medianMicros, perSecond: 1e6 / medianMicros };
}
