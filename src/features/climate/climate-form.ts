import { MONTH_NAMES } from '@shared/calc/moisture/monthly';
import { type ProjectClimate, projectClimateSchema } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { z } from 'zod';
import { issueErrorMap } from '../../lib/issue-words';
import { formatQuantity, type Quantity } from '../../lib/quantities';

export { MONTH_NAMES };

/*
 * The climate form: 12 months of exterior temperature and RH (stored SI: °C and a 0–1 fraction; typed in
 * °C/°F and %), where they come from, and the interior: an ISO 13788 humidity class, or the project's fixed
 * indoor design conditions. Validated by the shared project-climate schema.
 */

export const climateFormSchema = z
  .object({
    months: projectClimateSchema.shape.months,
    source: projectClimateSchema.shape.source,
    interior: z.enum(['class', 'fixed']),
    humidityClass: z.number().int().min(1).max(5),
  })
  .transform(
    (v): ProjectClimate => ({
      months: v.months,
      source: v.source,
      ...(v.interior === 'class' ? { humidityClass: v.humidityClass } : {}),
    }),
  );

export type ClimateFormValues = z.input<typeof climateFormSchema>;

/** The form's values for a stored climate, or a blank form (12 empty months) when there is none. */
export function climateToForm(climate: ProjectClimate | null): ClimateFormValues {
  if (!climate)
    return {
      months: MONTH_NAMES.map(() => ({
        exteriorTemperature: Number.NaN,
        exteriorRelativeHumidity: Number.NaN,
      })),
      source: '',
      interior: 'class',
      humidityClass: 2,
    };
  return {
    months: climate.months.map((m) => ({ ...m })),
    source: climate.source,
    interior: climate.humidityClass === undefined ? 'fixed' : 'class',
    humidityClass: climate.humidityClass ?? 2,
  };
}

const QUANTITY_OF: Record<string, Quantity> = {
  exteriorTemperature: 'temperature',
  exteriorRelativeHumidity: 'relativeHumidity',
};

/** Range and missing-value messages in the person's units ("Must be at most 140 °F"). */
export function climateErrorMap(system: UnitSystem) {
  return issueErrorMap((issue) => {
    const q = QUANTITY_OF[String(issue.path?.[issue.path.length - 1] ?? '')];
    return q ? (si) => formatQuantity(si, q, system) : undefined;
  });
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** One editable value of a climate, for the three-way merge after a version conflict. */
type Cell = { key: string; label: string; get: (c: ProjectClimate | null) => unknown };

const CELLS: Cell[] = [
  ...MONTH_NAMES.flatMap((name, k): Cell[] => [
    { key: `m${k}t`, label: `${name} temperature`, get: (c) => c?.months[k]?.exteriorTemperature },
    { key: `m${k}h`, label: `${name} RH`, get: (c) => c?.months[k]?.exteriorRelativeHumidity },
  ]),
  { key: 'source', label: 'Source', get: (c) => c?.source },
  { key: 'humidityClass', label: 'Interior (humidity class)', get: (c) => c?.humidityClass ?? 'fixed' },
];

/**
 * Keep every value this person changed from where they started; take the saved climate's value everywhere
 * else. Returns the merged climate and the values both changed (this person's kept).
 */
export function mergeClimate(
  base: ProjectClimate | null,
  mine: ProjectClimate,
  theirs: ProjectClimate | null,
): { merged: ProjectClimate; bothChanged: string[]; theirsChanged: string[] } {
  if (!theirs) return { merged: mine, bothChanged: [], theirsChanged: [] };
  const merged: ProjectClimate = {
    months: theirs.months.map((m) => ({ ...m })),
    source: theirs.source,
    ...(theirs.humidityClass === undefined ? {} : { humidityClass: theirs.humidityClass }),
  };
  const bothChanged: string[] = [];
  const theirsChanged: string[] = [];
  for (const cell of CELLS) {
    const mineChanged = !same(cell.get(mine), cell.get(base));
    const theirChanged = !same(cell.get(theirs), cell.get(base));
    if (theirChanged) theirsChanged.push(cell.label);
    if (!mineChanged) continue;
    if (theirChanged && !same(cell.get(theirs), cell.get(mine))) bothChanged.push(cell.label);
    if (cell.key === 'source') merged.source = mine.source;
    else if (cell.key === 'humidityClass') {
      if (mine.humidityClass === undefined) delete merged.humidityClass;
      else merged.humidityClass = mine.humidityClass;
    } else {
      const k = Number(cell.key.slice(1, -1));
      const field = cell.key.endsWith('t') ? 'exteriorTemperature' : 'exteriorRelativeHumidity';
      merged.months[k]![field] = mine.months[k]![field];
    }
  }
  return { merged, bothChanged, theirsChanged };
}
