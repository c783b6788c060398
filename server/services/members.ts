import { createHash, randomBytes } from 'node:crypto';
import { mayGrant, mayRemove, PROJECT_ROLE_LABELS, type ProjectRole } from '@shared/auth/permissions';
import type { Invitation, InvitationInput, InvitationPreview, Member } from '@shared/schemas/members';
import { and, asc, eq, isNull, ne } from 'drizzle-orm';
import type { Config } from '../config';
import type { Db } from '../db/client';
import {
  invitations,
  organisationMembers,
  organisations,
  projectMembers,
  projects,
  user,
} from '../db/schema';
import type { Mailer } from '../mail/mailer';
import { recordAudit } from './audit';
import { conflict, DomainError, notFound } from './errors';
import { archivedError } from './projects';

const INVITATION_DAYS = 14;
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Someone acting on the project's membership, with their role on it. */
interface Actor {
  id: string;
  role: ProjectRole;
}

/** 403 unless `actor` may give `role` to someone whose role is `current` (the rule in shared/auth). */
function assertMayGrant(actor: Actor, role: ProjectRole, current: ProjectRole | null) {
  if (mayGrant(actor.role, role, current)) return;
  const what =
    current === 'owner'
      ? 'only an owner may change an owner’s role'
      : `as ${PROJECT_ROLE_LABELS[actor.role]} you may not grant the role ${PROJECT_ROLE_LABELS[role]}`;
  throw new DomainError('forbidden', 'role_not_grantable', what, { role: what });
}

function toInvitation(r: typeof invitations.$inferSelect): Invitation {
  return {
    id: r.id,
    email: r.email,
    role: r.role as ProjectRole,
    expiresAt: r.expiresAt.toISOString(),
    acceptedAt: r.acceptedAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
  };
}

export function createMemberService(db: Db, config: Config, mailer: Mailer) {
  async function list(projectId: string): Promise<{ members: Member[]; invitations: Invitation[] }> {
    const rows = await db
      .select({ m: projectMembers, name: user.name, email: user.email })
      .from(projectMembers)
      .innerJoin(user, eq(user.id, projectMembers.userId))
      .where(eq(projectMembers.projectId, projectId))
      .orderBy(asc(user.name));
    const firms = await db
      .select({ userId: organisationMembers.userId, name: organisations.name })
      .from(organisationMembers)
      .innerJoin(organisations, eq(organisations.id, organisationMembers.organisationId));
    const firmOf = new Map(firms.map((f) => [f.userId, f.name]));
    const invites = await db
      .select()
      .from(invitations)
      .where(eq(invitations.projectId, projectId))
      .orderBy(asc(invitations.createdAt));
    return {
      members: rows.map((r) => ({
        id: r.m.id,
        userId: r.m.userId,
        name: r.name,
        email: r.email,
        organisationName: firmOf.get(r.m.userId) ?? null,
        role: r.m.role as ProjectRole,
      })),
      invitations: invites.filter((i) => !i.acceptedAt).map(toInvitation),
    };
  }

  /**
   * One change to a member, in a transaction that first locks the project row: changes to one project's
   * members happen one after the other, so two owners demoting each other at once cannot leave it ownerless.
   */
  function changeMember<T>(
    projectId: string,
    memberId: string,
    change: (tx: Db, m: typeof projectMembers.$inferSelect) => Promise<T>,
  ): Promise<T> {
    return db.transaction(async (tx) => {
      await tx.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId)).for('update');
      const [m] = await tx
        .select()
        .from(projectMembers)
        .where(and(eq(projectMembers.id, memberId), eq(projectMembers.projectId, projectId)));
      if (!m) throw notFound('member');
      return change(tx, m);
    });
  }

  /** A project must always keep at least one owner. */
  async function assertNotLastOwner(tx: Db, projectId: string, memberId: string) {
    const others = await tx
      .select({ id: projectMembers.id })
      .from(projectMembers)
      .where(
        and(
          eq(projectMembers.projectId, projectId),
          eq(projectMembers.role, 'owner'),
          ne(projectMembers.id, memberId),
        ),
      );
    if (others.length === 0) throw conflict('last_owner', 'a project must keep at least one owner');
  }

  return {
    list,

    async invite(
      projectId: string,
      inviter: Actor & { name: string },
      input: InvitationInput,
    ): Promise<Invitation> {
      assertMayGrant(inviter, input.role, null);
      const [existing] = await db
        .select({ id: projectMembers.id })
        .from(projectMembers)
        .innerJoin(user, eq(user.id, projectMembers.userId))
        .where(and(eq(projectMembers.projectId, projectId), eq(user.email, input.email)));
      if (existing)
        throw new DomainError('conflict', 'already_member', `${input.email} is already a member`, {
          email: 'already a member of this project',
        });
      const [project] = await db
        .select({ name: projects.name, archivedAt: projects.archivedAt })
        .from(projects)
        .where(eq(projects.id, projectId));
      if (project?.archivedAt) throw archivedError();
      const token = randomBytes(24).toString('base64url');
      const row = await db.transaction(async (tx) => {
        // Inviting the same address again replaces the pending invitation: the old link stops working.
        await tx
          .delete(invitations)
          .where(
            and(
              eq(invitations.projectId, projectId),
              eq(invitations.email, input.email),
              isNull(invitations.acceptedAt),
            ),
          );
        const [inv] = await tx
          .insert(invitations)
          .values({
            projectId,
            email: input.email,
            role: input.role,
            tokenHash: hashToken(token),
            invitedBy: inviter.id,
            expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
          })
          .returning();
        await recordAudit(tx, {
          actorId: inviter.id,
          projectId,
          entity: 'invitation',
          entityId: inv!.id,
          action: 'create',
          after: input,
        });
        return inv!;
      });
      const link = `${config.baseUrl}/invite/${token}`;
      await mailer.send({
        to: input.email,
        subject: `${inviter.name} invites you to ${project?.name ?? 'a project'} on Skinwright`,
        text: `${inviter.name} has invited you to join the project "${project?.name}" as ${PROJECT_ROLE_LABELS[input.role]}.\n\nAccept the invitation: ${link}\n\nThe link expires in ${INVITATION_DAYS} days.`,
      });
      return toInvitation(row);
    },

    async preview(token: string): Promise<InvitationPreview> {
      const [r] = await db
        .select({ inv: invitations, projectName: projects.name, inviter: user.name })
        .from(invitations)
        .innerJoin(projects, eq(projects.id, invitations.projectId))
        .innerJoin(user, eq(user.id, invitations.invitedBy))
        .where(eq(invitations.tokenHash, hashToken(token)));
      if (!r) throw notFound('invitation');
      return {
        projectName: r.projectName,
        invitedBy: r.inviter,
        email: r.inv.email,
        role: r.inv.role as ProjectRole,
        expired: r.inv.expiresAt.getTime() < Date.now(),
        accepted: r.inv.acceptedAt !== null,
      };
    },

    async accept(token: string, invitee: { id: string; email: string }): Promise<{ projectId: string }> {
      const [inv] = await db
        .select()
        .from(invitations)
        .where(eq(invitations.tokenHash, hashToken(token)));
      if (!inv) throw notFound('invitation');
      if (inv.acceptedAt) throw conflict('already_accepted', 'this invitation has already been accepted');
      if (inv.expiresAt.getTime() < Date.now())
        throw new DomainError('expired', 'expired', 'this invitation has expired; ask for a new one');
      if (inv.email.toLowerCase() !== invitee.email.toLowerCase())
        throw new DomainError(
          'forbidden',
          'wrong_account',
          `this invitation is for ${inv.email}; sign in with that address`,
        );
      const [project] = await db
        .select({ archivedAt: projects.archivedAt })
        .from(projects)
        .where(eq(projects.id, inv.projectId));
      if (project?.archivedAt) throw archivedError();
      // The rule holds when the invitation is used too: its sender must still be on the project with a role
      // that may grant it (an invitation sent before a demotion, or before the rule, grants no more).
      const [sender] = await db
        .select({ role: projectMembers.role })
        .from(projectMembers)
        .where(and(eq(projectMembers.projectId, inv.projectId), eq(projectMembers.userId, inv.invitedBy)));
      if (!mayGrant(sender?.role as ProjectRole | undefined, inv.role as ProjectRole))
        throw new DomainError(
          'forbidden',
          'inviter_not_allowed',
          'the person who invited you can no longer grant this role; ask an owner of the project for a new invitation',
        );
      await db.transaction(async (tx) => {
        // Joining never changes the role of someone already on the project (that is a role change).
        const joined = await tx
          .insert(projectMembers)
          .values({ projectId: inv.projectId, userId: invitee.id, role: inv.role })
          .onConflictDoNothing({ target: [projectMembers.projectId, projectMembers.userId] })
          .returning({ id: projectMembers.id });
        if (joined.length === 0) throw conflict('already_member', 'you are already a member of this project');
        await tx
          .update(invitations)
          .set({ acceptedAt: new Date(), acceptedBy: invitee.id })
          .where(eq(invitations.id, inv.id));
        await recordAudit(tx, {
          actorId: invitee.id,
          projectId: inv.projectId,
          entity: 'member',
          entityId: invitee.id,
          action: 'join',
          after: { role: inv.role },
        });
      });
      return { projectId: inv.projectId };
    },

    async setRole(projectId: string, memberId: string, role: ProjectRole, actor: Actor): Promise<Member> {
      await changeMember(projectId, memberId, async (tx, m) => {
        assertMayGrant(actor, role, m.role as ProjectRole);
        if (m.role === 'owner' && role !== 'owner') await assertNotLastOwner(tx, projectId, memberId);
        await tx.update(projectMembers).set({ role }).where(eq(projectMembers.id, memberId));
        await recordAudit(tx, {
          actorId: actor.id,
          projectId,
          entity: 'member',
          entityId: m.userId,
          action: 'change_role',
          before: { role: m.role },
          after: { role },
        });
      });
      const { members } = await list(projectId);
      return members.find((x) => x.id === memberId)!;
    },

    async remove(projectId: string, memberId: string, actor: Actor): Promise<void> {
      await changeMember(projectId, memberId, async (tx, m) => {
        if (!mayRemove(actor.role, m.role as ProjectRole))
          throw new DomainError('forbidden', 'role_not_grantable', 'only an owner may remove an owner');
        if (m.role === 'owner') await assertNotLastOwner(tx, projectId, memberId);
        await tx.delete(projectMembers).where(eq(projectMembers.id, memberId));
        await recordAudit(tx, {
          actorId: actor.id,
          projectId,
          entity: 'member',
          entityId: m.userId,
          action: 'remove',
          before: { role: m.role },
        });
      });
    },
  };
}
