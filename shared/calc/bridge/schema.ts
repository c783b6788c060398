import { z } from 'zod';

/**
 * Thermal-bridge model contract (ISO 10211:2017): steady conduction through axis-aligned boxes of material,
 * surfaces exposed to an environment (temperature + surface resistance), adiabatic everywhere else.
 * Everything is SI: metres, °C, W/(m·K), m²·K/W, W (3-D) or W/m (2-D, per metre of depth).
 * A 2-D model gives every point as [x, y]; a 3-D model as [x, y, z].
 */

/** Lowest λ accepted, W/(m·K): below vacuum insulation panels (about 0.004) — as the thermal module. */
export const MIN_LAMBDA = 0.001;
/** Smallest box edge, m: 0.1 mm — thinner than any steel sheet modelled (0.5 mm and up). */
export const MIN_EDGE = 1e-4;
/** Largest coordinate, m: a bridge model is a detail, never more than a few metres across. */
export const MAX_COORD = 50;

const name = z.string().trim().min(1).max(120, 'at most 120 characters');
const coord = z.number().min(-MAX_COORD).max(MAX_COORD).describe(`Coordinate, m (within ±${MAX_COORD} m)`);
const point = z
  .array(coord)
  .min(2, 'give [x, y] in 2-D or [x, y, z] in 3-D')
  .max(3, 'give [x, y] in 2-D or [x, y, z] in 3-D');

export const bridgeBoxSchema = z.object({
  name,
  lambda: z
    .number()
    .min(MIN_LAMBDA, `λ at least ${MIN_LAMBDA} W/(m·K) — below vacuum insulation panels`)
    .max(5000)
    .describe('Design thermal conductivity λ, W/(m·K)'),
  min: point.describe('Lowest corner, m'),
  max: point.describe('Highest corner, m'),
});

export const bridgeBoundarySchema = z.object({
  name,
  side: z
    .enum(['inside', 'outside'])
    .describe('Which environment: the minimum surface temperature and f_Rsi are taken on the inside'),
  temperature: z.number().min(-80).max(80).describe('Environment temperature θ, °C'),
  resistance: z
    .number()
    .min(0)
    .max(10)
    .describe(
      'Surface resistance Rs, m²·K/W (ISO 6946: Rsi 0.13, Rse 0.04 for walls; 0 = surface held at θ)',
    ),
  min: point.describe('Lowest corner of the region whose exposed faces take this environment, m'),
  max: point.describe('Highest corner of that region (a plane when min = max on one axis), m'),
});

export const bridgeReferenceSchema = z.object({
  elements: z
    .array(
      z.object({
        name,
        u: z.number().min(0).max(100).describe('U of the flanking element, W/(m²·K)'),
        size: z
          .number()
          .min(0)
          .max(1e4)
          .describe('Its length in the model l, m (2-D), or its area A, m² (3-D)'),
      }),
    )
    .max(20)
    .describe('Flanking elements: Σ U·l (2-D) or Σ U·A (3-D) is taken from the coupling coefficient'),
  lines: z
    .array(
      z.object({
        name,
        psi: z.number().min(-10).max(10).describe('ψ of a linear bridge in the 3-D model, W/(m·K)'),
        length: z.number().min(0).max(1e3).describe('Its length in the model, m'),
      }),
    )
    .max(20)
    .default([])
    .describe('3-D only: linear bridges whose Σ ψ·l is taken off as well (ISO 10211 eq. for χ)'),
});

export const bridgeMeshSchema = z.object({
  interfaceCell: z
    .number()
    .min(MIN_EDGE)
    .max(1)
    .default(0.002)
    .describe('Cell size at every material edge, m (a thinner box is one cell across)'),
  maxCell: z.number().min(0.001).max(5).default(0.05).describe('Largest cell, m'),
  growth: z
    .number()
    .min(1.05)
    .max(2)
    .default(1.3)
    .describe('Ratio of neighbouring cell sizes away from an edge'),
  subdivide: z
    .number()
    .int()
    .min(1)
    .max(4)
    .default(1)
    .describe('Split every cell into this many along each axis (grid-convergence checks)'),
  gradeBounds: z
    .boolean()
    .default(true)
    .describe(
      "Refine at the model's outer faces as at a material edge (false: symmetry and cut-off planes, smooth surfaces)",
    ),
});

export const bridgeModelSchema = z.object({
  dimension: z.enum(['2d', '3d']),
  boxes: z.array(bridgeBoxSchema).min(1).max(200),
  boundaries: z.array(bridgeBoundarySchema).min(1).max(20),
  reference: bridgeReferenceSchema.optional(),
  mesh: bridgeMeshSchema.prefault({}),
  field: z.boolean().default(false).describe('Return the temperature of every cell (for drawing)'),
});

export type BridgeBox = z.infer<typeof bridgeBoxSchema>;
export type BridgeBoundary = z.infer<typeof bridgeBoundarySchema>;
export type BridgeMesh = z.infer<typeof bridgeMeshSchema>;
export type BridgeModel = z.infer<typeof bridgeModelSchema>;
export type BridgeModelInput = z.input<typeof bridgeModelSchema>;

export const bridgeBoundaryResultSchema = z.object({
  name: z.string(),
  side: z.enum(['inside', 'outside']),
  /** Heat flow from the environment into the model, W (3-D) or W/m (2-D); negative = out. */
  heatFlow: z.number(),
  /** Exposed area, m² (3-D) or length, m (2-D). */
  area: z.number(),
  minSurfaceTemperature: z.number(),
  maxSurfaceTemperature: z.number(),
});

export const bridgeResultSchema = z.object({
  dimension: z.enum(['2d', '3d']),
  cells: z.number().int(),
  grid: z.object({ x: z.array(z.number()), y: z.array(z.number()), z: z.array(z.number()) }),
  solver: z.object({
    method: z.string(),
    iterations: z.number().int(),
    /** ‖b − A·θ‖ / ‖b‖ at the end. */
    residual: z.number(),
    /** |Σ heat in − Σ heat out| / Σ heat in. */
    energyBalance: z.number(),
  }),
  boundaries: z.array(bridgeBoundaryResultSchema),
  /** Σ of the heat flows into the model, W or W/m. */
  heatFlow: z.number(),
  /** With exactly two environment temperatures: L = Φ / Δθ, W/K or W/(m·K); else null. */
  coupling: z.number().nullable(),
  /** ψ = L2D − Σ U·l, W/(m·K) (2-D with a reference), else null. */
  psi: z.number().nullable(),
  /** χ = L3D − Σ U·A − Σ ψ·l, W/K (3-D with a reference), else null. */
  chi: z.number().nullable(),
  /** Lowest inside surface temperature, °C, and where (null without an inside surface). */
  minInsideSurface: z.object({ temperature: z.number(), at: z.array(z.number()) }).nullable(),
  /** f_Rsi = (θsi,min − θe) / (θi − θe) with two environment temperatures, else null. */
  fRsi: z.number().nullable(),
  /** Cell temperatures, x fastest then y then z (null = no material there); null unless asked. */
  field: z.array(z.number().nullable()).nullable(),
});
export type BridgeResult = z.infer<typeof bridgeResultSchema>;
