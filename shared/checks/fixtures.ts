import demo from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { engineMessageSchema, messageText } from '../format/messages';
import { type AssemblyInputSI, assemblyInputSchema } from '../schemas/assembly';
import {
  type ProjectClimateSI,
  type ProjectWindSI,
  projectClimateSchema,
  projectWindSchema,
} from '../schemas/project';
import type { CriteriaRowInput } from './criteria';
import type { ProjectForChecks } from './inputs';
import type { Check, CheckReport } from './report';

/** The invented demo assembly and project (data/seed) as the checks read them — for tests. */
export const demoAssembly = (): AssemblyInputSI => assemblyInputSchema.parse(demo.assembly);
export const demoProject = (): ProjectForChecks & {
  climate: ProjectClimateSI | null;
  wind: ProjectWindSI | null;
} => ({
  climateZone: '5A',
  elevationM: 185,
  buildingHeightM: 11.5,
  planLengthM: 96,
  planWidthM: 54,
  indoorTempC: 18,
  indoorRh: 0.45,
  winterDesignTempC: -19,
  summerDesignTempC: 31,
  wind: projectWindSchema.parse(demo.wind),
  climate: projectClimateSchema.parse(demo.climate),
});
export const criteriaRow = (
  criterion: CriteriaRowInput['criterion'],
  value: number | boolean,
  climateZone: CriteriaRowInput['climateZone'] = '5A',
  wallCategory: CriteriaRowInput['wallCategory'] = 'steel_framed',
): CriteriaRowInput => ({ climateZone, wallCategory, criterion, value, note: '' });

/** A passing maximum U-factor check (0.307 against 0.35 W/(m²·K)), with `over` put in — for tests. */
export const uFactorCheck = (over: Partial<Check> = {}): Check => ({
  id: 'criterion.max_u_factor',
  source: 'criteria',
  criterion: 'max_u_factor',
  label: 'Maximum U-factor',
  required: 0.35,
  provided: 0.307,
  unit: 'W/(m²·K)',
  direction: 'max',
  margin: 0.043,
  marginRatio: 0.043 / 0.35,
  status: 'pass',
  reason: '',
  module: 'thermal',
  traceStepIds: [],
  ...over,
});

/**
 * A report as check runs stored it before messages became data (D-030): every message replaced by its SI words,
 * a reason of none by ''.
 */
export function storedBefore(report: CheckReport): unknown {
  const walk = (v: unknown, key = ''): unknown => {
    if (v === null) return key === 'reason' ? '' : null;
    if (Array.isArray(v)) return v.map((x) => walk(x));
    if (typeof v !== 'object') return v;
    const parsed = engineMessageSchema.safeParse(v);
    if (parsed.success) return messageText(parsed.data);
    return Object.fromEntries(Object.entries(v as object).map(([k, x]) => [k, walk(x, k)]));
  };
  return walk(JSON.parse(JSON.stringify(report)));
}
