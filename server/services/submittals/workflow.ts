import { randomUUID } from 'node:crypto';
import { can, PROJECT_ROLE_LABELS, type ProjectRole } from '@shared/auth/permissions';
import {
  combinedDecision,
  confirmsFailingSheet,
  FAILING_SHEET_CONFIRMATION,
  isApproval,
  SUBMITTAL_STATUS_TEXT,
  type Submittal,
  type SubmittalCreate,
  type SubmittalDecision,
  type SubmittalDecisionInput,
  type SubmittalFields,
  type SubmittalStatus,
  sheetsWithVerdict,
} from '@shared/schemas/submittals';
import { and, asc, count, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import {
  projectMembers,
  submittalComments,
  submittalItems,
  submittalReviewers,
  submittals,
  user,
} from '../../db/schema';
import { type AuditRecord, recordAudit } from '../audit';
import { DomainError, notFound } from '../errors';
import { STALE, versionedUpdate } from '../versioned';
import type { createSubmittalNotifications, ReviewOutcome } from './notifications';
import { type Actor, type Row, STALE_MESSAGE, type SubmittalQueries } from './queries';

const fieldsAudit = (f: SubmittalFields & { number?: string }) => ({
  number: f.number,
  title: f.title,
  specSection: f.specSection,
  specTitle: f.specTitle,
  dueDate: f.dueDate,
  reviewerIds: f.reviewerIds,
});

/**
 * The steps of a submittal: created and edited as a draft, submitted to its named reviewers, taken under
 * review, decided by every reviewer (the last decision closes the revision; "revise and resubmit" opens the
 * next as a draft with copies of the items), commented on while undecided.
 */
export function createSubmittalWorkflow(
  db: Db,
  q: SubmittalQueries,
  notify: ReturnType<typeof createSubmittalNotifications>,
) {
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

  async function assertReviewer(r: Row, actor: Actor) {
    if (!(await q.reviewerIdsOf(r.id)).includes(actor.id))
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

  return {
    async create(projectId: string, actor: Actor, input: SubmittalCreate): Promise<Submittal> {
      await q.assertOpenProject(projectId);
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
      return q.get(id);
    },

    /** Edits a draft; the caller names the version it read (409 with the current submittal otherwise). */
    async update(id: string, actor: Actor, version: number, changes: SubmittalFields): Promise<Submittal> {
      const r = await q.writable(id, ['draft'], version);
      await checkReviewers(r.projectId, changes.reviewerIds);
      const before = { ...fieldsAudit({ ...r, reviewerIds: await q.reviewerIdsOf(id) }), number: undefined };
      return versionedUpdate(db, {
        conflictMessage: STALE_MESSAGE,
        current: () => q.get(id),
        write: async (tx) => {
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
            .where(
              and(eq(submittals.id, id), eq(submittals.version, version), eq(submittals.status, 'draft')),
            )
            .returning({ id: submittals.id });
          if (rows.length === 0) return STALE;
          await tx.delete(submittalReviewers).where(eq(submittalReviewers.submittalId, id));
          if (changes.reviewerIds.length > 0)
            await tx
              .insert(submittalReviewers)
              .values(changes.reviewerIds.map((userId) => ({ submittalId: id, userId })));
          return {
            audit: [
              {
                actorId: actor.id,
                projectId: r.projectId,
                entity: 'submittal',
                entityId: id,
                action: 'update',
                before,
                after: fieldsAudit(changes),
              },
            ],
          };
        },
      });
    },

    /** Sends a draft to its reviewers (it needs at least one item and one reviewer) and e-mails them. */
    async submit(id: string, actor: Actor, version?: number): Promise<Submittal> {
      const r = await q.writable(id, ['draft'], version);
      const reviewers = await q.reviewerIdsOf(id);
      const [{ n } = { n: 0 }] = await db
        .select({ n: count() })
        .from(submittalItems)
        .where(eq(submittalItems.submittalId, id));
      const fields: Record<string, string> = {};
      if (Number(n) === 0) fields.items = 'add a compliance sheet or a file first';
      if (reviewers.length === 0) fields.reviewerIds = 'name at least one reviewer first';
      if (Object.keys(fields).length > 0)
        throw new DomainError('invalid', 'incomplete', 'the submittal is not ready to submit', fields);
      const submitted = await transition(r, actor, 'submitted', 'submit', {
        submittedAt: new Date(),
        submittedBy: actor.id,
      });
      await notify.submitted(r, actor, reviewers);
      return submitted;
    },

    /** A named reviewer takes the submittal under review. */
    async startReview(id: string, actor: Actor, version?: number): Promise<Submittal> {
      const r = await q.writable(id, ['submitted'], version);
      await assertReviewer(r, actor);
      return transition(r, actor, 'under_review', 'start_review', {});
    },

    /**
     * A named reviewer records their decision (and may change it while the revision is open). Every named
     * reviewer decides: the last one closes the revision with the most severe of their decisions
     * (`combinedDecision`), and only then is the submitter e-mailed. Approving a package whose attached
     * compliance sheet fails needs `failingSheetConfirmation` (422 without it). A "revise and resubmit"
     * outcome opens the next revision as a draft, with the same reviewers (undecided) and copies of the items.
     */
    async decide(id: string, actor: Actor, input: SubmittalDecisionInput): Promise<Submittal> {
      const r = await q.writable(id, ['submitted', 'under_review'], input.version);
      await assertReviewer(r, actor);
      const failing = sheetsWithVerdict(await q.items(id), 'fail');
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
      return versionedUpdate(db, {
        conflictMessage: STALE_MESSAGE,
        current: () => q.get(id),
        // The submitter is e-mailed once the revision closes.
        answer: async (outcome: ReviewOutcome | null = null) => {
          if (outcome) await notify.outcome(r, outcome);
          return q.get(id);
        },
        write: async (tx) => {
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
          if (!open) return STALE;
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
          const decided: AuditRecord = {
            actorId: actor.id,
            projectId: r.projectId,
            entity: 'submittal',
            entityId: id,
            action: 'decide',
            before: { status: r.status },
            after: { status: closing ?? 'under_review', decision: input.decision, note: input.note },
          };
          if (!closing) return { audit: [decided], result: null };
          const note =
            made.length === 1
              ? made[0]!.note
              : made
                  .filter((d) => d.note)
                  .map(
                    (d) => `${d.name} (${SUBMITTAL_STATUS_TEXT[d.decision].label.toLowerCase()}): ${d.note}`,
                  )
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
          const closed: AuditRecord = {
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
          };
          const opened = closing === 'revise_and_resubmit' ? await openNextRevision(tx, r, actor) : null;
          return {
            audit: [decided, closed, ...(opened ? [opened.audit] : [])],
            result: { decision: closing, made, next: opened?.next ?? null },
          };
        },
      });
    },

    /** A comment on the submittal or one of its items, while the revision is undecided. */
    async comment(id: string, actor: Actor, body: string, itemId: string | null): Promise<Submittal> {
      const r = await q.writable(id, ['draft', 'submitted', 'under_review']);
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
      return q.get(id);
    },
  };

  async function transition(
    r: Row,
    actor: Actor,
    status: SubmittalStatus,
    action: string,
    extra: Partial<typeof submittals.$inferInsert>,
  ): Promise<Submittal> {
    return versionedUpdate(db, {
      conflictMessage: STALE_MESSAGE,
      current: () => q.get(r.id),
      write: async (tx) => {
        const rows = await tx
          .update(submittals)
          .set({ status, ...extra, version: r.version + 1, updatedAt: new Date() })
          .where(and(eq(submittals.id, r.id), eq(submittals.version, r.version)))
          .returning({ id: submittals.id });
        if (rows.length === 0) return STALE;
        const audit = {
          actorId: actor.id,
          projectId: r.projectId,
          entity: 'submittal',
          entityId: r.id,
          action,
          before: { status: r.status },
          after: { status },
        };
        return { audit: [audit] };
      },
    });
  }

  /** "Revise and resubmit": revision n + 1 as a draft, with the same reviewers (undecided) and copies of the items. */
  async function openNextRevision(
    tx: Db,
    r: Row,
    actor: Actor,
  ): Promise<{ next: string; audit: AuditRecord }> {
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
    return {
      next,
      audit: {
        actorId: actor.id,
        projectId: r.projectId,
        entity: 'submittal',
        entityId: next,
        action: 'open_revision',
        after: { number: r.number, revision: r.revision + 1, previous: r.id },
      },
    };
  }
}
