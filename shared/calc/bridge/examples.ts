import { solveBridge } from './bridge';
import type { ComputedBridge } from './computed';
import { computedOf, detailModel, surfaceCheck } from './detail';
import { type BridgeModelInput, bridgeModelSchema } from './schema';
import { sectionOf } from './section';
import type { ClipTemplate, GirtTemplate } from './templates';

/*
 * Invented demo details (not from any product): a steel Z girt through 100 mm of mineral wool between a
 * steel cladding skin and a steel liner (2-D, by hand and as a template), and a 3 mm steel clip 80 mm wide
 * every 0.6 × 0.6 m through the same insulation onto 150 mm of concrete (a template). Used by the API
 * example, the benchmarks and the grid-convergence tests.
 */

const STEEL = 50;
const WOOL = 0.035;
type Pt = number[];
const box = (name: string, lambda: number, min: Pt, max: Pt) => ({ name, lambda, min, max });

/** Girt every 0.6 m: web 1.5 mm, flanges 50 mm; cut at mid-span on both sides (x = 0 and 0.6, adiabatic). */
export function demoGirtModel(mesh: BridgeModelInput['mesh'] = {}): BridgeModelInput {
  const sheet = 0.0006;
  const t = 0.0015;
  const inner = sheet + 0.1;
  return {
    dimension: '2d',
    boxes: [
      box('cladding sheet', STEEL, [0, 0], [0.6, sheet]),
      box('liner', STEEL, [0, inner], [0.6, inner + sheet]),
      box('girt, outer flange', STEEL, [0.3, sheet], [0.35, sheet + t]),
      box('girt, web', STEEL, [0.3, sheet + t], [0.3 + t, inner - t]),
      box('girt, inner flange', STEEL, [0.25 + t, inner - t], [0.3 + t, inner]),
      box('mineral wool', WOOL, [0, sheet], [0.25 + t, inner]),
      box('mineral wool', WOOL, [0.25 + t, sheet], [0.3, inner - t]),
      box('mineral wool', WOOL, [0.3 + t, sheet + t], [0.6, inner]),
      box('mineral wool', WOOL, [0.35, sheet], [0.6, sheet + t]),
    ],
    boundaries: [
      { name: 'outside', side: 'outside', temperature: 0, resistance: 0.04, min: [0, 0], max: [0.6, 0] },
      {
        name: 'inside',
        side: 'inside',
        temperature: 20,
        resistance: 0.13,
        min: [0, inner + sheet],
        max: [0.6, inner + sheet],
      },
    ],
    reference: {
      elements: [{ name: 'wall without the girt', u: demoGirtWallU(), size: 0.6 }],
    },
    mesh,
  };
}

/** U of the girt wall's layers without the girt: 1 / (Rse + Σ d/λ + Rsi) (ISO 6946:2017 eq. 7). */
export function demoGirtWallU(): number {
  return 1 / (0.04 + 0.0006 / STEEL + 0.1 / WOOL + 0.0006 / STEEL + 0.13);
}

/** The same two details as template inputs (girt: the demo girt's wall; clip: the demo clip's wall). */
export const demoWall: { girt: GirtTemplate; clip: ClipTemplate } = {
  girt: {
    layers: [
      { name: 'cladding sheet', thickness: 0.0006, lambda: STEEL },
      { name: 'mineral wool', thickness: 0.1, lambda: WOOL },
      { name: 'liner', thickness: 0.0006, lambda: STEEL },
    ],
    crosses: { from: 1, to: 1 },
    profile: 'z',
    spacing: 0.6,
    thickness: 0.0015,
    outerFlange: 0.05,
    innerFlange: 0.05,
  },
  clip: {
    layers: [
      { name: 'cladding sheet', thickness: 0.0007, lambda: STEEL },
      { name: 'mineral wool', thickness: 0.1, lambda: WOOL },
      { name: 'concrete', thickness: 0.15, lambda: 2 },
    ],
    crosses: { from: 1, to: 1 },
    spacingX: 0.6,
    spacingZ: 0.6,
    width: 0.08,
    thickness: 0.003,
  },
};

/**
 * The demo girt solved on a coarse mesh (5 mm edge cells) as a computed library value: the API example of a
 * computed entry and the tests' stored solve. Dated 2026-01-01 so that it is the same on every run.
 */
export function demoComputedGirt(engineVersion: string): ComputedBridge {
  const detail = { template: 'girt', input: { ...demoWall.girt, mesh: { interfaceCell: 0.005 } } } as const;
  const model = detailModel(detail);
  const result = solveBridge(bridgeModelSchema.parse({ ...model, field: true }));
  const computed = computedOf(
    detail,
    result,
    sectionOf(result),
    surfaceCheck(model),
    { inside: 20, outside: 0 },
    engineVersion,
    new Date('2026-01-01T00:00:00Z'),
  );
  if (!computed) throw new Error('the demo girt gives ψ');
  return computed;
}
