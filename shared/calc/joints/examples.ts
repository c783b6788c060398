import type { JointInput } from './schema';

/**
 * Invented demo data — a joint schedule for a dark aluminium-composite rainscreen over a concrete frame.
 * Plausible numbers, not a published example; shared by the unit tests and the demo seed.
 */
export const demoJointSchedule = (): JointInput[] => [
  {
    name: 'VJ-1 vertical panel joint',
    type: 'panel_vertical',
    designWidth: 0.02,
    designDepth: 0.01,
    sides: [
      { material: 'aluminium-5005', length: 1.5 },
      { material: 'aluminium-5005', length: 1.5 },
    ],
    surfaceTemperatureRange: { min: -25, max: 80 },
    installationTemperature: { min: 5, max: 25 },
    sealant: { movementClass: '50' },
    constructionTolerance: 0.003,
    openingDepth: 0.05,
  },
  {
    name: 'HJ-1 horizontal panel joint',
    type: 'panel_horizontal',
    designWidth: 0.012,
    sides: [{ material: 'aluminium-5005', length: 3.6 }],
    surfaceTemperatureRange: { min: -25, max: 80 },
    installationTemperature: 15,
    otherMovement: { extension: 0.002, compression: 0.002 },
    sealant: { movementClass: '25' },
    constructionTolerance: 0.003,
  },
  {
    name: 'PJ-1 panel to concrete perimeter',
    type: 'perimeter',
    designWidth: 0.019,
    sides: [
      { material: 'aluminium-5005', length: 1.2 },
      { material: 'concrete', length: 3 },
    ],
    surfaceTemperatureRange: { min: -25, max: 70 },
    installationTemperature: { min: 5, max: 25 },
    otherMovement: { extension: 0, compression: 0.003 },
    sealant: { movementClass: '100/50' },
    constructionTolerance: 0.006,
    backer: 'open_cell',
    openingDepth: 0.012,
  },
];
