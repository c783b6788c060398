import { SUBMITTAL_STATUS_TEXT, type SubmittalDecision } from '@shared/schemas/submittals';
import { eq, inArray } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { projects, user } from '../../db/schema';
import type { Mailer } from '../../mail/mailer';
import type { Actor, Row } from './queries';

/** How a review closed: the combined decision, each reviewer's, and the next revision opened (if any). */
export interface ReviewOutcome {
  decision: SubmittalDecision;
  made: { name: string; decision: SubmittalDecision; note: string }[];
  next: string | null;
}

/**
 * The e-mails of the workflow: reviewers hear of a submission, the submitter of the outcome. Mail goes out
 * after the change is committed; a mail failure does not undo the change.
 */
export function createSubmittalNotifications(db: Db, config: Config, mailer: Mailer) {
  const link = (r: Pick<Row, 'projectId' | 'id'>) =>
    `${config.baseUrl}/projects/${r.projectId}/submittals/${r.id}`;

  async function emailsOf(ids: string[]) {
    if (ids.length === 0) return [];
    return db
      .select({ id: user.id, name: user.name, email: user.email })
      .from(user)
      .where(inArray(user.id, ids));
  }

  async function send(messages: { to: string; subject: string; text: string }[]) {
    await Promise.allSettled(messages.map((m) => mailer.send(m)));
  }

  return {
    /** Each reviewer is sent a link to the revision just submitted. */
    async submitted(r: Row, actor: Actor, reviewerIds: string[]) {
      const [project] = await db
        .select({ name: projects.name })
        .from(projects)
        .where(eq(projects.id, r.projectId));
      const people = await emailsOf(reviewerIds);
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
    },

    /** The submitter hears once, when the revision closes: the outcome and every reviewer's decision and note. */
    async outcome(r: Row, outcome: ReviewOutcome) {
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
    },
  };
}
