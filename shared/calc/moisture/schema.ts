import { heatFlowSchema, layerSchema } from '@shared/calc/thermal/schema';
import { traceStepSchema } from '@shared/calc/trace';
import { moistureWarningSchema, storedMessageSchema, warningsSchema } from '@shared/format/message-schema';
import { PERM_0C_TO_SI, PERM_23C_TO_SI, QUANTITIES, type Unbranded } from '@shared/units';
import { trimmedFixed } from '@shared/units/rounding';
import { z } from 'zod';

/**
 * Moisture (condensation) contract — the single source of truth for the API, the forms and the engine.
 * ISO 13788:2012: §5 surface temperature to avoid critical surface humidity, §6 interstitial condensation
 * by the monthly Glaser method. Everything is SI: °C, Pa, m, kg/(m²·s), kg/m². Layers are ordered
 * outside → inside, exactly as in the thermal contract, each with its vapour data.
 */

/*
 * Lower bounds: μ < 1 would make a layer more open than still air; the s_d and permeance bounds keep every
 * layer's s_d between 0.000001 m and 100 000 m (a film of 0.001 mm of still air; well above the 1500 m of a
 * "vapour-tight" layer), the range the Glaser profile resolves.
 */
const sdRange = 'at least 0.000001 m, at most 100 000 m';
/** A perm in ng/(Pa·s·m²), as NIST SP 811 prints it (57.4525). */
const permInNg = (perm: number) => trimmedFixed(perm / QUANTITIES.vapourPermeance.SI.scale, 4);

export const vapourSchema = z
  .discriminatedUnion('kind', [
    z.object({
      kind: z.literal('mu'),
      mu: z
        .number()
        .min(1)
        .max(1e7)
        .describe(
          'Water vapour resistance factor μ, dimensionless (at least 1 = still air, at most 10 000 000); s_d = μ·d, so the layer needs a thickness',
        ),
    }),
    z.object({
      kind: z.literal('sd'),
      sd: z
        .number()
        .min(1e-6)
        .max(1e5)
        .describe(`Water vapour diffusion-equivalent air layer thickness s_d, m (${sdRange})`),
    }),
    z.object({
      kind: z.literal('permeance'),
      permeance: z
        .number()
        .min(0.002)
        .max(1e6)
        .describe(
          'Water vapour permeance W, ng/(Pa·s·m²) (at least 0.002, i.e. s_d at most 100 000 m; at most 1 000 000); s_d = δ₀/W with δ₀ = 2×10⁻¹⁰ kg/(m·s·Pa)',
        ),
    }),
    z.object({
      kind: z.literal('usPerm'),
      perm: z
        .number()
        .min(0.00004)
        .max(1e4)
        .describe(
          'Water vapour permeance in US perms, grain/(h·ft²·inHg) (at least 0.00004, i.e. s_d at most about 87 000 m; at most 10 000)',
        ),
      reference: z
        .enum(['23C', '0C'])
        .describe(
          `Which perm: "23C" = perm (23 °C), ${permInNg(PERM_23C_TO_SI)} ng/(Pa·s·m²); "0C" = perm (0 °C), ${permInNg(PERM_0C_TO_SI)} ng/(Pa·s·m²) (NIST SP 811 B.9). ASTM E96 reports are at 23 °C.`,
        ),
    }),
  ])
  .describe('Vapour data of the layer: μ, s_d, SI permeance or US perms');

/** The thermal layer (same schema as the thermal calculation) with its vapour data. */
export const moistureLayerSchema = layerSchema.and(z.object({ vapour: vapourSchema }));

const temperature = (what: string) =>
  z.number().min(-60).max(60).describe(`${what}, °C (−60 to 60)`).brand<'°C'>();
const relativeHumidity = (what: string) =>
  z.number().min(0).max(1).describe(`${what}, fraction 0–1 (0.5 = 50 %)`);

export const interiorSchema = z
  .discriminatedUnion('kind', [
    z.object({
      kind: z.literal('fixed'),
      temperature: temperature('Interior air temperature θ_i'),
      relativeHumidity: relativeHumidity('Interior relative humidity φ_i, the same every month'),
    }),
    z.object({
      kind: z.literal('humidityClass'),
      temperature: temperature('Interior air temperature θ_i (ISO 13788 Annex A uses 20 °C for dwellings)'),
      humidityClass: z
        .number()
        .int()
        .min(1)
        .max(5)
        .describe(
          'ISO 13788:2012 Annex A internal humidity class, integer 1–5: 1 storage, 2 offices and shops, 3 dwellings with low occupancy, 4 dwellings with high occupancy, sports halls, kitchens, canteens, 5 special buildings (laundry, brewery, swimming pool). Δp at θ_e ≤ 0 °C = 270/540/810/1080/1350 Pa, falling linearly to 0 at θ_e = 20 °C',
        ),
    }),
  ])
  .describe('Interior conditions: fixed temperature and humidity, or an ISO 13788 humidity class');

export const monthClimateSchema = z.object({
  exteriorTemperature: temperature('Monthly mean exterior air temperature θ_e'),
  exteriorRelativeHumidity: relativeHumidity('Monthly mean exterior relative humidity φ_e'),
});

/** A thermal bridge's temperature factor from a 2-D/3-D solve (ISO 10211) for the surface check. */
export const surfaceBridgeSchema = z.object({
  name: z.string().trim().min(1).max(120, 'at most 120 characters'),
  fRsi: z
    .number()
    .min(-1)
    .max(2)
    .describe('f_Rsi at the bridge with Rsi = 0.25 m²·K/W (ISO 10211 solve), dimensionless'),
});

export const moistureInputSchema = z.object({
  layers: z.array(moistureLayerSchema).min(1).max(40).describe('Layers ordered outside → inside'),
  bridges: z
    .array(surfaceBridgeSchema)
    .max(40)
    .optional()
    .describe(
      'Thermal bridges whose inside surface is checked too (f_Rsi at the clip or girt, not only the clear field)',
    ),
  heatFlow: heatFlowSchema,
  interior: interiorSchema,
  months: z
    .array(monthClimateSchema)
    .length(12)
    .describe('Exactly 12 monthly mean exterior climates, January first, December last'),
  startMonth: z
    .number()
    .int()
    .min(1)
    .max(12)
    .optional()
    .describe(
      'Calendar month 1–12 in which the monthly balance starts with no accumulated water. Omit to use the ISO 13788:2012 §6.3 rule: the first month with condensation after a month without any [memory — verify the clause]',
    ),
  safetyFactor: z
    .number()
    .min(1)
    .max(2)
    .optional()
    .describe(
      'Factor on the interior vapour pressure excess Δp = p_i − p_e (applied when Δp > 0), dimensionless 1–2; default 1.10 per ISO 13788:2012 Annex A [memory — verify]. Set 1 to use a measured or prescribed interior humidity exactly as given',
    ),
});

const pa = (what: string) => z.number().describe(`${what}, Pa`);
const degC = (what: string) => z.number().describe(`${what}, °C`);
const perNode = (what: string) => z.array(z.number()).describe(`${what}, one value per node (see nodes)`);

export const nodeSchema = z.object({
  kind: z
    .enum(['exteriorSurface', 'interface', 'withinLayer', 'interiorSurface'])
    .describe(
      'Exterior surface, interface between two layers, a point inside a layer split into sub-layers, or interior surface',
    ),
  label: z.string().describe('Where the node is, in a practitioner’s words'),
  outerLayer: z
    .number()
    .int()
    .nullable()
    .describe('Index of the input layer on the outer side (null at the exterior surface)'),
  innerLayer: z
    .number()
    .int()
    .nullable()
    .describe('Index of the input layer on the inner side (null at the interior surface)'),
  resistance: z
    .number()
    .describe('Thermal resistance from the exterior air to the node (Rse included), m²·K/W'),
  sd: z.number().describe('s_d from the exterior surface to the node, m'),
});

export const moistureLayerResultSchema = z.object({
  name: z.string(),
  included: z
    .boolean()
    .describe('False when the layer lies outside a well-ventilated air layer and is disregarded'),
  resistance: z.number().describe('Thermal resistance R used for the layer, m²·K/W'),
  sd: z.number().describe('Diffusion-equivalent air layer thickness s_d, m'),
  sublayers: z.number().int().describe('Number of sub-layers the layer is split into for the Glaser profile'),
});

export const monthResultSchema = z.object({
  month: z.number().int().min(1).max(12).describe('Calendar month 1–12'),
  seconds: z.number().describe('Duration of the month, s'),
  exteriorTemperature: degC('θ_e'),
  exteriorVapourPressure: pa('p_e = φ_e·p_sat(θ_e)'),
  interiorTemperature: degC('θ_i'),
  interiorVapourPressure: pa('Design p_i (safety factor applied)'),
  temperature: perNode('Temperature θ at each node, °C'),
  saturationPressure: perNode('Saturation vapour pressure p_sat at each node, Pa'),
  vapourPressure: perNode('Vapour pressure p at each node (the Glaser line), Pa'),
  rate: perNode(
    'Net condensation rate g at each node, kg/(m²·s): > 0 condensing, < 0 evaporating, 0 where nothing happens',
  ),
  amount: perNode('Net amount g·t over the month at each node, g/m² per month'),
  accumulation: perNode('Accumulated water M_a at each node at the end of the month, kg/m²'),
  condensationNodes: z.array(z.number().int()).describe('Nodes where water condenses this month'),
  evaporationNodes: z.array(z.number().int()).describe('Nodes where accumulated water evaporates this month'),
  condensed: z.number().describe('Water condensed this month over all nodes, kg/m²'),
  evaporated: z.number().describe('Water evaporated this month over all nodes, kg/m²'),
  totalAccumulation: z.number().describe('Σ M_a over all nodes at the end of the month, kg/m²'),
  surface: z.object({
    surfaceTemperature: degC('Interior surface temperature θ_si with Rsi = 0.25 m²·K/W'),
    minSurfaceTemperature: degC('θ_si,min: surface temperature at which the surface RH reaches 80 %'),
    fRsiMin: z
      .number()
      .nullable()
      .describe(
        'f_Rsi,min = (θ_si,min − θ_e)/(θ_i − θ_e), dimensionless; null (not applicable) when θ_e ≥ θ_i or when it would be 0 or less',
      ),
    pass: z.boolean().describe('θ_si ≥ θ_si,min (equivalently f_Rsi ≥ f_Rsi,min)'),
  }),
});

export const moistureResultSchema = z.object({
  layers: z.array(moistureLayerResultSchema),
  nodes: z.array(nodeSchema),
  Rsi: z.number().describe('Internal surface resistance for the interstitial calculation, m²·K/W'),
  Rse: z.number().describe('External surface resistance for the interstitial calculation, m²·K/W'),
  totalResistance: z.number().describe('R_T for the interstitial calculation, m²·K/W'),
  totalSd: z.number().describe('s_d,T of the included layers, m'),
  safetyFactor: z.number().describe('Factor applied to Δp, dimensionless'),
  startMonth: z.number().int().min(1).max(12).describe('Calendar month the balance starts in'),
  startMonthRule: z
    .enum(['input', 'firstCondensingMonth', 'noCondensation', 'condensationEveryMonth'])
    .describe('How the start month was chosen'),
  months: z
    .array(monthResultSchema)
    .length(12)
    .describe('The 12 months in calculation order, from the start month'),
  interstitial: z.object({
    condensationOccurs: z.boolean(),
    maxAccumulation: z.number().describe('Largest Σ M_a at the end of any month, kg/m²'),
    maxAccumulationMonth: z
      .number()
      .int()
      .nullable()
      .describe('Calendar month of the largest Σ M_a; null if none'),
    finalAccumulation: z.number().describe('Σ M_a left at the end of the 12 months, kg/m²'),
    driesOut: z.boolean().describe('True when every node is dry again by the end of the 12 months'),
    totalCondensed: z.number().describe('Water condensed over the year, kg/m²'),
    totalEvaporated: z.number().describe('Water evaporated over the year, kg/m²'),
    planes: z
      .array(
        z.object({
          node: z.number().int(),
          label: z.string(),
          maxAccumulation: z.number().describe('Largest M_a at this node, kg/m²'),
          maxAccumulationMonth: z.number().int().describe('Calendar month of that maximum'),
          finalAccumulation: z.number().describe('M_a left at this node after 12 months, kg/m²'),
        }),
      )
      .describe('Every node where water condenses in some month'),
  }),
  surface: z.object({
    fRsi: z.number().describe('f_Rsi = 1 − Rsi/R_T of the clear field with Rsi = 0.25 m²·K/W, dimensionless'),
    criticalMonth: z
      .number()
      .int()
      .nullable()
      .describe('Calendar month with the highest f_Rsi,min; null if none'),
    fRsiMax: z.number().nullable().describe('Highest f_Rsi,min of the year, dimensionless'),
    bridges: z
      .array(
        surfaceBridgeSchema.extend({ pass: z.boolean().describe('f_Rsi ≥ f_Rsi,max (or not applicable)') }),
      )
      .default([])
      .describe('The surface check at each thermal bridge given'),
    pass: z.boolean().describe('True when every month passes, at the clear field and at every bridge'),
  }),
  verdict: storedMessageSchema.describe(
    'The result as a `moisture_verdict` message (`{ code, path, values }`, SI values), worded by the client; plain words in results stored before',
  ),
  trace: z.array(traceStepSchema),
  warnings: warningsSchema(moistureWarningSchema),
});

export type Vapour = z.infer<typeof vapourSchema>;
export type MoistureLayer = Unbranded<z.infer<typeof moistureLayerSchema>>;
export type Interior = Unbranded<z.infer<typeof interiorSchema>>;
export type MonthClimate = Unbranded<z.infer<typeof monthClimateSchema>>;
/** What the schema parses: SI by type (layers as the thermal schema, temperatures `Celsius` — D-028). */
export type MoistureInputSI = z.infer<typeof moistureInputSchema>;
/** The engine's input: the same shape with the SI brands off. */
export type MoistureInput = Unbranded<MoistureInputSI>;
export type MoistureNode = z.infer<typeof nodeSchema>;
export type MoistureLayerResult = z.infer<typeof moistureLayerResultSchema>;
export type MonthResult = z.infer<typeof monthResultSchema>;
export type MoistureResult = z.infer<typeof moistureResultSchema>;
