import { CalcInputError } from '@shared/calc/errors';
import { runSweep } from '@shared/sweep/sweep';
import { chunkParameters, type FromWorker, type SweepSetup, type ToWorker } from './pool';

/** The worker's scope, as much of it as is used (the client's types are the DOM's). */
const scope = self as unknown as {
  onmessage: (e: MessageEvent<ToWorker>) => void;
  postMessage: (message: FromWorker) => void;
};

let setup: SweepSetup | null = null;

/** The sweep once, then chunks: each run through the compliance runner, its variants numbered within it. */
scope.onmessage = (e) => {
  const m = e.data;
  if (m.type === 'setup') {
    setup = m.setup;
    return;
  }
  if (!setup) return;
  try {
    const { variants } = runSweep(
      setup.assembly,
      setup.project,
      setup.rows,
      chunkParameters(setup.parameters, m.chunk),
      m.chunk.count,
    );
    scope.postMessage({ type: 'done', id: m.id, variants });
  } catch (err) {
    if (!(err instanceof CalcInputError)) throw err;
    scope.postMessage({ type: 'refused', id: m.id, field: err.field, reason: err.reason });
  }
};
