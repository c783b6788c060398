import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * Firm roles: a firm's code tables, library entries and makers' data sheets are written by its editors and
 * administrators only; readers read; administrators manage the members. In the demo firm (Larchmere) the
 * owner's account is the administrator, the architect an editor and the project viewer a reader.
 */
const PDF = Buffer.from('%PDF-1.4\n%%EOF\n');

describe.each(testDatabases())('firm roles on %s', (kind) => {
  let t: TestApp;
  let orgId: string;
  let projectId: string;
  let tableId: string;
  let productId: string;
  const as = (who: string) => t.as(demoEmail(who));
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const admin = await as('admin');
    orgId = (await admin.get('/api/me')).body.organisations[0].id;
    tableId = (await admin.get(`/api/organisations/${orgId}/criteria-sets`)).body.criteriaSets[0].id;
    productId = (
      await admin.post(`/api/organisations/${orgId}/attachment-products`).send({
        kind: 'clip',
        name: 'Example clip (invented)',
        source: 'Maker data sheet, rev. 1 (example)',
        clip: { fastenerCapacity: 900, fastenersPerClip: 3 },
      })
    ).body.id;
    expect(productId).toBeTruthy();
    await admin
      .post(`/api/organisations/${orgId}/attachment-products/${productId}/data-sheet`)
      .attach('files', PDF, 'clip.pdf');
  });
  afterAll(async () => {
    await t?.close();
  });

  it('seeds the demo firm with an administrator, an editor and a reader', async () => {
    const roles = Object.fromEntries(
      (await (await as('viewer')).get(`/api/organisations/${orgId}/members`)).body.members.map(
        (m: { email: string; role: string }) => [m.email, m.role],
      ),
    );
    expect(roles).toEqual({
      [demoEmail('admin')]: 'admin',
      [demoEmail('architect')]: 'editor',
      [demoEmail('viewer')]: 'reader',
    });
    expect((await (await as('viewer')).get('/api/me')).body.organisations[0]).toMatchObject({
      id: orgId,
      role: 'reader',
    });
  });

  it('does not let a reader raise a code table’s U-factor limit, replace a data sheet or add entries', async () => {
    const viewer = await as('viewer');
    const table = (await viewer.get(`/api/criteria-sets/${tableId}`)).body;
    expect(table.myAccess).toBe('read');
    const raised = table.rows.map((r: { criterion: string; value: number }) =>
      r.criterion === 'max_u_factor' ? { ...r, value: 0.7 } : r,
    );
    const refusals = [
      await viewer.put(`/api/criteria-sets/${tableId}/rows`).send({ revision: table.revision, rows: raised }),
      await viewer.post(`/api/criteria-sets/${tableId}/import?revision=${table.revision}`).send({
        csv: 'climate_zone,wall_category,criterion,value,unit,note\n5A,*,max_u_factor,0.7,W/(m2.K),\n',
      }),
      await viewer.post(`/api/organisations/${orgId}/criteria-sets`).send({ name: 'The viewer’s table' }),
      await viewer
        .post(`/api/organisations/${orgId}/attachment-products/${productId}/data-sheet`)
        .attach('files', Buffer.from('%PDF-1.4\n% replaced\n%%EOF\n'), 'other.pdf'),
      await viewer
        .post(`/api/organisations/${orgId}/materials`)
        .send({ name: 'x', conductivity: 0.03, source: 'y' }),
      await viewer.delete(`/api/organisations/${orgId}/attachment-products/${productId}`),
    ];
    for (const res of refusals) expect(res.status, res.text).toBe(403);
    // Nothing changed: the table, its version and the data sheet are as they were.
    const after = (await (await as('architect')).get(`/api/criteria-sets/${tableId}`)).body;
    expect(after).toMatchObject({ revision: table.revision, version: table.version, rows: table.rows });
    const sheet = await (await as('architect')).get(
      `/api/organisations/${orgId}/attachment-products/${productId}/data-sheet`,
    );
    expect(Buffer.from(sheet.body).equals(PDF)).toBe(true);
    // So the architect's check is offered no table of the viewer's.
    const offered = (await (await as('architect')).get(`/api/projects/${projectId}/criteria-sets`)).body
      .criteriaSets as { name: string }[];
    expect(offered.map((s) => s.name)).not.toContain('The viewer’s table');
  });

  it('lets an editor write tables, entries and data sheets but not delete them', async () => {
    const architect = await as('architect');
    const set = await architect
      .post(`/api/organisations/${orgId}/criteria-sets`)
      .send({ name: 'Editor table' });
    expect(set.status).toBe(201);
    expect(set.body.myAccess).toBe('write');
    const upload = await architect
      .post(`/api/organisations/${orgId}/attachment-products/${productId}/data-sheet`)
      .attach('files', PDF, 'clip-rev-2.pdf');
    expect(upload.status).toBe(201);
    expect((await architect.delete(`/api/criteria-sets/${set.body.id}`)).status).toBe(403);
    expect(
      (await architect.delete(`/api/organisations/${orgId}/attachment-products/${productId}`)).status,
    ).toBe(403);
    expect((await (await as('admin')).delete(`/api/criteria-sets/${set.body.id}`)).status).toBe(204);
  });

  it('lets an administrator add an account by e-mail, change its firm role and take it out again', async () => {
    const admin = await as('admin');
    const unknown = await admin
      .post(`/api/organisations/${orgId}/members`)
      .send({ email: 'nobody.here@example.com', role: 'reader' });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.fields.email).toMatch(/no account/);

    const newcomer = await t.signUp(request.agent(t.app), {
      name: 'Nell Newcomer',
      email: 'nell@example.com',
      password: 'a-long-password-1',
    });
    expect((await newcomer.get(`/api/organisations/${orgId}/materials`)).status).toBe(404);
    const added = await admin
      .post(`/api/organisations/${orgId}/members`)
      .send({ email: 'Nell@Example.com', role: 'reader' });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ name: 'Nell Newcomer', email: 'nell@example.com', role: 'reader' });
    expect((await t.mailTo('nell@example.com', 'added you')).text).toMatch(/as Reader/);
    const again = await admin
      .post(`/api/organisations/${orgId}/members`)
      .send({ email: 'nell@example.com', role: 'editor' });
    expect(again.status).toBe(409);

    const userId = added.body.userId as string;
    const write = () =>
      newcomer
        .post(`/api/organisations/${orgId}/materials`)
        .send({ name: 'PIR', conductivity: 0.022, source: 'x' });
    expect((await newcomer.get(`/api/organisations/${orgId}/materials`)).status).toBe(200);
    expect((await write()).status).toBe(403);
    // Readers and editors do not manage members.
    for (const who of ['viewer', 'architect']) {
      const agent = await as(who);
      expect(
        (await agent.put(`/api/organisations/${orgId}/members/${userId}`).send({ role: 'admin' })).status,
      ).toBe(403);
      expect((await agent.delete(`/api/organisations/${orgId}/members/${userId}`)).status).toBe(403);
      expect(
        (
          await agent
            .post(`/api/organisations/${orgId}/members`)
            .send({ email: 'x@example.com', role: 'reader' })
        ).status,
      ).toBe(403);
    }
    const promoted = await admin
      .put(`/api/organisations/${orgId}/members/${userId}`)
      .send({ role: 'editor' });
    expect(promoted.status).toBe(200);
    expect(promoted.body.role).toBe('editor');
    expect((await write()).status).toBe(201);
    expect((await admin.delete(`/api/organisations/${orgId}/members/${userId}`)).status).toBe(204);
    expect((await newcomer.get(`/api/organisations/${orgId}/materials`)).status).toBe(404);
    // Someone outside the firm does not learn who is in it.
    expect((await (await as('outsider')).get(`/api/organisations/${orgId}/members`)).status).toBe(404);
  });

  it('keeps the last administrator', async () => {
    const admin = await as('admin');
    const me = (await admin.get('/api/me')).body.id as string;
    const demote = await admin.put(`/api/organisations/${orgId}/members/${me}`).send({ role: 'editor' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_admin');
    expect((await admin.delete(`/api/organisations/${orgId}/members/${me}`)).status).toBe(409);
    // With a second administrator, the first may step down.
    const architectId = (await admin.get(`/api/organisations/${orgId}/members`)).body.members.find(
      (m: { email: string }) => m.email === demoEmail('architect'),
    ).userId;
    expect(
      (await admin.put(`/api/organisations/${orgId}/members/${architectId}`).send({ role: 'admin' })).status,
    ).toBe(200);
    expect(
      (await admin.put(`/api/organisations/${orgId}/members/${me}`).send({ role: 'editor' })).status,
    ).toBe(200);
    const architect = await as('architect');
    expect(
      (await architect.put(`/api/organisations/${orgId}/members/${architectId}`).send({ role: 'reader' }))
        .status,
    ).toBe(409);
    expect(
      (await architect.put(`/api/organisations/${orgId}/members/${me}`).send({ role: 'admin' })).status,
    ).toBe(200);
  });

  it('migrates the old `member` rows to editors and keeps administrators (migration 0015)', async () => {
    const { db } = t.database;
    const architect = (await (await as('architect')).get('/api/me')).body.id as string;
    const statements = readFileSync('drizzle/0015_firm_roles_backfill.sql', 'utf8').split(
      '--> statement-breakpoint',
    );
    // The table as it was before firm roles: `member` was allowed.
    await db.execute(sql`ALTER TABLE organisation_members DROP CONSTRAINT org_members_role_check`);
    await db.execute(
      sql`UPDATE organisation_members SET role = 'member' WHERE user_id = ${architect} AND organisation_id = ${orgId}`,
    );
    for (const statement of statements) await db.execute(sql.raw(statement));
    await db.execute(
      sql`ALTER TABLE organisation_members ADD CONSTRAINT org_members_role_check CHECK (role in ('admin', 'editor', 'reader'))`,
    );
    const roles = await (await as('admin')).get(`/api/organisations/${orgId}/members`);
    const byEmail = Object.fromEntries(
      roles.body.members.map((m: { email: string; role: string }) => [m.email, m.role]),
    );
    expect(byEmail[demoEmail('architect')]).toBe('editor');
    expect(byEmail[demoEmail('viewer')]).toBe('reader');
    // An unknown role cannot be stored.
    await expect(
      db.execute(sql`UPDATE organisation_members SET role = 'member' WHERE user_id = ${architect}`),
    ).rejects.toThrow();
  });
});
