import { canInFirm, type FirmRole } from '@shared/auth/permissions';
import type { CriteriaAccess } from '@shared/schemas/criteria';
import { and, eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { criteriaSets, organisationMembers, projectMembers, projects } from '../../db/schema';
import { ownerOf } from '../owner';

/** Who may do what with a firm's code tables (the `criteria` access kind of the route registry). */
export function createCriteriaAccess(db: Db) {
  return {
    /** The firm a table belongs to (for the permission check), or null. */
    organisationOf: ownerOf(db, {
      from: criteriaSets,
      key: criteriaSets.id,
      owner: criteriaSets.organisationId,
    }),

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
  };
}
