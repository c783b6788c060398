import type { Vapour } from '@shared/calc/moisture/schema';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import type { Material } from '@shared/calc/thermal/materials';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import type {
  AssemblyInput,
  assemblyInputSchema,
  BridgeValue,
  BridgeValueInput,
  OrgMaterial,
} from '@shared/schemas/assembly';
import { siValue } from '@shared/units';
import { createContext, useContext } from 'react';
import type { FieldPath } from 'react-hook-form';
import type { z } from 'zod';
import { defaultThickness } from './layer-class';

/** What the builder's form holds: the shared input schema (numbers may be NaN while a box is unreadable). */
export type AssemblyFormValues = z.input<typeof assemblyInputSchema>;
export type FormPath = FieldPath<AssemblyFormValues>;

/** Cast a path built at run time (`thermal.layers.${i}.thickness`) to the form's path type. */
export const p = (path: string) => path as FormPath;

export type StartingPoint = 'sample' | 'blank';

/** The sample build-up (a metal-panel rainscreen over mineral wool and a steel-stud backup) or a blank one. */
export function startingInput(start: StartingPoint): AssemblyInput {
  if (start === 'blank')
    return {
      name: '',
      description: '',
      wallCategory: 'steel_framed',
      attachment: { girtOrientation: 'horizontal', clipType: '', fastenerType: '' },
      thermal: { heatFlow: 'horizontal', layers: [], bridges: [] },
    };
  return {
    name: 'Metal-panel rainscreen on steel studs',
    description: 'Sample build-up: adjust every layer and attachment to the project before relying on it.',
    wallCategory: 'steel_framed',
    attachment: {
      girtOrientation: 'horizontal',
      clipType: 'Aluminium clip',
      fastenerType: 'Insulation screw',
    },
    thermal: metalPanelWall(),
  };
}

export type LayerKind = Layer['kind'];

export const LAYER_KIND_LABELS: Record<LayerKind, string> = {
  homogeneous: 'Solid layer (d/λ)',
  resistance: 'Declared R',
  air: 'Air layer',
  framed: 'Framed layer (sections)',
};

/** A new layer of a kind, carrying over what still makes sense (name, thickness). */
export function layerOfKind(kind: LayerKind, from?: Partial<Layer>): Layer {
  const name = from?.name || 'New layer';
  const thickness =
    from && 'thickness' in from && typeof from.thickness === 'number' ? from.thickness : 0.025;
  switch (kind) {
    case 'homogeneous':
      return { kind, name, thickness, conductivity: 0.035 };
    case 'resistance':
      return { kind, name, resistance: 0.1, thickness };
    case 'air':
      return { kind, name, thickness: Math.min(thickness, 0.3), ventilation: 'unventilated' };
    case 'framed':
      return {
        kind,
        name,
        thickness,
        metal: false,
        sections: [
          { name: 'Insulation', conductivity: 0.04, fraction: 0.85 },
          { name: 'Framing', conductivity: 0.13, fraction: 0.15 },
        ],
      };
  }
}

export const layerFromGeneric = (m: Material): Layer => ({
  kind: 'homogeneous',
  name: m.name,
  thickness: defaultThickness(m.category, m.name),
  conductivity: m.conductivity,
  materialId: m.id,
});

/**
 * The vapour data a new layer starts with: the library's μ (dry cup, else wet cup) when it has one; null —
 * "vapour data needed", shown at once on the build-up and moisture pages — for a vapour-tight row (μ = ∞, the
 * product's s_d is needed) or a layer entered by hand.
 */
export function vapourFromGeneric(m: Material): Vapour | null {
  const mu = m.mu.dry ?? m.mu.wet;
  return mu === null ? null : { kind: 'mu', mu };
}

/** A firm material's μ as the new layer's vapour data, or null when the firm entered none. */
export const vapourFromFirm = (m: OrgMaterial): Vapour | null =>
  m.vapourResistanceFactor === undefined ? null : { kind: 'mu', mu: m.vapourResistanceFactor };

/** A firm material carries no `materialId`: that field names the generic library only. */
export const layerFromFirm = (m: OrgMaterial): Layer => ({
  kind: 'homogeneous',
  name: m.name.slice(0, 120),
  thickness: 0.05,
  conductivity: m.conductivity,
});

export type BridgeRole = 'clip' | 'girt' | 'fastener';

export function newBridge(role: BridgeRole, insulationIndex: number): Bridge {
  switch (role) {
    case 'clip':
      return {
        kind: 'point',
        name: 'Clips',
        chi: siValue<'W/K'>(0.03),
        spacingHorizontal: 0.406,
        spacingVertical: 0.6,
      };
    case 'girt':
      return { kind: 'linear', name: 'Girts', psi: siValue<'ψ W/(m·K)'>(0.02), spacing: 1.2 };
    case 'fastener':
      return {
        kind: 'fastener',
        name: 'Fasteners',
        conductivity: 50,
        diameter: 0.005,
        countPerArea: 4,
        penetration: 'full',
        layerIndex: insulationIndex,
      };
  }
}

/** Layer indexes after moving one layer from `from` to `to` (for fasteners that name the layer they cross). */
export function remapAfterMove(index: number, from: number, to: number): number {
  if (index === from) return to;
  if (from < to && index > from && index <= to) return index - 1;
  if (from > to && index >= to && index < from) return index + 1;
  return index;
}

/** Layer indexes after removing one; the removed layer itself → -1 (the person chooses again). */
export const remapAfterRemove = (index: number, removed: number) =>
  index === removed ? -1 : index > removed ? index - 1 : index;

/** Layer indexes after inserting one at `at`. */
export const remapAfterInsert = (index: number, at: number) => (index >= at ? index + 1 : index);

export interface BuilderContextValue {
  /** Form path → reason (from the schema, the engine or the server). */
  errors: Record<string, string>;
  readOnly: boolean;
  firmName: string | null;
  firmMaterials: readonly OrgMaterial[];
  bridgeValues: readonly BridgeValue[];
  /** Save a computed χ/ψ to the firm library (absent unless the person is its editor or administrator). */
  saveBridgeValue?: { firmName: string; add: (entry: BridgeValueInput) => Promise<{ id: string }> };
  /** Per layer, its R (m²·K/W) from the live result's trace, when there is one. */
  layerR: (index: number) => number | undefined;
  /** Layers outside a well-ventilated air layer (and that layer) do not count (ISO 6946 §6.9). */
  disregarded: (index: number) => boolean;
  /** Name what a removal removes, for the save bar's “Removed … — Undo”. */
  markRemoval: (what: string) => void;
}

export const BuilderContext = createContext<BuilderContextValue>({
  errors: {},
  readOnly: false,
  firmName: null,
  firmMaterials: [],
  bridgeValues: [],
  layerR: () => undefined,
  disregarded: () => false,
  markRemoval: () => {},
});

export const useBuilder = () => useContext(BuilderContext);
