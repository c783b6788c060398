import { demoSweep } from '@shared/sweep/examples';
import type { SweepVariantResult } from '@shared/sweep/schema';
import { planSweep, runSweep, variantRunner, variantValues } from '@shared/sweep/sweep';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { packVariants } from './packed';
import { type FromWorker, runPool, splitSweep, type ToWorker, type WorkerLike } from './pool';

describe('splitting a sweep over workers', () => {
  it('chunks cover every variant once, in order, none larger than the target (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5000 }), fc.integer({ min: 1, max: 400 }), (count, target) => {
        const chunks = splitSweep(count, target);
        const all = chunks.flatMap((c) => Array.from({ length: c.count }, (_, i) => c.start + i));
        expect(all).toEqual(Array.from({ length: count }, (_, i) => i));
        for (const c of chunks) expect(c.count).toBeLessThanOrEqual(target);
      }),
    );
  });
});

/**
 * A worker that runs its chunks in this thread as sweep.worker.ts does (one runner, results packed), answering on
 * the next tick.
 */
function inThreadWorker(log: string[]): WorkerLike {
  let run: ((index: number) => SweepVariantResult) | null = null;
  const w: WorkerLike = {
    onmessage: null,
    onerror: null,
    terminate: () => log.push('terminate'),
    postMessage: (m: ToWorker) => {
      if (m.type === 'setup') {
        const { assembly, project, rows, parameters } = m.setup;
        const plan = planSweep(assembly, parameters, 1e6);
        const runner = variantRunner(plan, assembly, project, rows);
        run = (i) => runner(i, variantValues(plan, i));
      } else
        setTimeout(() => {
          const variants = Array.from({ length: m.chunk.count }, (_, i) => run!(m.chunk.start + i));
          w.onmessage?.({
            data: { type: 'done', id: m.id, packed: packVariants(variants) } satisfies FromWorker,
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
    const got: SweepVariantResult[] = [];
    const log: string[] = [];
    const run = runPool({
      setup: { assembly, project, rows, parameters },
      chunks: splitSweep(whole.count, 5),
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
    const chunks = splitSweep(24, 4);
    const setup = { assembly, project, rows, parameters };
    const log: string[] = [];
    const run = runPool({
      setup,
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
    const refused = runPool({ setup, chunks, size: 1, createWorker: () => refusing, onResults: () => {} });
    expect(await refused.done).toEqual({ ok: false, field: 'parameters.0.list.0', reason: 'no' });
  });
});
