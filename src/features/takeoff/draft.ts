import type { Opening, TakeoffInput, Trim, Wall } from '@shared/calc/takeoff/schema';

export const newWall = (index: number): Wall => ({
  name: `Elevation ${String.fromCharCode(65 + (index % 26))}`,
  length: 20,
  height: 6,
  openings: [],
  corners: 1,
});

export const newOpening = (index: number): Opening => ({
  name: `W${index + 1}`,
  width: 1.2,
  height: 1.5,
  count: 1,
});

export const newTrim = (): Trim => ({
  name: 'Trim',
  appliesTo: 'corner',
  stockLength: 3.05,
  lapAllowance: 0.05,
});

/**
 * A blank elevation to start a takeoff from: one wall, 1 m × 6 m vertical panels, 20 × 10 mm panel-joint
 * beads, 10 % waste. Every value is shown and editable.
 */
export const blankTakeoff = (): TakeoffInput => ({
  walls: [newWall(0)],
  module: { width: 1, length: 6, orientation: 'vertical' },
  beads: {
    panel_vertical: { shape: 'rectangular', width: 0.02, depth: 0.01 },
    panel_horizontal: { shape: 'rectangular', width: 0.02, depth: 0.01 },
  },
  wasteFactor: 0.1,
  trims: [],
});

export const replaceAt = <T>(list: readonly T[], i: number, item: T): T[] =>
  list.map((x, k) => (k === i ? item : x));
export const removeAt = <T>(list: readonly T[], i: number): T[] => list.filter((_, k) => k !== i);
