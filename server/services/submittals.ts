import { randomUUID } from 'node:crypto';
import { can, PROJECT_ROLE_LABELS, type ProjectRole } from '@shared/auth/permissions';
import type { Verdict } from '@shared/checks/report';
import {
  combinedDecision,
  confirmsFailingSheet,
  FAILING_SHEET_CONFIRMATION,
  isApproval,
  isDecided,
  SUBMITTAL_STATUS_TEXT,
  type Submittal,
  type SubmittalComment,
  type SubmittalCreate,
  type SubmittalDecision,
  type SubmittalDecisionInput,
  type SubmittalFields,
  type SubmittalItem,
  type SubmittalStatus,
  type SubmittalSummary,
  sheetsWithVerdict,
} from '@shared/schemas/submittals';
import { verificationCode } from '@shared/sheets/verification';
import { and, asc, count, eq, inArray, isNotNull, max, sql } from 'drizzle-orm';
import type { Config } from '../config';
import type { Db } from '../db/client';
import {
  checkRuns,
  projectMembers,
  projects,
  submittalComments,
  submittalItems,
  submittalReviewers,
  submittals,
  user,
} from '../db/schema';
import type { Mailer } from '../mail/mailer';
import type { ReceiveFiles } from '../storage/files';
import { fileIntake, type StoredUpload } from '../storage/files';
import type { ObjectStore } from '../storage/object-store';
import { recordAudit } from './audit';
import { conflict, DomainError, notFound } from './errors';
import { archivedError } from './projects';
import type { createSheetService } from './sheets';

type Row = typeof submittals.$inferSelect;
type ItemRow = typeof submittalItems.$inferSelect;
type Actor = { id: string; name: string };

/** Items per revision (sheets and files together). */
const MAX_ITEMS = 40;

const statusWords = (s: SubmittalStatus) => SUBMITTAL_STATUS_TEXT[s].label.toLowerCase();
const MB = 1024 * 1024;

/** The refusal of a step that needs another status (a decided revision is read-only). */
function wrongStatus(r: Pick<Row, 'status' | 'revision'>, statuses: readonly SubmittalStatus[]) {
  const status = r.status as SubmittalStatus;
  return isDecided(status)
    ? conflict('read_only', `revision ${r.revision} was decided (${statusWords(status)}) and is read-only`)
    : conflict(
        'wrong_status',
        `revision ${r.revision} is ${statusWords(status)}; this step needs it to be ${statuses.map(statusWords).join(' or ')}`,
      );
}

const tooManyItems = (has: number, adding: number) =>
  conflict(
    'too_many_items',
    `a revision holds at most ${MAX_ITEMS} items: it has ${has}, so ${adding} more would be too many; nothing was added`,
  );

/**
 * Submittals and their workflow. A revision is edited while it is a draft; submitting sends it to its
 * reviewers; a reviewer starts the review and decides. "Revise and resubmit" closes the revision and opens
 * the next as a draft (with copies of the items); decided revisions never change. Every change writes the
 * audit log in its transaction; submissions and decisions send e-mail.
 */
export function createSubmittalService(
  db: Db,
  config: Config,
  mailer: Mailer,
  storage: ObjectStore,
  sheets: ReturnType<typeof createSheetService>,
) {
  const link = (r: Pick<Row, 'projectId' | 'id'>) =>
    `${config.baseUrl}/projects/${r.projectId}/submittals/${r.id}`;

  async function row(id: string): Promise<Row> {
    const [r] = await db.select().from(submittals).where(eq(submittals.id, id));
    if (!r) throw notFound('submittal');
    return r;
  }

  async function names(ids: (string | null)[]): Promise<Map<string, string>> {
    const wanted = [...new Set(ids.filter((x): x is string => Boolean(x)))];
    if (wanted.length === 0) return new Map();
    const rows = await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, wanted));
    return new Map(rows.map((r) => [r.id, r.name]));
  }

  function toSummary(r: Row, itemCount: number, who: Map<string, string>): SubmittalSummary {
    return {
      id: r.id,
      projectId: r.projectId,
      lineageId: r.lineageId,
      number: r.number,
      title: r.title,
      specSection: r.specSection,
      specTitle: r.specTitle,
      revision: r.revision,
      status: r.status as SubmittalStatus,
      submitter: r.submitterId ? { id: r.submitterId, name: who.get(r.submitterId) ?? '—' } : null,
      dueDate: r.dueDate,
      itemCount,
      version: r.version,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
      submittedAt: r.submittedAt?.toISOString() ?? null,
      decidedAt: r.decidedAt?.toISOString() ?? null,
    };
  }

  async function items(submittalId: string): Promise<SubmittalItem[]> {
    const rows = await db
      .select({ item: submittalItems, run: checkRuns, by: user.name })
      .from(submittalItems)
      .leftJoin(checkRuns, eq(checkRuns.id, submittalItems.checkRunId))
      .leftJoin(user, eq(user.id, submittalItems.addedBy))
      .where(eq(submittalItems.submittalId, submittalId))
      .orderBy(asc(submittalItems.position), asc(submittalItems.createdAt));
    return rows.map(({ item, run, by }): SubmittalItem => {
      const base = {
        id: item.id,
        position: item.position,
        addedBy: by,
        createdAt: item.createdAt.toISOString(),
      };
      if (item.kind === 'sheet' && run)
        return {
          ...base,
          kind: 'sheet',
          sheet: {
            checkRunId: run.id,
            assemblyName: run.assemblyName,
            assemblyRevision: run.assemblyRevision,
            criteriaSetName: run.criteriaSetName,
            criteriaSetVersion: run.criteriaSetVersion,
            verdict: run.verdict as Verdict,
            verificationCode: verificationCode(run.hash),
            runAt: run.createdAt.toISOString(),
          },
        };
      return {
        ...base,
        kind: 'file',
        file: {
          name: item.fileName ?? 'file',
          contentType: item.contentType ?? 'application/octet-stream',
          size: item.size ?? 0,
          sha256: item.sha256 ?? '',
        },
      };
    });
  }

  async function get(id: string): Promise<Submittal> {
    const r = await row(id);
    const [itemList, reviewerRows, commentRows, revisionRows] = await Promise.all([
      items(id),
      db
        .select({ id: user.id, name: user.name, role: projectMembers.role, reviewer: submittalReviewers })
        .from(submittalReviewers)
        .innerJoin(user, eq(user.id, submittalReviewers.userId))
        .leftJoin(
          projectMembers,
          and(
            eq(projectMembers.userId, submittalReviewers.userId),
            eq(projectMembers.projectId, r.projectId),
          ),
        )
        .where(eq(submittalReviewers.submittalId, id))
        .orderBy(asc(user.name)),
      db
        .select({ c: submittalComments, author: user.name, role: projectMembers.role })
        .from(submittalComments)
        .leftJoin(user, eq(user.id, submittalComments.authorId))
        .leftJoin(
          projectMembers,
          and(
            eq(projectMembers.userId, submittalComments.authorId),
            eq(projectMembers.projectId, r.projectId),
          ),
        )
        .where(eq(submittalComments.submittalId, id))
        .orderBy(asc(submittalComments.createdAt), asc(submittalComments.id)),
      db
        .select({
          id: submittals.id,
          revision: submittals.revision,
          status: submittals.status,
          createdAt: submittals.createdAt,
          decidedAt: submittals.decidedAt,
        })
        .from(submittals)
        .where(eq(submittals.lineageId, r.lineageId))
        .orderBy(asc(submittals.revision)),
    ]);
    const who = await names([r.submitterId, r.decidedBy]);
    return {
      ...toSummary(r, itemList.length, who),
      description: r.description,
      reviewers: reviewerRows.map((x) => ({
        id: x.id,
        name: x.name,
        role: (x.role as ProjectRole | null) ?? null,
        decision:
          x.reviewer.decision && x.reviewer.decidedAt
            ? {
                decision: x.reviewer.decision as SubmittalDecision,
                note: x.reviewer.decisionNote ?? '',
                at: x.reviewer.decidedAt.toISOString(),
              }
            : null,
      })),
      items: itemList,
      comments: commentRows.map(
        ({ c, author, role }): SubmittalComment => ({
          id: c.id,
          itemId: c.itemId,
          author,
          authorRole: (role as ProjectRole | null) ?? null,
          body: c.body,
          createdAt: c.createdAt.toISOString(),
        }),
      ),
      decision:
        r.decision && r.decidedAt
          ? {
              decision: r.decision as NonNullable<Submittal['decision']>['decision'],
              note: r.decisionNote ?? '',
              by:
                reviewerRows
                  .filter((x) => x.reviewer.decision)
                  .map((x) => x.name)
                  .join(', ') || (r.decidedBy ? (who.get(r.decidedBy) ?? null) : null),
              at: r.decidedAt.toISOString(),
            }
          : null,
      revisions: revisionRows.map((x) => ({
        id: x.id,
        revision: x.revision,
        status: x.status as SubmittalStatus,
        createdAt: x.createdAt.toISOString(),
        decidedAt: x.decidedAt?.toISOString() ?? null,
      })),
      readOnly: isDecided(r.status as SubmittalStatus),
    };
  }

  /** Writes need an unarchived project. */
  async function assertOpenProject(projectId: string) {
    const [p] = await db
      .select({ archivedAt: projects.archivedAt })
      .from(projects)
      .where(eq(projects.id, projectId));
    if (!p) throw notFound('project');
    if (p.archivedAt) throw archivedError();
  }

  /** Guards of a write to a revision: open project, the expected status, the version the caller read. */
  async function writable(id: string, statuses: readonly SubmittalStatus[], version?: number): Promise<Row> {
    const r = await row(id);
    await assertOpenProject(r.projectId);
    if (version !== undefined && version !== r.version)
      throw conflict(
        'version_conflict',
        'someone changed this submittal after you opened it; here it is as it is now',
        await get(id),
      );
    if (!statuses.includes(r.status as SubmittalStatus)) throw wrongStatus(r, statuses);
    return r;
  }

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

  /** Bytes of the project's stored submittal files, each object once (revisions share their objects). */
  async function storedBytes(q: Db, projectId: string): Promise<number> {
    const objects = q
      .selectDistinct({ key: submittalItems.storageKey, size: submittalItems.size })
      .from(submittalItems)
      .innerJoin(submittals, eq(submittals.id, submittalItems.submittalId))
      .where(and(eq(submittals.projectId, projectId), isNotNull(submittalItems.storageKey)))
      .as('objects');
    const [r] = await q.select({ bytes: sql<string>`coalesce(sum(${objects.size}), 0)` }).from(objects);
    return Number(r?.bytes ?? 0);
  }

  const quotaFull = (used: number) => {
    const quota = config.storage.projectQuotaBytes;
    return new DomainError(
      'too_large',
      'storage_quota_exceeded',
      `this project’s file storage is full (${(used / MB).toFixed(1)} of ${(quota / MB).toFixed(0)} MB used) and the upload does not fit; remove files that are no longer needed, or ask the site administrator to raise the quota. Nothing was stored`,
      { files: 'project storage quota reached' },
    );
  };

  /** Reviewers must be members of the project whose role allows reviewing submittals. */
  async function checkReviewers(projectId: string, ids: string[]) {
    if (ids.length === 0) return;
    const members = await db
      .select({ userId: projectMembers.userId, role: projectMembers.role })
      .from(projectMembers)
      .where(and(eq(projectMembers.projectId, projectId), inArray(projectMembers.userId, ids)));
    const roles = new Map(members.map((m) => [m.userId, m.role as ProjectRole]));
    const fields: Record<string, string> = {};
    ids.forEach((uid, i) => {
      const role = roles.get(uid);
      if (!role) fields[`reviewerIds.${i}`] = 'not a member of this project';
      else if (!can(role, 'submittal.review'))
        fields[`reviewerIds.${i}`] =
          `a ${PROJECT_ROLE_LABELS[role].toLowerCase()} does not review submittals`;
    });
    if (Object.keys(fields).length > 0)
      throw new DomainError(
        'invalid',
        'invalid_reviewer',
        'reviewers must be project members who review submittals',
        fields,
      );
  }

  async function reviewerIdsOf(id: string): Promise<string[]> {
    const rows = await db
      .select({ userId: submittalReviewers.userId })
      .from(submittalReviewers)
      .where(eq(submittalReviewers.submittalId, id));
    return rows.map((r) => r.userId);
  }

  async function assertReviewer(r: Row, actor: Actor) {
    if (!(await reviewerIdsOf(r.id)).includes(actor.id))
      throw new DomainError(
        'forbidden',
        'not_a_reviewer',
        'only the reviewers named on this submittal review it',
      );
  }

  /** "07 42 13-003": the section and the next free number of the project. */
  async function nextNumber(projectId: string, section: string): Promise<string> {
    const taken = new Set(
      (
        await db
          .select({ number: submittals.number })
          .from(submittals)
          .where(eq(submittals.projectId, projectId))
      ).map((x) => x.number),
    );
    for (let n = 1; ; n++) {
      const candidate = `${section}-${String(n).padStart(3, '0')}`;
      if (!taken.has(candidate)) return candidate;
    }
  }

  async function emailsOf(ids: string[]) {
    if (ids.length === 0) return [];
    return db
      .select({ id: user.id, name: user.name, email: user.email })
      .from(user)
      .where(inArray(user.id, ids));
  }

  /** Mail goes out after the change is committed; a mail failure does not undo the change. */
  async function send(messages: { to: string; subject: string; text: string }[]) {
    await Promise.allSettled(messages.map((m) => mailer.send(m)));
  }

  const fieldsAudit = (f: SubmittalFields & { number?: string }) => ({
    number: f.number,
    title: f.title,
    specSection: f.specSection,
    specTitle: f.specTitle,
    dueDate: f.dueDate,
    reviewerIds: f.reviewerIds,
  });

  return {
    get,

    /** The project a submittal belongs to (for the permission check), or null. */
    async projectOf(id: string): Promise<string | null> {
      const [r] = await db
        .select({ projectId: submittals.projectId })
        .from(submittals)
        .where(eq(submittals.id, id));
      return r?.projectId ?? null;
    },

    /** The latest revision of every submittal of the project, by number (optionally one status only). */
    async list(projectId: string, status?: SubmittalStatus): Promise<SubmittalSummary[]> {
      const rows = await db
        .select()
        .from(submittals)
        .where(eq(submittals.projectId, projectId))
        .orderBy(asc(submittals.number), asc(submittals.revision));
      const latest = new Map<string, Row>();
      for (const r of rows) latest.set(r.lineageId, r);
      const shown = [...latest.values()].filter((r) => !status || r.status === status);
      const ids = shown.map((r) => r.id);
      const counts =
        ids.length === 0
          ? []
          : await db
              .select({ id: submittalItems.submittalId, n: count() })
              .from(submittalItems)
              .where(inArray(submittalItems.submittalId, ids))
              .groupBy(submittalItems.submittalId);
      const n = new Map(counts.map((c) => [c.id, Number(c.n)]));
      const who = await names(shown.map((r) => r.submitterId));
      return shown.map((r) => toSummary(r, n.get(r.id) ?? 0, who));
    },

    async create(projectId: string, actor: Actor, input: SubmittalCreate): Promise<Submittal> {
      await assertOpenProject(projectId);
      await checkReviewers(projectId, input.reviewerIds);
      const number = input.number?.trim() || (await nextNumber(projectId, input.specSection));
      const [clash] = await db
        .select({ id: submittals.id })
        .from(submittals)
        .where(and(eq(submittals.projectId, projectId), eq(submittals.number, number)));
      if (clash)
        throw new DomainError(
          'conflict',
          'duplicate_number',
          `submittal ${number} already exists on this project`,
          {
            number: 'already used on this project',
          },
        );
      const id = randomUUID();
      await db.transaction(async (tx) => {
        await tx.insert(submittals).values({
          id,
          projectId,
          lineageId: id,
          revision: 1,
          number,
          title: input.title,
          description: input.description,
          specSection: input.specSection,
          specTitle: input.specTitle,
          dueDate: input.dueDate,
          status: 'draft',
          submitterId: actor.id,
          createdBy: actor.id,
        });
        if (input.reviewerIds.length > 0)
          await tx
            .insert(submittalReviewers)
            .values(input.reviewerIds.map((userId) => ({ submittalId: id, userId })));
        await recordAudit(tx, {
          actorId: actor.id,
          projectId,
          entity: 'submittal',
          entityId: id,
          action: 'create',
          after: fieldsAudit({ ...input, number }),
        });
      });
      return get(id);
    },

    /** Edits a draft; the caller names the version it read (409 with the current submittal otherwise). */
    async update(id: string, actor: Actor, version: number, changes: SubmittalFields): Promise<Submittal> {
      const r = await writable(id, ['draft'], version);
      await checkReviewers(r.projectId, changes.reviewerIds);
      const before = { ...fieldsAudit({ ...r, reviewerIds: await reviewerIdsOf(id) }), number: undefined };
      const updated = await db.transaction(async (tx) => {
        const rows = await tx
          .update(submittals)
          .set({
            title: changes.title,
            description: changes.description,
            specSection: changes.specSection,
            specTitle: changes.specTitle,
            dueDate: changes.dueDate,
            version: version + 1,
            updatedAt: new Date(),
          })
          .where(and(eq(submittals.id, id), eq(submittals.version, version), eq(submittals.status, 'draft')))
          .returning({ id: submittals.id });
        if (rows.length === 0) return false;
        await tx.delete(submittalReviewers).where(eq(submittalReviewers.submittalId, id));
        if (changes.reviewerIds.length > 0)
          await tx
            .insert(submittalReviewers)
            .values(changes.reviewerIds.map((userId) => ({ submittalId: id, userId })));
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
          action: 'update',
          before,
          after: fieldsAudit(changes),
        });
        return true;
      });
      if (!updated)
        throw conflict(
          'version_conflict',
          'someone changed this submittal after you opened it',
          await get(id),
        );
      return get(id);
    },

    /** Attaches the compliance sheet of a stored check run of the same project (and issues its code). */
    async attachSheet(id: string, actor: Actor, checkRunId: string): Promise<Submittal> {
      const r = await writable(id, ['draft']);
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
        await bump(tx, id);
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
          action: 'add_sheet',
          after: { item: item!.id, checkRun: checkRunId, assembly: run.assemblyName, verificationCode: code },
        });
      });
      return get(id);
    },

    /**
     * Stores uploaded files as they arrive (`fileIntake`: each judged by its first bytes before anything is
     * stored, streamed to object storage, within the project's storage quota), then writes the items in one
     * transaction that takes its turn on the revision (item limit, positions) and on the project (quota).
     * Anything that fails removes what was already stored: nothing is kept from a refused upload.
     */
    async upload(
      id: string,
      actor: Actor,
      receive: ReceiveFiles,
    ): Promise<{ items: SubmittalItem[]; submittal: Submittal }> {
      const r = await writable(id, ['draft']);
      const [[{ n } = { n: 0 }], used] = await Promise.all([
        db.select({ n: count() }).from(submittalItems).where(eq(submittalItems.submittalId, id)),
        storedBytes(db, r.projectId),
      ]);
      const has = Number(n);
      if (has >= MAX_ITEMS) throw tooManyItems(has, 1);
      const quota = config.storage.projectQuotaBytes;
      if (used >= quota) throw quotaFull(used);
      const intake = fileIntake(storage, {
        keyPrefix: `projects/${r.projectId}/submittals/`,
        room: quota - used,
        full: () => quotaFull(used),
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
          // Uploads to the project's other submittals take their turn on its row for the quota.
          await tx
            .select({ id: projects.id })
            .from(projects)
            .where(eq(projects.id, r.projectId))
            .for('update');
          const now = await storedBytes(tx, r.projectId);
          if (now + files.reduce((sum, f) => sum + f.size, 0) > quota) throw quotaFull(now);
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
          await bump(tx, id);
          await recordAudit(tx, {
            actorId: actor.id,
            projectId: r.projectId,
            entity: 'submittal',
            entityId: id,
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
      const submittal = await get(id);
      return { items: submittal.items.filter((i) => ids.includes(i.id)), submittal };
    },

    /** Removes an item from a draft; a file's stored object goes when no revision refers to it any more. */
    async removeItem(id: string, actor: Actor, itemId: string): Promise<Submittal> {
      const r = await writable(id, ['draft']);
      const [item] = await db
        .select()
        .from(submittalItems)
        .where(and(eq(submittalItems.id, itemId), eq(submittalItems.submittalId, id)));
      if (!item) throw notFound('item');
      await db.transaction(async (tx) => {
        await tx.delete(submittalItems).where(eq(submittalItems.id, itemId));
        await bump(tx, id);
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
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
      return get(id);
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
      const object = await storage.get(item.storageKey);
      return {
        body: object.body,
        name: item.fileName ?? 'file',
        contentType: item.contentType ?? 'application/octet-stream',
        size: item.size ?? object.size,
      };
    },

    /** Sends a draft to its reviewers (it needs at least one item and one reviewer) and e-mails them. */
    async submit(id: string, actor: Actor, version?: number): Promise<Submittal> {
      const r = await writable(id, ['draft'], version);
      const reviewers = await reviewerIdsOf(id);
      const [{ n } = { n: 0 }] = await db
        .select({ n: count() })
        .from(submittalItems)
        .where(eq(submittalItems.submittalId, id));
      const fields: Record<string, string> = {};
      if (Number(n) === 0) fields.items = 'add a compliance sheet or a file first';
      if (reviewers.length === 0) fields.reviewerIds = 'name at least one reviewer first';
      if (Object.keys(fields).length > 0)
        throw new DomainError('invalid', 'incomplete', 'the submittal is not ready to submit', fields);
      await transition(r, actor, 'submitted', 'submit', { submittedAt: new Date(), submittedBy: actor.id });
      const [project] = await db
        .select({ name: projects.name })
        .from(projects)
        .where(eq(projects.id, r.projectId));
      const people = await emailsOf(reviewers);
      await send(
        people.map((p) => ({
          to: p.email,
          subject: `For your review: submittal ${r.number} rev ${r.revision} — ${r.title}`,
          text: [
            `${actor.name} submitted ${r.number} revision ${r.revision}, “${r.title}”, on ${project?.name ?? 'a project'} for your review.`,
            `Specification section: ${r.specSection} ${r.specTitle}.`,
            r.dueDate ? `Review due: ${r.dueDate}.` : '',
            `Open it: ${link(r)}`,
          ]
            .filter(Boolean)
            .join('\n\n'),
        })),
      );
      return get(id);
    },

    /** A named reviewer takes the submittal under review. */
    async startReview(id: string, actor: Actor, version?: number): Promise<Submittal> {
      const r = await writable(id, ['submitted'], version);
      await assertReviewer(r, actor);
      await transition(r, actor, 'under_review', 'start_review', {});
      return get(id);
    },

    /**
     * A named reviewer records their decision (and may change it while the revision is open). Every named
     * reviewer decides: the last one closes the revision with the most severe of their decisions
     * (`combinedDecision`), and only then is the submitter e-mailed. Approving a package whose attached
     * compliance sheet fails needs `failingSheetConfirmation` (422 without it). A "revise and resubmit"
     * outcome opens the next revision as a draft, with the same reviewers (undecided) and copies of the items.
     */
    async decide(id: string, actor: Actor, input: SubmittalDecisionInput): Promise<Submittal> {
      const r = await writable(id, ['submitted', 'under_review'], input.version);
      await assertReviewer(r, actor);
      const failing = sheetsWithVerdict(await items(id), 'fail');
      if (
        isApproval(input.decision) &&
        failing.length > 0 &&
        !confirmsFailingSheet(input.failingSheetConfirmation)
      )
        throw new DomainError(
          'invalid',
          'confirmation_required',
          `an attached compliance sheet fails (${failing.map((f) => f.sheet.assemblyName).join(', ')}): approving it needs a confirmation`,
          {
            failingSheetConfirmation: `type ${FAILING_SHEET_CONFIRMATION} to approve a package whose attached compliance sheet fails`,
          },
        );
      const now = new Date();
      const outcome = await db.transaction(async (tx) => {
        // Taking the revision row first (still open, the version the caller read if named) serialises the
        // reviewers' decisions, so exactly one of them sees the last decision and closes the revision.
        const [open] = await tx
          .update(submittals)
          .set({ status: 'under_review', version: sql`${submittals.version} + 1`, updatedAt: now })
          .where(
            and(
              eq(submittals.id, id),
              inArray(submittals.status, ['submitted', 'under_review']),
              input.version === undefined ? undefined : eq(submittals.version, input.version),
            ),
          )
          .returning({ version: submittals.version });
        if (!open)
          throw conflict('version_conflict', 'someone changed this submittal a moment ago; reload it');
        await tx
          .update(submittalReviewers)
          .set({ decision: input.decision, decisionNote: input.note, decidedAt: now })
          .where(and(eq(submittalReviewers.submittalId, id), eq(submittalReviewers.userId, actor.id)));
        const decisions = await tx
          .select({
            decision: submittalReviewers.decision,
            note: submittalReviewers.decisionNote,
            name: user.name,
          })
          .from(submittalReviewers)
          .innerJoin(user, eq(user.id, submittalReviewers.userId))
          .where(eq(submittalReviewers.submittalId, id))
          .orderBy(asc(user.name));
        const made = decisions.flatMap((d) =>
          d.decision ? [{ ...d, decision: d.decision as SubmittalDecision, note: d.note ?? '' }] : [],
        );
        const closing =
          made.length === decisions.length ? combinedDecision(made.map((d) => d.decision)) : null;
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
          action: 'decide',
          before: { status: r.status },
          after: { status: closing ?? 'under_review', decision: input.decision, note: input.note },
        });
        if (!closing) return null;
        const note =
          made.length === 1
            ? made[0]!.note
            : made
                .filter((d) => d.note)
                .map((d) => `${d.name} (${SUBMITTAL_STATUS_TEXT[d.decision].label.toLowerCase()}): ${d.note}`)
                .join('\n\n');
        await tx
          .update(submittals)
          .set({
            status: closing,
            decision: closing,
            decisionNote: note,
            decidedAt: now,
            decidedBy: actor.id,
          })
          .where(eq(submittals.id, id));
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
          action: 'close_review',
          before: { status: 'under_review' },
          after: {
            status: closing,
            decisions: made.map((d) => ({ reviewer: d.name, decision: d.decision })),
          },
        });
        const next = closing === 'revise_and_resubmit' ? await openNextRevision(tx, r, actor) : null;
        return { decision: closing, made, next };
      });
      if (outcome) await mailOutcome(r, outcome);
      return get(id);
    },

    /** A comment on the submittal or one of its items, while the revision is undecided. */
    async comment(id: string, actor: Actor, body: string, itemId: string | null): Promise<Submittal> {
      const r = await writable(id, ['draft', 'submitted', 'under_review']);
      if (itemId) {
        const [item] = await db
          .select({ id: submittalItems.id })
          .from(submittalItems)
          .where(and(eq(submittalItems.id, itemId), eq(submittalItems.submittalId, id)));
        if (!item) throw notFound('item');
      }
      await db.transaction(async (tx) => {
        const [c] = await tx
          .insert(submittalComments)
          .values({ submittalId: id, itemId, authorId: actor.id, body })
          .returning({ id: submittalComments.id });
        await recordAudit(tx, {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: id,
          action: 'comment',
          after: { comment: c!.id, item: itemId, body },
        });
      });
      return get(id);
    },
  };

  async function transition(
    r: Row,
    actor: Actor,
    status: SubmittalStatus,
    action: string,
    extra: Partial<typeof submittals.$inferInsert>,
  ) {
    await db.transaction(async (tx) => {
      const rows = await tx
        .update(submittals)
        .set({ status, ...extra, version: r.version + 1, updatedAt: new Date() })
        .where(and(eq(submittals.id, r.id), eq(submittals.version, r.version)))
        .returning({ id: submittals.id });
      if (rows.length === 0)
        throw conflict('version_conflict', 'someone changed this submittal a moment ago; reload it');
      await recordAudit(tx, {
        actorId: actor.id,
        projectId: r.projectId,
        entity: 'submittal',
        entityId: r.id,
        action,
        before: { status: r.status },
        after: { status },
      });
    });
  }

  /** "Revise and resubmit": revision n + 1 as a draft, with the same reviewers (undecided) and copies of the items. */
  async function openNextRevision(tx: Db, r: Row, actor: Actor): Promise<string> {
    const next = randomUUID();
    await tx.insert(submittals).values({
      id: next,
      projectId: r.projectId,
      lineageId: r.lineageId,
      previousRevisionId: r.id,
      revision: r.revision + 1,
      number: r.number,
      title: r.title,
      description: r.description,
      specSection: r.specSection,
      specTitle: r.specTitle,
      dueDate: null,
      status: 'draft',
      submitterId: r.submitterId,
      createdBy: actor.id,
    });
    const reviewers = await tx
      .select({ userId: submittalReviewers.userId })
      .from(submittalReviewers)
      .where(eq(submittalReviewers.submittalId, r.id));
    if (reviewers.length > 0)
      await tx
        .insert(submittalReviewers)
        .values(reviewers.map((x) => ({ submittalId: next, userId: x.userId })));
    const old = await tx.select().from(submittalItems).where(eq(submittalItems.submittalId, r.id));
    if (old.length > 0)
      await tx
        .insert(submittalItems)
        .values(
          old.map(({ id: _id, submittalId: _s, createdAt: _c, ...rest }) => ({ ...rest, submittalId: next })),
        );
    await recordAudit(tx, {
      actorId: actor.id,
      projectId: r.projectId,
      entity: 'submittal',
      entityId: next,
      action: 'open_revision',
      after: { number: r.number, revision: r.revision + 1, previous: r.id },
    });
    return next;
  }

  /** The submitter hears once, when the revision closes: the outcome and every reviewer's decision and note. */
  async function mailOutcome(
    r: Row,
    outcome: {
      decision: SubmittalDecision;
      made: { name: string; decision: SubmittalDecision; note: string }[];
      next: string | null;
    },
  ) {
    const notify = r.submittedBy ?? r.submitterId;
    const people = notify ? await emailsOf([notify]) : [];
    const label = SUBMITTAL_STATUS_TEXT[outcome.decision].label;
    const each = outcome.made.map(
      (d) => `${d.name}: ${SUBMITTAL_STATUS_TEXT[d.decision].label}${d.note ? `\n${d.note}` : ''}`,
    );
    await send(
      people.map((p) => ({
        to: p.email,
        subject: `Submittal ${r.number} rev ${r.revision}: ${label}`,
        text: [
          `The review of ${r.number} revision ${r.revision}, “${r.title}”, is closed: ${label}.`,
          outcome.made.length > 1
            ? `Every reviewer decided; the outcome is the most severe of their decisions.\n\n${each.join('\n\n')}`
            : `Reviewer’s decision:\n${each[0] ?? ''}`,
          outcome.next
            ? `Revision ${r.revision + 1} is open as a draft for you to revise and resubmit: ${link({ projectId: r.projectId, id: outcome.next })}`
            : '',
          `Open the decided revision: ${link(r)}`,
        ]
          .filter(Boolean)
          .join('\n\n'),
      })),
    );
  }

  /** Item changes count as edits of the revision (its version goes up). */
  async function bump(tx: Db, id: string) {
    await tx
      .update(submittals)
      .set({ version: sql`${submittals.version} + 1`, updatedAt: new Date() })
      .where(eq(submittals.id, id));
  }
}

function describeItem(item: ItemRow) {
  return item.kind === 'sheet'
    ? { item: item.id, kind: 'sheet', checkRun: item.checkRunId }
    : { item: item.id, kind: 'file', name: item.fileName, sha256: item.sha256 };
}
