import { demoSweep } from '@shared/sweep/examples';
import type { SweepParameter } from '@shared/sweep/schema';
import { runSweep } from '@shared/sweep/sweep';

/** One sweep figure: wall and CPU time of the whole sweep, median of `runs` after one warm-up. */
export interface SweepBench {
  name: string;
  variants: number;
  medianMs: number;
  medianCpuMs: number;
  targetMs: number;
}

/**
 * 10 000 variants of the invented demo sweep through all four check modules, single thread: the mineral wool
 * 10–259 mm by 1 mm (250) × clip spacing 0.3–1.5 m (20 values) × sealant class of every joint (2), against
 * the demo code table. Target: < 1 s in Node. Median of 3 sweeps after one warm-up.
 */
export function benchSweep(): SweepBench {
  const s = demoSweep();
  const parameters: SweepParameter[] = [
    { kind: 'insulationThickness', layer: 3, range: { start: 0.01, stop: 0.259, step: 0.001 } },
    { kind: 'clipSpacing', range: { start: 0.3, stop: 1.44, step: 0.06 } },
    { kind: 'sealantClass', list: ['25', '50'] },
  ];
  const sweep = () => runSweep(s.assembly, s.project, s.rows, parameters, 10_000);
  const variants = sweep().count;
  if (variants !== 10_000) throw new Error(`the sweep bench has ${variants} variants, not 10 000`);
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < 3; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    sweep();
    times.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  const median = (v: number[]) => v.sort((a, b) => a - b)[1]!;
  return {
    name: 'sweep: 10 000 variants, all four modules',
    variants,
    medianMs: median(times),
    medianCpuMs: median(cpu),
    targetMs: 1000,
  };
}
