import type { CriteriaRowInput } from '@shared/checks/criteria';
import type { ProjectForChecks } from '@shared/checks/inputs';
import type { AssemblyInput } from '@shared/schemas/assembly';
import type { SweepParameter, SweepVariantResult } from '@shared/sweep/schema';

/*
 * A sweep split over a small pool of Web Workers. The variants are numbered in mixed radix (the last parameter
 * fastest, as the engine enumerates them), so fixing the values of the first parameters and taking a run of the
 * next one's values is a contiguous stretch of numbers: each chunk is a small sweep of its own (its parameters as
 * lists) whose variant i is variant start + i of the whole. Workers take chunks as they finish one; results stream
 * back chunk by chunk; cancel terminates every worker.
 */

type Value = number | string;

export interface Chunk {
  /** Number of the chunk's first variant in the whole sweep. */
  start: number;
  count: number;
  /** The values of each parameter in this chunk, in order. */
  lists: Value[][];
}

/**
 * The sweep's variants in contiguous chunks of at most `target` variants, or of one value of the last parameter
 * when that alone is more: the split parameter is the first whose later combinations fit in `target`.
 */
export function splitSweep(axes: readonly (readonly Value[])[], target: number): Chunk[] {
  const n = axes.map((v) => v.length);
  // tail[k]: variants per value of parameter k (the product of the later parameters' counts).
  const tail = n.map((_, k) => n.slice(k + 1).reduce((p, x) => p * x, 1));
  const k = tail.findIndex((t) => t <= target);
  const per = Math.max(1, Math.floor(target / tail[k]!));
  const prefixes = n.slice(0, k).reduce((p, x) => p * x, 1);
  const chunks: Chunk[] = [];
  for (let p = 0; p < prefixes; p++) {
    // The values of parameters 0 … k−1 fixed by prefix p (mixed radix, the last fastest).
    const fixed: Value[][] = new Array(k);
    let rest = p;
    for (let i = k - 1; i >= 0; i--) {
      fixed[i] = [axes[i]![rest % n[i]!]!];
      rest = Math.floor(rest / n[i]!);
    }
    for (let j = 0; j < n[k]!; j += per) {
      const slice = axes[k]!.slice(j, j + per);
      chunks.push({
        start: (p * n[k]! + j) * tail[k]!,
        count: slice.length * tail[k]!,
        lists: [...fixed, [...slice], ...axes.slice(k + 1).map((v) => [...v])],
      });
    }
  }
  return chunks;
}

/** A chunk's parameters: the sweep's own, each with the chunk's values as its list. */
export const chunkParameters = (parameters: readonly SweepParameter[], chunk: Chunk): SweepParameter[] =>
  parameters.map((p, i) => {
    if (p.kind === 'sealantClass') return { ...p, list: chunk.lists[i] as typeof p.list };
    const { range: _range, ...rest } = p;
    return { ...rest, list: chunk.lists[i] as number[] };
  });

/** A chunk's results numbered as variants of the whole sweep. */
export const placeChunk = (chunk: Chunk, results: readonly SweepVariantResult[]): SweepVariantResult[] =>
  results.map((r) => ({ ...r, index: chunk.start + r.index }));

/** What every worker of one sweep is given once. */
export interface SweepSetup {
  assembly: AssemblyInput;
  project: ProjectForChecks;
  rows: CriteriaRowInput[];
  parameters: SweepParameter[];
}

export type ToWorker = { type: 'setup'; setup: SweepSetup } | { type: 'chunk'; id: number; chunk: Chunk };
export type FromWorker =
  | { type: 'done'; id: number; variants: SweepVariantResult[] }
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
 * each chunk's variants numbered in the whole sweep, in the order they finish.
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
      onResults(placeChunk(chunks[m.id]!, m.variants));
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
