import { Writable } from 'node:stream';
import { INT4_MAX } from '@shared/schemas/common';
import { sql } from 'drizzle-orm';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import type { Config } from '../../server/config';
import { createLogger } from '../../server/logger';
import { apiRoutes } from '../../server/routes';
import { createTestApp, DEMO_PASSWORD, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * Bounds of what a request may carry, found by a security review: text has a length limit (a 100 000-character
 * name made a 138 kB Set-Cookie), a lone UTF-16 surrogate is refused with the field (it was a 500), integers
 * that reach a database `integer` column stay ≤ 2³¹ − 1 (larger ones were a 500), every number of a
 * calculation has a plausible lower bound instead of "greater than 0" (5e-324 N was accepted), and a 500
 * never writes user text or SQL parameters to the log.
 */

type Json = Record<string, unknown> & { type?: string };

/** Every JSON-schema node of a request schema with its path (properties, items, unions, intersections). */
function nodes(schema: Json, path = ''): [string, Json][] {
  const out: [string, Json][] = [[path || '(root)', schema]];
  const props = schema.properties as Record<string, Json> | undefined;
  for (const [k, v] of Object.entries(props ?? {})) out.push(...nodes(v, `${path}.${k}`));
  if (schema.items && typeof schema.items === 'object') out.push(...nodes(schema.items as Json, `${path}[]`));
  if (schema.additionalProperties && typeof schema.additionalProperties === 'object')
    out.push(...nodes(schema.additionalProperties as Json, `${path}.*`));
  for (const key of ['anyOf', 'oneOf', 'allOf'])
    for (const [i, v] of ((schema[key] as Json[] | undefined) ?? []).entries())
      out.push(...nodes(v, `${path}|${i}`));
  return out;
}

/** Every node of every route's body, query and path schema, as the request sees it (zod input). */
const requestNodes = apiRoutes.flatMap((route) =>
  (['body', 'query', 'params'] as const).flatMap((part) => {
    const schema = route[part] as z.ZodType | undefined;
    if (!schema) return [];
    const json = z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as Json;
    return nodes(json).map(([path, node]) => ({
      where: `${route.method.toUpperCase()} ${route.path} ${part}${path}`,
      calc: route.path.startsWith('/v1/calc/'),
      node,
    }));
  }),
);

/** An anchored pattern without an open-ended repeat (`*`, `+`, `{n,}`) bounds the length by itself. */
const boundedPattern = (p: unknown) =>
  typeof p === 'string' && p.startsWith('^') && p.endsWith('$') && !/[*+]|\{\d+,\}/.test(p);

describe('request schemas bound every text, integer and calculation number', () => {
  it('every string has a maximum length (enums, formats and bounded patterns bound themselves)', () => {
    const open = requestNodes
      .filter(({ node: n }) => n.type === 'string' && n.maxLength === undefined)
      .filter(({ node: n }) => !n.enum && n.const === undefined && !n.format && !boundedPattern(n.pattern))
      .map((n) => n.where);
    expect(open).toEqual([]);
  });

  it('every integer fits a database integer column (at most 2³¹ − 1)', () => {
    const open = requestNodes
      .filter(({ node: n }) => n.type === 'integer' && !((n.maximum as number) <= INT4_MAX))
      .map((n) => `${n.where} (max ${n.node.maximum})`);
    expect(open).toEqual([]);
  });

  it('every number has a lower bound of its own, never only "greater than 0"', () => {
    const open = requestNodes
      .filter(({ node: n }) => n.type === 'number' && (n.minimum === undefined || 'exclusiveMinimum' in n))
      .map((n) => n.where);
    expect(open).toEqual([]);
  });
});

describe.each(testDatabases())('hostile values on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  const owner = () => t.as(demoEmail('admin'));
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('a sign-up or name change with an over-long name is refused with 400 and sets no cookie', async () => {
    const long = await t
      .anonymous()
      .post('/api/auth/sign-up/email')
      .send({ name: 'x'.repeat(100_000), email: 'long.name@example.com', password: 'a-long-password-1' });
    // Refused by the body limit of the sign-in routes (413) or by the name's (400); either way no cookie.
    expect([400, 413], long.text.slice(0, 200)).toContain(long.status);
    expect(long.headers['set-cookie']).toBeUndefined();
    for (const name of ['x'.repeat(201), 'x'.repeat(10_000), 'bad \ud800 name', 'nul \u0000 name']) {
      const res = await t
        .anonymous()
        .post('/api/auth/sign-up/email')
        .send({ name, email: 'odd.name@example.com', password: 'a-long-password-1' });
      expect(res.status, JSON.stringify(name).slice(0, 40)).toBe(400);
    }
    const image = await t
      .anonymous()
      .post('/api/auth/sign-up/email')
      .send({
        name: 'Ann',
        email: 'image@example.com',
        password: 'a-long-password-1',
        image: 'x'.repeat(5000),
      });
    expect(image.status).toBe(400);

    const fine = await t
      .anonymous()
      .post('/api/auth/sign-up/email')
      .send({ name: 'N'.repeat(200), email: 'fine.name@example.com', password: 'a-long-password-1' });
    expect(fine.status, fine.text).toBeLessThan(300);

    const viewer = await t.as(demoEmail('viewer'));
    const rename = await viewer.post('/api/auth/update-user').send({ name: 'y'.repeat(10_000) });
    expect(rename.status).toBe(400);
    expect(rename.headers['set-cookie']).toBeUndefined();
    expect((await viewer.post('/api/auth/update-user').send({ name: 'Ann Other' })).status).toBe(200);
    expect((await viewer.get('/api/me')).body.name).toBe('Ann Other');
  });

  it('over-long text in a form is refused with the field and its limit', async () => {
    const res = await (await owner())
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: 't'.repeat(201), specSection: '07 42 13', specTitle: 'Metal Wall Panels' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.title).toMatch(/200 characters/);
  });

  it('a lone UTF-16 surrogate in any text field is refused with 400 naming the field', async () => {
    const agent = await owner();
    const project = (await agent.get(`/api/projects/${projectId}`)).body;
    const newProject = await agent.post('/api/projects').send({ ...siteOf(project), name: 'Depot \ud800' });
    expect(newProject.status).toBe(400);
    expect(newProject.body.error.fields).toEqual({ name: expect.stringMatching(/surrogate/) });

    const submittal = await agent
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: '\udfffTitle', specSection: '07 42 13', specTitle: 'Metal Wall Panels' });
    expect(submittal.status).toBe(400);
    expect(Object.keys(submittal.body.error.fields)).toEqual(['title']);

    const created = await agent
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: 'Surrogates', specSection: '07 42 13', specTitle: 'Metal Wall Panels' });
    expect(created.status).toBe(201);
    const comment = await agent
      .post(`/api/submittals/${created.body.id}/comments`)
      .send({ body: 'half an emoji \ud83d', itemId: null });
    expect(comment.status).toBe(400);
    expect(Object.keys(comment.body.error.fields)).toEqual(['body']);
    // A key of an object is text too.
    const key = await agent
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: 'Keys', specSection: '07 42 13', specTitle: 'Metal Wall Panels', '\ud800': 1 });
    expect(key.status).toBe(400);
    // A whole emoji (a surrogate pair) is fine.
    const emoji = await agent
      .post(`/api/submittals/${created.body.id}/comments`)
      .send({ body: 'looks good 👍', itemId: null });
    expect(emoji.status).toBe(201);

    // The calculations: both the lean path and Express (another spelling of the content type).
    const thermal = apiRoutes.find((r) => r.path === '/v1/calc/thermal')!.example as {
      layers: { name: string }[];
    };
    const body = {
      ...thermal,
      layers: thermal.layers.map((l, i) => (i === 1 ? { ...l, name: 'x\udc00' } : l)),
    };
    for (const type of ['application/json', 'application/json; charset=UTF-8']) {
      const res = await t
        .anonymous()
        .post('/api/v1/calc/thermal')
        .set('content-type', type)
        .send(JSON.stringify(body));
      expect(res.status, type).toBe(400);
      expect(res.body.error.fields, type).toEqual({ 'layers.1.name': expect.stringMatching(/surrogate/) });
    }
  });

  it('versions, revisions and counts beyond a database integer are refused with 400', async () => {
    const agent = await owner();
    const project = (await agent.get(`/api/projects/${projectId}`)).body;
    const put = await agent
      .put(`/api/projects/${projectId}`)
      .send({ version: 2 ** 31, changes: siteOf(project) });
    expect(put.status).toBe(400);
    expect(put.body.error.fields.version).toMatch(/2147483647/);
    const assemblyId = (await agent.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
    const revision = await agent.get(`/api/assemblies/${assemblyId}/revisions/${2 ** 31}`);
    expect(revision.status).toBe(400);
    const assembly = (await agent.get(`/api/assemblies/${assemblyId}`)).body;
    const save = await agent
      .put(`/api/assemblies/${assemblyId}`)
      .send({ version: 2 ** 53 - 1, note: '', input: assembly.current.input });
    expect(save.status).toBe(400);
    const orgId = (await agent.get('/api/me')).body.organisations[0].id;
    const set = await agent.post(`/api/organisations/${orgId}/criteria-sets`).send({ name: 'Bounds' });
    const rows = await agent
      .put(`/api/criteria-sets/${set.body.id}/rows`)
      .send({ revision: 2 ** 31, rows: [] });
    expect(rows.status).toBe(400);
    const diff = await agent.get(`/api/criteria-sets/${set.body.id}/diff?from=1&to=${2 ** 40}`);
    expect(diff.status).toBe(400);
    // A date the database cannot store (there is no year 0) is refused too.
    const due = await agent
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: 'Due', specSection: '07 42 13', specTitle: 'Metal Wall Panels', dueDate: '0000-01-01' });
    expect(due.status).toBe(400);
    expect(Object.keys(due.body.error.fields)).toEqual(['dueDate']);
  });

  it('a vanishing fastener capacity is refused with the reason, not answered with a null utilisation', async () => {
    const example = apiRoutes.find((r) => r.path === '/v1/calc/wind')!.example as {
      panel: Record<string, unknown>;
    };
    const body = {
      ...example,
      panel: { ...example.panel, clip: { fastenerCapacity: 5e-324, fastenersPerClip: 2 } },
    };
    const res = await t.anonymous().post('/api/v1/calc/wind').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['panel.clip.fastenerCapacity'] ?? JSON.stringify(res.body)).toMatch(
      /at least 1 N/,
    );
  });
});

describe.each(testDatabases())('CSV exports on %s', (kind) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp(kind);
  });
  afterAll(async () => {
    await t?.close();
  });

  // OWASP "CSV Injection": a spreadsheet runs a cell that starts with = + - @, a tab or a CR.
  const HOSTILE = ['=HYPERLINK("http://evil.example","x")', '+1+cmd|x', '-2+3', '@SUM(A1)', '\t=1', '\r=1'];

  it('a code table neutralises formula-like notes and reads its own export back unchanged', async () => {
    const agent = await t.as(demoEmail('admin'));
    const orgId = (await agent.get('/api/me')).body.organisations[0].id;
    const rows = HOSTILE.map((note, i) => ({
      climateZone: ['4A', '5A', '6A', '7', '8', '*'][i],
      wallCategory: 'steel_framed',
      criterion: 'max_u_factor',
      value: 0.35,
      note: note.trim(),
    }));
    const source = await agent.post(`/api/organisations/${orgId}/criteria-sets`).send({ name: 'CSV', rows });
    expect(source.status, source.text).toBe(201);
    const csv = await agent.get(`/api/criteria-sets/${source.body.id}/export.csv`).buffer(true);
    expect(csv.status).toBe(200);
    const cells = csv.text.split('\r\n').flatMap((line) => line.split(','));
    for (const cell of cells) expect(cell.replace(/^"/, ''), cell).not.toMatch(/^[=+\-@\t\r]/);
    expect(csv.text).toContain(`"'=HYPERLINK(""http://evil.example""`);
    const target = await agent.post(`/api/organisations/${orgId}/criteria-sets`).send({ name: 'Back' });
    const imported = await agent.post(`/api/criteria-sets/${target.body.id}/import`).send({ csv: csv.text });
    expect(imported.status, imported.text).toBe(200);
    expect(imported.body.rows.map((r: { note: string }) => r.note)).toEqual(rows.map((r) => r.note));
  });

  it('the takeoff CSV neutralises a formula in a wall name', async () => {
    const example = apiRoutes.find((r) => r.path === '/v1/calc/takeoff')!.example as {
      walls: { name: string }[];
    };
    const body = { ...example, walls: example.walls.map((w) => ({ ...w, name: '=cmd|" /C calc"!A0' })) };
    const res = await t.anonymous().post('/api/v1/calc/takeoff.csv').send(body);
    expect(res.status).toBe(200);
    const firstCells = res.text
      .split('\r\n')
      .filter(Boolean)
      .map((line) => line.replace(/^"/, ''));
    for (const cell of firstCells) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
    expect(res.text).toContain(`"'=cmd|"" /C calc""!A0`);
  });
});

/** The site data of a project record (what `POST /projects` and `PUT /projects/:id` take). */
function siteOf(project: Record<string, unknown>) {
  const keys = [
    'name',
    'number',
    'description',
    'siteAddress',
    'climateZone',
    'elevationM',
    'buildingHeightM',
    'planLengthM',
    'planWidthM',
    'indoorTempC',
    'indoorRh',
    'winterDesignTempC',
    'summerDesignTempC',
  ];
  return Object.fromEntries(keys.map((k) => [k, project[k]]));
}

describe.each(testDatabases())('the log of a 500 on %s', (kind) => {
  let t: TestApp;
  const lines: string[] = [];
  const SECRET = 'Zebra-7f3c-secret-site-name';
  beforeAll(async () => {
    const logger = pino(
      { level: 'error' },
      new Writable({
        write(chunk, _enc, done) {
          lines.push(String(chunk));
          done();
        },
      }),
    );
    t = await createTestApp(kind, { logger });
    // A constraint the app does not know: the insert fails inside the database with the name in its detail.
    await t.database.db.execute(
      sql.raw(`ALTER TABLE projects ADD CONSTRAINT test_no_zebra CHECK (name NOT LIKE 'Zebra%') NOT VALID`),
    );
  });
  afterAll(async () => {
    await t?.close();
  });

  it('names the error and its code but holds neither the SQL parameters nor the user text', async () => {
    const agent = await t.as(demoEmail('admin'));
    const project = (await agent.get(`/api/projects/${await t.demoProjectId()}`)).body;
    const res = await agent
      .post('/api/projects')
      .send({ ...siteOf(project), name: SECRET, description: `${SECRET} description` });
    expect(res.status).toBe(500);
    expect(res.text).not.toContain(SECRET);
    const log = lines.join('');
    expect(log).toContain('unhandled error');
    expect(log).toContain('23514'); // check_violation (PostgreSQL Appendix A)
    expect(log).toContain('test_no_zebra');
    expect(log).not.toContain(SECRET);
    expect(log).not.toMatch(/insert into/i);
  });
});

describe('the request log at info', () => {
  let t: TestApp;
  const lines: string[] = [];
  beforeAll(async () => {
    // The server's own logger factory, at info (every request logged with its headers), into a buffer.
    const logger = createLogger(
      { env: 'production', logLevel: 'info' } as Config,
      new Writable({
        write(chunk, _enc, done) {
          lines.push(String(chunk));
          done();
        },
      }),
    );
    t = await createTestApp('pglite', { logger });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('never holds the session cookie, an Authorization header or a Set-Cookie', async () => {
    const signIn = await t
      .anonymous()
      .post('/api/auth/sign-in/email')
      .send({ email: demoEmail('architect'), password: DEMO_PASSWORD });
    const cookies = ([] as string[]).concat(signIn.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]!);
    expect(cookies.length).toBeGreaterThan(0);
    await t
      .anonymous()
      .get('/api/me')
      .set('cookie', cookies.join('; '))
      .set('authorization', 'Bearer sekrit-token');
    const log = lines.join('');
    expect(log).toContain('/api/me');
    for (const c of cookies) expect(log).not.toContain(c.split('=')[1]!);
    expect(log).not.toContain('sekrit-token');
  });
});
