import type { CapturedMail, Me } from '@shared/schemas/me';
import { desc, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { capturedMail, organisationMembers, organisations, user } from '../db/schema';
import { HttpError, notFound } from '../http/errors';

const slugify = (name: string) =>
  `${name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 40)}-${Math.random().toString(36).slice(2, 8)}`;

export function createMeService(db: Db) {
  async function me(userId: string): Promise<Me> {
    const [u] = await db.select().from(user).where(eq(user.id, userId));
    if (!u) throw notFound('user');
    const orgs = await db
      .select({ id: organisations.id, name: organisations.name, role: organisationMembers.role })
      .from(organisationMembers)
      .innerJoin(organisations, eq(organisations.id, organisationMembers.organisationId))
      .where(eq(organisationMembers.userId, userId));
    return {
      id: u.id,
      name: u.name,
      email: u.email,
      siteRole: u.role === 'admin' ? 'admin' : 'user',
      unitSystem: u.unitSystem === 'IP' ? 'IP' : 'SI',
      organisations: orgs.map((o) => ({
        id: o.id,
        name: o.name,
        role: o.role === 'admin' ? 'admin' : 'member',
      })),
    };
  }

  return {
    me,
    async setUnitSystem(userId: string, unitSystem: 'SI' | 'IP'): Promise<Me> {
      await db.update(user).set({ unitSystem, updatedAt: new Date() }).where(eq(user.id, userId));
      return me(userId);
    },
    /** A new firm with the caller as its administrator. */
    async createOrganisation(userId: string, name: string): Promise<Me> {
      const existing = await me(userId);
      if (existing.organisations.some((o) => o.name.toLowerCase() === name.toLowerCase()))
        throw new HttpError(409, 'duplicate_firm', 'you already belong to a firm of that name', {
          name: 'already exists',
        });
      await db.transaction(async (tx) => {
        const [org] = await tx
          .insert(organisations)
          .values({ name, slug: slugify(name) })
          .returning();
        await tx.insert(organisationMembers).values({ organisationId: org!.id, userId, role: 'admin' });
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
