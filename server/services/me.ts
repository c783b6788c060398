import { randomBytes } from 'node:crypto';
import type { CapturedMail, Me } from '@shared/schemas/me';
import { asc, desc, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { capturedMail, organisationMembers, organisations, user } from '../db/schema';
import { DomainError, notFound } from './errors';
import { firmRoleOf } from './firm-members';
import { firmHandle } from './organisations';

/**
 * A new firm's slug — its handle for good (nothing changes it): the name in lower-case ASCII words, then 8
 * random characters (40 bits), e.g. `corvid-architects-0k3x9qa1`. Names are not unique; the random part
 * keeps a firm of the same name from getting (or choosing) another firm's handle.
 */
export const newSlug = (name: string): string => {
  const words = name
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, 40)
    .replace(/^-+|-+$/g, '');
  return `${words || 'firm'}-${randomBytes(5).readUIntBE(0, 5).toString(36).padStart(8, '0')}`;
};

/** One row per firm of the user (one row with null firm fields when they belong to none). */
interface MeRow {
  id: string;
  name: string;
  email: string;
  role: string;
  unitSystem: string;
  orgId: string | null;
  orgName: string | null;
  orgSlug: string | null;
  orgVerifiedAt: Date | null;
  orgRole: string | null;
}

function toMe(rows: MeRow[]): Me {
  const u = rows[0];
  if (!u) throw notFound('user');
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    siteRole: u.role === 'admin' ? 'admin' : 'user',
    unitSystem: u.unitSystem === 'IP' ? 'IP' : 'SI',
    organisations: rows
      .filter((r) => r.orgId !== null)
      .map((r) => ({
        id: r.orgId!,
        name: r.orgName!,
        handle: firmHandle(r.orgSlug!),
        verified: r.orgVerifiedAt !== null,
        role: firmRoleOf(r.orgRole),
      })),
  };
}

/** The user's own columns of the answer, from the user table or from the row an update returned. */
type PersonColumn = 'id' | 'name' | 'email' | 'role' | 'unitSystem';
const personColumns = <T extends Record<PersonColumn, unknown>>(t: T): Pick<T, PersonColumn> => ({
  id: t.id,
  name: t.name,
  email: t.email,
  role: t.role,
  unitSystem: t.unitSystem,
});

/** Each of the user's firms (one row per membership; none: nulls from the left joins). */
const firmColumns = {
  orgId: organisations.id,
  orgName: organisations.name,
  orgSlug: organisations.slug,
  orgVerifiedAt: organisations.verifiedAt,
  orgRole: organisationMembers.role,
};

export function createMeService(db: Db) {
  // Prepared once (no query building per request; a PostgreSQL server plans them once per connection), and
  // one statement each: the user with their firms, and the preference write returning the same rows.
  const meQuery = db
    .select({ ...personColumns(user), ...firmColumns })
    .from(user)
    .leftJoin(organisationMembers, eq(organisationMembers.userId, user.id))
    .leftJoin(organisations, eq(organisations.id, organisationMembers.organisationId))
    .where(eq(user.id, sql.placeholder('userId')))
    .orderBy(asc(organisationMembers.createdAt))
    .prepare('sw_me');
  const updated = db.$with('updated').as(
    db
      .update(user)
      .set({ unitSystem: sql`${sql.placeholder('unitSystem')}`, updatedAt: sql`now()` })
      .where(eq(user.id, sql.placeholder('userId')))
      .returning(personColumns(user)),
  );
  const setUnitSystemQuery = db
    .with(updated)
    .select({ ...personColumns(updated), ...firmColumns })
    .from(updated)
    .leftJoin(organisationMembers, eq(organisationMembers.userId, updated.id))
    .leftJoin(organisations, eq(organisations.id, organisationMembers.organisationId))
    .orderBy(asc(organisationMembers.createdAt))
    .prepare('sw_me_set_unit_system');

  const me = async (userId: string): Promise<Me> => toMe(await meQuery.execute({ userId }));

  return {
    me,
    async setUnitSystem(userId: string, unitSystem: 'SI' | 'IP'): Promise<Me> {
      return toMe(await setUnitSystemQuery.execute({ userId, unitSystem }));
    },
    /** A new firm with the caller as its administrator. */
    async createOrganisation(userId: string, name: string): Promise<Me> {
      const existing = await me(userId);
      if (existing.organisations.some((o) => o.name.toLowerCase() === name.toLowerCase()))
        throw new DomainError('conflict', 'duplicate_firm', 'you already belong to a firm of that name', {
          name: 'already exists',
        });
      await db.transaction(async (tx) => {
        // A slug already taken (40 random bits: hardly ever) is drawn again.
        for (let attempt = 0; attempt < 5; attempt++) {
          const [org] = await tx
            .insert(organisations)
            .values({ name, slug: newSlug(name) })
            .onConflictDoNothing({ target: organisations.slug })
            .returning({ id: organisations.id });
          if (org) {
            await tx.insert(organisationMembers).values({ organisationId: org.id, userId, role: 'admin' });
            return;
          }
        }
        throw new Error('no free slug for a new firm');
      });
      return me(userId);
    },
    async capturedMail(limit = 200): Promise<CapturedMail[]> {
      const rows = await db.select().from(capturedMail).orderBy(desc(capturedMail.receivedAt)).limit(limit);
      return rows.map((r) => ({
        id: r.id,
        receivedAt: r.receivedAt.toISOString(),
        from: r.from,
        to: r.to,
        subject: r.subject,
        text: r.text,
      }));
    },
  };
}
