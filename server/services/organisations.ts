import type { AdminOrganisation } from '@shared/schemas/organisations';
import { and, asc, count, eq, isNotNull, isNull, type SQL, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Db } from '../db/client';
import { organisationMembers, organisations, user } from '../db/schema';
import { recordAudit } from './audit';
import { notFound } from './errors';

/** A firm's handle as people see it: its slug (unique, never changed) after an @, e.g. `@demo-larchmere`. */
export const firmHandle = (slug: string): string => `@${slug}`;

/**
 * Firms as the site administrator manages them. Verifying a firm says a site administrator has confirmed it
 * is who its name says; its sheets and the verification page show it (names alone are not unique).
 */
export function createOrganisationService(db: Db) {
  const verifier = alias(user, 'verifier');
  const select = (where?: SQL) =>
    db
      .select({
        id: organisations.id,
        name: organisations.name,
        slug: organisations.slug,
        createdAt: organisations.createdAt,
        verifiedAt: organisations.verifiedAt,
        verifiedBy: verifier.name,
        members: count(organisationMembers.userId),
      })
      .from(organisations)
      .leftJoin(organisationMembers, eq(organisationMembers.organisationId, organisations.id))
      .leftJoin(verifier, eq(verifier.id, organisations.verifiedBy))
      .where(where)
      .groupBy(organisations.id, verifier.name)
      // Firms of one name side by side, so a copy stands next to the original.
      .orderBy(sql`lower(${organisations.name})`, asc(organisations.slug));
  const toApi = (r: Awaited<ReturnType<typeof select>>[number]): AdminOrganisation => ({
    id: r.id,
    name: r.name,
    handle: firmHandle(r.slug),
    createdAt: r.createdAt.toISOString(),
    members: r.members,
    verifiedAt: r.verifiedAt?.toISOString() ?? null,
    verifiedBy: r.verifiedAt ? r.verifiedBy : null,
  });
  const one = async (orgId: string) => {
    const [r] = await select(eq(organisations.id, orgId));
    if (!r) throw notFound('firm');
    return toApi(r);
  };

  return {
    list: async (): Promise<AdminOrganisation[]> => (await select()).map(toApi),

    /**
     * Verifies a firm (or withdraws it). Verifying a verified firm keeps who verified it and when; each
     * change writes the audit log.
     */
    async setVerified(orgId: string, adminId: string, verified: boolean): Promise<AdminOrganisation> {
      await db.transaction(async (tx) => {
        const [changed] = await tx
          .update(organisations)
          .set(
            verified
              ? { verifiedAt: sql`now()`, verifiedBy: adminId }
              : { verifiedAt: null, verifiedBy: null },
          )
          .where(
            and(
              eq(organisations.id, orgId),
              verified ? isNull(organisations.verifiedAt) : isNotNull(organisations.verifiedAt),
            ),
          )
          .returning({ verifiedAt: organisations.verifiedAt });
        if (changed)
          await recordAudit(tx, {
            actorId: adminId,
            entity: 'organisation',
            entityId: orgId,
            action: verified ? 'verify' : 'withdraw_verification',
            after: { verifiedAt: changed.verifiedAt?.toISOString() ?? null },
          });
      });
      return one(orgId);
    },
  };
}
