import { measure } from '@shared/calc/answer';
import { traceStepSchema } from '@shared/calc/trace';
import { K, M, PER_K } from '@shared/calc/trace-units';
import { jointWarningSchema, warningsSchema } from '@shared/format/message-schema';
import type { Unbranded } from '@shared/units/brands';
import { z } from 'zod';

/**
 * Sealant-joint contract — the single source of truth for the API, the forms and the engine.
 * Everything is SI: metres, °C, 1/K. A joint is sized for movement by the ASTM C1193 approach with the
 * installation-temperature split of ASTM C1472 and the movement classes of ASTM C920.
 */

/**
 * A length `min` … `max`, m. The default lower bound, 1 mm, is below any joint, bead or tolerance that can be
 * built; less is a typing or unit slip (and would let the movement ratios overflow).
 */
const metres = (what: string, max: number, min = 0.001) =>
  z
    .number()
    .min(min, `at least ${min} m — less is a typing or unit slip`)
    .max(max)
    .describe(`${what}, m (at least ${min} m, at most ${max} m)`)
    .brand<'m'>();
const metresOrZero = (what: string, max: number) =>
  z.number().nonnegative().max(max).describe(`${what}, m (0 to ${max} m)`).brand<'m'>();
const celsius = (what: string) =>
  z.number().min(-80).max(120).describe(`${what}, °C (−80 to 120 °C)`).brand<'°C'>();

export const JOINT_TYPES = ['panel_vertical', 'panel_horizontal', 'perimeter', 'corner', 'other'] as const;
export const jointTypeSchema = z.enum(JOINT_TYPES).describe('Where the joint sits in the wall');

/** ASTM C920 movement classes; 100/50 = +100 % extension / −50 % compression, the others symmetric. */
export const MOVEMENT_CLASSES = ['12.5', '25', '35', '50', '100/50'] as const;
export const movementClassSchema = z
  .enum(MOVEMENT_CLASSES)
  .describe('ASTM C920 movement class: ±12.5, ±25, ±35, ±50 %, or 100/50 (+100 % / −50 %)');

const sideLength = metres(
  'Length L of material whose movement this side puts into the joint (the panel length for a panel fixed at its far end; half of it for a panel anchored at mid-length)',
  100,
  0.01,
);

export const materialSideSchema = z.object({
  material: z.string().min(1).max(100).describe('Id of a row in data/reference/thermal-expansion.json'),
  length: sideLength,
});
export const customSideSchema = z.object({
  alpha: z
    .number()
    .min(1e-7, 'at least 1 × 10⁻⁷ 1/K — below any building material (Invar is about 1.2 × 10⁻⁶)')
    .max(5e-4)
    .describe(
      'Declared coefficient of linear thermal expansion α, 1/K (at least 1 × 10⁻⁷, at most 5 × 10⁻⁴)',
    ),
  label: z.string().min(1).max(120).optional().describe('What the custom α belongs to, e.g. the product'),
  length: sideLength,
});
export const jointSideSchema = z.union([materialSideSchema, customSideSchema]);

export const temperatureRangeSchema = z.object({
  min: celsius('Lowest surface temperature of the moving material'),
  max: celsius('Highest surface temperature of the moving material (dark metal in sun runs far above air)'),
});

export const installationTemperatureSchema = z.union([
  celsius('Surface temperature when the sealant is installed'),
  z.object({
    min: celsius('Coolest surface temperature expected during installation'),
    max: celsius('Warmest surface temperature expected during installation'),
  }),
]);

export const BACKER_CELLS = ['closed_cell', 'open_cell'] as const;

export const jointInputSchema = z.object({
  name: z.string().min(1).max(120).describe('Joint mark, e.g. "VJ-1 vertical panel joint, level 3"'),
  type: jointTypeSchema,
  designWidth: metres('Joint width as designed (at installation)', 0.2),
  designDepth: metres('Sealant depth as designed', 0.1).optional(),
  sides: z
    .array(jointSideSchema)
    .min(1)
    .max(2)
    .describe('One side (joint against fixed construction) or two sides (both substrates move)'),
  surfaceTemperatureRange: temperatureRangeSchema,
  installationTemperature: installationTemperatureSchema,
  otherMovement: z
    .object({
      extension: metresOrZero('Non-thermal opening of the joint (moisture shrinkage, drift, seismic)', 0.2),
      compression: metresOrZero('Non-thermal closing of the joint (moisture growth, creep, drift)', 0.2),
    })
    .optional()
    .describe('Non-thermal movement entered by the designer; omitted = none'),
  sealant: z.object({ movementClass: movementClassSchema }),
  constructionTolerance: metresOrZero('Construction tolerance added to the width', 0.05),
  minimumPracticalWidth: metres(
    'Smallest joint that can be tooled (default 6 mm ≈ ¼ in — common trade practice)',
    0.05,
  ).optional(),
  backer: z
    .enum(BACKER_CELLS)
    .optional()
    .describe('Backer rod: closed-cell (default) or open-cell polyurethane'),
  openingDepth: metres(
    'Depth of the joint opening from the face to the back stop; needed to decide rod or bond-breaker tape',
    0.5,
  ).optional(),
});

export const jointScheduleInputSchema = z.object({ joints: z.array(jointInputSchema).min(1).max(500) });

export const backerSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('rod'),
    cell: z.enum(BACKER_CELLS),
    minDiameter: measure('Smallest rod diameter for the joint width', M),
    maxDiameter: measure('Largest rod diameter for the joint width', M),
  }),
  z.object({
    kind: z.literal('bond_breaker_tape'),
    width: measure('Tape width = joint width', M),
  }),
]);

export const jointResultSchema = z.object({
  name: z.string(),
  type: jointTypeSchema,
  sides: z.array(
    z.object({
      label: z.string(),
      alpha: measure('α used', PER_K),
      length: measure('Moving length L', M),
      extension: measure('Thermal opening α·L·ΔT_ext', M),
      compression: measure('Thermal closing α·L·ΔT_comp', M),
    }),
  ),
  deltaTExtension: measure('Installation (warmest) → coldest surface', K),
  deltaTCompression: measure('Coldest installation → hottest surface', K),
  movementExtension: measure('Total opening movement', M),
  movementCompression: measure('Total closing movement', M),
  widthForExtension: measure('(100/X_ext)·movementExtension + tolerance', M),
  widthForCompression: measure('(100/X_comp)·movementCompression + tolerance', M),
  requiredWidth: measure('Largest of the two and the minimum practical width', M),
  governing: z.enum(['extension', 'compression', 'minimum']),
  designWidth: measure('Width as designed', M),
  requiredDepth: measure('Sealant depth for the design width by the depth rule', M),
  backer: backerSchema,
  verdict: z.enum(['pass', 'fail']),
  margin: z.number().describe('(designWidth − requiredWidth)/requiredWidth, dimensionless'),
  marginText: z.string().describe('"meets — margin 12 %" or "short by 3.2 mm"'),
  warnings: warningsSchema(jointWarningSchema),
  trace: z.array(traceStepSchema),
});

export const jointScheduleResultSchema = z.object({
  joints: z.array(jointResultSchema),
  passCount: z.number().int(),
  failCount: z.number().int(),
});

export type JointType = z.infer<typeof jointTypeSchema>;
export type MovementClass = z.infer<typeof movementClassSchema>;
export type JointSide = Unbranded<z.infer<typeof jointSideSchema>>;
export type TemperatureRange = Unbranded<z.infer<typeof temperatureRangeSchema>>;
export type InstallationTemperature = Unbranded<z.infer<typeof installationTemperatureSchema>>;
export type BackerCell = (typeof BACKER_CELLS)[number];
/** What the schema parses: SI by type (lengths `Metre`, temperatures `Celsius` — D-028). */
export type JointInputSI = z.infer<typeof jointInputSchema>;
/** The engine's joint: the same shape with the SI brands off. */
export type JointInput = Unbranded<JointInputSI>;
export type JointScheduleInput = Unbranded<z.infer<typeof jointScheduleInputSchema>>;
export type Backer = z.infer<typeof backerSchema>;
export type JointResult = z.infer<typeof jointResultSchema>;
export type JointScheduleResult = z.infer<typeof jointScheduleResultSchema>;
