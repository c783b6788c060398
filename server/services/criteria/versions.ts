import { randomUUID } from 'node:crypto';
import type { CriteriaRowInput } from '@shared/checks/criteria';
import { diffFields, diffRows } from '@shared/checks/criteria-diff';
import type {
  CriteriaAccess,
  CriteriaRow,
  CriteriaSave,
  CriteriaSet,
  CriteriaSetCreate,
  CriteriaSetMeta,
} from '@shared/schemas/criteria';
import { and, desc, eq, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { checkRuns, criteriaRows, criteriaSets } from '../../db/schema';
import { recordAudit } from '../audit';
import { conflict, notFound } from '../errors';
import { STALE, versionConflict, versionedUpdate } from '../versioned';
import { type CriteriaQueries, META_FIELDS, metaOf } from './queries';
import { rowValues, sameRows } from './rows-csv';

/** An edit of a version that is no longer the latest (thrown out of its transaction, answered as a conflict). */
class NotLatest extends Error {}

/** A 23505 unique violation, whichever driver reported it. */
const isUniqueViolation = (e: unknown) => {
  const err = e as { code?: string; cause?: { code?: string } };
  return err?.code === '23505' || err?.cause?.code === '23505';
};

/**
 * Writing code tables, with versions: a version used by a stored check run is frozen, and editing it creates
 * the next version; unfrozen versions are edited in place (revision + 1). Only the latest version is edited,
 * and only a version nothing used or builds on is deleted.
 */
export function createCriteriaVersions(db: Db, q: CriteriaQueries) {
  const { get, rowsOf } = q;

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
    try {
      return await versionedUpdate(db, {
        conflictMessage:
          'someone else saved this code table after you opened it; your changes were not saved',
        current: () => get(setId, access),
        answer: async (saved: { id: string; versionCreated: boolean }) => ({
          ...(await get(saved.id, access)),
          versionCreated: saved.versionCreated,
        }),
        write: async (tx) => {
          const [current] = await tx
            .select()
            .from(criteriaSets)
            .where(eq(criteriaSets.id, setId))
            .for('update');
          if (!current) throw notFound('code table');
          if (revision !== undefined && current.revision !== revision) return STALE;
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
          if (newer) throw new NotLatest();
          const rows = await rowsOf(setId, tx);
          const meta = metaOf(current);
          const next = apply(meta, rows);
          const metaChanges = diffFields(meta, next.meta, META_FIELDS);
          if (metaChanges.length === 0 && sameRows(rows, next.rows))
            return { audit: [], result: { id: setId, versionCreated: false } };
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
            const audit = {
              actorId: userId,
              entity: 'criteria_set',
              entityId: created!.id,
              action: 'new_version',
              before: { id: current.id, version: current.version },
              after: { version: current.version + 1, cause: action, ...change },
            };
            return { audit: [audit], result: { id: created!.id, versionCreated: true } };
          }
          await tx
            .update(criteriaSets)
            .set({ ...next.meta, revision: current.revision + 1, updatedAt: new Date() })
            .where(eq(criteriaSets.id, setId));
          await tx.delete(criteriaRows).where(eq(criteriaRows.setId, setId));
          if (next.rows.length > 0) await tx.insert(criteriaRows).values(rowValues(setId, next.rows));
          const audit = {
            actorId: userId,
            entity: 'criteria_set',
            entityId: setId,
            action,
            before: { revision: current.revision },
            after: { revision: current.revision + 1, ...change },
          };
          return { audit: [audit], result: { id: setId, versionCreated: false } };
        },
      });
    } catch (e) {
      // A newer version exists (or was created by a racing edit of the same frozen version).
      if (!(e instanceof NotLatest) && !isUniqueViolation(e)) throw e;
      const [latest] = await db
        .select({ id: criteriaSets.id })
        .from(criteriaSets)
        .where(eq(criteriaSets.lineageId, sql`(select lineage_id from criteria_sets where id = ${setId})`))
        .orderBy(desc(criteriaSets.version))
        .limit(1);
      throw versionConflict(
        'a newer version of this code table exists; open the latest version and edit that',
        await get(latest!.id, access),
      );
    }
  }

  return {
    edit,

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

export type CriteriaVersions = ReturnType<typeof createCriteriaVersions>;
