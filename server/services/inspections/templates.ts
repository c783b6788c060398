import type { InspectionTemplate, TemplateItem } from '@shared/inspections/schema';
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { inspectionTemplates, organisations } from '../../db/schema';
import { recordAudit } from '../audit';
import { versionConflict } from '../versioned';
import type { Actor } from './queries';

const STALE = 'someone changed the firm’s checklist template after you opened it; here it is as it is now';

function dto(r: typeof inspectionTemplates.$inferSelect): InspectionTemplate {
  return {
    id: r.id,
    organisationId: r.organisationId,
    version: r.version,
    items: r.items as TemplateItem[],
    frozen: r.frozenAt !== null,
    revision: r.revision,
    createdAt: r.createdAt.toISOString(),
  };
}

/**
 * A firm's checklist template, versioned like its code tables: the latest version is the one new inspections
 * take; a version an inspection used is frozen, so saving it makes the next version; an unfrozen one is edited in
 * place under `revision`. A save names the revision it read (absent only for the firm's first template).
 */
export function createInspectionTemplates(db: Db) {
  async function latest(orgId: string, from: Db = db) {
    const [r] = await from
      .select()
      .from(inspectionTemplates)
      .where(eq(inspectionTemplates.organisationId, orgId))
      .orderBy(desc(inspectionTemplates.version))
      .limit(1);
    return r ?? null;
  }

  async function template(orgId: string): Promise<InspectionTemplate | null> {
    const r = await latest(orgId);
    return r && dto(r);
  }

  return {
    template,

    async saveTemplate(
      orgId: string,
      actor: Actor,
      body: { revision?: number; items: TemplateItem[] },
    ): Promise<InspectionTemplate> {
      const saved = await db.transaction(async (tx) => {
        // Saves of one firm's template take turns on the firm's row (the first version included).
        await tx
          .select({ id: organisations.id })
          .from(organisations)
          .where(eq(organisations.id, orgId))
          .for('update');
        const now = await latest(orgId, tx);
        if (now && body.revision !== now.revision) return null;
        const audit = (r: typeof inspectionTemplates.$inferSelect, action: string) =>
          recordAudit(tx, {
            actorId: actor.id,
            entity: 'inspection_template',
            entityId: r.id,
            action,
            after: { organisation: orgId, version: r.version, items: body.items.length },
          });
        if (now && !now.frozenAt) {
          const [u] = await tx
            .update(inspectionTemplates)
            .set({
              items: body.items,
              revision: sql`${inspectionTemplates.revision} + 1`,
              updatedAt: new Date(),
            })
            .where(
              and(
                eq(inspectionTemplates.id, now.id),
                eq(inspectionTemplates.revision, now.revision),
                isNull(inspectionTemplates.frozenAt),
              ),
            )
            .returning();
          if (!u) return null;
          await audit(u, 'update');
          return u;
        }
        const [r] = await tx
          .insert(inspectionTemplates)
          .values({
            organisationId: orgId,
            version: (now?.version ?? 0) + 1,
            previousVersionId: now?.id ?? null,
            items: body.items,
            createdBy: actor.id,
          })
          .returning();
        await audit(r!, 'create');
        return r!;
      });
      if (!saved) throw versionConflict(STALE, await template(orgId));
      return dto(saved);
    },
  };
}
