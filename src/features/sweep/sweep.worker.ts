import { CalcInputError } from '@shared/calc/errors';
import { planSweep, variantRunner, variantValues } from '@shared/sweep/sweep';
import { packVariants } from './packed';
import type { FromWorker, ToWorker } from './pool';

/** The worker's scope, as much of it as is used (the client's types are the DOM's). */
const scope = self as unknown as {
  onmessage: (e: MessageEvent<ToWorker>) => void;
  postMessage: (message: FromWorker, transfer?: Transferable[]) => void;
};

let sweep: { plan: ReturnType<typeof planSweep>; run: ReturnType<typeof variantRunner> } | null = null;
let refused: { field: string; reason: string } | null = null;

/**
 * The sweep once (planned, and one runner that keeps module runs across chunks), then chunks: each variant of
 * the chunk through the compliance runner, numbered in the whole sweep, packed into numbers (moved, not copied).
 */
scope.onmessage = (e) => {
  const m = e.data;
  if (m.type === 'setup') {
    const { assembly, project, rows, parameters } = m.setup;
    try {
      const plan = planSweep(assembly, parameters, Number.MAX_SAFE_INTEGER);
      sweep = { plan, run: variantRunner(plan, assembly, project, rows) };
    } catch (err) {
      if (!(err instanceof CalcInputError)) throw err;
      refused = { field: err.field, reason: err.reason };
    }
    return;
  }
  if (refused || !sweep) {
    scope.postMessage({
      type: 'refused',
      id: m.id,
      ...(refused ?? { field: 'parameters', reason: 'no sweep' }),
    });
    return;
  }
  const { plan, run } = sweep;
  const variants = Array.from({ length: m.chunk.count }, (_, i) => {
    const index = m.chunk.start + i;
    return run(index, variantValues(plan, index));
  });
  const packed = packVariants(variants);
  scope.postMessage({ type: 'done', id: m.id, packed }, [packed.numbers.buffer]);
};
