import { metalPanelWall } from '@shared/calc/thermal/examples';
import { calculateThermal } from '@shared/calc/thermal/thermal';

const BATCHES = 50;
const RUNS_PER_BATCH = 500;
const WARMUP_RUNS = 5_000;

/**
 * Median time of one full thermal calculation: the ten-layer metal-panel wall with a point, a linear and a
 * fastener bridge, timed in 50 batches of 500 runs (25 000 runs) with performance.now(); the figure is the
 * median of the batch means. Target: ≤ 20 µs in Node.
 */
export function benchThermal(): { name: string; medianMicros: number; perSecond: number } {
  const input = metalPanelWall();
  let sink = 0;
  for (let i = 0; i < WARMUP_RUNS; i++) sink += calculateThermal(input).Ueff;
  const means: number[] = [];
  for (let b = 0; b < BATCHES; b++) {
    const t0 = performance.now();
    for (let i = 0; i < RUNS_PER_BATCH; i++) sink += calculateThermal(input).Ueff;
    means.push(((performance.now() - t0) * 1000) / RUNS_PER_BATCH);
  }
  if (!Number.isFinite(sink)) throw new Error('thermal bench produced a non-finite result');
  means.sort((a, b) => a - b);
  const medianMicros = (means[(BATCHES - 1) >> 1]! + means[BATCHES >> 1]!) / 2;
  return { name: 'thermal: 10 layers, 3 bridge types', medianMicros, perSecond: 1e6 / medianMicros };
}
