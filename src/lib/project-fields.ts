import type { ProjectInput } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { formatQuantity, type Quantity } from './quantities';

/** Plain-word labels for the project's fields — used by the form, the title block and the activity log. */
export const PROJECT_FIELD_LABELS: Record<keyof ProjectInput, string> = {
  name: 'Project name',
  number: 'Project number',
  description: 'Description',
  siteAddress: 'Site address',
  climateZone: 'Climate zone (ASHRAE 169)',
  elevationM: 'Site elevation above sea level',
  buildingHeightM: 'Mean roof height',
  planLengthM: 'Plan length (longer side)',
  planWidthM: 'Plan width (shorter side)',
  indoorTempC: 'Indoor design temperature',
  indoorRh: 'Indoor design relative humidity',
  winterDesignTempC: 'Winter design temperature',
  summerDesignTempC: 'Summer design temperature',
};

/** Which project fields carry a physical quantity, and which. Everything stored SI. */
export const PROJECT_FIELD_QUANTITIES = {
  elevationM: 'length',
  buildingHeightM: 'length',
  planLengthM: 'length',
  planWidthM: 'length',
  indoorTempC: 'temperature',
  indoorRh: 'relativeHumidity',
  winterDesignTempC: 'temperature',
  summerDesignTempC: 'temperature',
} as const satisfies Partial<Record<keyof ProjectInput, Quantity>>;

export type ProjectQuantityField = keyof typeof PROJECT_FIELD_QUANTITIES;

export const PROJECT_INPUT_FIELDS = Object.keys(PROJECT_FIELD_LABELS) as (keyof ProjectInput)[];

/** A project field's value as text, with units for physical quantities ("—" when empty). */
export function formatProjectFieldValue(field: string, value: unknown, system: UnitSystem): string {
  if (value === null || value === undefined || value === '') return '—';
  const q = (PROJECT_FIELD_QUANTITIES as Record<string, Quantity | undefined>)[field];
  if (q && typeof value === 'number') return formatQuantity(value, q, system);
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean')
    return String(value);
  return JSON.stringify(value);
}

export function projectFieldLabel(field: string): string {
  return (PROJECT_FIELD_LABELS as Record<string, string | undefined>)[field] ?? field;
}
