import type { BeadProfile, TakeoffJointType } from '@shared/calc/takeoff/schema';

export const TAKEOFF_TYPE_LABELS: Record<TakeoffJointType, string> = {
  panel_vertical: 'Vertical panel joints',
  panel_horizontal: 'Horizontal panel joints',
  perimeter: 'Perimeter joints (head, abutting ends)',
  opening: 'Opening perimeters',
  corner: 'Corners',
  base: 'Base',
};

export const BEAD_SHAPE_LABELS: Record<BeadProfile['shape'], string> = {
  round: 'Round bead',
  fillet: 'Triangular fillet',
  rectangular: 'Rectangular (W × D)',
};
