import { FIRM_ROLE_LABELS, type FirmRole, firmRoleSchema } from '@shared/auth/permissions';
import type { FirmMember, FirmMemberAdd } from '@shared/schemas/firm-members';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import type { Config } from '../config';
import type { Db } from '../db/client';
import { organisationMembers, organisations, user } from '../db/schema';
import type { Mailer } from '../mail/mailer';
import { recordAudit } from './audit';
import { DomainError, notFound } from './errors';

interface Row {
  userId: string;
  name: string;
  email: string;
  role: string;
  since: Date;
}

/** A stored role as the API shows it: anything unknown reads as the least, `reader`. */

/** One person's membership row of a firm. */
const memberRow = (organisationId: string, userId: string) =>
  and(eq(organisationMembers.organisationId, organisationId), eq(organisationMembers.userId, userId));

export const firmRoleOf = (role: string | null | undefined): FirmRole =>
  firmRoleSchema.catch('reader').parse(role);

const toMember = (r: Row): FirmMember => ({
  userId: r.userId,
  name: r.name,
  email: r.email,
  role: firmRoleOf(r.role),
  since: r.since.toISOString(),
});

/**
 * The people of a firm and their firm roles (admin, editor, reader — see shared/auth/permissions.ts). A firm
 * always keeps at least one administrator; changes to one firm's members run one after the other (a lock of
 * its row), so two administrators demoting each other at once cannot leave it without one.
 */
export function createFirmMemberService(db: Db, config: Config, mailer: Mailer) {
  const columns = {
    userId: organisationMembers.userId,
    name: user.name,
    email: user.email,
    role: organisationMembers.role,
    since: organisationMembers.createdAt,
  };
  /** The firm's members, or the one with `userId`. */
  const members = (organisationId: string, userId?: string) =>
    db
      .select(columns)
      .from(organisationMembers)
      .innerJoin(user, eq(user.id, organisationMembers.userId))
      .where(
        and(
          eq(organisationMembers.organisationId, organisationId),
          userId === undefined ? undefined : eq(organisationMembers.userId, userId),
        ),
      );

  async function one(organisationId: string, userId: string): Promise<FirmMember> {
    const [r] = await members(organisationId, userId);
    if (!r) throw notFound('member');
    return toMember(r);
  }

  async function assertNotLastAdmin(tx: Db, organisationId: string, userId: string) {
    const [other] = await tx
      .select({ userId: organisationMembers.userId })
      .from(organisationMembers)
      .where(
        and(
          eq(organisationMembers.organisationId, organisationId),
          eq(organisationMembers.role, 'admin'),
          ne(organisationMembers.userId, userId),
        ),
      )
      .limit(1);
    if (!other)
      throw new DomainError('conflict', 'last_admin', 'a firm must keep at least one administrator', {
        role: 'the firm’s only administrator; make someone else administrator first',
      });
  }

  /**
   * Gives a member another role, or (`role` null) takes them out of the firm, with the firm's row locked: 404
   * when they are not in it, 409 when it would leave the firm without an administrator.
   */
  function changeMember(organisationId: string, userId: string, actorId: string, role: FirmRole | null) {
    return db.transaction(async (tx) => {
      await tx
        .select({ id: organisations.id })
        .from(organisations)
        .where(eq(organisations.id, organisationId))
        .for('update');
      const [m] = await tx
        .select({ role: organisationMembers.role })
        .from(organisationMembers)
        .where(memberRow(organisationId, userId));
      if (!m) throw notFound('member');
      const before = firmRoleOf(m.role);
      if (before === role) return;
      if (before === 'admin') await assertNotLastAdmin(tx, organisationId, userId);
      if (role) await tx.update(organisationMembers).set({ role }).where(memberRow(organisationId, userId));
      else await tx.delete(organisationMembers).where(memberRow(organisationId, userId));
      await recordAudit(tx, {
        actorId,
        entity: 'firm_member',
        entityId: userId,
        action: role ? 'change_role' : 'remove',
        before: { organisationId, role: before },
        after: role && { organisationId, role },
      });
    });
  }

  return {
    /** The caller's role in the firm, or null when they are not in it. */
    async roleIn(organisationId: string, userId: string): Promise<FirmRole | null> {
      const [m] = await db
        .select({ role: organisationMembers.role })
        .from(organisationMembers)
        .where(memberRow(organisationId, userId));
      return m ? firmRoleOf(m.role) : null;
    },

    async list(organisationId: string): Promise<FirmMember[]> {
      const rows = await members(organisationId).orderBy(asc(user.name), asc(user.email));
      return rows.map(toMember);
    },

    /**
     * Adds someone who already has an account (found by e-mail) with a firm role, and tells them by e-mail.
     * No account with that address: 422 on `email` (they sign up first); already in the firm: 409.
     */
    async add(
      organisationId: string,
      actor: { id: string; name: string },
      input: FirmMemberAdd,
    ): Promise<FirmMember> {
      const [person] = await db
        .select({ id: user.id })
        .from(user)
        .where(sql`lower(${user.email}) = ${input.email}`);
      if (!person)
        throw new DomainError(
          'invalid',
          'no_account',
          `nobody has a Skinwright account with ${input.email}`,
          {
            email: 'no account uses this address; ask them to sign up first, then add them',
          },
        );
      const firm = await db.transaction(async (tx) => {
        const added = await tx
          .insert(organisationMembers)
          .values({ organisationId, userId: person.id, role: input.role })
          .onConflictDoNothing()
          .returning({ userId: organisationMembers.userId });
        if (added.length === 0)
          throw new DomainError('conflict', 'already_member', `${input.email} is already in this firm`, {
            email: 'already a member of this firm',
          });
        await recordAudit(tx, {
          actorId: actor.id,
          entity: 'firm_member',
          entityId: person.id,
          action: 'add',
          after: { organisationId, role: input.role },
        });
        const [o] = await tx
          .select({ name: organisations.name })
          .from(organisations)
          .where(eq(organisations.id, organisationId));
        return o!.name;
      });
      await mailer.send({
        to: input.email,
        subject: `${actor.name} added you to ${firm} on Skinwright`,
        text: `${actor.name} added you to the firm "${firm}" as ${FIRM_ROLE_LABELS[input.role]}.\n\nThe firm's members, with their roles: ${config.baseUrl}/settings/firm?org=${organisationId}`,
      });
      return one(organisationId, person.id);
    },

    async setRole(
      organisationId: string,
      userId: string,
      role: FirmRole,
      actorId: string,
    ): Promise<FirmMember> {
      await changeMember(organisationId, userId, actorId, role);
      return one(organisationId, userId);
    },

    /** Takes someone out of the firm (what they wrote stays, with their name). */
    async remove(organisationId: string, userId: string, actorId: string): Promise<void> {
      await changeMember(organisationId, userId, actorId, null);
    },
  };
}
