import { computedBridgeSchema } from '@shared/calc/bridge/computed';
import { valueSourceSchema } from '@shared/calc/source';
import { traceStepSchema } from '@shared/calc/trace';
import { thermalWarningSchema, warningsSchema } from '@shared/format/message-schema';
import type { Unbranded } from '@shared/units/brands';
import { z } from 'zod';

/**
 * Thermal calculation contract — the single source of truth for the API, the forms and the engine.
 * Everything is SI: metres, W/(m·K), m²·K/W, W/(m²·K), W/K. Layers are ordered outside → inside.
 */

/*
 * Lower bounds: a value below them is a typing or unit slip, never a real wall, and would let d/λ, 1/s or
 * the zone widths overflow or underflow to 0 or ∞. Each is far outside practice, so no real input is refused.
 */

/** Thinnest layer, m: 0.001 mm — thinner than any film, foil or coating that is modelled as a layer. */
export const MIN_THICKNESS = 1e-6;
/** Lowest design λ, W/(m·K): below vacuum insulation panels (about 0.004) and still air (0.025). */
export const MIN_CONDUCTIVITY = 0.001;
/** Smallest area fraction of a section: the tolerance to which the fractions must sum to 1. */
export const MIN_FRACTION = 1e-6;
/** Closest spacing of framing members or of bridges, m: 10 mm. */
export const MIN_SPACING = 0.01;
/** Narrowest metal flange, m: 1 mm. */
export const MIN_FLANGE_WIDTH = 0.001;
/** Thinnest fastener shank, m: 1 mm. */
export const MIN_FASTENER_DIAMETER = 0.001;

const name = z.string().min(1).max(120).describe('Name a practitioner recognises, e.g. "Mineral wool board"');
const thickness = z
  .number()
  .min(MIN_THICKNESS)
  .max(2)
  .describe('Layer thickness d, m (at least 0.000001 m = 0.001 mm, at most 2 m)')
  .brand<'m'>();
const conductivity = z
  .number()
  .min(MIN_CONDUCTIVITY)
  .max(1000)
  .describe(
    'Design thermal conductivity λ, W/(m·K) (at least 0.001 — below vacuum insulation panels — at most 1000)',
  )
  .brand<'W/(m·K)'>();

export const homogeneousLayerSchema = z.object({
  kind: z.literal('homogeneous'),
  name,
  thickness,
  conductivity,
  materialId: z
    .string()
    .min(1)
    .max(100)
    .optional()
    .describe('Id of the material in data/reference/materials.json'),
});

export const resistanceLayerSchema = z.object({
  kind: z.literal('resistance'),
  name,
  resistance: z
    .number()
    .min(0.001, 'at least 0.001 m²·K/W — a smaller declared R is a typing or unit slip')
    .max(50)
    .describe('Declared thermal resistance R, m²·K/W (at least 0.001, at most 50)')
    .brand<'m²·K/W'>(),
  thickness: thickness
    .optional()
    .describe(
      'Layer thickness d, m (at least 0.000001 m, at most 2 m) — needed in a wall with metal framing: the zone method measures the distance from the metal to the surface through every layer',
    ),
});

export const airLayerSchema = z.object({
  kind: z.literal('air'),
  name,
  thickness: z
    .number()
    .min(MIN_THICKNESS)
    .max(0.3)
    .describe(
      'Air layer thickness in the heat-flow direction, m (at least 0.000001 m, at most 0.3 m — ISO 6946 Table 8)',
    )
    .brand<'m'>(),
  ventilation: z
    .enum(['unventilated', 'slightly', 'well'])
    .describe('ISO 6946:2017 §6.9: unventilated, slightly ventilated, or well ventilated'),
  ventArea: z
    .number()
    .min(0)
    .max(100000)
    .optional()
    .describe(
      'Vent area A_v, mm² per m of length (vertical air layer) or per m² of surface (horizontal), 0–100 000 — ISO 6946:2017 §6.9.3: ≤ 500 unventilated, > 1500 well ventilated; needed for a slightly ventilated layer',
    ),
  emissivityFactor: z
    .number()
    .min(0.01, 'at least 0.01 — below the lowest-emissivity foil faces')
    .max(1)
    .optional()
    .describe(
      'Intersurface emittance E = 1/(1/ε₁ + 1/ε₂ − 1), dimensionless (0.01–1); omit for high-emissivity faces (Table 8)',
    ),
});

export const framedSectionSchema = z.object({
  name,
  conductivity,
  fraction: z
    .number()
    .min(MIN_FRACTION)
    .max(1)
    .describe(
      'Fraction of the wall area taken by this section, dimensionless (0.000001–1, 0.000001 being the tolerance of the sum); fractions sum to 1',
    ),
});

export const framedLayerSchema = z.object({
  kind: z.literal('framed'),
  name,
  thickness,
  sections: z.array(framedSectionSchema).min(1).max(8),
  metal: z.boolean().describe('True when the framing is metal (steel or aluminium studs, girts)'),
  flangeWidth: z
    .number()
    .min(MIN_FLANGE_WIDTH)
    .max(0.5)
    .describe('Metal flange width m, m (at least 0.001 m = 1 mm, at most 0.5 m) — needed by the zone method')
    .brand<'m'>()
    .optional(),
  spacing: z
    .number()
    .min(MIN_SPACING)
    .max(5)
    .describe(
      'Member spacing on centre s, m (at least 0.01 m = 10 mm, at most 5 m) — needed by the zone method',
    )
    .brand<'m'>()
    .optional(),
});

export const layerSchema = z.discriminatedUnion('kind', [
  homogeneousLayerSchema,
  resistanceLayerSchema,
  airLayerSchema,
  framedLayerSchema,
]);

export const heatFlowSchema = z
  .enum(['horizontal', 'upward', 'downward'])
  .describe('Direction of heat flow (ISO 6946:2017 Table 7): horizontal within ±30°, upward, downward');

/** A bridge's thermal transmittance, 0–10 in its unit (χ and ψ keep their brands, D-028). */
const transmittance = (what: string, unit: string) =>
  z.number().nonnegative().max(10).describe(`${what}, ${unit} (0–10)`);
const chi = transmittance('Point thermal transmittance χ', 'W/K').brand<'W/K'>();
const psi = transmittance('Linear thermal transmittance ψ', 'W/(m·K)').brand<'ψ W/(m·K)'>();
const countPerArea = z
  .number()
  .min(0.001, 'at least 0.001 per m² (one in 1000 m²) — fewer is a typing or unit slip')
  .max(10000)
  .describe('Number of items per square metre of wall, 1/m² (at least 0.001, at most 10 000)');
const spacing = (what: string) =>
  z
    .number()
    .min(MIN_SPACING)
    .max(100)
    .describe(`${what} spacing, m (at least 0.01 m = 10 mm, at most 100 m)`)
    .brand<'m'>();

/**
 * Where χ or ψ came from (test report, catalogue, calculation), when it was taken from a firm library; a value
 * computed by the bridge solver keeps its detail, solve and map (`computed`).
 */
const source = valueSourceSchema
  .extend({ computed: computedBridgeSchema.optional().describe('The solve that gave the value') })
  .optional();

export const pointBridgeBySpacingSchema = z.object({
  kind: z.literal('point'),
  name,
  chi,
  source,
  spacingHorizontal: spacing('Horizontal'),
  spacingVertical: spacing('Vertical'),
});
export const pointBridgeByCountSchema = z.object({
  kind: z.literal('point'),
  name,
  chi,
  source,
  countPerArea,
});
export const linearBridgeBySpacingSchema = z.object({
  kind: z.literal('linear'),
  name,
  psi,
  source,
  spacing: spacing('Member'),
});
export const linearBridgeByLengthSchema = z.object({
  kind: z.literal('linear'),
  name,
  psi,
  source,
  lengthPerArea: z
    .number()
    .min(0.001, 'at least 0.001 m/m² — less is a typing or unit slip')
    .max(1000)
    .describe('Length of the linear bridge per square metre of wall, m/m² (at least 0.001, at most 1000)'),
});
export const fastenerBridgeSchema = z.object({
  kind: z.literal('fastener'),
  name,
  conductivity: z
    .number()
    .min(MIN_CONDUCTIVITY, `at least ${MIN_CONDUCTIVITY} W/(m·K) — below any fastener material`)
    .max(1000)
    .describe(`Fastener thermal conductivity λ_f, W/(m·K) (at least ${MIN_CONDUCTIVITY}, at most 1000)`)
    .brand<'W/(m·K)'>(),
  diameter: z
    .number()
    .min(MIN_FASTENER_DIAMETER)
    .max(0.05)
    .describe('Fastener shank diameter, m (at least 0.001 m = 1 mm, at most 0.05 m)')
    .brand<'m'>(),
  countPerArea,
  penetration: z
    .enum(['full', 'recessed'])
    .describe('Whether the fastener passes through the whole insulation layer or is recessed into it'),
  recessDepth: z
    .number()
    .nonnegative()
    .max(1)
    .optional()
    .describe(
      'Depth by which a recessed fastener head sits below the insulation face, m (0 to layer thickness)',
    ),
  layerIndex: z
    .number()
    .int()
    .nonnegative()
    .max(39, 'an assembly has at most 40 layers (index 0 to 39)')
    .describe(
      'Index of the insulation layer crossed, dimensionless integer ≥ 0 (layers counted outside → inside from 0)',
    ),
  bothEndsMetal: z
    .boolean()
    .optional()
    .describe('True when both ends of the fastener touch metal sheets — Annex F then does not apply'),
});

export const bridgeSchema = z.union([
  pointBridgeBySpacingSchema,
  pointBridgeByCountSchema,
  linearBridgeBySpacingSchema,
  linearBridgeByLengthSchema,
  fastenerBridgeSchema,
]);

export const thermalInputSchema = z.object({
  layers: z.array(layerSchema).min(1).max(40).describe('Layers ordered outside → inside'),
  heatFlow: heatFlowSchema,
  bridges: z.array(bridgeSchema).max(40).describe('Bridges crossing the continuous insulation'),
});

export const methodNameSchema = z.enum([
  'parallelPath',
  'isothermalPlanes',
  'isoCombined',
  'zone',
  'energyCode',
]);

const rSI = (what: string) => z.number().describe(`${what}, m²·K/W (greater than 0)`);
const uSI = (what: string) => z.number().describe(`${what}, W/(m²·K) (0 or more)`);
const rIP = (what: string) => z.number().describe(`${what}, h·ft²·°F/Btu (greater than 0)`);
const uIP = (what: string) => z.number().describe(`${what}, Btu/(h·ft²·°F) (0 or more)`);

export const thermalResultSchema = z.object({
  R0: rSI('Clear-field total resistance by the default method (surfaces included)'),
  U0: uSI('Clear-field thermal transmittance 1/R0'),
  Ueff: uSI('Effective thermal transmittance U0 + ΣΔU of the bridges'),
  Reff: rSI('Effective total resistance 1/Ueff'),
  ip: z.object({
    R0: rIP('Clear-field total resistance'),
    Reff: rIP('Effective total resistance'),
    U0: uIP('Clear-field U-factor'),
    Ueff: uIP('Effective U-factor'),
  }),
  Rsi: rSI('Internal surface resistance used'),
  Rse: rSI('External surface resistance used'),
  methods: z.object({
    parallelPath: rSI('ASHRAE parallel-path total resistance'),
    isothermalPlanes: rSI('ASHRAE isothermal-planes total resistance'),
    isoUpper: rSI('ISO 6946 upper limit R′T').nullable(),
    isoLower: rSI('ISO 6946 lower limit R″T').nullable(),
    isoCombined: rSI('ISO 6946 combined R_T = (R′T + R″T)/2').nullable(),
    isoError: z
      .number()
      .describe('ISO 6946 maximum relative error e = (R′T − R″T)/(2R_T), dimensionless')
      .nullable(),
    zone: rSI('ASHRAE zone-method total resistance').nullable(),
    energyCode: rSI(
      'Energy-code path: ASHRAE 90.1 Appendix A steel-framing table in series with the other layers and the code’s air films',
    ).nullable(),
  }),
  energyCode: z
    .object({
      status: z.enum(['applied', 'refused']),
      text: z.string().describe('The table row used, or why the table does not apply'),
      source: z.string(),
      framingR: rSI('Effective framing/cavity R of the steel-framed layer from the table').nullable(),
    })
    .nullable()
    .describe('The energy-code path for a steel-framed wall; null when no layer is metal-framed'),
  basis: z.object({
    kind: z
      .enum(['energyCode', 'standard', 'mostConservative'])
      .describe(
        'energyCode: the energy standard’s own method for steel framing; standard: ISO 6946 applies; mostConservative: no code path applies, the lowest R of the methods offered is used',
      ),
    text: z.string().describe('Which method gives R₀ and why, in a sentence printed on the sheet'),
  }),
  offeredMethods: z.array(methodNameSchema),
  defaultMethod: methodNameSchema,
  methodSpread: z
    .number()
    .describe('(max − min)/mean of the offered methods, dimensionless (0 when they agree)'),
  bridges: z.array(
    z.object({
      name: z.string(),
      kind: z.enum(['point', 'linear', 'fastener']),
      deltaU: uSI('Added transmittance ΔU'),
      share: z.number().describe('ΔU / Ueff, dimensionless (0–1)'),
    }),
  ),
  clearFieldShare: z.number().describe('U0 / Ueff, dimensionless (0–1)'),
  sharesSum: z.number().describe('clearFieldShare + Σ bridge shares, dimensionless (1 by construction)'),
  trace: z.array(traceStepSchema),
  warnings: warningsSchema(thermalWarningSchema),
});

/** What the schemas parse: SI by type (lengths `Metre`, λ, R branded — D-028). */
export type ThermalInputSI = z.infer<typeof thermalInputSchema>;
/** The engine's types: the same shapes with the SI brands off (plain numbers in the loops; χ, ψ stay branded). */
export type HomogeneousLayer = Unbranded<z.infer<typeof homogeneousLayerSchema>>;
export type ResistanceLayer = Unbranded<z.infer<typeof resistanceLayerSchema>>;
export type AirLayer = Unbranded<z.infer<typeof airLayerSchema>>;
export type FramedLayer = Unbranded<z.infer<typeof framedLayerSchema>>;
export type FramedSection = Unbranded<z.infer<typeof framedSectionSchema>>;
export type Layer = Unbranded<z.infer<typeof layerSchema>>;
export type HeatFlow = z.infer<typeof heatFlowSchema>;
export type Ventilation = AirLayer['ventilation'];
export type Bridge = Unbranded<z.infer<typeof bridgeSchema>>;
export type FastenerBridge = Unbranded<z.infer<typeof fastenerBridgeSchema>>;
export type ThermalInput = Unbranded<ThermalInputSI>;
export type MethodName = z.infer<typeof methodNameSchema>;
export type ThermalResult = z.infer<typeof thermalResultSchema>;
export type BridgeResult = ThermalResult['bridges'][number];
