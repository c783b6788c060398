import { type BridgeDetailInput, type ComputedBridge, computedBridgeSchema, MAP_CELLS } from './computed';
import { edgeModel } from './edges';
import type { BridgeModelInput, BridgeResult } from './schema';
import { coarseSection, type Section } from './section';
import { clipModel, fastenerModel, girtModel } from './templates';

/** The solver model of a detail (throws `CalcInputError` naming the template field for impossible inputs). */
export function detailModel(d: BridgeDetailInput): BridgeModelInput {
  if (d.template === 'girt') return girtModel(d.input);
  if (d.template === 'clip') return clipModel(d.input);
  if (d.template === 'fastener') return fastenerModel(d.input);
  return edgeModel(d.input);
}

/**
 * What a computed value keeps: its detail, the solve, the coldest inside surface and f_Rsi, and the map on a
 * coarse grid; null when the solve gave no χ/ψ, no inside surface or no section.
 */
export function computedOf(
  detail: BridgeDetailInput,
  result: Omit<BridgeResult, 'field'>,
  section: Section | null,
  temperatures: { inside: number; outside: number },
  engineVersion: string,
  date: Date,
): ComputedBridge | null {
  const value = result.psi ?? result.chi;
  if (value === null || !result.minInsideSurface || result.fRsi === null || !section) return null;
  return computedBridgeSchema.parse({
    detail,
    engineVersion,
    date: date.toISOString().slice(0, 10),
    cells: result.cells,
    iterations: result.solver.iterations,
    energyBalance: result.solver.energyBalance,
    value,
    ...temperatures,
    minInsideSurface: result.minInsideSurface.temperature,
    fRsi: result.fRsi,
    map: coarseSection(section, MAP_CELLS),
  });
}
