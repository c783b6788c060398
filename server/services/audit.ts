import type { AuditEntry } from '@shared/schemas/me';
import { desc, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import {
  assemblies,
  assemblySweeps,
  auditLog,
  checkRuns,
  inspections,
  invitations,
  projects,
  submittals,
  user,
} from '../db/schema';

export interface AuditRecord {
  actorId: string | null;
  projectId?: string | null;
  entity: string;
  entityId: string;
  action: string;
  before?: unknown;
  after?: unknown;
}

/** Appends one entry to the audit log (inside the caller's transaction when one is given). */
export async function recordAudit(db: Db, r: AuditRecord): Promise<void> {
  await db.insert(auditLog).values({
    actorId: r.actorId,
    projectId: r.projectId ?? null,
    entity: r.entity,
    entityId: r.entityId,
    action: r.action,
    before: r.before ?? null,
    after: r.after ?? null,
  });
}

/**
 * The name an entry's object goes by now (null when it is gone or has no name), read in the same query as
 * the entries: one correlated lookup per entity kind.
 */
const entityName = sql<string | null>`case ${auditLog.entity}
  when 'project' then (select ${projects.name} from ${projects} where ${projects.id}::text = ${auditLog.entityId})
  when 'assembly' then (select ${assemblies.name} from ${assemblies} where ${assemblies.id}::text = ${auditLog.entityId})
  when 'submittal' then (select ${submittals.number} || ' rev ' || ${submittals.revision} || ' — ' || ${submittals.title}
    from ${submittals} where ${submittals.id}::text = ${auditLog.entityId})
  when 'check_run' then (select ${checkRuns.assemblyName} || ', revision ' || ${checkRuns.assemblyRevision}
    from ${checkRuns} where ${checkRuns.id}::text = ${auditLog.entityId})
  when 'sweep' then (select ${assemblySweeps.name} from ${assemblySweeps} where ${assemblySweeps.id}::text = ${auditLog.entityId})
  when 'inspection' then (select 'Inspection ' || ${inspections.number} || ' — ' || ${inspections.title}
    from ${inspections} where ${inspections.id}::text = ${auditLog.entityId})
  when 'member' then (select ${user.name} from ${user} where ${user.id} = ${auditLog.entityId})
  when 'invitation' then (select ${invitations.email} from ${invitations} where ${invitations.id}::text = ${auditLog.entityId})
end`;

export function createAuditService(db: Db) {
  return {
    record: (r: AuditRecord) => recordAudit(db, r),
    async forProject(projectId: string, limit = 200): Promise<AuditEntry[]> {
      const rows = await db
        .select({ entry: auditLog, actorName: user.name, entityName })
        .from(auditLog)
        .leftJoin(user, eq(user.id, auditLog.actorId))
        .where(eq(auditLog.projectId, projectId))
        .orderBy(desc(auditLog.at), desc(auditLog.id))
        .limit(limit);
      return rows.map(({ entry, actorName, entityName }) => ({
        id: entry.id,
        at: entry.at.toISOString(),
        actorName,
        entity: entry.entity,
        entityId: entry.entityId,
        entityName,
        action: entry.action,
        before: entry.before,
        after: entry.after,
      }));
    },
  };
}
