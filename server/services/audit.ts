import type { AuditEntry } from '@shared/schemas/me';
import { desc, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { auditLog, user } from '../db/schema';

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

export function createAuditService(db: Db) {
  return {
    record: (r: AuditRecord) => recordAudit(db, r),
    async forProject(projectId: string, limit = 200): Promise<AuditEntry[]> {
      const rows = await db
        .select({ entry: auditLog, actorName: user.name })
        .from(auditLog)
        .leftJoin(user, eq(user.id, auditLog.actorId))
        .where(eq(auditLog.projectId, projectId))
        .orderBy(desc(auditLog.at), desc(auditLog.id))
        .limit(limit);
      return rows.map(({ entry, actorName }) => ({
        id: entry.id,
        at: entry.at.toISOString(),
        actorName,
        entity: entry.entity,
        entityId: entry.entityId,
        action: entry.action,
        before: entry.before,
        after: entry.after,
      }));
    },
  };
}
