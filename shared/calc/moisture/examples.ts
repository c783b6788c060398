import { steelStudsWithBatts } from '@shared/calc/thermal/examples';
import type { MoistureInput, MoistureLayer, MonthClimate } from './schema';

/**
 * INVENTED DEMO DATA — a plausible cold continental year (monthly means, January first). It is not the
 * climate of any real place and must not be used for design; enter the project's own monthly climate
 * (e.g. from ISO 15927-1 processing of local records).
 */
export const coldClimateYear = (): MonthClimate[] =>
  (
    [
      [-12, 0.84],
      [-10, 0.82],
      [-4, 0.77],
      [4, 0.7],
      [11, 0.65],
      [16, 0.68],
      [19, 0.7],
      [18, 0.73],
      [12, 0.77],
      [5, 0.8],
      [-2, 0.85],
      [-9, 0.86],
    ] as const
  ).map(([t, rh]) => ({ exteriorTemperature: t, exteriorRelativeHumidity: rh }));

/**
 * A metal-panel rainscreen over mineral wool and an insulated steel-stud backup wall, eight layers outside →
 * inside, with vapour data (μ from data/reference/materials.json where it has one). With
 * `vapourRetarder: false` the polyethylene film is left out, which makes the sheathing plane condense in
 * winter. Shared by the unit tests and the benchmark; the numbers are plausible, not published.
 */
export function metalPanelMoistureWall({ vapourRetarder = true } = {}): MoistureInput {
  const layers: MoistureLayer[] = [
    {
      kind: 'homogeneous',
      name: 'Steel face panel',
      thickness: 0.0007,
      conductivity: 50,
      materialId: 'steel',
      // Vapour-tight; taken as s_d = 1500 m, the "diffusion-tight" threshold of DIN 4108-3.
      vapour: { kind: 'sd', sd: 1500 },
    },
    {
      kind: 'air',
      name: 'Ventilated cavity',
      thickness: 0.025,
      ventilation: 'well',
      vapour: { kind: 'mu', mu: 1 },
    },
    {
      kind: 'resistance',
      name: 'Water-resistive barrier',
      resistance: 0.01,
      vapour: { kind: 'usPerm', perm: 50, reference: '23C' },
    },
    {
      kind: 'homogeneous',
      name: 'Mineral wool board',
      thickness: 0.1,
      conductivity: 0.035,
      materialId: 'mineral-wool-board',
      vapour: { kind: 'mu', mu: 1 },
    },
    {
      kind: 'homogeneous',
      name: 'Exterior gypsum sheathing',
      thickness: 0.0159,
      conductivity: 0.25,
      materialId: 'gypsum-board',
      vapour: { kind: 'mu', mu: 10 },
    },
    { ...steelStudsWithBatts(), vapour: { kind: 'mu', mu: 1 } },
    {
      kind: 'homogeneous',
      name: 'Polyethylene film',
      thickness: 0.00015,
      conductivity: 0.33,
      materialId: 'pe-film',
      vapour: { kind: 'mu', mu: 100000 },
    },
    {
      kind: 'homogeneous',
      name: 'Interior gypsum board',
      thickness: 0.0159,
      conductivity: 0.25,
      materialId: 'gypsum-board',
      vapour: { kind: 'mu', mu: 10 },
    },
  ];
  return {
    layers: vapourRetarder ? layers : layers.filter((l) => l.name !== 'Polyethylene film'),
    heatFlow: 'horizontal',
    interior: { kind: 'humidityClass', temperature: 20, humidityClass: 3 },
    months: coldClimateYear(),
  };
}
