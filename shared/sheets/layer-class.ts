import { findMaterial, type Material } from '../calc/thermal/materials';
import type { Layer } from '../calc/thermal/schema';

/**
 * How a layer is drawn in a section (the printed compliance sheet's sketch): from the generic library's
 * category when the layer names a library material, otherwise from its name and λ. A drawing aid only —
 * never used in a calculation. (Same classes as the builder's on-screen sketch.)
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

/** Whether a layer is insulation that clips and fasteners cross. */
export const isInsulation = (layer: Layer) => {
  const c = drawClass(layer);
  return layer.kind === 'homogeneous' && (c === 'batt' || c === 'rigid');
};

/** Physical thickness of a layer, m (a declared-resistance layer entered without one has none). */
export const layerThickness = (layer: Layer): number => layer.thickness ?? 0;
