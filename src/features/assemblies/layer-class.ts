import { findMaterial, type Material } from '@shared/calc/thermal/materials';
import type { Layer } from '@shared/calc/thermal/schema';

/**
 * How a layer is drawn in the section sketch. Taken from the generic library's category when the layer
 * names a library material, otherwise read from its name and λ (a drawing aid only — never used in
 * the calculation).
 */
export type DrawClass =
  | 'metal'
  | 'batt'
  | 'rigid'
  | 'gypsum'
  | 'board'
  | 'masonry'
  | 'membrane'
  | 'air'
  | 'glass'
  | 'other';

const FIBROUS = /wool|batt|blanket|fibre|fiber|glass-fibre|cellulose/i;

function fromMaterial(m: Material): DrawClass {
  switch (m.category) {
    case 'metal':
      return 'metal';
    case 'insulation':
      return FIBROUS.test(m.name) ? 'batt' : 'rigid';
    case 'board':
      return /gypsum|plaster/i.test(m.name) ? 'gypsum' : 'board';
    case 'timber':
      return 'board';
    case 'masonry':
      return 'masonry';
    case 'membrane':
      return 'membrane';
    case 'gas':
      return 'air';
    case 'glass':
      return 'glass';
  }
}

/** Classify by name and conductivity when the layer is not from the generic library. */
export function classifyNamed(name: string, conductivity: number | undefined): DrawClass {
  if (/gypsum|plaster/i.test(name)) return 'gypsum';
  if (/steel|alumin|metal|sheet|skin|zinc|copper/i.test(name) || (conductivity ?? 0) >= 10) return 'metal';
  if (/film|membrane|barrier|wrap|paper|felt/i.test(name)) return 'membrane';
  if (conductivity !== undefined && conductivity <= 0.07) return FIBROUS.test(name) ? 'batt' : 'rigid';
  if (/wool|batt|insulation|foam|polyiso|pir|eps|xps/i.test(name))
    return FIBROUS.test(name) ? 'batt' : 'rigid';
  if (/concrete|brick|block|masonry|render|stucco|stone/i.test(name)) return 'masonry';
  if (/glass/i.test(name)) return 'glass';
  return 'board';
}

export function drawClass(layer: Layer): DrawClass {
  switch (layer.kind) {
    case 'air':
      return 'air';
    case 'resistance':
      return 'membrane';
    case 'framed': {
      const cavity = layer.sections.reduce((a, s) => (s.fraction > a.fraction ? s : a), layer.sections[0]!);
      return cavity ? classifyNamed(cavity.name, cavity.conductivity) : 'batt';
    }
    case 'homogeneous': {
      const m = layer.materialId ? findMaterial(layer.materialId) : undefined;
      return m ? fromMaterial(m) : classifyNamed(layer.name, layer.conductivity);
    }
  }
}

/** Whether a layer is insulation (for placing clips and girts across it). */
export const isInsulation = (layer: Layer) => {
  const c = drawClass(layer);
  return layer.kind === 'homogeneous' && (c === 'batt' || c === 'rigid');
};

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
