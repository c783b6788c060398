import type { JointInput } from '../calc/joints/schema';
import { findMaterial } from '../calc/thermal/materials';
import type { Bridge, Layer } from '../calc/thermal/schema';
import type { AssemblyInput } from '../schemas/assembly';
import { siValue } from '../units';

/**
 * Starting build-ups offered on "New assembly": each a complete input (layers, bridges, joints where the wall
 * has sealed panel joints) that the person then fits to the project. λ values come from the generic material
 * library; χ and ψ are starting values to be replaced by tested or calculated ones.
 */
export const TEMPLATE_NOTE =
  'λ: generic design values (ISO 10456 / ASHRAE Fundamentals) — use the maker’s declared values. χ and ψ: starting values — replace them with tested or calculated ones.';

const BRIDGE_SOURCE = {
  text: 'Template starting value — replace with the tested or calculated value for the chosen product',
};

/** A solid layer with the library's generic λ (throws at import when the id is not in the library). */
function generic(id: string, thickness: number, name?: string): Layer {
  const m = findMaterial(id);
  if (!m) throw new Error(`template material ${id} is not in the generic library`);
  return {
    kind: 'homogeneous',
    name: name ?? m.name,
    thickness,
    conductivity: m.conductivity,
    materialId: id,
  };
}

/** Steel studs with batts: the web's share of the area is t_web / spacing (zone method input). */
function steelStuds(depth: number, spacing: number): Layer {
  const web = 0.0011 / spacing;
  const batt = findMaterial('mineral-wool-batt')!;
  return {
    kind: 'framed',
    name: `Steel studs ${Math.round(depth * 1000)} mm @ ${Math.round(spacing * 1000)} mm with batts`,
    thickness: depth,
    metal: true,
    flangeWidth: 0.041,
    spacing,
    sections: [
      { name: batt.name, conductivity: batt.conductivity, fraction: 1 - web },
      { name: 'Steel web', conductivity: findMaterial('steel')!.conductivity, fraction: web },
    ],
  };
}

const clips = (name: string, chi: number, h: number, v: number): Bridge => ({
  kind: 'point',
  name,
  chi: siValue<'W/K'>(chi),
  spacingHorizontal: h,
  spacingVertical: v,
  source: BRIDGE_SOURCE,
});
const linear = (name: string, psi: number, spacing: number): Bridge => ({
  kind: 'linear',
  name,
  psi: siValue<'ψ W/(m·K)'>(psi),
  spacing,
  source: BRIDGE_SOURCE,
});

/** A sealed joint between two faces of one metal, temperatures for a cold-climate elevation. */
const metalJoint = (
  name: string,
  type: JointInput['type'],
  material: string,
  panelLength: number,
  designWidth: number,
  movementClass: JointInput['sealant']['movementClass'] = '50',
): JointInput => ({
  name,
  type,
  designWidth,
  sides: [
    { material, length: panelLength },
    { material, length: panelLength },
  ],
  surfaceTemperatureRange: { min: -30, max: 80 },
  installationTemperature: { min: 5, max: 25 },
  sealant: { movementClass },
  constructionTolerance: 0.003,
});

const steelStudInterior = (stud: number): Layer[] => [
  generic('gypsum-board', 0.0159, 'Exterior gypsum sheathing'),
  steelStuds(stud, 0.406),
  generic('pe-film', 0.00015),
  generic('gypsum-board', 0.0159, 'Interior gypsum board'),
];

export interface AssemblyTemplate {
  /** The `start` value in the New assembly address. */
  id: string;
  title: string;
  input: AssemblyInput;
}

export const ASSEMBLY_TEMPLATES: readonly AssemblyTemplate[] = [
  {
    id: 'insulated-panel',
    title: 'Insulated metal panel on girts',
    input: {
      name: 'Insulated metal panel on girts',
      description:
        'Template: 100 mm foam-core insulated metal panel (steel faces) through-fastened to steel girts at 1.8 m.',
      wallCategory: 'metal_building',
      attachment: {
        girtOrientation: 'horizontal',
        clipType: 'Through-fastened (no clip)',
        fastenerType: 'Self-drilling screw with sealing washer',
        girtSpacing: 1.8,
      },
      thermal: {
        heatFlow: 'horizontal',
        layers: [
          generic('steel', 0.0005, 'Exterior steel face'),
          generic('pir-panel-core', 0.1),
          generic('steel', 0.0004, 'Interior steel face'),
        ],
        bridges: [
          clips('Through-fasteners (panel to girt)', 0.004, 0.333, 1.8),
          linear('Panel side joints', 0.02, 1),
        ],
      },
      joints: [
        metalJoint('VJ-1 panel side joint', 'panel_vertical', 'carbon-steel', 1, 0.012, '25'),
        metalJoint('HJ-1 panel end joint', 'panel_horizontal', 'carbon-steel', 3.6, 0.025),
      ],
    },
  },
  {
    id: 'rainscreen',
    title: 'Metal rainscreen on clips and girts over mineral wool',
    input: {
      name: 'Metal rainscreen on clips and girts over mineral wool',
      description:
        'Template: steel rainscreen panels on girts and clips through 100 mm mineral wool, steel-stud backup.',
      wallCategory: 'steel_framed',
      attachment: {
        girtOrientation: 'horizontal',
        clipType: 'Thermally broken clip',
        fastenerType: 'Self-drilling screw',
        girtSpacing: 1.2,
        clipSpacing: 0.8,
      },
      thermal: {
        heatFlow: 'horizontal',
        layers: [
          generic('steel', 0.0007, 'Steel rainscreen panel'),
          { kind: 'air', name: 'Ventilated cavity', thickness: 0.025, ventilation: 'well' },
          { kind: 'resistance', name: 'Water-resistive barrier', resistance: 0.01, thickness: 0.0005 },
          generic('mineral-wool-board', 0.1),
          ...steelStudInterior(0.092),
        ],
        bridges: [clips('Clips (girt to stud)', 0.03, 0.8, 1.2), linear('Horizontal girts', 0.02, 1.2)],
      },
      joints: [
        metalJoint('VJ-1 vertical panel joint', 'panel_vertical', 'aluminium-5005', 1.5, 0.02),
        metalJoint('HJ-1 horizontal panel joint', 'panel_horizontal', 'aluminium-5005', 3.6, 0.035),
      ],
    },
  },
  {
    id: 'steel-stud',
    title: 'Steel-stud backup with exterior insulation',
    input: {
      name: 'Steel-stud backup with exterior insulation',
      description:
        'Template: cladding on a ventilated cavity, 75 mm mineral wool held by screws, 152 mm steel studs with batts.',
      wallCategory: 'steel_framed',
      attachment: {
        girtOrientation: 'vertical',
        clipType: 'Vertical rails on the insulation',
        fastenerType: 'Insulation screw',
      },
      thermal: {
        heatFlow: 'horizontal',
        layers: [
          generic('steel', 0.0007, 'Cladding (steel sheet)'),
          { kind: 'air', name: 'Ventilated cavity', thickness: 0.025, ventilation: 'well' },
          generic('mineral-wool-board', 0.075),
          ...steelStudInterior(0.152),
        ],
        bridges: [
          {
            kind: 'fastener',
            name: 'Insulation screws',
            conductivity: findMaterial('steel')!.conductivity,
            diameter: 0.005,
            countPerArea: 4,
            penetration: 'full',
            layerIndex: 2,
          },
        ],
      },
    },
  },
];

/** The template with this id, or undefined. */
export const findTemplate = (id: string | null): AssemblyTemplate | undefined =>
  ASSEMBLY_TEMPLATES.find((t) => t.id === id);
