import { z } from 'zod';

/*
 * The engine's and the runner's messages as data — `{ path, code, values }` — one discriminated union by `code`.
 * `path` says where the thing is put right (an assembly or project field, or the calculation's own field path;
 * '' when nothing is to be put right); `values` hold names, keys and SI numbers, never words of a sentence.
 * Worded by `messageText` (messages.ts). This file imports zod only: the engines' schemas use it, and the
 * wording's imports (the formatter, the code tables) reach back into them.
 */

const none = z.object({});
const message = <C extends string, V extends z.ZodObject>(code: C, values: V) =>
  z.object({ code: z.literal(code), path: z.string(), values });
const month = z.number().int().min(1).max(12);
const names = z.array(z.string());

/** What a module lacks to build its input (`moduleOutcome.missing`). */
const inputMissing = [
  /** A layer has no vapour data (`path` vapour.<i>; `layer` is the index i). */
  message('vapour_missing', z.object({ layer: z.number().int().min(0), name: z.string() })),
  message('climate_missing', none),
  message('wind_missing', none),
  message('panel_missing', none),
  message('joints_missing', none),
  message('takeoff_missing', none),
] as const;
export const inputMissingSchema = z.discriminatedUnion('code', [...inputMissing]);
export type InputMissing = z.infer<typeof inputMissingSchema>;

/** What a metric counted or read (a metric's `note`; the reason of a criterion's check). */
const metricNotes = [
  /** Continuous insulation: the layers counted and the declared-R layers left out; λ limit in W/(m·K). */
  message('ci_counted', z.object({ counted: names, declared: names, maxLambda: z.number() })),
  /** Cavity insulation: each counted fill and its framed layer; λ limit in W/(m·K). */
  message(
    'cavity_counted',
    z.object({ counted: z.array(z.object({ fill: z.string(), layer: z.string() })), maxLambda: z.number() }),
  ),
  /** Highest interior surface RH: its month and the surface resistance used, m²·K/W. */
  message('surface_rh_highest', z.object({ month, rsi: z.number() })),
  message('sealant_lowest', z.object({ joint: z.string(), movementClass: z.string() })),
  message('deflection_column', z.object({ limit: z.string() })),
  message('nothing_to_dry', none),
] as const;
export const metricNoteSchema = z.discriminatedUnion('code', [...metricNotes]);
export type MetricNote = z.infer<typeof metricNoteSchema>;

/** Why the wind design check has no number at the design spacing (a `DesignCheck`'s `reason`); lengths in m. */
const designReasons = [
  message('design_girt_missing', none),
  message('design_clip_missing', none),
  message('span_beyond_table', z.object({ span: z.number(), longest: z.number() })),
  message('span_below_table', z.object({ span: z.number(), shortest: z.number() })),
] as const;
export const designReasonSchema = z.discriminatedUnion('code', [...designReasons]);
export type DesignReason = z.infer<typeof designReasonSchema>;

// The engines' warnings: what to read with a result (each engine's result schema lists its own codes).

/** The thermal engine's: R′T/R″T of the combined method above the ISO 6946 limit (dimensionless). */
const thermalWarnings = [
  message('combined_method_limit', z.object({ ratio: z.number(), limit: z.number() })),
] as const;
export const thermalWarningSchema = z.discriminatedUnion('code', [...thermalWarnings]);
export type ThermalWarning = z.infer<typeof thermalWarningSchema>;

/** The moisture engine's; `layer` is a layer's index (`path` layers.<i>). */
const moistureWarnings = [
  message('interior_capped', z.object({ months: z.array(month) })),
  message('condensation_every_month', none),
  message('slightly_ventilated_unventilated', z.object({ layer: z.number().int().min(0), name: z.string() })),
  message('framed_layer_between_members', z.object({ layer: z.number().int().min(0), name: z.string() })),
  /** The first `count` layers lie outside a well-ventilated air layer. */
  message('outside_ventilated_layer', z.object({ count: z.number().int().min(1) })),
] as const;
export const moistureWarningSchema = z.discriminatedUnion('code', [...moistureWarnings]);
export type MoistureWarning = z.infer<typeof moistureWarningSchema>;

/** The joint engine's, per joint; lengths in m. */
const jointWarnings = [
  /** `side`: the label of the side whose α is a generic value. */
  message('expansion_generic', z.object({ side: z.string() })),
  message('depth_over_rule', z.object({ designDepth: z.number(), requiredDepth: z.number() })),
  message('depth_below_bond', z.object({ designDepth: z.number(), minimum: z.number() })),
  message('joint_over_wide', z.object({ width: z.number(), limit: z.number() })),
  message('opening_shallow', z.object({ openingDepth: z.number(), requiredDepth: z.number() })),
] as const;
export const jointWarningSchema = z.discriminatedUnion('code', [...jointWarnings]);
export type JointWarning = z.infer<typeof jointWarningSchema>;

const zone = z.number().int();
/** The wind engine's: the site's, then each zone's; heights and spacings in m. */
const windWarnings = [
  message('above_gradient_height', z.object({ height: z.number(), gradientHeight: z.number() })),
  message('high_rise_gcp', z.object({ figure: z.string(), limit: z.number() })),
  /** K_z here, the 0.70 floor ASCE 7-10 kept below `floorHeight` for components and cladding. */
  message(
    'exposure_b_floor',
    z.object({ edition: z.string(), kz: z.number(), floorKz: z.number(), floorHeight: z.number() }),
  ),
  message('low_slope_gcp', z.object({ slopeLimit: z.number() })),
  message('span_outside_table', z.object({ zone, check: z.string() })),
  message('spacing_not_converged', z.object({ zone, check: z.string(), iterations: z.number().int() })),
  message('table_end_governs', z.object({ zone })),
  message('clip_below_module', z.object({ zone, clipSpacing: z.number() })),
  message('module_wider_than_end_zone', none),
  message('panels_cross_end_zone', none),
] as const;
export const windWarningSchema = z.discriminatedUnion('code', [...windWarnings]);
export type WindWarning = z.infer<typeof windWarningSchema>;

/** The takeoff's notes on how it counted (fixed statements; which apply depends on the input). */
const takeoffNotes = [
  message('joints_gross_through_openings', none),
  message('waste_on_sealant_and_tape', none),
  message('base_net_of_doors', none),
  message('fasteners_counted_on_girt_lines', none),
] as const;
export const takeoffNoteSchema = z.discriminatedUnion('code', [...takeoffNotes]);
export type TakeoffNote = z.infer<typeof takeoffNoteSchema>;

const failedCheck = z.object({ check: z.string(), utilisation: z.number() });

export const engineMessageSchema = z.discriminatedUnion('code', [
  ...inputMissing,
  ...metricNotes,
  /** A calculation refused its input (`CalcInputError`): `path` is the calculation's field, `reason` its words. */
  message('calc_refused', z.object({ reason: z.string() })),

  // Why a criterion or a module could not be evaluated (the runner).
  message('module_missing', z.object({ items: z.array(inputMissingSchema) })),
  /** `path` is the calculation's field, `reason` the engine's words of the refusal. */
  message('module_refused', z.object({ module: z.string(), reason: z.string() })),
  message('metric_not_reported', z.object({ module: z.string() })),
  message('no_module_measures', z.object({ criterion: z.string() })),
  message('not_both_yes_no', none),
  message('not_both_numbers', none),
  /** No row of the code table applies: the project's climate zone and the wall category (keys). */
  message('no_matching_rows', z.object({ climateZone: z.string(), wallCategory: z.string() })),
  /** A yes/no criterion the table sets to "no": met whatever the metric, with its note. */
  message('not_required', z.object({ note: metricNoteSchema.nullable() })),
  message('joints_empty', none),
  message('no_deflection_column', none),

  // The moisture module's own checks.
  message('surface_not_applicable', none),
  /** `month`: the critical month (1–12) of the surface check. */
  message('surface_at_bridge', z.object({ month: month.nullable(), rsi: z.number() })),
  message('surface_clear_field', z.object({ month: month.nullable(), bridgesSolved: z.boolean() })),

  // The wind module's own checks, per zone.
  message('table_outside', none),
  message('table_end', none),
  message('table_inside', none),
  message('girt_spacing_missing', none),
  message('clip_spacing_missing', none),
  message('clip_needs_girt_spacing', none),
  /** `detail`: the design check's reason the table cannot say (words in runs stored before; null: outside). */
  message('girt_outside_table', z.object({ detail: z.union([designReasonSchema, z.string()]).nullable() })),
  message('clip_outside_table', none),
  message('no_girt_spacing_works', none),
  message('no_clip_spacing_works', none),
  message('girt_governed', z.object({ governing: z.string().nullable(), failed: z.array(failedCheck) })),
  message('clip_at_design_girt', z.object({ failed: z.array(failedCheck) })),

  // The joints module's own checks.
  message('joint_minimum_governs', none),
  message('joint_governs', z.object({ governing: z.string() })),

  ...designReasons,
  ...thermalWarnings,
  ...moistureWarnings,
  ...jointWarnings,
  ...windWarnings,
  ...takeoffNotes,
  /** A joint's warning among a check run's cautions: the joint's name and the warning. */
  message('joint_warning', z.object({ joint: z.string(), warning: jointWarningSchema })),

  /** The moisture result: condensation (none, dries out, builds up) and the surface checks; SI values. */
  message(
    'moisture_verdict',
    z.object({
      condensation: z.enum(['none', 'dries', 'builds']),
      /** kg/m² */
      maxAccumulation: z.number(),
      /** kg/m² left after the 12 months */
      finalAccumulation: z.number(),
      month: month.nullable(),
      /** Where most of it condenses. */
      plane: z.string().nullable(),
      fRsi: z.number(),
      fRsiMax: z.number().nullable(),
      /** Months whose clear-field surface exceeds 80 % RH. */
      failingMonths: z.array(month),
      bridges: z.array(z.object({ name: z.string(), fRsi: z.number(), pass: z.boolean() })),
    }),
  ),
]);
export type EngineMessage = z.infer<typeof engineMessageSchema>;
export type EngineMessageCode = EngineMessage['code'];

/** An engine result's `warnings`: its own codes. */
export const warningsSchema = <T extends z.ZodType>(codes: T) =>
  z
    .array(codes)
    .describe(
      'What to read with the result: messages `{ code, path, values }` (SI values) worded by the client',
    );

/** A message built in code, its values checked against its code. */
export const engineMessage = <C extends EngineMessageCode>(
  code: C,
  path: string,
  values: Extract<EngineMessage, { code: C }>['values'],
): Extract<EngineMessage, { code: C }> => ({ code, path, values }) as Extract<EngineMessage, { code: C }>;

/** A stored message: data (runs since messages became data) or the words a run stored before. */
export const storedMessageSchema = z.union([engineMessageSchema, z.string()]);
export type StoredMessage = z.infer<typeof storedMessageSchema>;
