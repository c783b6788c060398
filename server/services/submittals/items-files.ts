import { createHash, randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import type { Submittal, SubmittalItem } from '@shared/schemas/submittals';
import { and, count, eq, max, sql } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { checkRuns, submittalItems, submittals } from '../../db/schema';
import { type ReceiveFiles, type StoredUpload, storedDownload } from '../../storage/files';
import type { ObjectStore } from '../../storage/object-store';
import { type AuditRecord, recordAudit } from '../audit';
import { conflict, DomainError, notFound } from '../errors';
import { projectIntake, projectStoredBytes, quotaFull, takeQuotaTurn } from '../project-storage';
import type { createSheetService } from '../sheets';
import { type Actor, type ItemRow, MAX_ITEMS, type Row, type SubmittalQueries, wrongStatus } from './queries';

const tooManyItems = (has: number, adding: number) =>
  conflict(
    'too_many_items',
    `a revision holds at most ${MAX_ITEMS} items: it has ${has}, so ${adding} more would be too many; nothing was added`,
  );

function describeItem(item: ItemRow) {
  return item.kind === 'sheet'
    ? { item: item.id, kind: 'sheet', checkRun: item.checkRunId }
    : { item: item.id, kind: 'file', name: item.fileName, sha256: item.sha256 };
}

/** An item change is an edit of the revision: its version goes up, and the audit log says what changed. */
async function recordItemChange(
  tx: Db,
  submittal: Pick<Row, 'id' | 'projectId'>,
  actor: Actor,
  change: Pick<AuditRecord, 'action' | 'before' | 'after'>,
) {
  await tx
    .update(submittals)
    .set({ version: sql`${submittals.version} + 1`, updatedAt: new Date() })
    .where(eq(submittals.id, submittal.id));
  await recordAudit(tx, {
    actorId: actor.id,
    projectId: submittal.projectId,
    entity: 'submittal',
    entityId: submittal.id,
    ...change,
  });
}

/**
 * The items of a draft: compliance sheets of the project's check runs, and uploaded files (streamed to
 * object storage within the project's quota, at most `MAX_ITEMS` per revision), removed and downloaded.
 */
export function createSubmittalItemSteps(
  db: Db,
  config: Config,
  storage: ObjectStore,
  sheets: ReturnType<typeof createSheetService>,
  q: SubmittalQueries,
) {
  /**
   * The first free position of a draft for `adding` new items. The revision's row is locked first
   * (SELECT … FOR UPDATE, held to the end of the caller's transaction), so additions to one revision take
   * turns: each sees the items of those before it, the item limit holds and positions follow on (a unique
   * (revision, position) index is the backstop). The revision must still be a draft.
   */
  async function placesFor(tx: Db, id: string, adding: number): Promise<number> {
    const [locked] = await tx
      .select({ status: submittals.status, revision: submittals.revision })
      .from(submittals)
      .where(eq(submittals.id, id))
      .for('update');
    if (!locked) throw notFound('submittal');
    if (locked.status !== 'draft') throw wrongStatus(locked, ['draft']);
    const [{ n, last } = { n: 0, last: null }] = await tx
      .select({ n: count(), last: max(submittalItems.position) })
      .from(submittalItems)
      .where(eq(submittalItems.submittalId, id));
    if (Number(n) + adding > MAX_ITEMS) throw tooManyItems(Number(n), adding);
    return last === null ? 0 : last + 1;
  }

  return {
    /** Attaches the compliance sheet of a stored check run of the same project (and issues its code). */
    async attachSheet(id: string, actor: Actor, checkRunId: string): Promise<Submittal> {
      const r = await q.writable(id, ['draft']);
      const [run] = await db
        .select({ id: checkRuns.id, projectId: checkRuns.projectId, assemblyName: checkRuns.assemblyName })
        .from(checkRuns)
        .where(eq(checkRuns.id, checkRunId));
      if (!run || run.projectId !== r.projectId) throw notFound('check run');
      const { code } = await sheets.issue(checkRunId);
      await db.transaction(async (tx) => {
        const position = await placesFor(tx, id, 1);
        const [attached] = await tx
          .select({ id: submittalItems.id })
          .from(submittalItems)
          .where(and(eq(submittalItems.submittalId, id), eq(submittalItems.checkRunId, checkRunId)));
        if (attached) throw conflict('already_attached', 'this compliance sheet is already in the submittal');
        const [item] = await tx
          .insert(submittalItems)
          .values({
            submittalId: id,
            kind: 'sheet',
            position,
            checkRunId,
            addedBy: actor.id,
          })
          .returning({ id: submittalItems.id });
        await recordItemChange(tx, r, actor, {
          action: 'add_sheet',
          after: { item: item!.id, checkRun: checkRunId, assembly: run.assemblyName, verificationCode: code },
        });
      });
      return q.get(id);
    },

    /**
     * Stores uploaded files as they arrive (`projectIntake`: each judged by its first bytes before anything is
     * stored, streamed to object storage, within the project's storage quota), then writes the items in one
     * transaction that takes its turn on the revision (item limit, positions) and on the project (quota).
     * Anything that fails removes what was already stored: nothing is kept from a refused upload.
     */
    async upload(
      id: string,
      actor: Actor,
      receive: ReceiveFiles,
    ): Promise<{ items: SubmittalItem[]; submittal: Submittal }> {
      const r = await q.writable(id, ['draft']);
      const [[{ n } = { n: 0 }], used] = await Promise.all([
        db.select({ n: count() }).from(submittalItems).where(eq(submittalItems.submittalId, id)),
        projectStoredBytes(db, r.projectId),
      ]);
      const has = Number(n);
      if (has >= MAX_ITEMS) throw tooManyItems(has, 1);
      const quota = config.storage.projectQuotaBytes;
      const intake = projectIntake(storage, {
        projectId: r.projectId,
        folder: 'submittals',
        used,
        quota,
        what: 'the upload',
      });
      let arrived = 0;
      const files = await receive<StoredUpload>({
        // A file past the item limit is refused before it is stored.
        store: async (file) => {
          arrived += 1;
          if (has + arrived > MAX_ITEMS) throw tooManyItems(has, arrived);
          return intake.store(file);
        },
        remove: intake.remove,
      });
      let ids: string[];
      try {
        ids = await db.transaction(async (tx) => {
          const first = await placesFor(tx, id, files.length);
          const size = files.reduce((sum, f) => sum + f.size, 0);
          await takeQuotaTurn(tx, r.projectId, size, quota, 'the upload');
          const inserted = await tx
            .insert(submittalItems)
            .values(
              files.map((f, i) => ({
                submittalId: id,
                kind: 'file',
                position: first + i,
                storageKey: f.key,
                fileName: f.name,
                contentType: f.contentType,
                size: f.size,
                sha256: f.sha256,
                addedBy: actor.id,
              })),
            )
            .returning({ id: submittalItems.id });
          await recordItemChange(tx, r, actor, {
            action: 'upload',
            after: {
              files: files.map((f) => ({
                name: f.name,
                type: f.contentType,
                size: f.size,
                sha256: f.sha256,
              })),
            },
          });
          return inserted.map((x) => x.id);
        });
      } catch (err) {
        await Promise.allSettled(files.map(intake.remove));
        throw err;
      }
      const submittal = await q.get(id);
      return { items: submittal.items.filter((i) => ids.includes(i.id)), submittal };
    },

    /**
     * Adds a file the server made (an inspection's field report) to a draft as a file item: stored first, then
     * written in a transaction that takes its turn on the revision (item limit, position) and on the project
     * (quota); the stored object is removed when that fails.
     */
    async attachGenerated(
      id: string,
      actor: Actor,
      file: { name: string; contentType: string; bytes: Buffer; about: Record<string, unknown> },
    ): Promise<Submittal> {
      const r = await q.writable(id, ['draft']);
      const quota = config.storage.projectQuotaBytes;
      const used = await projectStoredBytes(db, r.projectId);
      if (used + file.bytes.length > quota) throw quotaFull(used, quota, 'the upload');
      const key = `projects/${r.projectId}/submittals/${randomUUID()}`;
      await storage.put(key, Readable.from([file.bytes]), file.contentType);
      const sha256 = createHash('sha256').update(file.bytes).digest('hex');
      try {
        await db.transaction(async (tx) => {
          const position = await placesFor(tx, id, 1);
          await takeQuotaTurn(tx, r.projectId, file.bytes.length, quota, 'the upload');
          const [item] = await tx
            .insert(submittalItems)
            .values({
              submittalId: id,
              kind: 'file',
              position,
              storageKey: key,
              fileName: file.name,
              contentType: file.contentType,
              size: file.bytes.length,
              sha256,
              addedBy: actor.id,
            })
            .returning({ id: submittalItems.id });
          await recordItemChange(tx, r, actor, {
            action: 'add_report',
            after: { item: item!.id, name: file.name, sha256, ...file.about },
          });
        });
      } catch (err) {
        await storage.delete(key).catch(() => undefined);
        throw err;
      }
      return q.get(id);
    },

    /** Removes an item from a draft; a file's stored object goes when no revision refers to it any more. */
    async removeItem(id: string, actor: Actor, itemId: string): Promise<Submittal> {
      const r = await q.writable(id, ['draft']);
      const [item] = await db
        .select()
        .from(submittalItems)
        .where(and(eq(submittalItems.id, itemId), eq(submittalItems.submittalId, id)));
      if (!item) throw notFound('item');
      await db.transaction(async (tx) => {
        await tx.delete(submittalItems).where(eq(submittalItems.id, itemId));
        await recordItemChange(tx, r, actor, {
          action: 'remove_item',
          before: describeItem(item),
        });
      });
      if (item.storageKey) {
        const [still] = await db
          .select({ n: count() })
          .from(submittalItems)
          .where(eq(submittalItems.storageKey, item.storageKey));
        if (Number(still?.n ?? 0) === 0) await storage.delete(item.storageKey).catch(() => undefined);
      }
      return q.get(id);
    },

    /** A stored file of an item, to stream back. */
    async file(id: string, itemId: string) {
      const [item] = await db
        .select()
        .from(submittalItems)
        .where(and(eq(submittalItems.id, itemId), eq(submittalItems.submittalId, id)));
      if (!item) throw notFound('item');
      if (item.kind !== 'file' || !item.storageKey)
        throw new DomainError(
          'not_found',
          'not_found',
          'this item is a compliance sheet: download it from its run',
        );
      return storedDownload(storage, item.storageKey, {
        name: item.fileName ?? 'file',
        contentType: item.contentType,
        size: item.size,
      });
    },
  };
}
