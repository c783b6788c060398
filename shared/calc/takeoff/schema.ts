import { measure } from '@shared/calc/answer';
import { traceStepSchema } from '@shared/calc/trace';
import { M, M2, M3 } from '@shared/calc/trace-units';
import { takeoffNoteSchema } from '@shared/format/message-schema';
import { z } from 'zod';

/**
 * Material takeoff contract for a panelised wall: joint lengths, sealant, tape, trim pieces and fasteners
 * from a simple elevation list. Everything is SI (m, m², m³); package counts are whole numbers.
 */

/**
 * A length between `min` and `max`, m. Each lower bound is far below practice (a slip of units, not a real
 * wall) and keeps the counts — columns, rows, pieces, fasteners — finite and exact whole numbers.
 */
const metres = (what: string, min: number, max: number) =>
  z.number().min(min).max(max).describe(`${what}, m (at least ${min} m, at most ${max} m)`);
const name = z.string().min(1).max(120);

export const TAKEOFF_JOINT_TYPES = [
  'panel_vertical',
  'panel_horizontal',
  'perimeter',
  'opening',
  'corner',
  'base',
] as const;
export const takeoffJointTypeSchema = z
  .enum(TAKEOFF_JOINT_TYPES)
  .describe('Joint line: panel joints, wall perimeter (head and abutting ends), openings, corners, base');

export const openingSchema = z.object({
  name: name.optional(),
  width: metres('Opening width', 0.001, 50),
  height: metres('Opening height', 0.001, 50),
  count: z.number().int().min(1).max(10000).describe('How many identical openings, integer ≥ 1'),
  kind: z
    .enum(['window', 'door'])
    .optional()
    .describe('A door (default window) has no sill: 3-sided perimeter, and it interrupts the base'),
});

export const wallSchema = z.object({
  name,
  length: metres('Wall length along the elevation', 0.1, 1000),
  height: metres('Wall height', 0.1, 500),
  openings: z.array(openingSchema).max(200),
  corners: z
    .number()
    .int()
    .min(0)
    .max(2)
    .optional()
    .describe('Building corners counted with this wall (0–2); count each corner on one wall only'),
  abutments: z
    .number()
    .int()
    .min(0)
    .max(2)
    .optional()
    .describe('Wall ends that butt other construction (0–2): a perimeter joint the wall height'),
});

export const moduleSchema = z.object({
  width: metres('Panel module width (joint spacing across the panels)', 0.05, 10),
  length: metres('Largest panel length (end joints occur where a run exceeds it)', 0.05, 30),
  orientation: z
    .enum(['vertical', 'horizontal'])
    .describe('Panels span vertically (width runs along the wall) or horizontally (width runs up the wall)'),
});

export const beadProfileSchema = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('round'), diameter: metres('Round bead diameter d', 0.001, 0.1) }),
  z.object({ shape: z.literal('fillet'), leg: metres('Triangular fillet leg', 0.001, 0.1) }),
  z.object({
    shape: z.literal('rectangular'),
    width: metres('Joint width W', 0.001, 0.2),
    depth: metres('Sealant depth D', 0.001, 0.1),
  }),
]);

export const beadsSchema = z
  .object(
    Object.fromEntries(TAKEOFF_JOINT_TYPES.map((t) => [t, beadProfileSchema.optional()])) as Record<
      (typeof TAKEOFF_JOINT_TYPES)[number],
      z.ZodOptional<typeof beadProfileSchema>
    >,
  )
  .describe('Bead cross-section per joint type; a type left out takes no sealant');

export const trimSchema = z.object({
  name,
  appliesTo: takeoffJointTypeSchema,
  stockLength: metres('Stock length of one trim piece', 0.1, 20),
  lapAllowance: z
    .number()
    .nonnegative()
    .max(1)
    .describe('Overlap where two pieces meet on a run, m (0 to 1 m, less than the stock length)'),
});

export const takeoffInputSchema = z.object({
  walls: z.array(wallSchema).min(1).max(200),
  module: moduleSchema,
  beads: beadsSchema,
  wasteFactor: z
    .number()
    .min(0)
    .max(1)
    .describe('Waste on sealant and tape, dimensionless fraction (0.10 = 10 %, 0 to 1)'),
  trims: z.array(trimSchema).max(40),
  fasteners: z
    .object({
      spacingAlongGirt: metres('Fastener spacing along each girt', 0.01, 5),
      girtSpacing: metres('Girt spacing up the wall', 0.05, 10),
    })
    .optional(),
  tape: z
    .object({
      width: metres('Tape width', 0.001, 1),
      appliesTo: z.array(takeoffJointTypeSchema).min(1).describe('Joint lines that get tape'),
      rollLength: metres('Length of one roll', 0.1, 1000).optional(),
    })
    .optional(),
});

const count = (what: string) => z.number().int().describe(`${what}, whole number`);

export const takeoffResultSchema = z.object({
  lengths: z.record(takeoffJointTypeSchema, measure('Joint length of the type', M)),
  sealant: z.object({
    byJoint: z.array(
      z.object({
        joint: takeoffJointTypeSchema,
        length: measure('Joint length', M),
        crossSection: measure('Bead cross-section', M2),
        volume: measure('Net volume', M3),
      }),
    ),
    volume: measure('Net sealant volume', M3),
    volumeWithWaste: measure('Volume × (1 + waste)', M3),
    cartridges: z.object({
      usFlOz10_1: count('10.1 US fl oz cartridges'),
      ml300: count('300 ml cartridges'),
    }),
    sausages: z.object({ usFlOz20: count('20 US fl oz sausages'), ml600: count('600 ml sausages') }),
  }),
  tape: z
    .object({
      length: measure('Tape length with waste', M),
      area: measure('Tape area with waste', M2),
      rolls: count('Rolls').nullable(),
    })
    .nullable(),
  trims: z.array(
    z.object({
      name: z.string(),
      appliesTo: takeoffJointTypeSchema,
      runs: count('Continuous runs'),
      length: measure('Run length to cover', M),
      pieces: count('Stock pieces'),
    }),
  ),
  fasteners: count('Fasteners').nullable(),
  lines: z.array(traceStepSchema).describe('The takeoff lines (quantities), each with its formula'),
  trace: z.array(traceStepSchema).describe('Every step, per wall and in total'),
  notes: z
    .array(takeoffNoteSchema)
    .describe('How the takeoff counted: messages `{ code, path, values }` worded by the client'),
});

export type TakeoffJointType = z.infer<typeof takeoffJointTypeSchema>;
export type Opening = z.infer<typeof openingSchema>;
export type Wall = z.infer<typeof wallSchema>;
export type PanelModule = z.infer<typeof moduleSchema>;
export type BeadProfile = z.infer<typeof beadProfileSchema>;
export type Trim = z.infer<typeof trimSchema>;
export type TakeoffInput = z.infer<typeof takeoffInputSchema>;
export type TakeoffResult = z.infer<typeof takeoffResultSchema>;
