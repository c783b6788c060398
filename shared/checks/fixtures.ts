import demo from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { type AssemblyInput, assemblyInputSchema } from '../schemas/assembly';
import { projectClimateSchema, projectWindSchema } from '../schemas/project';
import type { CriteriaRowInput } from './criteria';
import type { ProjectForChecks } from './inputs';

/** The invented demo assembly and project (data/seed) as the checks read them — for tests. */
export const demoAssembly = (): AssemblyInput => assemblyInputSchema.parse(demo.assembly);
export const demoProject = (): ProjectForChecks => ({
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
