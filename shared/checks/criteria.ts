import { z } from 'zod';
import { WALL_CATEGORY_LABELS, wallCategorySchema } from '../schemas/assembly';
import { TEXT_MAX, text } from '../schemas/common';
import { CLIMATE_ZONES, climateZoneSchema } from '../schemas/project';
import {
  type DisplayUnit,
  LB_PER_FT2_TO_KG_PER_M2,
  QUANTITIES,
  R_IP_TO_SI,
  U_IP_TO_SI,
  type UnitSystem,
} from '../units';

/*
 * Code tables ("criteria sets"): the closed list of criterion types a firm can enter, with their units,
 * direction and the metric of the check run each one reads. This file is the single source of truth for
 * the API, the grid, the CSV import/export and the runner. Values are stored in SI.
 */

/** The wildcard climate zone of a row: it applies in every zone unless a row names the zone itself. */
export const ALL_ZONES = '*';
export type WallCategory = z.infer<typeof wallCategorySchema>;
export const CRITERIA_ZONES = [ALL_ZONES, ...CLIMATE_ZONES] as const;
export const criteriaZoneSchema = z.union([z.literal(ALL_ZONES), climateZoneSchema]);
export type CriteriaZone = z.infer<typeof criteriaZoneSchema>;
export const zoneLabel = (zone: CriteriaZone): string => (zone === ALL_ZONES ? 'All zones' : zone);

/** What the check run measures; each criterion type reads one of these. */
export const METRIC_KEYS = [
  'Ueff',
  'Reff',
  'continuousInsulationR',
  'cavityInsulationR',
  'maxAccumulation',
  'driesOut',
  'maxSurfaceRh',
  'deflectionLimit',
  'minSealantMovementClass',
] as const;
export type MetricKey = (typeof METRIC_KEYS)[number];

/** How a unit is shown in a system and converted to the stored SI value: si = shown × toSI. */
export interface UnitSpec {
  symbol: string;
  toSI: number;
}

export interface CriterionSpec {
  label: string;
  /** One sentence on what the row demands. */
  description: string;
  /** max: provided ≤ required; min: provided ≥ required; required: the provided yes/no must be yes. */
  direction: 'max' | 'min' | 'required';
  kind: 'number' | 'boolean';
  /** The metric of the check run compared with the row's value. */
  metric: MetricKey;
  /** Symbol of the stored SI value ('' for a pure number). */
  unit: string;
  /** How the grid shows and takes the value in each unit system. */
  display: Record<UnitSystem, UnitSpec>;
  /** Unit spellings accepted in a CSV import → factor to SI. '' (no unit) only where it cannot mislead. */
  accepts: Record<string, number>;
  /** Sane SI range of a value (not a code limit); `minExclusive` refuses the bound itself. */
  range: { min: number; max: number; minExclusive?: boolean };
  /** Decimals shown in the grid for each system. */
  decimals: Record<UnitSystem, number>;
}

/** A registry unit as a code-table unit. */
const shown = (u: DisplayUnit): UnitSpec => ({ symbol: u.symbol, toSI: u.scale });
const U_SI = shown(QUANTITIES.transmittance.SI);
const U_IP = shown(QUANTITIES.transmittance.IP);
const R_SI = shown(QUANTITIES.resistance.SI);
const R_IP = shown(QUANTITIES.resistance.IP);
const MASS_PER_AREA = QUANTITIES.massPerArea;
const uAccepts = { 'w/m2k': 1, 'btu/hft2f': U_IP_TO_SI };
const rAccepts = { 'm2k/w': 1, 'hft2f/btu': R_IP_TO_SI, 'ft2fh/btu': R_IP_TO_SI };
const resistance = (label: string, description: string, metric: MetricKey): CriterionSpec => ({
  label,
  description,
  direction: 'min',
  kind: 'number',
  metric,
  unit: R_SI.symbol,
  display: { SI: R_SI, IP: R_IP },
  accepts: rAccepts,
  range: { min: 0, max: 30, minExclusive: true },
  decimals: { SI: 2, IP: 1 },
});
/** A unit written and rounded alike in both systems (a pure number, %, L/x). */
const sameInBoth = (symbol: string, toSI: number, decimals: number) => ({
  display: { SI: { symbol, toSI }, IP: { symbol, toSI } },
  decimals: { SI: decimals, IP: decimals },
});

/**
 * The closed list of criterion types. A firm enters the values its adopted code requires; Skinwright
 * never supplies them.
 */
export const CRITERION_TYPES = {
  max_u_factor: {
    label: 'Maximum U-factor',
    description: 'The effective U-factor of the assembly (clear field plus every bridge) must not exceed it.',
    direction: 'max',
    kind: 'number',
    metric: 'Ueff',
    unit: U_SI.symbol,
    display: { SI: U_SI, IP: U_IP },
    accepts: uAccepts,
    range: { min: 0, max: 10, minExclusive: true },
    decimals: { SI: 3, IP: 3 },
  },
  min_effective_r: resistance(
    'Minimum effective R-value',
    'The effective total resistance 1/U_eff (surfaces and bridges included) must reach it.',
    'Reff',
  ),
  min_continuous_insulation_r: resistance(
    'Minimum continuous insulation R',
    'Σ d/λ of the homogeneous insulation layers (λ ≤ 0.065 W/(m·K)) outside any framing must reach it.',
    'continuousInsulationR',
  ),
  min_cavity_insulation_r: resistance(
    'Minimum cavity insulation R',
    'Σ d/λ of the insulation filling the framed layers (the lowest-λ section of each) must reach it.',
    'cavityInsulationR',
  ),
  max_condensation_accumulation: {
    label: 'Maximum condensation accumulation',
    description: 'The largest water accumulated inside the wall in any month (ISO 13788) must not exceed it.',
    direction: 'max',
    kind: 'number',
    metric: 'maxAccumulation',
    unit: 'kg/m²',
    display: { SI: shown(MASS_PER_AREA.SI), IP: shown(MASS_PER_AREA.IP) },
    accepts: { 'kg/m2': 1, 'g/m2': 0.001, 'lb/ft2': LB_PER_FT2_TO_KG_PER_M2 },
    range: { min: 0, max: 100 },
    decimals: { SI: 3, IP: 4 },
  },
  must_dry_within_year: {
    label: 'Must dry out within the year',
    description: 'Any water that condenses must have evaporated again by the end of the 12 months.',
    direction: 'required',
    kind: 'boolean',
    metric: 'driesOut',
    unit: '',
    ...sameInBoth('', 1, 0),
    accepts: { '': 1 },
    range: { min: 0, max: 1 },
  },
  max_surface_rh: {
    label: 'Maximum interior surface RH',
    description:
      'The relative humidity at the clear-field interior surface, p_i/p_sat(θ_si), must not exceed it in any month (mould risk).',
    direction: 'max',
    kind: 'number',
    metric: 'maxSurfaceRh',
    unit: 'fraction',
    ...sameInBoth('%', 0.01, 1),
    accepts: { '': 1, fraction: 1, '%': 0.01 },
    range: { min: 0, max: 1, minExclusive: true },
  },
  min_deflection_limit: {
    label: 'Minimum deflection limit (L/x)',
    description:
      'The denominator x of the deflection limit L/x of the panel’s load–span table must be at least this.',
    direction: 'min',
    kind: 'number',
    metric: 'deflectionLimit',
    unit: 'L/x',
    ...sameInBoth('L/x', 1, 0),
    accepts: { '': 1, 'l/x': 1 },
    range: { min: 1, max: 5000 },
  },
  min_sealant_movement_class: {
    label: 'Minimum sealant movement class',
    description:
      'Every joint’s sealant must have at least this ASTM C920 movement capability (±%; 100/50 counts as 50).',
    direction: 'min',
    kind: 'number',
    metric: 'minSealantMovementClass',
    unit: '%',
    ...sameInBoth('%', 1, 1),
    accepts: { '': 1, '%': 1 },
    range: { min: 0, max: 100, minExclusive: true },
  },
} as const satisfies Record<string, CriterionSpec>;

export type CriterionType = keyof typeof CRITERION_TYPES;
export const CRITERION_TYPE_KEYS = Object.keys(CRITERION_TYPES) as CriterionType[];
export const criterionTypeSchema = z.enum(CRITERION_TYPE_KEYS as [CriterionType, ...CriterionType[]]);
export const criterionSpec = (type: CriterionType): CriterionSpec => CRITERION_TYPES[type];

/** A row as stored and sent: one criterion for one climate zone (or all) and one wall category. */
export const criteriaRowInputSchema = z.object({
  climateZone: criteriaZoneSchema.describe('ASHRAE 169 climate zone, or "*" for all zones'),
  wallCategory: wallCategorySchema,
  criterion: criterionTypeSchema,
  value: z
    .union([z.number().refine(Number.isFinite, 'must be a finite number'), z.boolean()])
    .describe('SI value (see the criterion’s unit); yes/no for must_dry_within_year'),
  note: text(TEXT_MAX.line).default(''),
});
export type CriteriaRowInput = z.infer<typeof criteriaRowInputSchema>;

export interface RowIssue {
  /** Index of the row in the list. */
  index: number;
  field: 'climateZone' | 'wallCategory' | 'criterion' | 'value' | 'unit' | 'note' | 'row';
  reason: string;
}

const rowKey = (r: Pick<CriteriaRowInput, 'climateZone' | 'wallCategory' | 'criterion'>) =>
  `${r.climateZone}|${r.wallCategory}|${r.criterion}`;

export { rowKey as criteriaRowKey };

/** Why an SI value does not suit the criterion, or null when it does. */
export function valueProblem(type: CriterionType, value: number | boolean): string | null {
  const spec = criterionSpec(type);
  if (spec.kind === 'boolean')
    return typeof value === 'boolean' ? null : 'enter yes or no for this criterion';
  if (typeof value !== 'number' || !Number.isFinite(value)) return 'enter a number';
  const { min, max, minExclusive } = spec.range;
  if (minExclusive ? value <= min : value < min)
    return `must be ${minExclusive ? 'greater than' : 'at least'} ${min}${spec.unit && spec.unit !== 'fraction' ? ` ${spec.unit}` : ''}`;
  if (value > max)
    return type === 'max_surface_rh'
      ? 'a relative humidity is a fraction 0–1 (write 80 with the unit % for 80 %)'
      : `must be at most ${max}${spec.unit && spec.unit !== 'L/x' ? ` ${spec.unit}` : ''}`;
  return null;
}

/** Every problem of a list of rows: values outside their criterion's range, and duplicate keys. */
export function rowIssues(rows: readonly CriteriaRowInput[]): RowIssue[] {
  const issues: RowIssue[] = [];
  const seen = new Map<string, number>();
  rows.forEach((row, index) => {
    const problem = valueProblem(row.criterion, row.value);
    if (problem) issues.push({ index, field: 'value', reason: problem });
    const key = rowKey(row);
    const first = seen.get(key);
    if (first !== undefined)
      issues.push({
        index,
        field: 'row',
        reason: `repeats row ${first + 1} (${zoneLabel(row.climateZone)}, ${WALL_CATEGORY_LABELS[row.wallCategory]}, ${criterionSpec(row.criterion).label}); one value per criterion`,
      });
    else seen.set(key, index);
  });
  return issues;
}

/** The rows of a whole table: each valid, no key twice. */
export const criteriaRowsSchema = z
  .array(criteriaRowInputSchema)
  .max(2000)
  .superRefine((rows, ctx) => {
    for (const issue of rowIssues(rows))
      ctx.addIssue({
        code: 'custom',
        path: issue.field === 'row' ? [issue.index] : [issue.index, issue.field],
        message: issue.reason,
      });
  });

/**
 * The words a code table uses for each of Skinwright's wall categories (e.g. "Metal building" or
 * "Steel-framed"). The category keys themselves are fixed — assemblies carry them — so a table may rename
 * them but not invent a category no assembly could ever match.
 */
export const categoryLabelsSchema = z
  .partialRecord(wallCategorySchema, z.string().trim().min(1).max(120))
  .describe('The table’s own name for a wall category; omitted = the standard name');
export type CategoryLabels = z.infer<typeof categoryLabelsSchema>;
export const categoryLabel = (labels: Partial<Record<WallCategory, string>>, c: WallCategory): string =>
  labels[c] ?? WALL_CATEGORY_LABELS[c];

/**
 * The rows that apply to an assembly of `category` in climate zone `zone`: a row naming the zone wins over
 * an all-zones row for the same criterion.
 */
export function applicableRows<R extends CriteriaRowInput>(
  rows: readonly R[],
  zone: string,
  category: WallCategory,
): R[] {
  const byType = new Map<CriterionType, R>();
  for (const r of rows) {
    if (r.wallCategory !== category) continue;
    if (r.climateZone !== zone && r.climateZone !== ALL_ZONES) continue;
    const held = byType.get(r.criterion);
    if (!held || (held.climateZone === ALL_ZONES && r.climateZone !== ALL_ZONES)) byType.set(r.criterion, r);
  }
  return CRITERION_TYPE_KEYS.flatMap((t) => {
    const r = byType.get(t);
    return r ? [r] : [];
  });
}

// -------------------------------------------------------------------------------- units at the edge

/** Value of a row as shown in `system` (booleans untouched). */
export function toDisplay(type: CriterionType, si: number | boolean, system: UnitSystem): number | boolean {
  if (typeof si === 'boolean') return si;
  return si / criterionSpec(type).display[system].toSI;
}

/** A number typed in `system` → the SI value stored. */
export const fromDisplay = (type: CriterionType, shown: number, system: UnitSystem): number =>
  shown * criterionSpec(type).display[system].toSI;

/** Unit text as typed in a CSV → a comparable key ("W/(m²·K)", "W/m2K" → "w/m2k"). */
export function normaliseUnit(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replaceAll('²', '2')
    .replaceAll('^', '')
    .replaceAll('°', '')
    .replaceAll('hr', 'h')
    .replace(/[\s·*.()]/g, '')
    .replace(/^degf$/, 'f');
}
