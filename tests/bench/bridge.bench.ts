import { solveBridge } from '@shared/calc/bridge/bridge';
import { demoGirtModel, demoWall } from '@shared/calc/bridge/examples';
import { bridgeModelSchema } from '@shared/calc/bridge/schema';
import { clipModel } from '@shared/calc/bridge/templates';

/** One bridge solve figure: median wall time of `runs` solves after one warm-up, with its cells and iterations. */
export interface BridgeBench {
  name: string;
  cells: number;
  iterations: number;
  medianMs: number;
  /** Median CPU time of this process over the same solves (user + system), ms: what the wall time would be on an idle machine. */
  medianCpuMs: number;
  targetMs: number;
}

function timeSolves(name: string, input: unknown, runs: number, targetMs: number): BridgeBench {
  const model = bridgeModelSchema.parse(input);
  const first = solveBridge(model, 1_000_000);
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    solveBridge(model, 1_000_000);
    times.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  const median = (v: number[]) => {
    v.sort((a, b) => a - b);
    return (v[(v.length - 1) >> 1]! + v[v.length >> 1]!) / 2;
  };
  return {
    name,
    cells: first.cells,
    iterations: first.solver.iterations,
    medianMs: median(times),
    medianCpuMs: median(cpu),
    targetMs,
  };
}

/**
 * The bridge solver on the invented demo details (shared/calc/bridge/fixtures.ts): the 2-D girt through
 * insulation at the default mesh (target ≤ 100 ms) and the 3-D clip template at its default mesh
 * (≥ 200 000 cells, target ≤ 2 s); each the median of several solves (parse excluded).
 */
export function benchBridge(): BridgeBench[] {
  return [
    timeSolves('bridge: 2-D girt, default mesh', demoGirtModel(), 21, 100),
    timeSolves('bridge: 3-D clip template, default mesh', clipModel(demoWall.clip), 3, 2000),
  ];
}
