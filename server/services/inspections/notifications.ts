import type { ProjectRole } from '@shared/auth/permissions';
import { and, eq, inArray, ne } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { projectMembers, projects, user } from '../../db/schema';
import type { Mailer } from '../../mail/mailer';
import type { Actor, InspectionRow } from './queries';

/** The roles that inspect (accept and reopen deficiencies) and the crew that fills and corrects. */
export const INSPECTOR_ROLES: readonly ProjectRole[] = ['envelope_consultant', 'engineer'];
export const CREW_ROLES: readonly ProjectRole[] = ['subcontractor'];

/** Who hears of a change: people by id, and project members by role (never the one who made it). */
export interface Recipients {
  ids?: (string | null)[];
  roles?: readonly ProjectRole[];
}

/**
 * The e-mails of inspections, through the one mail path. Mail goes out after the change is committed; a mail
 * failure does not undo the change.
 */
export function createInspectionNotifications(db: Db, config: Config, mailer: Mailer) {
  const link = (r: Pick<InspectionRow, 'projectId' | 'id'>) =>
    `${config.baseUrl}/projects/${r.projectId}/inspections/${r.id}`;

  async function people(projectId: string, to: Recipients, actor: Actor) {
    const ids = (to.ids ?? []).filter((x): x is string => x !== null);
    const byRole =
      to.roles && to.roles.length > 0
        ? await db
            .select({ id: projectMembers.userId })
            .from(projectMembers)
            .where(and(eq(projectMembers.projectId, projectId), inArray(projectMembers.role, [...to.roles])))
        : [];
    const all = [...new Set([...ids, ...byRole.map((r) => r.id)])];
    if (all.length === 0) return [];
    return db
      .select({ email: user.email })
      .from(user)
      .where(and(inArray(user.id, all), ne(user.id, actor.id)));
  }

  return {
    /** Sends one message about inspection `r` to the recipients. */
    async send(r: InspectionRow, actor: Actor, to: Recipients, subject: string, lines: string[]) {
      const [project] = await db
        .select({ name: projects.name })
        .from(projects)
        .where(eq(projects.id, r.projectId));
      const who = await people(r.projectId, to, actor);
      const text = [
        ...lines,
        `Inspection ${r.number}, “${r.title}”, on ${project?.name ?? 'a project'} — ${r.assemblyName} revision ${r.assemblyRevision}.`,
        `Open it: ${link(r)}`,
      ].join('\n\n');
      await Promise.allSettled(
        who.map((p) => mailer.send({ to: p.email, subject: `Inspection ${r.number}: ${subject}`, text })),
      );
    },
  };
}
export type InspectionNotifications = ReturnType<typeof createInspectionNotifications>;
