import { demoSweep } from '@shared/sweep/examples';
import type { SweepVariantResult } from '@shared/sweep/schema';
import { planSweep, runSweep, variantValues } from '@shared/sweep/sweep';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  type Chunk,
  chunkParameters,
  type FromWorker,
  runPool,
  splitSweep,
  type ToWorker,
  type WorkerLike,
} from './pool';

const axesOf = (sizes: number[]) => sizes.map((n, i) => Array.from({ length: n }, (_, j) => i * 1000 + j));

/** Every variant number of each chunk, with the values the chunk gives it. */
const unrolled = (chunk: Chunk) =>
  Array.from({ length: chunk.count }, (_, local) =>
    variantValues({ axes: chunk.lists.map((values) => ({ values })), count: chunk.count } as never, local),
  ).map((values, local) => ({ index: chunk.start + local, values }));

describe('splitting a sweep over workers', () => {
  it('chunks cover every variant once, in order, each with the values the whole sweep gives it (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 1, max: 9 }), { minLength: 1, maxLength: 3 }),
        fc.integer({ min: 1, max: 50 }),
        (sizes, target) => {
          const axes = axesOf(sizes);
          const count = sizes.reduce((p, n) => p * n, 1);
          const plan = { axes: axes.map((values) => ({ values })), count } as never;
          const chunks = splitSweep(axes, target);
          const all = chunks.flatMap(unrolled);
          expect(all.map((v) => v.index)).toEqual(Array.from({ length: count }, (_, i) => i));
          for (const v of all) expect(v.values).toEqual(variantValues(plan, v.index));
          const last = sizes[sizes.length - 1]!;
          for (const c of chunks) expect(c.count).toBeLessThanOrEqual(Math.max(target, last));
        },
      ),
    );
  });

  it('10 000 variants of 100 × 100 with a target of 250: 50 chunks of two values of the first parameter', () => {
    const chunks = splitSweep(axesOf([100, 100]), 250);
    expect(chunks).toHaveLength(50);
    expect(chunks[1]).toMatchObject({ start: 200, count: 200 });
    expect(chunks[1]!.lists[0]).toEqual([2, 3]);
  });
});

/** A worker that runs the chunk in this thread (as sweep.worker.ts does), answering on the next tick. */
function inThreadWorker(log: string[]): WorkerLike {
  let setup: Extract<ToWorker, { type: 'setup' }>['setup'] | null = null;
  const w: WorkerLike = {
    onmessage: null,
    onerror: null,
    terminate: () => log.push('terminate'),
    postMessage: (m) => {
      if (m.type === 'setup') setup = m.setup;
      else
        setTimeout(() => {
          const s = setup!;
          const { variants } = runSweep(
            s.assembly,
            s.project,
            s.rows,
            chunkParameters(s.parameters, m.chunk),
            m.chunk.count,
          );
          w.onmessage?.({
            data: { type: 'done', id: m.id, variants } satisfies FromWorker,
          } as MessageEvent<FromWorker>);
        });
    },
  };
  return w;
}

describe('the worker pool', () => {
  it('merges the chunks into exactly what one runSweep gives (the demo sweep, 3 workers, chunks of 5)', async () => {
    const { assembly, project, rows, parameters } = demoSweep();
    const whole = runSweep(assembly, project, rows, parameters, 1000);
    const chunks = splitSweep(
      whole.plan.axes.map((x) => x.values),
      5,
    );
    const got: SweepVariantResult[] = [];
    const log: string[] = [];
    const run = runPool({
      setup: { assembly, project, rows, parameters },
      chunks,
      size: 3,
      createWorker: () => inThreadWorker(log),
      onResults: (v) => got.push(...v),
    });
    expect(await run.done).toEqual({ ok: true });
    expect(got.sort((a, b) => a.index - b.index)).toEqual(whole.variants);
    expect(log).toEqual(['terminate', 'terminate', 'terminate']);
  });

  it('cancel stops every worker and settles as cancelled; a refusal settles with its field', async () => {
    const { assembly, project, rows, parameters } = demoSweep();
    const plan = planSweep(assembly, parameters, 1000);
    const chunks = splitSweep(
      plan.axes.map((x) => x.values),
      4,
    );
    const log: string[] = [];
    const run = runPool({
      setup: { assembly, project, rows, parameters },
      chunks,
      size: 2,
      createWorker: () => inThreadWorker(log),
      onResults: () => {},
    });
    run.cancel();
    expect(await run.done).toEqual({ ok: false, cancelled: true });
    expect(log).toEqual(['terminate', 'terminate']);

    const refusing: WorkerLike = {
      onmessage: null,
      onerror: null,
      terminate: () => {},
      postMessage: (m) => {
        if (m.type === 'chunk')
          setTimeout(() =>
            refusing.onmessage?.({
              data: { type: 'refused', id: m.id, field: 'parameters.0.list.0', reason: 'no' },
            } as MessageEvent<FromWorker>),
          );
      },
    };
    const refused = runPool({
      setup: { assembly, project, rows, parameters },
      chunks,
      size: 1,
      createWorker: () => refusing,
      onResults: () => {},
    });
    expect(await refused.done).toEqual({ ok: false, field: 'parameters.0.list.0', reason: 'no' });
  });
});
