import { z } from 'zod';
import { bridgeMeshSchema, MIN_EDGE, MIN_LAMBDA } from './schema';

/*
 * The inputs of the parametric details (zod, no engine): a wall of layers (outside → inside) and the metal or
 * edge through it. Kept apart from the models so that an assembly's bridge can carry the detail it was
 * computed from (`computed.ts`) without the thermal schema importing the solver.
 */

const name = z.string().trim().min(1).max(120, 'at most 120 characters');
const size = (what: string) => z.number().min(MIN_EDGE).max(5).describe(`${what}, m`);

export const templateLayerSchema = z.object({
  name,
  thickness: size('Thickness d'),
  lambda: z.number().min(MIN_LAMBDA).max(5000).describe('λ, W/(m·K)'),
});

/** One layer of a template wall: a box of λ over its thickness. */
export type TemplateLayer = z.infer<typeof templateLayerSchema>;

export const wallSchema = z.object({
  layers: z.array(templateLayerSchema).min(1).max(40).describe('Layers, outside → inside'),
  crosses: z
    .object({ from: z.number().int().min(0).max(39), to: z.number().int().min(0).max(39) })
    .describe('The metal passes through layers from … to (indices, inclusive)'),
  metalLambda: z.number().min(1).max(500).default(50).describe('λ of the metal, W/(m·K) (steel 50)'),
  rsi: z.number().min(0).max(1).default(0.13),
  rse: z.number().min(0).max(1).default(0.04),
  mesh: bridgeMeshSchema.partial().default({}),
});

/**
 * Default mesh of the 3-D templates: 0.5 mm cells at every edge growing by 1.45 (about 214 000 cells for the
 * demo clip). The error sits at the metal's edges (a 2 mm edge cell read the demo clip's χ 3 % low; the
 * growth ratio moved it by < 0.1 %), so the edge cell is small and the grading steep.
 */
export const TEMPLATE_MESH_3D = { interfaceCell: 0.0003, growth: 1.3 } as const;
const mesh3dSchema = bridgeMeshSchema
  .extend({
    interfaceCell: bridgeMeshSchema.shape.interfaceCell.unwrap().default(TEMPLATE_MESH_3D.interfaceCell),
    growth: bridgeMeshSchema.shape.growth.unwrap().default(TEMPLATE_MESH_3D.growth),
    gradeBounds: bridgeMeshSchema.shape.gradeBounds.unwrap().default(false),
  })
  .prefault({});

export const girtTemplateSchema = wallSchema.extend({
  profile: z.enum(['z', 'c']).describe('Z: flanges to opposite sides; C: both to the same side'),
  spacing: size('Girt spacing'),
  thickness: z.number().min(0.0003).max(0.01).describe('Steel thickness, m'),
  outerFlange: size('Outer flange width'),
  innerFlange: size('Inner flange width'),
});

export const clipTemplateSchema = wallSchema.extend({
  mesh: mesh3dSchema,
  spacingX: size('Clip spacing along the girt'),
  spacingZ: size('Clip spacing across the girts'),
  width: size('Clip width'),
  thickness: z.number().min(0.0005).max(0.02).describe('Clip plate thickness, m'),
  pad: z
    .object({ thickness: size('Thermal break pad thickness'), lambda: z.number().min(MIN_LAMBDA).max(50) })
    .optional()
    .describe('Thermal break between the clip and the layer behind it'),
});

export const fastenerTemplateSchema = wallSchema.extend({
  mesh: mesh3dSchema,
  spacingX: size('Fastener spacing along x'),
  spacingZ: size('Fastener spacing along z'),
  diameter: z.number().min(0.001).max(0.05).describe('Shank diameter, m'),
  recess: z
    .number()
    .min(0)
    .max(1)
    .default(0)
    .describe('Depth of the head below the outside face of the crossed layers, m (0 = through them all)'),
});

export type GirtTemplate = z.input<typeof girtTemplateSchema>;
export type FastenerTemplate = z.input<typeof fastenerTemplateSchema>;
export type ClipTemplate = z.input<typeof clipTemplateSchema>;

const lambda = z.number().min(MIN_LAMBDA).max(5000).describe('λ, W/(m·K)');
const edgeWallSchema = wallSchema.omit({ crosses: true, metalLambda: true }).extend({
  flank: size('Length of each flanking wall to its cut-off').default(1),
});

export const edgeTemplateSchema = z.discriminatedUnion('kind', [
  edgeWallSchema.extend({
    kind: z.literal('slab'),
    slab: z.object({
      from: z.number().int().min(0).max(39).describe('The slab edge sits at the outside face of this layer'),
      thickness: size('Slab thickness'),
      lambda,
      reach: size('Slab length inside the wall to its cut-off').default(1),
    }),
  }),
  edgeWallSchema.extend({ kind: z.literal('corner') }),
  edgeWallSchema.extend({
    kind: z.literal('opening'),
    frame: z.object({
      width: size('Frame width seen from outside (to the glazing, an adiabatic cut)'),
      depth: size('Frame depth through the wall'),
      offset: z.number().min(0).max(5).describe('Frame outside face behind the wall outside face, m'),
      lambda,
    }),
  }),
]);
export type EdgeTemplate = z.input<typeof edgeTemplateSchema>;
