import { solveBridge } from './bridge';
import { type BridgeDetailInput, type ComputedBridge, computedBridgeSchema, MAP_CELLS } from './computed';
import { edgeModel } from './edges';
import { type BridgeModelInput, type BridgeResult, bridgeModelSchema } from './schema';
import { coarseSection, type Section } from './section';
import { clipModel, fastenerModel, girtModel } from './templates';

/** The solver model of a detail (throws `CalcInputError` naming the template field for impossible inputs). */
export function detailModel(d: BridgeDetailInput): BridgeModelInput {
  if (d.template === 'girt') return girtModel(d.input);
  if (d.template === 'clip') return clipModel(d.input);
  if (d.template === 'fastener') return fastenerModel(d.input);
  return edgeModel(d.input);
}

/** Inside surface resistance of the surface-humidity (mould) check, m²·K/W (ISO 13788:2012 §5, as the moisture engine). */
export const SURFACE_CHECK_RSI = 0.25;

/** The model with every inside surface at Rsi = 0.25 m²·K/W: its f_Rsi is the one ISO 13788 checks. */
export const surfaceCheckModel = (model: BridgeModelInput): BridgeModelInput => ({
  ...model,
  field: false,
  boundaries: model.boundaries.map((b) =>
    b.side === 'inside' ? { ...b, resistance: SURFACE_CHECK_RSI } : b,
  ),
});

/** The surface-check solve of a model, or null when it has no inside surface or not two temperatures. */
export function surfaceCheck(model: BridgeModelInput): ComputedBridge['surface'] | null {
  const r = solveBridge(bridgeModelSchema.parse(surfaceCheckModel(model)));
  if (r.fRsi === null || !r.minInsideSurface) return null;
  return { rsi: SURFACE_CHECK_RSI, fRsi: r.fRsi, minInsideSurface: r.minInsideSurface.temperature };
}

/**
 * What a computed value keeps: its detail, the solve, the coldest inside surface and f_Rsi, and the map on a
 * coarse grid; null when the solve gave no χ/ψ, no inside surface or no section.
 */
export function computedOf(
  detail: BridgeDetailInput,
  result: Omit<BridgeResult, 'field'>,
  section: Section | null,
  surface: ComputedBridge['surface'] | null,
  temperatures: { inside: number; outside: number },
  engineVersion: string,
  date: Date,
): ComputedBridge | null {
  const value = result.psi ?? result.chi;
  if (value === null || !result.minInsideSurface || result.fRsi === null || !section || !surface) return null;
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
    surface,
    map: coarseSection(section, MAP_CELLS),
  });
}
