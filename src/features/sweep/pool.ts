import type { CriteriaRowInput } from '@shared/checks/criteria';
import type { ProjectForChecks } from '@shared/checks/inputs';
import type { AssemblyInput } from '@shared/schemas/assembly';
import type { SweepParameter, SweepVariantResult } from '@shared/sweep/schema';
import { type PackedVariants, unpackVariants } from './packed';

/*
 * A sweep split over a small pool of Web Workers. Each worker plans the sweep once and keeps one variant runner
 * (shared/sweep `variantRunner`: each module's run kept by the values of the parameters that touch it), then
 * takes contiguous runs of variant numbers — chunks — as it hands one back; results stream back chunk by chunk,
 * already numbered in the whole sweep and packed into numbers (packed.ts); cancel terminates every worker.
 */

/** A contiguous run of variant numbers. */
export interface Chunk {
  start: number;
  count: number;
}

/** Variants 0 … count − 1 in chunks of at most `target`, in order. */
export const splitSweep = (count: number, target: number): Chunk[] =>
  Array.from({ length: Math.ceil(count / target) }, (_, i) => ({
    start: i * target,
    count: Math.min(target, count - i * target),
  }));

/** What every worker of one sweep is given once. */
export interface SweepSetup {
  assembly: AssemblyInput;
  project: ProjectForChecks;
  rows: CriteriaRowInput[];
  parameters: SweepParameter[];
}

export type ToWorker = { type: 'setup'; setup: SweepSetup } | { type: 'chunk'; id: number; chunk: Chunk };
export type FromWorker =
  | { type: 'done'; id: number; packed: PackedVariants }
  | { type: 'refused'; id: number; field: string; reason: string };

/** The part of a Worker the pool uses (a test passes its own). */
export interface WorkerLike {
  postMessage(message: ToWorker): void;
  onmessage: ((e: MessageEvent<FromWorker>) => void) | null;
  onerror: ((e: ErrorEvent) => void) | null;
  terminate(): void;
}

export interface PoolRun {
  /** Settles when every chunk is back, or with the first refusal or failure (the others are then stopped). */
  done: Promise<{ ok: true } | { ok: false; field: string; reason: string } | { ok: false; cancelled: true }>;
  cancel(): void;
}

/**
 * Runs the chunks on `size` workers, each taking the next chunk when it hands one back; `onResults` receives
 * each chunk's variants (numbered in the whole sweep) in the order they finish.
 */
export function runPool({
  setup,
  chunks,
  size,
  createWorker,
  onResults,
}: {
  setup: SweepSetup;
  chunks: readonly Chunk[];
  size: number;
  createWorker: () => WorkerLike;
  onResults: (variants: SweepVariantResult[]) => void;
}): PoolRun {
  const workers: WorkerLike[] = [];
  let next = 0;
  let back = 0;
  let settled = false;
  let settle: (r: Awaited<PoolRun['done']>) => void = () => {};
  const done = new Promise<Awaited<PoolRun['done']>>((resolve) => {
    settle = resolve;
  });
  const finish = (r: Awaited<PoolRun['done']>) => {
    if (settled) return;
    settled = true;
    for (const w of workers) w.terminate();
    settle(r);
  };
  const feed = (w: WorkerLike) => {
    if (next < chunks.length) {
      const id = next++;
      w.postMessage({ type: 'chunk', id, chunk: chunks[id]! });
    }
  };
  if (chunks.length === 0) finish({ ok: true });
  const count = Math.max(1, Math.min(size, chunks.length));
  for (let i = 0; i < count && !settled; i++) {
    const w = createWorker();
    workers.push(w);
    w.onmessage = (e) => {
      if (settled) return;
      const m = e.data;
      if (m.type === 'refused') return finish({ ok: false, field: m.field, reason: m.reason });
      onResults(unpackVariants(m.packed));
      back++;
      if (back === chunks.length) finish({ ok: true });
      else feed(w);
    };
    w.onerror = (e) => finish({ ok: false, field: 'parameters', reason: e.message || 'a worker stopped' });
    w.postMessage({ type: 'setup', setup });
    feed(w);
  }
  return { done, cancel: () => finish({ ok: false, cancelled: true }) };
}

/** Workers for this machine: one per core the browser reports, 1 to 4. */
export const poolSize = (cores: number | undefined) => Math.max(1, Math.min(4, cores || 2));

/** Chunk size: about ten chunks per worker, 20 to 400 variants each (results stream often, messages stay few). */
export const chunkTarget = (count: number, workers: number) =>
  Math.max(20, Math.min(400, Math.ceil(count / (workers * 10))));

/** Seconds left at the pace so far; null until something is done. */
export const secondsLeft = (done: number, total: number, elapsedMs: number): number | null =>
  done === 0 ? null : ((total - done) * elapsedMs) / done / 1000;
