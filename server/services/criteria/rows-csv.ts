import {
  type CategoryLabels,
  type CriteriaRowInput,
  type CriteriaZone,
  type CriterionType,
  criterionSpec,
  type WallCategory,
} from '@shared/checks/criteria';
import { criteriaFromCsv, criteriaToCsv } from '@shared/checks/criteria-csv';
import type { CriteriaAccess, CriteriaRow, CriteriaSave } from '@shared/schemas/criteria';
import type { UnitSystem } from '@shared/units';
import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { type criteriaRows, criteriaSets } from '../../db/schema';
import { DomainError, notFound } from '../errors';
import type { CriteriaQueries } from './queries';
import type { CriteriaVersions } from './versions';

type RowRow = typeof criteriaRows.$inferSelect;

/** A stored row as the API gives it (a yes/no criterion is stored as 0/1). */
export function toRow(r: RowRow): CriteriaRow {
  const type = r.criterion as CriterionType;
  return {
    id: r.id,
    climateZone: r.climateZone as CriteriaZone,
    wallCategory: r.wallCategory as WallCategory,
    criterion: type,
    value: criterionSpec(type).kind === 'boolean' ? r.value !== 0 : r.value,
    note: r.note,
  };
}

/** Rows to insert, in the order given. */
export const rowValues = (setId: string, rows: readonly CriteriaRowInput[]) =>
  rows.map((r, position) => ({
    setId,
    position,
    climateZone: r.climateZone,
    wallCategory: r.wallCategory,
    criterion: r.criterion,
    value: typeof r.value === 'boolean' ? (r.value ? 1 : 0) : r.value,
    note: r.note,
  }));

export const sameRows = (a: readonly CriteriaRowInput[], b: readonly CriteriaRowInput[]) =>
  a.length === b.length &&
  a.every((r, i) => {
    const o = b[i]!;
    return (
      r.climateZone === o.climateZone &&
      r.wallCategory === o.wallCategory &&
      r.criterion === o.criterion &&
      r.value === o.value &&
      r.note === o.note
    );
  });

/** A table's rows as CSV, in and out (`shared/checks/criteria-csv.ts`). */
export function createCriteriaCsv(db: Db, q: CriteriaQueries, edit: CriteriaVersions['edit']) {
  return {
    /** Replaces the rows with the CSV's, all or nothing: on any problem, 422 with every line's problem. */
    async importCsv(
      setId: string,
      userId: string,
      csv: string,
      revision: number | undefined,
      access: CriteriaAccess,
    ): Promise<CriteriaSave> {
      const [s] = await db.select().from(criteriaSets).where(eq(criteriaSets.id, setId));
      if (!s) throw notFound('code table');
      const parsed = criteriaFromCsv(csv, s.categoryLabels as CategoryLabels);
      if (!parsed.ok)
        throw new DomainError(
          'invalid',
          'invalid_csv',
          `the CSV was not imported: ${parsed.errors.length} problem${parsed.errors.length === 1 ? '' : 's'} (nothing was changed)`,
          undefined,
          { errors: parsed.errors },
        );
      return edit(setId, userId, revision, 'import_csv', (meta) => ({ meta, rows: parsed.rows }), access);
    },

    async exportCsv(setId: string, units: UnitSystem): Promise<{ csv: string; filename: string }> {
      const s = await q.summary(setId);
      const slug =
        s.name
          .toLowerCase()
          .replace(/[^a-z0-9]+/g, '-')
          .replace(/^-|-$/g, '')
          .slice(0, 60) || 'code-table';
      return {
        csv: criteriaToCsv(await q.rowsOf(setId), units),
        filename: `${slug}-v${s.version}${units === 'IP' ? '-ip' : ''}.csv`,
      };
    },
  };
}
