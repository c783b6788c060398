import { checkCosts, rankVariants } from '@shared/sweep/rank';
import type { SweepRequest, SweepResult } from '@shared/sweep/schema';
import { SWEEP_SEARCH_MAX_COMBINATIONS, SWEEP_SEARCH_MAX_VALUES, searchSweep } from '@shared/sweep/search';
import { planSweep, runSweep, sweepSize } from '@shared/sweep/sweep';
import { DomainError } from './errors';

/**
 * The public sweep with the work budget of this server (`SWEEP_MAX_VARIANTS`): more variants than that is
 * refused with 413 `too_much_work` naming `parameters`, counted from the ranges and lists before anything runs —
 * unless the request says `mode: "search"`, which runs at most that many (shared/sweep/search.ts) and says what
 * was and was not explored.
 */
export function createSweepService(maxVariants: number) {
  return {
    run(req: SweepRequest): SweepResult {
      const search = req.mode === 'search';
      const count = sweepSize(req.parameters);
      if (!search && count > maxVariants)
        throw new DomainError(
          'too_large',
          'too_much_work',
          'the request asks for more work than one request may do',
          {
            parameters: `at most ${maxVariants} variants (got ${count}); vary fewer values, split the sweep or ask for mode "search"`,
          },
        );
      const plan = search
        ? planSweep(req.assembly, req.parameters, SWEEP_SEARCH_MAX_COMBINATIONS, SWEEP_SEARCH_MAX_VALUES)
        : planSweep(req.assembly, req.parameters, maxVariants);
      // A missing price is refused before anything runs.
      if (req.costs) checkCosts(plan, req.assembly, req.costs);
      const { plan: ran, ...result } = search
        ? searchSweep(req.assembly, req.project, req.rows, req.parameters, maxVariants)
        : runSweep(req.assembly, req.project, req.rows, req.parameters, maxVariants);
      return {
        ...result,
        ranking: req.costs ? rankVariants(ran, req.assembly, result.variants, req.costs) : null,
      };
    },
  };
}
