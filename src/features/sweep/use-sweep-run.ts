import type { SweepVariantResult } from '@shared/sweep/schema';
import type { SweepPlan } from '@shared/sweep/sweep';
import { useCallback, useEffect, useRef, useState } from 'react';
import {
  chunkTarget,
  type PoolRun,
  poolSize,
  runPool,
  type SweepSetup,
  splitSweep,
  type WorkerLike,
} from './pool';

export type RunState =
  | { status: 'idle' }
  | { status: 'running'; done: number; total: number; startedAt: number; now: number }
  | { status: 'finished'; total: number; ms: number }
  | { status: 'cancelled'; done: number; total: number }
  | { status: 'refused'; field: string; reason: string };

const sweepWorker = (): WorkerLike =>
  new Worker(new URL('./sweep.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike;

/** Results reach the page every 150 ms, less often as they grow (1 s from 8 500 on): each flush redraws the table. */
const flushEvery = (received: number) => Math.min(1000, 150 + received / 10);

/**
 * One sweep at a time on the worker pool: its progress, the variants as they stream in (flushed every 150 ms to 1 s),
 * cancel. A new run or leaving the page stops the one before.
 */
export function useSweepRun(createWorker: () => WorkerLike = sweepWorker) {
  const [state, setState] = useState<RunState>({ status: 'idle' });
  const [variants, setVariants] = useState<SweepVariantResult[]>([]);
  const run = useRef<PoolRun | null>(null);
  useEffect(() => () => run.current?.cancel(), []);

  const start = useCallback(
    (setup: SweepSetup, plan: SweepPlan) => {
      run.current?.cancel();
      const workers = poolSize(typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency);
      const chunks = splitSweep(plan.count, chunkTarget(plan.count, workers));
      const startedAt = performance.now();
      let buffer: SweepVariantResult[] = [];
      let done = 0;
      let last = 0;
      const flush = () => {
        const batch = buffer;
        buffer = [];
        setVariants((v) => v.concat(batch));
        setState({ status: 'running', done, total: plan.count, startedAt, now: performance.now() });
        last = performance.now();
      };
      setVariants([]);
      setState({ status: 'running', done: 0, total: plan.count, startedAt, now: startedAt });
      const current = runPool({
        setup,
        chunks,
        size: workers,
        createWorker,
        onResults: (batch) => {
          buffer = buffer.concat(batch);
          done += batch.length;
          if (performance.now() - last >= flushEvery(done)) flush();
        },
      });
      run.current = current;
      void current.done.then((r) => {
        if (run.current !== current) return;
        run.current = null;
        const batch = buffer;
        buffer = [];
        setVariants((v) => v.concat(batch));
        if (r.ok) setState({ status: 'finished', total: plan.count, ms: performance.now() - startedAt });
        else if ('cancelled' in r) setState({ status: 'cancelled', done, total: plan.count });
        else setState({ status: 'refused', field: r.field, reason: r.reason });
      });
    },
    [createWorker],
  );

  const cancel = useCallback(() => run.current?.cancel(), []);
  return { state, variants, start, cancel };
}
