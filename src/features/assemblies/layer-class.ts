import type { Material } from '@shared/calc/thermal/materials';

// How layers are drawn (drawClass, isInsulation) lives in shared/sheets/layer-class.ts, shared with the sheet.
/** A sensible first thickness for a library material, m (the person changes it). */
export function defaultThickness(category: Material['category'], name: string): number {
  switch (category) {
    case 'metal':
      return 0.0007;
    case 'insulation':
      return 0.075;
    case 'board':
      return /gypsum|plaster/i.test(name) ? 0.0159 : 0.0127;
    case 'timber':
      return 0.038;
    case 'masonry':
      return 0.1;
    case 'membrane':
      return 0.0002;
    case 'glass':
      return 0.006;
    case 'gas':
      return 0.025;
  }
}

export const CATEGORY_LABELS: Record<Material['category'], string> = {
  metal: 'Metals',
  board: 'Boards and sheathing',
  timber: 'Timber',
  insulation: 'Insulation',
  masonry: 'Masonry and concrete',
  glass: 'Glass',
  gas: 'Gases',
  membrane: 'Membranes and films',
};
