import { bridgeGrid, solveBridge } from '@shared/calc/bridge/bridge';
import type { BridgeModel, BridgeResult } from '@shared/calc/bridge/schema';
import { DomainError } from './errors';

/**
 * The public bridge solve with the work budget of this server (`BRIDGE_MAX_CELLS`): a model whose grid would
 * pass it is refused with 413 `too_much_work` naming `mesh`, before anything is allocated for the solve.
 */
export function createBridgeService(maxCells: number) {
  return {
    solve(model: BridgeModel): BridgeResult {
      const { cells } = bridgeGrid(model);
      if (cells > maxCells)
        throw new DomainError(
          'too_large',
          'too_much_work',
          'the request asks for more work than one request may do',
          {
            mesh: `at most ${maxCells} grid cells (got ${cells}); coarsen the mesh (a larger interfaceCell or maxCell) or model less`,
          },
        );
      return solveBridge(model, maxCells);
    },
  };
}
