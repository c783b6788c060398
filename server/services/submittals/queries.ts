import type { ProjectRole } from '@shared/auth/permissions';
import type { Verdict } from '@shared/checks/report';
import {
  isDecided,
  SUBMITTAL_STATUS_TEXT,
  type Submittal,
  type SubmittalComment,
  type SubmittalDecision,
  type SubmittalItem,
  type SubmittalStatus,
  type SubmittalSummary,
} from '@shared/schemas/submittals';
import { verificationCode } from '@shared/sheets/verification';
import { type AnyColumn, and, asc, count, eq, inArray } from 'drizzle-orm';
import type { Db } from '../../db/client';
import {
  checkRuns,
  projectMembers,
  projects,
  submittalComments,
  submittalItems,
  submittalReviewers,
  submittals,
  user,
} from '../../db/schema';
import { conflict, notFound } from '../errors';
import { ownerOf } from '../owner';
import { archivedError } from '../projects';
import { versionConflict } from '../versioned';

export type Row = typeof submittals.$inferSelect;
export type ItemRow = typeof submittalItems.$inferSelect;
export type Actor = { id: string; name: string };

export const STALE_MESSAGE = 'someone changed this submittal after you opened it; here it is as it is now';

/** Items per revision (sheets and files together). */
export const MAX_ITEMS = 40;

const statusWords = (s: SubmittalStatus) => SUBMITTAL_STATUS_TEXT[s].label.toLowerCase();

/** The refusal of a step that needs another status (a decided revision is read-only). */
export function wrongStatus(r: Pick<Row, 'status' | 'revision'>, statuses: readonly SubmittalStatus[]) {
  const status = r.status as SubmittalStatus;
  return isDecided(status)
    ? conflict('read_only', `revision ${r.revision} was decided (${statusWords(status)}) and is read-only`)
    : conflict(
        'wrong_status',
        `revision ${r.revision} is ${statusWords(status)}; this step needs it to be ${statuses.map(statusWords).join(' or ')}`,
      );
}

/**
 * Reading submittals — one revision whole (items, reviewers and their decisions, comments, the revisions of
 * its lineage), the project's list — and the guard every write to a revision passes first.
 */
export function createSubmittalQueries(db: Db) {
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

  /** Join condition: the person in `userId` as a member of the project (their role there). */
  const membershipOf = (userId: AnyColumn, projectId: string) =>
    and(eq(projectMembers.userId, userId), eq(projectMembers.projectId, projectId));

  async function get(id: string): Promise<Submittal> {
    const r = await row(id);
    const [itemList, reviewerRows, commentRows, revisionRows] = await Promise.all([
      items(id),
      db
        .select({ id: user.id, name: user.name, role: projectMembers.role, reviewer: submittalReviewers })
        .from(submittalReviewers)
        .innerJoin(user, eq(user.id, submittalReviewers.userId))
        .leftJoin(projectMembers, membershipOf(submittalReviewers.userId, r.projectId))
        .where(eq(submittalReviewers.submittalId, id))
        .orderBy(asc(user.name)),
      db
        .select({ c: submittalComments, author: user.name, role: projectMembers.role })
        .from(submittalComments)
        .leftJoin(user, eq(user.id, submittalComments.authorId))
        .leftJoin(projectMembers, membershipOf(submittalComments.authorId, r.projectId))
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
    if (version !== undefined && version !== r.version) throw versionConflict(STALE_MESSAGE, await get(id));
    if (!statuses.includes(r.status as SubmittalStatus)) throw wrongStatus(r, statuses);
    return r;
  }

  async function reviewerIdsOf(id: string): Promise<string[]> {
    const rows = await db
      .select({ userId: submittalReviewers.userId })
      .from(submittalReviewers)
      .where(eq(submittalReviewers.submittalId, id));
    return rows.map((r) => r.userId);
  }

  return {
    get,
    items,
    assertOpenProject,
    writable,
    reviewerIdsOf,

    /** The project a submittal belongs to (for the permission check), or null. */
    projectOf: ownerOf(db, { from: submittals, key: submittals.id, owner: submittals.projectId }),

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
  };
}

export type SubmittalQueries = ReturnType<typeof createSubmittalQueries>;
