import { rankVariants } from '@shared/sweep/rank';
import type { SweepRequest, SweepResult } from '@shared/sweep/schema';
import { runSweep, sweepSize } from '@shared/sweep/sweep';
import { DomainError } from './errors';

/**
 * The public sweep with the work budget of this server (`SWEEP_MAX_VARIANTS`): more variants than that is
 * refused with 413 `too_much_work` naming `parameters`, counted from the ranges and lists before anything runs.
 */
export function createSweepService(maxVariants: number) {
  return {
    run(req: SweepRequest): SweepResult {
      const count = sweepSize(req.parameters);
      if (count > maxVariants)
        throw new DomainError(
          'too_large',
          'too_much_work',
          'the request asks for more work than one request may do',
          {
            parameters: `at most ${maxVariants} variants (got ${count}); vary fewer values or split the sweep`,
          },
        );
      const { plan, ...result } = runSweep(req.assembly, req.project, req.rows, req.parameters, maxVariants);
      return {
        ...result,
        ranking: req.costs ? rankVariants(plan, req.assembly, result.variants, req.costs) : null,
      };
    },
  };
}
