import { metalPanelMoistureWall } from '@shared/calc/moisture/examples';
import { calculateMoisture } from '@shared/calc/moisture/monthly';

const BATCHES = 50;
const RUNS_PER_BATCH = 200;
const WARMUP_RUNS = 2_000;

/**
 * Median time of one full moisture calculation: the eight-layer metal-panel wall without its vapour
 * retarder (so that a plane condenses and dries), invented cold-climate year, 12-month ISO 13788 balance
 * plus surface check, timed in 50 batches of 200 runs (10 000 runs) with performance.now(); the figure is
 * the median of the batch means. Target: ≤ 50 µs in Node.
 */
export function benchMoisture(): { name: string; medianMicros: number; perSecond: number } {
  const input = metalPanelMoistureWall({ vapourRetarder: false });
  let sink = 0;
  for (let i = 0; i < WARMUP_RUNS; i++) sink += calculateMoisture(input).interstitial.maxAccumulation;
  const means: number[] = [];
  for (let b = 0; b < BATCHES; b++) {
    const t0 = performance.now();
    for (let i = 0; i < RUNS_PER_BATCH; i++) sink += calculateMoisture(input).interstitial.maxAccumulation;
    means.push(((performance.now() - t0) * 1000) / RUNS_PER_BATCH);
  }
  if (!Number.isFinite(sink)) throw new Error('moisture bench produced a non-finite result');
  means.sort((a, b) => a - b);
  const medianMicros = (means[(BATCHES - 1) >> 1]! + means[BATCHES >> 1]!) / 2;
  return { name: 'moisture: 8 layers, 12-month balance', medianMicros, perSecond: 1e6 / medianMicros };
}
