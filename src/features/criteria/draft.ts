import {
  CRITERION_TYPE_KEYS,
  type CriteriaRowInput,
  type CriteriaZone,
  type CriterionType,
  criterionSpec,
  rowIssues,
  toDisplay,
  type WallCategory,
} from '@shared/checks/criteria';
import type { UnitSystem } from '@shared/units';

/**
 * A row of the grid while it is being edited: the value as typed, in the unit system the grid was opened
 * in. An unchanged value keeps its stored SI number exactly (no rounding through the display).
 */
export interface DraftRow {
  key: string;
  climateZone: CriteriaZone;
  wallCategory: WallCategory;
  criterion: CriterionType;
  valueText: string;
  note: string;
  /** The stored value and the text it was first shown as (null for a new row). */
  original: { criterion: CriterionType; si: number | boolean; text: string } | null;
}

export type DraftField = 'climateZone' | 'wallCategory' | 'criterion' | 'value' | 'note' | 'row';
export type DraftErrors = Record<string, Partial<Record<DraftField, string>>>;

/**
 * The value as the grid first shows it: 4 significant digits (0.35 W/(m²·K) reads 0.06164 Btu/(h·ft²·°F)).
 * Showing fewer digits loses nothing: a value left as shown is saved as the stored SI number (`original`).
 */
const shortText = (x: number) =>
  Math.abs(x) >= 1000 ? String(Math.round(x)) : String(Number(x.toPrecision(4)));

export function valueToText(type: CriterionType, si: number | boolean, system: UnitSystem): string {
  const shown = toDisplay(type, si, system);
  return typeof shown === 'boolean' ? (shown ? 'yes' : 'no') : shortText(shown);
}

let counter = 0;
export const newDraftKey = () => `draft-${++counter}`;

export function toDrafts(
  rows: readonly (CriteriaRowInput & { id?: string })[],
  system: UnitSystem,
): DraftRow[] {
  return rows.map((r) => {
    const text = valueToText(r.criterion, r.value, system);
    return {
      key: r.id ?? newDraftKey(),
      climateZone: r.climateZone,
      wallCategory: r.wallCategory,
      criterion: r.criterion,
      valueText: text,
      note: r.note,
      original: { criterion: r.criterion, si: r.value, text },
    };
  });
}

export function blankDraft(previous?: DraftRow): DraftRow {
  return {
    key: newDraftKey(),
    climateZone: previous?.climateZone ?? '5A',
    wallCategory: previous?.wallCategory ?? 'steel_framed',
    criterion: 'max_u_factor',
    valueText: '',
    note: '',
    original: null,
  };
}

/** One blank row per criterion type the runner reads, for one zone and category: a new table's outline. */
export const starterDrafts = (climateZone: CriteriaZone, wallCategory: WallCategory): DraftRow[] =>
  CRITERION_TYPE_KEYS.map((criterion) => ({ ...blankDraft(), climateZone, wallCategory, criterion }));

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/**
 * Drafts → rows in SI, or the problems per draft key (a value that is not a number, out of range, a
 * criterion given twice). Nothing is sent while any problem remains.
 */
export function fromDrafts(
  drafts: readonly DraftRow[],
  system: UnitSystem,
): { ok: true; rows: CriteriaRowInput[] } | { ok: false; errors: DraftErrors } {
  const errors: DraftErrors = {};
  const rows: CriteriaRowInput[] = [];
  const keys: string[] = [];
  for (const d of drafts) {
    const spec = criterionSpec(d.criterion);
    const text = d.valueText.trim().replace(/\u2212/g, '-');
    let value: number | boolean | null = null;
    if (d.original && d.original.criterion === d.criterion && d.original.text === d.valueText)
      value = d.original.si;
    else if (spec.kind === 'boolean') value = text === 'yes' ? true : text === 'no' ? false : null;
    else if (NUMBER.test(text)) value = Number(text) * spec.display[system].toSI;
    if (value === null) {
      errors[d.key] = {
        value:
          spec.kind === 'boolean'
            ? 'choose yes or no'
            : text === ''
              ? `enter a value in ${spec.display[system].symbol || 'the criterion’s unit'}`
              : `“${d.valueText}” is not a number`,
      };
      continue;
    }
    rows.push({
      climateZone: d.climateZone,
      wallCategory: d.wallCategory,
      criterion: d.criterion,
      value,
      note: d.note.trim(),
    });
    keys.push(d.key);
  }
  const gridNumber = (key: string) => drafts.findIndex((d) => d.key === key) + 1;
  for (const issue of rowIssues(rows)) {
    const key = keys[issue.index]!;
    const field: DraftField = issue.field === 'row' ? 'row' : 'value';
    const reason = issue.reason.replace(
      /repeats row (\d+)/,
      (_m, n: string) => `repeats row ${gridNumber(keys[Number(n) - 1]!)}`,
    );
    errors[key] = { ...errors[key], [field]: reason };
  }
  for (const d of drafts)
    if (d.note.length > 500) errors[d.key] = { ...errors[d.key], note: 'at most 500 characters' };
  return Object.keys(errors).length > 0 ? { ok: false, errors } : { ok: true, rows };
}
