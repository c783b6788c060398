import type { JointInput, JointSide } from '@shared/calc/joints/schema';
import { defaultSurfaceTemperatureRange } from '@shared/calc/joints/surface-temperature';

/** Air design temperatures to start a new joint from (the project's, when it has them). */
export interface AirDesign {
  min: number;
  max: number;
}

/** A finite range with min below max, else null (a new joint then starts from a generic range). */
const usable = (air: AirDesign | null | undefined) =>
  air && Number.isFinite(air.min) && Number.isFinite(air.max) && air.min < air.max ? air : null;

/**
 * A new joint: two aluminium panel edges, a medium finish in sun from the project's air design range,
 * installed at 15 °C (or mid-range), class 25, 3 mm tolerance. Every value is shown and editable.
 */
export function newJoint(index: number, air?: AirDesign | null): JointInput {
  const a = usable(air);
  const surface = a ? defaultSurfaceTemperatureRange(a, 'medium', 'sun') : { min: -25, max: 65 };
  const mid = Math.round((surface.min + surface.max) / 2);
  const install = surface.min <= 15 && 15 <= surface.max ? 15 : mid;
  return {
    name: `J-${index + 1}`,
    type: 'panel_vertical',
    designWidth: 0.02,
    sides: [
      { material: 'aluminium-5005', length: 3 },
      { material: 'aluminium-5005', length: 3 },
    ],
    surfaceTemperatureRange: surface,
    installationTemperature: install,
    sealant: { movementClass: '25' },
    constructionTolerance: 0.003,
  };
}

/** A copy of a joint under a new mark. */
export const copyJoint = (j: JointInput, index: number): JointInput => ({
  ...structuredClone(j),
  name: `${j.name} (copy)`.slice(0, 120) || `J-${index + 1}`,
});

export const newSide = (like?: JointSide): JointSide =>
  like && 'material' in like
    ? { material: like.material, length: like.length }
    : { material: 'concrete', length: 3 };

/** Replace item `i` of a list (immutably). */
export const replaceAt = <T>(list: readonly T[], i: number, item: T): T[] =>
  list.map((x, k) => (k === i ? item : x));
export const removeAt = <T>(list: readonly T[], i: number): T[] => list.filter((_, k) => k !== i);
