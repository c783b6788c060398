import { canonicalJson } from './canonical';
import { CRITERION_TYPE_KEYS, type CriteriaRowInput, criteriaRowKey } from './criteria';

/** What changed between two versions of a code table, keyed by (zone, category, criterion). */
export interface RowsDiff {
  added: CriteriaRowInput[];
  removed: CriteriaRowInput[];
  changed: (Pick<CriteriaRowInput, 'climateZone' | 'wallCategory' | 'criterion'> & {
    from: Pick<CriteriaRowInput, 'value' | 'note'>;
    to: Pick<CriteriaRowInput, 'value' | 'note'>;
  })[];
  unchanged: number;
}

const order = (a: CriteriaRowInput, b: CriteriaRowInput) =>
  a.climateZone.localeCompare(b.climateZone) ||
  a.wallCategory.localeCompare(b.wallCategory) ||
  CRITERION_TYPE_KEYS.indexOf(a.criterion) - CRITERION_TYPE_KEYS.indexOf(b.criterion);

const bare = (r: CriteriaRowInput): CriteriaRowInput => ({
  climateZone: r.climateZone,
  wallCategory: r.wallCategory,
  criterion: r.criterion,
  value: r.value,
  note: r.note,
});

/** Rows added, removed and changed (value or note) from `from` to `to`, in a stable order. */
export function diffRows(from: readonly CriteriaRowInput[], to: readonly CriteriaRowInput[]): RowsDiff {
  const before = new Map(from.map((r) => [criteriaRowKey(r), r]));
  const after = new Map(to.map((r) => [criteriaRowKey(r), r]));
  const diff: RowsDiff = { added: [], removed: [], changed: [], unchanged: 0 };
  for (const r of [...to].sort(order)) {
    const old = before.get(criteriaRowKey(r));
    if (!old) diff.added.push(bare(r));
    else if (old.value !== r.value || old.note !== r.note)
      diff.changed.push({
        climateZone: r.climateZone,
        wallCategory: r.wallCategory,
        criterion: r.criterion,
        from: { value: old.value, note: old.note },
        to: { value: r.value, note: r.note },
      });
    else diff.unchanged++;
  }
  for (const r of [...from].sort(order)) if (!after.has(criteriaRowKey(r))) diff.removed.push(bare(r));
  return diff;
}

/** The fields of two records that differ (compared as canonical JSON), in the order of `fields`. */
export function diffFields<T extends Record<string, unknown>>(
  from: T,
  to: T,
  fields: readonly (keyof T & string)[],
): { field: string; from: unknown; to: unknown }[] {
  return fields
    .filter((f) => canonicalJson(from[f] ?? null) !== canonicalJson(to[f] ?? null))
    .map((f) => ({ field: f, from: from[f] ?? null, to: to[f] ?? null }));
}
