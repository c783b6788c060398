import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * Who may hand out which project role, written out by hand (independent of `mayGrant` in shared/auth): an
 * owner grants any role; an architect grants only roles that can do nothing an architect cannot — never owner,
 * and not the subcontractor who submits what the architect reviews; the other roles invite nobody. Only owners
 * change or remove members, and an owner only while another owner stays.
 */
const ROLES = ['owner', 'architect', 'envelope_consultant', 'engineer', 'subcontractor', 'viewer'] as const;
type Role = (typeof ROLES)[number];
const MAY_INVITE: Record<Role, Role[]> = {
  owner: [...ROLES],
  architect: ['architect', 'envelope_consultant', 'engineer', 'viewer'],
  envelope_consultant: [],
  engineer: [],
  subcontractor: [],
  viewer: [],
};
const MAY_CHANGE_TO: Record<Role, Role[]> = { ...MAY_INVITE, architect: [] };
const ACCOUNT: Record<Role, string> = {
  owner: 'admin',
  architect: 'architect',
  envelope_consultant: 'consultant',
  engineer: 'engineer',
  subcontractor: 'subcontractor',
  viewer: 'viewer',
};
const PASSWORD = 'a-long-password-1';
/** The member whose role the role-change cases change. */
const SPARE = 'spare.member@example.com';

describe.each(testDatabases())('granting project roles on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  const as = (role: Role) => t.as(demoEmail(ACCOUNT[role]));
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    await (await as('owner'))
      .post(`/api/projects/${projectId}/invitations`)
      .send({ email: SPARE, role: 'viewer' });
    expect(
      (await (await account(SPARE)).post(`/api/invitations/${await tokenFor(SPARE)}/accept`)).status,
    ).toBe(200);
  });
  afterAll(async () => {
    await t?.close();
  });

  const tokenFor = async (email: string) =>
    (await t.mailTo(email, 'invites you')).text.match(/\/invite\/([\w-]+)/)![1]!;
  /** A new account with this address, signed in. */
  const account = (email: string) =>
    t.signUp(request.agent(t.app), { name: email, email, password: PASSWORD });
  const memberId = async (email: string) =>
    (
      (await (await as('owner')).get(`/api/projects/${projectId}/members`)).body.members as {
        id: string;
        email: string;
      }[]
    ).find((m) => m.email === email)!.id;

  it.each(ROLES.flatMap((by) => ROLES.map((role) => [by, role] as const)))(
    '%s inviting as %s',
    async (by, role) => {
      const email = `${by}.invites.${role}@example.com`.replaceAll('_', '-');
      const res = await (await as(by)).post(`/api/projects/${projectId}/invitations`).send({ email, role });
      if (MAY_INVITE[by].includes(role)) {
        expect(res.status, res.text).toBe(201);
        expect(res.body.role).toBe(role);
      } else {
        expect(res.status, res.text).toBe(403);
        // Someone who may invite hears which role they may not grant, on the field.
        if (MAY_INVITE[by].length > 0) {
          expect(res.body.error.code).toBe('role_not_grantable');
          expect(res.body.error.fields.role).toMatch(/may not grant/);
        }
      }
    },
  );

  it.each(ROLES.flatMap((by) => ROLES.map((role) => [by, role] as const)))(
    '%s changing a member to %s',
    async (by, role) => {
      // The same member each time, a viewer again before each change.
      const owner = await as('owner');
      const id = await memberId(SPARE);
      expect(
        (await owner.put(`/api/projects/${projectId}/members/${id}`).send({ role: 'viewer' })).status,
      ).toBe(200);
      const res = await (await as(by)).put(`/api/projects/${projectId}/members/${id}`).send({ role });
      expect(res.status, res.text).toBe(MAY_CHANGE_TO[by].includes(role) ? 200 : 403);
      const now = (await owner.get(`/api/projects/${projectId}/members`)).body.members.find(
        (m: { id: string }) => m.id === id,
      );
      expect(now.role).toBe(MAY_CHANGE_TO[by].includes(role) ? role : 'viewer');
    },
  );

  it('stops the architect who invites a second account of theirs as owner to push the owner out', async () => {
    const architect = await as('architect');
    const res = await architect
      .post(`/api/projects/${projectId}/invitations`)
      .send({ email: 'architect.second@example.com', role: 'owner' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('role_not_grantable');
    expect((await t.mail()).some((m) => m.to.includes('architect.second@example.com'))).toBe(false);
    const ownerId = await memberId(demoEmail('admin'));
    expect((await architect.delete(`/api/projects/${projectId}/members/${ownerId}`)).status).toBe(403);
    expect(
      (await architect.put(`/api/projects/${projectId}/members/${ownerId}`).send({ role: 'viewer' })).status,
    ).toBe(403);
  });

  it('checks the sender again when an invitation is used: a demoted sender’s owner invitation grants nothing', async () => {
    const owner = await as('owner');
    const architectId = await memberId(demoEmail('architect'));
    const promote = (role: Role) =>
      owner.put(`/api/projects/${projectId}/members/${architectId}`).send({ role });
    expect((await promote('owner')).status).toBe(200);
    const sent = await (await as('architect'))
      .post(`/api/projects/${projectId}/invitations`)
      .send({ email: 'while.owner@example.com', role: 'owner' });
    expect(sent.status).toBe(201);
    expect((await promote('architect')).status).toBe(200);
    const invitee = await account('while.owner@example.com');
    const accept = await invitee.post(`/api/invitations/${await tokenFor('while.owner@example.com')}/accept`);
    expect(accept.status).toBe(403);
    expect(accept.body.error.code).toBe('inviter_not_allowed');
    expect((await invitee.get(`/api/projects/${projectId}`)).status).toBe(404);
  });

  it('keeps the last owner: not demoted, not removed; with a second owner either may go', async () => {
    const owner = await as('owner');
    const ownerId = await memberId(demoEmail('admin'));
    const demote = await owner
      .put(`/api/projects/${projectId}/members/${ownerId}`)
      .send({ role: 'architect' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    const remove = await owner.delete(`/api/projects/${projectId}/members/${ownerId}`);
    expect(remove.status).toBe(409);
    expect(remove.body.error.code).toBe('last_owner');

    await owner
      .post(`/api/projects/${projectId}/invitations`)
      .send({ email: 'second.owner@example.com', role: 'owner' });
    const second = await account('second.owner@example.com');
    await second.post(`/api/invitations/${await tokenFor('second.owner@example.com')}/accept`);
    expect((await second.get(`/api/projects/${projectId}`)).body.myRole).toBe('owner');
    // Two owners demoting each other at once: one of them stays owner.
    const secondId = await memberId('second.owner@example.com');
    const [a, b] = await Promise.all([
      owner.put(`/api/projects/${projectId}/members/${secondId}`).send({ role: 'viewer' }),
      second.put(`/api/projects/${projectId}/members/${ownerId}`).send({ role: 'viewer' }),
    ]);
    // The other was refused: no longer an owner (403), or the last one left (409).
    const statuses = [a.status, b.status].sort();
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    const owners = (await (await as('viewer')).get(`/api/projects/${projectId}/members`)).body.members.filter(
      (m: { role: string }) => m.role === 'owner',
    );
    expect(owners).toHaveLength(1);
  });
});
