import { siValue } from '@shared/units';
import type { FramedLayer, ThermalInput } from './schema';

/** 92 mm steel studs at 406 mm with glass-fibre batts (the 1.1 mm web's share of the spacing is steel). */
export const steelStudsWithBatts = (): FramedLayer => ({
  kind: 'framed',
  name: 'Steel studs 92 mm @ 406 mm with batts',
  thickness: 0.092,
  metal: true,
  flangeWidth: 0.041,
  spacing: 0.406,
  sections: [
    { name: 'Glass-fibre batt', conductivity: 0.04, fraction: 1 - 0.0011 / 0.406 },
    { name: 'Steel web', conductivity: 50, fraction: 0.0011 / 0.406 },
  ],
});

/**
 * A metal-panel rainscreen over mineral wool and an insulated steel-stud backup wall — ten layers, one of
 * each bridge type. Shared by the unit tests and the benchmark; the numbers are plausible, not published.
 */
export const metalPanelWall = (): ThermalInput => ({
  heatFlow: 'horizontal',
  layers: [
    {
      kind: 'homogeneous',
      name: 'Steel face sheet',
      thickness: 0.0007,
      conductivity: 50,
      materialId: 'steel',
    },
    { kind: 'air', name: 'Drained cavity', thickness: 0.025, ventilation: 'slightly', ventArea: 1000 },
    { kind: 'resistance', name: 'Water-resistive barrier', resistance: 0.01, thickness: 0.0005 },
    {
      kind: 'homogeneous',
      name: 'Mineral wool board',
      thickness: 0.1,
      conductivity: 0.035,
      materialId: 'mineral-wool-board',
    },
    { kind: 'homogeneous', name: 'Exterior gypsum sheathing', thickness: 0.0159, conductivity: 0.25 },
    { kind: 'air', name: 'Gap behind sheathing', thickness: 0.005, ventilation: 'unventilated' },
    steelStudsWithBatts(),
    {
      kind: 'homogeneous',
      name: 'Polyethylene film',
      thickness: 0.00015,
      conductivity: 0.33,
      materialId: 'pe-film',
    },
    { kind: 'air', name: 'Service gap', thickness: 0.015, ventilation: 'unventilated' },
    { kind: 'homogeneous', name: 'Interior gypsum board', thickness: 0.0159, conductivity: 0.25 },
  ],
  bridges: [
    {
      kind: 'point',
      name: 'Aluminium clips',
      chi: siValue<'W/K'>(0.03),
      spacingHorizontal: 0.406,
      spacingVertical: 0.6,
    },
    { kind: 'linear', name: 'Horizontal girts', psi: siValue<'ψ W/(m·K)'>(0.02), spacing: 1.2 },
    {
      kind: 'fastener',
      name: 'Insulation screws',
      conductivity: 50,
      diameter: 0.005,
      countPerArea: 4,
      penetration: 'full',
      layerIndex: 3,
    },
  ],
});
