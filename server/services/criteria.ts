import { randomUUID } from 'node:crypto';
import { canInFirm, type FirmRole } from '@shared/auth/permissions';
import {
  type CategoryLabels,
  type CriteriaRowInput,
  type CriteriaZone,
  type CriterionType,
  criterionSpec,
  type WallCategory,
} from '@shared/checks/criteria';
import { criteriaFromCsv, criteriaToCsv } from '@shared/checks/criteria-csv';
import { diffFields, diffRows } from '@shared/checks/criteria-diff';
import type {
  CriteriaAccess,
  CriteriaDiff,
  CriteriaRow,
  CriteriaSave,
  CriteriaSet,
  CriteriaSetCreate,
  CriteriaSetMeta,
  CriteriaSetSummary,
} from '@shared/schemas/criteria';
import type { UnitSystem } from '@shared/units';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import {
  checkRuns,
  criteriaRows,
  criteriaSets,
  organisationMembers,
  organisations,
  projectMembers,
  projects,
  user,
} from '../db/schema';
import { recordAudit } from './audit';
import { conflict, DomainError, notFound } from './errors';

type SetRow = typeof criteriaSets.$inferSelect;
type RowRow = typeof criteriaRows.$inferSelect;

const META_FIELDS = [
  'name',
  'jurisdiction',
  'edition',
  'effectiveDate',
  'notes',
  'sourceReference',
  'categoryLabels',
] as const;

function toRow(r: RowRow): CriteriaRow {
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

const rowValues = (setId: string, rows: readonly CriteriaRowInput[]) =>
  rows.map((r, position) => ({
    setId,
    position,
    climateZone: r.climateZone,
    wallCategory: r.wallCategory,
    criterion: r.criterion,
    value: typeof r.value === 'boolean' ? (r.value ? 1 : 0) : r.value,
    note: r.note,
  }));

const metaOf = (s: SetRow): CriteriaSetMeta => ({
  name: s.name,
  jurisdiction: s.jurisdiction,
  edition: s.edition,
  effectiveDate: s.effectiveDate,
  notes: s.notes,
  sourceReference: s.sourceReference,
  categoryLabels: s.categoryLabels as CategoryLabels,
});

const sameRows = (a: readonly CriteriaRowInput[], b: readonly CriteriaRowInput[]) =>
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

/** A 23505 unique violation, whichever driver reported it. */
const isUniqueViolation = (e: unknown) => {
  const err = e as { code?: string; cause?: { code?: string } };
  return err?.code === '23505' || err?.cause?.code === '23505';
};

/**
 * Code tables (criteria sets) of a firm, with versions: a version used by a stored check run is frozen,
 * and editing it creates the next version; unfrozen versions are edited in place (revision + 1).
 */
export function createCriteriaService(db: Db) {
  const summaryColumns = {
    s: criteriaSets,
    orgName: organisations.name,
    by: user.name,
    rowCount: sql<number>`(select count(*)::int from criteria_rows r where r.set_id = ${criteriaSets.id})`,
    latest: sql<number>`(select max(v.version)::int from criteria_sets v where v.lineage_id = ${criteriaSets.lineageId})`,
  };
  type SummaryRow = { s: SetRow; orgName: string; by: string | null; rowCount: number; latest: number };

  const summaries = () =>
    db
      .select(summaryColumns)
      .from(criteriaSets)
      .innerJoin(organisations, eq(organisations.id, criteriaSets.organisationId))
      .leftJoin(user, eq(user.id, criteriaSets.createdBy));

  function toSummary({ s, orgName, by, rowCount, latest }: SummaryRow): CriteriaSetSummary {
    return {
      id: s.id,
      organisationId: s.organisationId,
      organisationName: orgName,
      lineageId: s.lineageId,
      version: s.version,
      previousVersionId: s.previousVersionId,
      revision: s.revision,
      name: s.name,
      jurisdiction: s.jurisdiction,
      edition: s.edition,
      effectiveDate: s.effectiveDate,
      frozenAt: s.frozenAt?.toISOString() ?? null,
      isLatest: Number(latest) === s.version,
      rowCount: Number(rowCount),
      createdBy: by,
      createdAt: s.createdAt.toISOString(),
      updatedAt: s.updatedAt.toISOString(),
    };
  }

  async function summary(setId: string): Promise<CriteriaSetSummary> {
    const [r] = await summaries().where(eq(criteriaSets.id, setId));
    if (!r) throw notFound('code table');
    return toSummary(r);
  }

  async function rowsOf(setId: string, tx: Db = db): Promise<CriteriaRow[]> {
    const rows = await tx
      .select()
      .from(criteriaRows)
      .where(eq(criteriaRows.setId, setId))
      .orderBy(asc(criteriaRows.position));
    return rows.map(toRow);
  }

  async function get(setId: string, access: CriteriaAccess): Promise<CriteriaSet> {
    const [r] = await summaries().where(eq(criteriaSets.id, setId));
    if (!r) throw notFound('code table');
    return {
      ...toSummary(r),
      notes: r.s.notes,
      sourceReference: r.s.sourceReference,
      categoryLabels: r.s.categoryLabels as CategoryLabels,
      rows: await rowsOf(setId),
      myAccess: access,
    };
  }

  /** The latest version of every table of these firms, by name. */
  async function latestOf(organisationIds: string[]): Promise<CriteriaSetSummary[]> {
    if (organisationIds.length === 0) return [];
    const rows = await summaries()
      .where(inArray(criteriaSets.organisationId, organisationIds))
      .orderBy(asc(criteriaSets.name), desc(criteriaSets.version));
    return rows.map(toSummary).filter((s) => s.isLatest);
  }

  /**
   * One edit of a table: in place when the version is not frozen (revision + 1), as the next version when
   * it is. The caller names the revision it read; a stale one, or an edit of a version that is no longer
   * the latest, gets 409 and nothing is written. An edit that changes nothing writes nothing.
   */
  async function edit(
    setId: string,
    userId: string,
    revision: number | undefined,
    action: string,
    apply: (
      meta: CriteriaSetMeta,
      rows: CriteriaRow[],
    ) => { meta: CriteriaSetMeta; rows: CriteriaRowInput[] },
    access: CriteriaAccess,
  ): Promise<CriteriaSave> {
    let result: { id: string; versionCreated: boolean } | 'stale' | 'not_latest';
    try {
      result = await db.transaction(async (tx) => {
        const [current] = await tx
          .select()
          .from(criteriaSets)
          .where(eq(criteriaSets.id, setId))
          .for('update');
        if (!current) throw notFound('code table');
        if (revision !== undefined && current.revision !== revision) return 'stale' as const;
        const [newer] = await tx
          .select({ id: criteriaSets.id })
          .from(criteriaSets)
          .where(
            and(
              eq(criteriaSets.lineageId, current.lineageId),
              sql`${criteriaSets.version} > ${current.version}`,
            ),
          )
          .limit(1);
        if (newer) return 'not_latest' as const;
        const rows = await rowsOf(setId, tx);
        const meta = metaOf(current);
        const next = apply(meta, rows);
        const metaChanges = diffFields(meta, next.meta, META_FIELDS);
        if (metaChanges.length === 0 && sameRows(rows, next.rows))
          return { id: setId, versionCreated: false };
        const rowsDiff = diffRows(rows, next.rows);
        const change = {
          meta: metaChanges,
          added: rowsDiff.added.length,
          removed: rowsDiff.removed.length,
          changed: rowsDiff.changed.length,
        };

        if (current.frozenAt) {
          const [created] = await tx
            .insert(criteriaSets)
            .values({
              organisationId: current.organisationId,
              lineageId: current.lineageId,
              version: current.version + 1,
              previousVersionId: current.id,
              ...next.meta,
              createdBy: userId,
            })
            .returning({ id: criteriaSets.id });
          if (next.rows.length > 0) await tx.insert(criteriaRows).values(rowValues(created!.id, next.rows));
          await recordAudit(tx, {
            actorId: userId,
            entity: 'criteria_set',
            entityId: created!.id,
            action: 'new_version',
            before: { id: current.id, version: current.version },
            after: { version: current.version + 1, cause: action, ...change },
          });
          return { id: created!.id, versionCreated: true };
        }
        await tx
          .update(criteriaSets)
          .set({ ...next.meta, revision: current.revision + 1, updatedAt: new Date() })
          .where(eq(criteriaSets.id, setId));
        await tx.delete(criteriaRows).where(eq(criteriaRows.setId, setId));
        if (next.rows.length > 0) await tx.insert(criteriaRows).values(rowValues(setId, next.rows));
        await recordAudit(tx, {
          actorId: userId,
          entity: 'criteria_set',
          entityId: setId,
          action,
          before: { revision: current.revision },
          after: { revision: current.revision + 1, ...change },
        });
        return { id: setId, versionCreated: false };
      });
    } catch (e) {
      if (!isUniqueViolation(e)) throw e;
      result = 'not_latest';
    }
    if (result === 'stale')
      throw conflict(
        'version_conflict',
        'someone else saved this code table after you opened it; your changes were not saved',
        await get(setId, access),
      );
    if (result === 'not_latest') {
      const [latest] = await db
        .select({ id: criteriaSets.id })
        .from(criteriaSets)
        .where(eq(criteriaSets.lineageId, sql`(select lineage_id from criteria_sets where id = ${setId})`))
        .orderBy(desc(criteriaSets.version))
        .limit(1);
      throw conflict(
        'version_conflict',
        'a newer version of this code table exists; open the latest version and edit that',
        await get(latest!.id, access),
      );
    }
    return { ...(await get(result.id, access)), versionCreated: result.versionCreated };
  }

  return {
    get,
    summary,

    /** The firm a table belongs to (for the permission check), or null. */
    async organisationOf(setId: string): Promise<string | null> {
      const [s] = await db
        .select({ org: criteriaSets.organisationId })
        .from(criteriaSets)
        .where(eq(criteriaSets.id, setId));
      return s?.org ?? null;
    },

    /**
     * What a person may do with a firm's code tables: by their firm role — admin: admin (edit, delete);
     * editor: write; reader: read. Someone outside the firm who is on one of the firm's projects: read (to
     * see what their checks are run against; writing is the firm's alone). Anyone else: null (404).
     */
    async accessIn(organisationId: string, userId: string): Promise<CriteriaAccess | null> {
      const [m] = await db
        .select({ role: organisationMembers.role })
        .from(organisationMembers)
        .where(
          and(eq(organisationMembers.organisationId, organisationId), eq(organisationMembers.userId, userId)),
        );
      if (m) {
        const role = m.role as FirmRole;
        return canInFirm(role, 'firm.admin') ? 'admin' : canInFirm(role, 'firm.write') ? 'write' : 'read';
      }
      const [onProject] = await db
        .select({ id: projectMembers.id })
        .from(projectMembers)
        .innerJoin(projects, eq(projects.id, projectMembers.projectId))
        .where(and(eq(projects.organisationId, organisationId), eq(projectMembers.userId, userId)))
        .limit(1);
      return onProject ? 'read' : null;
    },

    /** The latest version of each of the firm's tables. */
    list: (organisationId: string) => latestOf([organisationId]),

    /** Tables a member of the project may check against: the project firm's and the caller's own firms'. */
    async forProject(projectId: string, userId: string): Promise<CriteriaSetSummary[]> {
      const firms = await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(eq(organisationMembers.userId, userId));
      const [p] = await db
        .select({ org: projects.organisationId })
        .from(projects)
        .where(eq(projects.id, projectId));
      const ids = [...new Set([...(p ? [p.org] : []), ...firms.map((f) => f.id)])];
      const sets = await latestOf(ids);
      // The project's own firm first.
      return [
        ...sets.filter((s) => s.organisationId === p?.org),
        ...sets.filter((s) => s.organisationId !== p?.org),
      ];
    },

    async create(
      organisationId: string,
      userId: string,
      input: CriteriaSetCreate,
      access: CriteriaAccess,
    ): Promise<CriteriaSet> {
      const id = randomUUID();
      const { rows, ...meta } = input;
      await db.transaction(async (tx) => {
        await tx
          .insert(criteriaSets)
          .values({ id, organisationId, lineageId: id, ...meta, createdBy: userId });
        if (rows.length > 0) await tx.insert(criteriaRows).values(rowValues(id, rows));
        await recordAudit(tx, {
          actorId: userId,
          entity: 'criteria_set',
          entityId: id,
          action: 'create',
          after: { name: meta.name, rows: rows.length },
        });
      });
      return get(id, access);
    },

    updateMeta: (
      setId: string,
      userId: string,
      revision: number,
      changes: CriteriaSetMeta,
      access: CriteriaAccess,
    ) => edit(setId, userId, revision, 'update', (_meta, rows) => ({ meta: changes, rows }), access),

    replaceRows: (
      setId: string,
      userId: string,
      revision: number,
      rows: CriteriaRowInput[],
      access: CriteriaAccess,
    ) => edit(setId, userId, revision, 'update_rows', (meta) => ({ meta, rows }), access),

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
      const s = await summary(setId);
      const slug =
        s.name
          .toLowerCase()
          .replace(/[^a-z0-9]+/g, '-')
          .replace(/^-|-$/g, '')
          .slice(0, 60) || 'code-table';
      return {
        csv: criteriaToCsv(await rowsOf(setId), units),
        filename: `${slug}-v${s.version}${units === 'IP' ? '-ip' : ''}.csv`,
      };
    },

    async versions(setId: string): Promise<CriteriaSetSummary[]> {
      const [s] = await db
        .select({ lineage: criteriaSets.lineageId })
        .from(criteriaSets)
        .where(eq(criteriaSets.id, setId));
      if (!s) throw notFound('code table');
      const rows = await summaries()
        .where(eq(criteriaSets.lineageId, s.lineage))
        .orderBy(desc(criteriaSets.version));
      return rows.map(toSummary);
    },

    async diff(setId: string, from: number, to: number): Promise<CriteriaDiff> {
      const [s] = await db
        .select({ lineage: criteriaSets.lineageId })
        .from(criteriaSets)
        .where(eq(criteriaSets.id, setId));
      if (!s) throw notFound('code table');
      const version = async (v: number) => {
        const [r] = await summaries().where(
          and(eq(criteriaSets.lineageId, s.lineage), eq(criteriaSets.version, v)),
        );
        if (!r) throw new DomainError('not_found', 'not_found', `this code table has no version ${v}`);
        return { summary: toSummary(r), meta: metaOf(r.s), rows: await rowsOf(r.s.id) };
      };
      const a = await version(from);
      const b = await version(to);
      return {
        lineageId: s.lineage,
        from: a.summary,
        to: b.summary,
        meta: diffFields(a.meta, b.meta, META_FIELDS),
        ...diffRows(a.rows, b.rows),
      };
    },

    /** Deletes a version that no check run used (frozen versions are part of the record and stay). */
    async remove(setId: string, userId: string): Promise<void> {
      await db.transaction(async (tx) => {
        const [s] = await tx.select().from(criteriaSets).where(eq(criteriaSets.id, setId)).for('update');
        if (!s) throw notFound('code table');
        const [used] = await tx
          .select({ id: checkRuns.id })
          .from(checkRuns)
          .where(eq(checkRuns.criteriaSetId, setId))
          .limit(1);
        if (s.frozenAt || used)
          throw conflict('frozen', 'this version was used by a stored check run; it is kept as issued');
        const [next] = await tx
          .select({ id: criteriaSets.id })
          .from(criteriaSets)
          .where(eq(criteriaSets.previousVersionId, setId))
          .limit(1);
        if (next) throw conflict('has_newer_version', 'a newer version is based on this one');
        await tx.delete(criteriaSets).where(eq(criteriaSets.id, setId));
        await recordAudit(tx, {
          actorId: userId,
          entity: 'criteria_set',
          entityId: setId,
          action: 'delete',
          before: { name: s.name, version: s.version },
        });
      });
    },

    /**
     * Freezes a version inside the caller's transaction (a check run is being stored) and returns it with
     * its rows, read under the same lock so that no in-place edit can slip between reading and storing.
     */
    async freezeForRun(tx: Db, setId: string, userId: string) {
      const [s] = await tx.select().from(criteriaSets).where(eq(criteriaSets.id, setId)).for('update');
      if (!s) throw notFound('code table');
      if (!s.frozenAt) {
        await tx.update(criteriaSets).set({ frozenAt: new Date() }).where(eq(criteriaSets.id, setId));
        await recordAudit(tx, {
          actorId: userId,
          entity: 'criteria_set',
          entityId: setId,
          action: 'freeze',
          after: { version: s.version, reason: 'used by a stored check run' },
        });
      }
      return { set: s, rows: await rowsOf(setId, tx) };
    },
  };
}
