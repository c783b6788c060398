import type { TakeoffInput } from './schema';

/**
 * Invented demo data — a two-storey metal-panel building, four elevations, vertical 1 m panels up to
 * 6 m long. Plausible numbers, not a published example; shared by the unit tests and the demo seed.
 */
export const demoElevation = (): TakeoffInput => ({
  walls: [
    {
      name: 'North elevation',
      length: 24,
      height: 7.2,
      corners: 1,
      openings: [
        { name: 'W1 window', width: 1.8, height: 1.5, count: 6 },
        { name: 'D1 door', width: 1.8, height: 2.4, count: 1, kind: 'door' },
      ],
    },
    {
      name: 'East elevation',
      length: 12,
      height: 7.2,
      corners: 1,
      openings: [{ name: 'W2 window', width: 1.2, height: 1.5, count: 4 }],
    },
    { name: 'South elevation', length: 24, height: 7.2, corners: 1, openings: [] },
    {
      name: 'West elevation',
      length: 12,
      height: 7.2,
      corners: 1,
      openings: [{ name: 'D2 door', width: 3, height: 3, count: 1, kind: 'door' }],
    },
  ],
  module: { width: 1, length: 6, orientation: 'vertical' },
  beads: {
    panel_vertical: { shape: 'rectangular', width: 0.02, depth: 0.01 },
    panel_horizontal: { shape: 'rectangular', width: 0.02, depth: 0.01 },
    perimeter: { shape: 'rectangular', width: 0.019, depth: 0.0095 },
    opening: { shape: 'rectangular', width: 0.012, depth: 0.012 },
    corner: { shape: 'fillet', leg: 0.01 },
  },
  wasteFactor: 0.1,
  trims: [
    { name: 'Outside corner trim', appliesTo: 'corner', stockLength: 3.05, lapAllowance: 0.05 },
    { name: 'Base flashing', appliesTo: 'base', stockLength: 3.05, lapAllowance: 0.05 },
    { name: 'Opening surround', appliesTo: 'opening', stockLength: 3.05, lapAllowance: 0.05 },
  ],
  fasteners: { spacingAlongGirt: 0.3, girtSpacing: 1.2 },
  tape: { width: 0.025, appliesTo: ['opening', 'perimeter'], rollLength: 25 },
});
