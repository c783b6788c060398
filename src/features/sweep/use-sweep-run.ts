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
  | { status: 'running'; total: number }
  | { status: 'finished'; total: number; ms: number }
  | { status: 'cancelled'; done: number; total: number }
  | { status: 'refused'; field: string; reason: string };

/** How far the running sweep is (performance.now() times). */
export interface Progress {
  done: number;
  total: number;
  startedAt: number;
  now: number;
}

/** The running sweep's progress, read by the progress line alone: the page does not redraw with every count. */
export interface ProgressStore {
  get(): Progress | null;
  subscribe(listener: () => void): () => void;
}

function progressStore(): ProgressStore & { set(p: Progress | null): void } {
  let value: Progress | null = null;
  const listeners = new Set<() => void>();
  return {
    get: () => value,
    set: (p) => {
      value = p;
      for (const l of listeners) l();
    },
    subscribe: (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
  };
}

const sweepWorker = (): WorkerLike =>
  new Worker(new URL('./sweep.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike;

/**
 * While the workers run, the count and time left redraw at most every 100 ms; the variants (the table, chart,
 * map and ranking redraw with them) 2 s after the start, then after 4, 8 … s more, and all at the end: each
 * redraw of thousands of variants is main-thread work the workers wait for on a small machine (D-032).
 */
const PROGRESS_MS = 100;
const FIRST_RESULTS_MS = 2000;
const REWARM_MS = 1000;

const workersHere = () =>
  poolSize(typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency);

/**
 * One sweep at a time on the worker pool: its progress, the variants as they stream in (ever less often), cancel.
 * The pool's workers are started while the page is open, before a run, so a run does not wait for them to load
 * the engine; each run uses them up (it ends by stopping them) and fresh ones start a second later. A new run or
 * leaving the page stops the one before.
 */
export function useSweepRun(createWorker: () => WorkerLike = sweepWorker) {
  const [state, setState] = useState<RunState>({ status: 'idle' });
  const [variants, setVariants] = useState<SweepVariantResult[]>([]);
  const [progress] = useState(progressStore);
  const run = useRef<PoolRun | null>(null);
  const spare = useRef<WorkerLike[]>([]);
  const open = useRef(false);

  const warm = useCallback(() => {
    while (open.current && spare.current.length < workersHere()) {
      const w = createWorker();
      // A worker that cannot load is dropped; the run then starts one of its own (and reports its failure).
      w.onerror = () => {
        spare.current = spare.current.filter((x) => x !== w);
        w.terminate();
      };
      spare.current.push(w);
    }
  }, [createWorker]);

  useEffect(() => {
    open.current = true;
    warm();
    return () => {
      open.current = false;
      run.current?.cancel();
      for (const w of spare.current) w.terminate();
      spare.current = [];
    };
  }, [warm]);

  const start = useCallback(
    (setup: SweepSetup, plan: SweepPlan) => {
      run.current?.cancel();
      const workers = workersHere();
      const chunks = splitSweep(plan.count, chunkTarget(plan.count, workers));
      const startedAt = performance.now();
      let buffer: SweepVariantResult[] = [];
      let done = 0;
      let shown = startedAt;
      let wait = FIRST_RESULTS_MS;
      let flushAt = startedAt + wait;
      const flush = () => {
        const batch = buffer;
        buffer = [];
        if (batch.length > 0) setVariants((v) => v.concat(batch));
      };
      setVariants([]);
      setState({ status: 'running', total: plan.count });
      progress.set({ done: 0, total: plan.count, startedAt, now: startedAt });
      const current = runPool({
        setup,
        chunks,
        size: workers,
        createWorker: () => spare.current.pop() ?? createWorker(),
        onResults: (batch) => {
          for (const v of batch) buffer.push(v);
          done += batch.length;
          const now = performance.now();
          if (now >= flushAt) {
            flush();
            wait *= 2;
            flushAt = now + wait;
          }
          if (now - shown >= PROGRESS_MS) {
            progress.set({ done, total: plan.count, startedAt, now });
            shown = now;
          }
        },
      });
      run.current = current;
      void current.done.then((r) => {
        if (run.current !== current) return;
        run.current = null;
        flush();
        progress.set(null);
        if (r.ok) setState({ status: 'finished', total: plan.count, ms: performance.now() - startedAt });
        else if ('cancelled' in r) setState({ status: 'cancelled', done, total: plan.count });
        else setState({ status: 'refused', field: r.field, reason: r.reason });
        // The next run's workers start once this one's results are drawn, not while they are.
        setTimeout(warm, REWARM_MS);
      });
    },
    [createWorker, progress, warm],
  );

  const cancel = useCallback(() => run.current?.cancel(), []);
  return { state, variants, progress, start, cancel };
}
