import { measure } from '@shared/calc/answer';
import { traceStepSchema } from '@shared/calc/trace';
import { M, M2, N, PA } from '@shared/calc/trace-units';
import { designReasonSchema, warningsSchema, windWarningSchema } from '@shared/format/message-schema';
import type { Unbranded } from '@shared/units/brands';
import { z } from 'zod';

/**
 * Wind components-and-cladding contract for walls — the single source of truth for the API, the forms and the
 * engine. Everything is SI: m/s, metres, m², pascals, newtons. The engine converts to the standard's feet and
 * square feet internally where the standard's figures are drawn in them.
 */

export const windEditionSchema = z
  .enum(['ASCE 7-16', 'ASCE 7-22'])
  .describe('Edition of ASCE/SEI 7 whose chapters 26 and 30 are applied');

export const exposureSchema = z
  .enum(['B', 'C', 'D'])
  .describe('Exposure category from the surface roughness upwind (ASCE 7 §26.7)');

export const enclosureSchema = z
  .enum(['enclosed', 'partially_enclosed', 'open'])
  .describe('Enclosure classification (ASCE 7 §26.12); walls of open buildings are refused');

export const riskCategorySchema = z
  .enum(['I', 'II', 'III', 'IV'])
  .describe('Risk category (ASCE 7 Table 1.5-1); informational — V is already read from that category’s map');

/*
 * Lower bounds: a value below them is a typing or unit slip, never a real building or product, and would let a
 * spacing, an area or a capacity underflow to 0 — a null result with no reason. Each is far outside practice.
 */

/** Shortest panel span (girt spacing), m: 100 mm. */
export const MIN_SPAN = 0.1;
/** Closest clip spacing along a girt, m: 50 mm. */
export const MIN_CLIP_SPACING = 0.05;
/** Smallest allowable pressure of a load–span table, Pa: 10 Pa ≈ 0.2 lbf/ft². */
export const MIN_ALLOWABLE_PRESSURE = 10;
/** Smallest allowable load of a clip or a fastener, N. */
export const MIN_CAPACITY = 1;

const metres = (what: string, min: number, max: number) =>
  z
    .number()
    .min(min, `at least ${min} m — less is a typing or unit slip`)
    .max(max)
    .describe(`${what}, m (at least ${min}, at most ${max})`)
    .brand<'m'>();

export const windSiteSchema = z.object({
  edition: windEditionSchema,
  basicWindSpeed: z
    .number()
    .min(10, 'at least 10 m/s — no design wind map goes lower')
    .max(150)
    .describe(
      'Basic wind speed V from the risk-category map (3-s gust, 10 m, exposure C), m/s (at least 10, at most 150)',
    ),
  riskCategory: riskCategorySchema,
  exposure: exposureSchema,
  Kzt: z
    .number()
    .min(1)
    .max(5)
    .describe('Topographic factor K_zt (ASCE 7 §26.8), dimensionless (1 to 5; 1.0 on flat terrain)'),
  groundElevation: z
    .number()
    .min(-150)
    .max(3000)
    .describe('Ground elevation above sea level z_e, m (−150 to 3000) — sets K_e'),
  keEqualsOne: z
    .boolean()
    .optional()
    .describe('Take the ground elevation factor K_e = 1.0, which ASCE 7 §26.9 always permits'),
  enclosure: enclosureSchema,
  meanRoofHeight: metres(
    'Mean roof height h (eave height where the roof slope θ ≤ 10°) — at most 152.4 m = 500 ft',
    1,
    152.4,
  ),
  planLength: metres('Plan length of the building', 1, 2000),
  planWidth: metres('Plan width of the building', 1, 2000),
  roofSlopeDeg: z.number().min(0).max(90).describe('Roof slope θ, degrees (0 to 90)'),
  heightOfComponent: metres(
    'Height z of the component above ground (at most h; default h)',
    0.1,
    152.4,
  ).optional(),
});

export const spanConditionSchema = z
  .enum(['single', 'double', 'triple'])
  .describe('Span condition of the load–span table: single, double (two-span) or triple (three-span)');

const pascals = (what: string) =>
  z
    .number()
    .min(MIN_ALLOWABLE_PRESSURE, `at least ${MIN_ALLOWABLE_PRESSURE} Pa — less is a typing or unit slip`)
    .max(100_000)
    .describe(`${what}, Pa (at least ${MIN_ALLOWABLE_PRESSURE}, at most 100 000)`)
    .brand<'Pa'>();

export const loadSpanRowSchema = z.object({
  span: metres('Panel span (girt spacing)', MIN_SPAN, 10),
  allowableInward: pascals('Allowable ASD inward (positive) pressure at this span'),
  allowableOutward: pascals('Allowable ASD outward (suction) pressure at this span'),
  allowableDeflectionPressure: pascals(
    'Pressure that produces the table’s deflection limit at this span (optional column)',
  ).optional(),
});

export const loadSpanTableSchema = z.object({
  spanCondition: spanConditionSchema,
  deflectionLimit: z
    .string()
    .regex(/^L\/\d{2,4}$/)
    .describe('Deflection limit of the deflection column, e.g. "L/180"'),
  rows: z
    .array(loadSpanRowSchema)
    .min(2)
    .max(100)
    .describe('Rows in increasing span; allowables as published by the maker (ASD)'),
});

/** An allowable ASD capacity, N: 1 N to 1 MN (less is a typing or unit slip). */
const newtons = (what: string) =>
  z
    .number()
    .min(MIN_CAPACITY, `at least ${MIN_CAPACITY} N — less is a typing or unit slip`)
    .max(1_000_000)
    .describe(`${what}, N (at least 1, at most 1 000 000)`);

export const clipByRatingSchema = z.object({
  allowableLoad: newtons('Allowable ASD load of one clip (tested or published)'),
});

export const clipByFastenersSchema = z.object({
  fastenerCapacity: newtons('Allowable ASD capacity of one fastener, lesser of pull-out and pull-over'),
  fastenersPerClip: z.number().int().min(1).max(20).describe('Fasteners per clip, count (1 to 20)'),
});

export const clipSchema = z.union([clipByRatingSchema, clipByFastenersSchema]);

export const panelSchema = z.object({
  loadSpanTable: loadSpanTableSchema,
  clip: clipSchema,
  panelModuleWidth: metres('Panel module width — tributary width along the girt', 0.1, 3),
  girtOrientation: z
    .enum(['horizontal', 'vertical'])
    .describe(
      'Girt direction: horizontal girts carry vertically spanning panels, vertical girts the reverse',
    ),
  continuityFactor: z
    .number()
    .min(1)
    .max(1.5)
    .optional()
    .describe(
      'Factor on the support reaction of a continuous panel, dimensionless (1 to 1.5); default single 1.0, double 1.25, triple 1.10 (beam theory)',
    ),
  deflectionWindFactor: z
    .number()
    .min(0.42)
    .max(1)
    .optional()
    .describe(
      'Factor on the strength-level pressure for the deflection check, dimensionless (0.42 to 1; default 0.6 = ASD)',
    ),
  designLevel: z.literal('ASD').describe('Allowable values of the table and clip are ASD (0.6 W)'),
});

export const windScheduleInputSchema = z.object({ site: windSiteSchema, panel: panelSchema });

// ------------------------------------------------------------------------------------------------ result

export const velocityResultSchema = z.object({
  edition: windEditionSchema,
  Kh: z
    .number()
    .describe('Velocity pressure exposure coefficient at the mean roof height K_h, dimensionless'),
  Kz: z
    .number()
    .describe('Velocity pressure exposure coefficient at the component height K_z, dimensionless'),
  Kzt: z.number().describe('Topographic factor K_zt, dimensionless'),
  Kd: z.number().describe('Wind directionality factor K_d, dimensionless'),
  Ke: z.number().describe('Ground elevation factor K_e, dimensionless'),
  qh: measure('Velocity pressure at the mean roof height q_h (7-16: includes K_d; 7-22: excludes it)', PA),
  qhPsf: z.number().describe('q_h, lbf/ft²'),
  qz: measure('Velocity pressure at the component height q_z (same convention as q_h)', PA),
  qzPsf: z.number().describe('q_z, lbf/ft²'),
  equation: z.string().describe('Velocity pressure equation of the edition with its number'),
});

export const spanCheckNameSchema = z.enum(['inward', 'outward', 'deflection']);
export const tableStatusSchema = z.enum(['ok', 'table-end', 'outside-table']);

export const iterationSchema = z.object({
  converged: z.boolean(),
  iterations: z.number().int().describe('Fixed-point iterations used'),
  lastChange: measure('Change of the spacing in the last iteration', M),
});

export const spanCheckSchema = z.object({
  check: spanCheckNameSchema,
  status: tableStatusSchema.describe(
    'ok: found inside the table; table-end: the table’s longest span still carries the load (no extrapolation); outside-table: even the shortest span does not',
  ),
  maxSpan: z.number().nullable().describe('Largest allowed panel span (girt spacing) for this check, m'),
  demand: z.number().nullable().describe('Pressure at that span, Pa (ASD, or deflection level)'),
  allowable: z.number().nullable().describe('Table value at that span, Pa'),
  utilisation: z.number().nullable().describe('demand / allowable, dimensionless'),
  iteration: iterationSchema,
});

export const zonePressureSchema = z.object({
  effectiveArea: measure('Effective wind area A = span × max(width, span/3)', M2),
  GCpInward: z.number().describe('External pressure coefficient, positive (toward the surface)'),
  GCpOutward: z.number().describe('External pressure coefficient, negative (away from the surface)'),
  strength: z.object({
    inward: measure('Strength-level inward pressure W', PA),
    outward: measure('Strength-level outward', PA),
  }),
  asd: z.object({
    inward: measure('ASD inward pressure 0.6 W', PA),
    outward: measure('ASD outward pressure 0.6 W', PA),
  }),
  minimumGoverns: z.boolean().describe('True when the 16 psf (0.77 kPa) minimum net pressure governs'),
});

export const clipResultSchema = z.object({
  capacity: measure('Allowable ASD load per clip', N),
  continuityFactor: z.number().describe('Reaction factor of the panel at the clip, dimensionless'),
  maxSpacing: measure('Largest clip spacing along the girt', M),
  effectiveArea: measure('Tributary (= effective) area of one clip at that spacing', M2),
  pressure: measure('ASD pressure magnitude at the clip’s effective area', PA),
  demand: measure('ASD load on one clip at the maximum spacing', N),
  utilisation: z.number().describe('demand / capacity, dimensionless (1 at the maximum spacing)'),
  iteration: iterationSchema,
});

export const zoneResultSchema = z.object({
  zone: z.union([z.literal(4), z.literal(5)]),
  name: z.string(),
  status: tableStatusSchema,
  governingCheck: spanCheckNameSchema.nullable(),
  girtSpacing: z
    .number()
    .nullable()
    .describe('Maximum girt spacing = panel span, m (null outside the table)'),
  spanChecks: z.array(spanCheckSchema),
  pressures: zonePressureSchema.nullable().describe('Pressures at the maximum girt spacing'),
  clip: clipResultSchema.nullable(),
});

export const windScheduleResultSchema = z.object({
  velocity: velocityResultSchema,
  lowRise: z.boolean().describe('h ≤ 60 ft (18.3 m): Part 1 figures; otherwise the h > 60 ft figures'),
  figure: z.string().describe('Wall figure applied'),
  edgeWidth: measure('End-zone width a (zone 5 at each corner)', M),
  GCpi: z.number().describe('Magnitude of the internal pressure coefficient (GC_pi), dimensionless'),
  minimumPressure: measure('Minimum net C&C pressure (strength level)', PA),
  zones: z.array(zoneResultSchema),
  trace: z.array(traceStepSchema),
  warnings: warningsSchema(windWarningSchema),
  cautions: z.array(z.string()),
});

export type WindEdition = z.infer<typeof windEditionSchema>;
export type Exposure = z.infer<typeof exposureSchema>;
export type Enclosure = z.infer<typeof enclosureSchema>;
export type WindSite = Unbranded<z.infer<typeof windSiteSchema>>;
export type SpanCondition = z.infer<typeof spanConditionSchema>;
export type LoadSpanRow = Unbranded<z.infer<typeof loadSpanRowSchema>>;
export type LoadSpanTable = Unbranded<z.infer<typeof loadSpanTableSchema>>;
export type Clip = Unbranded<z.infer<typeof clipSchema>>;
export type Panel = Unbranded<z.infer<typeof panelSchema>>;
/** What the schema parses: lengths `Metre`, the table's pressures `Pascal` (D-028). */
export type WindScheduleInputSI = z.infer<typeof windScheduleInputSchema>;
export type WindScheduleInput = Unbranded<WindScheduleInputSI>;
export type VelocityResult = z.infer<typeof velocityResultSchema>;
export type SpanCheckName = z.infer<typeof spanCheckNameSchema>;
export type TableStatus = z.infer<typeof tableStatusSchema>;
export type Iteration = z.infer<typeof iterationSchema>;
export type SpanCheck = z.infer<typeof spanCheckSchema>;
export type ZonePressure = z.infer<typeof zonePressureSchema>;
export type ClipResult = z.infer<typeof clipResultSchema>;
export type ZoneResult = z.infer<typeof zoneResultSchema>;
export type WindScheduleResult = z.infer<typeof windScheduleResultSchema>;
export type WallZone = ZoneResult['zone'];

// ================================================================================================================
// Design spacing — the girt and clip spacing the designer chose, checked per wall zone (checkDesignSpacing in
// design.ts). Appended as one block; nothing above depends on it.
// ================================================================================================================

export const designSpacingsSchema = z.object({
  girtSpacing: metres(
    'Girt spacing the designer chose (= panel span); absent: not checked',
    MIN_SPAN,
    10,
  ).optional(),
  clipSpacing: metres(
    'Clip spacing along a girt the designer chose; absent: not checked',
    MIN_CLIP_SPACING,
    10,
  ).optional(),
});

export const windDesignInputSchema = windScheduleInputSchema.extend({
  design: designSpacingsSchema.describe(
    'The design spacings to check against the schedule of site and panel',
  ),
});

export const designStatusSchema = z
  .enum(['meets', 'fails', 'outside-table', 'missing'])
  .describe(
    'meets / fails on a number; outside-table: the table has no value at the design span (never extrapolated); missing: a design spacing is not given',
  );

export const designCheckNameSchema = z.enum(['inward', 'outward', 'deflection', 'clip']);

export const designCheckSchema = z.object({
  check: designCheckNameSchema,
  status: designStatusSchema,
  required: z
    .number()
    .nullable()
    .describe(
      'Demand at the design spacing: ASD pressure (inward, outward), deflection-level pressure (deflection), Pa; ASD load on one clip, N',
    ),
  allowable: z
    .number()
    .nullable()
    .describe('Table value at the design span, Pa (interpolated linearly), or the clip capacity, N'),
  utilisation: z.number().nullable().describe('required / allowable, dimensionless'),
  unit: z.enum(['Pa', 'N']),
  reason: designReasonSchema
    .optional()
    .describe(
      'Why there is no number (outside the table, no design spacing): a message `{ code, path, values }`',
    ),
});

export const zoneDesignSchema = z.object({
  zone: z.union([z.literal(4), z.literal(5)]),
  girtSpacing: z.number().optional().describe('The design girt spacing, m (absent when not given)'),
  clipSpacing: z.number().optional().describe('The design clip spacing, m (absent when not given)'),
  maxGirtSpacing: z
    .number()
    .nullable()
    .describe(
      'Maximum girt spacing the design is compared with: the schedule’s, zone 5 never above zone 4’s, m (null outside the table)',
    ),
  maxClipAtDesignGirt: z
    .number()
    .nullable()
    .describe(
      'Largest clip spacing at the design girt spacing, zone 5 never above zone 4’s, m (null without one)',
    ),
  girt: designStatusSchema.describe('Design girt spacing ≤ maximum and every span check met'),
  clip: designStatusSchema.describe(
    'Design clip spacing ≤ maximum at the design girt spacing and the clip load met',
  ),
  status: designStatusSchema.describe('Zone verdict: fails if any fails, then outside-table, then missing'),
  checks: z.array(designCheckSchema).describe('inward, outward, deflection (when tabulated), clip'),
  worst: designCheckSchema.nullable().describe('The check with the highest utilisation'),
});

export const designSpacingResultSchema = z.object({
  zones: z.array(zoneDesignSchema),
  trace: z.array(traceStepSchema),
});

export type DesignSpacings = Unbranded<z.infer<typeof designSpacingsSchema>>;
export type WindDesignInputSI = z.infer<typeof windDesignInputSchema>;
export type WindDesignInput = Unbranded<WindDesignInputSI>;
export type DesignStatus = z.infer<typeof designStatusSchema>;
export type DesignCheckName = z.infer<typeof designCheckNameSchema>;
export type DesignCheck = z.infer<typeof designCheckSchema>;
export type ZoneDesign = z.infer<typeof zoneDesignSchema>;
export type DesignSpacingResult = z.infer<typeof designSpacingResultSchema>;
