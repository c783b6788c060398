import type { BridgeModelInput } from '@shared/calc/bridge/schema';
import type { SolveOutcome } from './run-bridge';

/** A solve under way: its outcome, and a way to stop it. */
export interface RunningSolve {
  outcome: Promise<SolveOutcome>;
  cancel: () => void;
}
export type BridgeRunner = (model: BridgeModelInput) => RunningSolve;

/** In a Web Worker, so the page never waits; cancel terminates the worker. */
export const workerRunner: BridgeRunner = (model) => {
  const worker = new Worker(new URL('./bridge.worker.ts', import.meta.url), { type: 'module' });
  let settle: (o: SolveOutcome) => void = () => {};
  const outcome = new Promise<SolveOutcome>((resolve) => {
    settle = resolve;
  });
  worker.onmessage = (e: MessageEvent<SolveOutcome>) => {
    settle(e.data);
    worker.terminate();
  };
  worker.onerror = (e) => {
    settle({ ok: false, field: 'model', reason: e.message || 'the solver stopped' });
    worker.terminate();
  };
  worker.postMessage(model);
  return { outcome, cancel: () => worker.terminate() };
};
