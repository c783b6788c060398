import { adminOrganisationListSchema, adminOrganisationSchema } from '@shared/schemas/organisations';
import { sheetVerificationSchema } from '@shared/schemas/sheets';
import { verificationCode } from '@shared/sheets/verification';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import demoAssembly from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { demoScenario } from '../../server/db/seed';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { readPdf } from '../setup/pdf';

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
/** The PDF's text on one line (the sheet wraps long values). */
const flatText = async (pdf: Buffer) => (await readPdf(pdf)).text.replace(/\s+/g, ' ');

const GENUINE_FIRM = 'Ridgeline Cladding Co. (demo)';
const VERIFIED = 'verified by Skinwright’s site administrator';
const NOT_VERIFIED = 'issuer not verified by Skinwright’s site administrator';

/**
 * The verification page must not vouch for a copy. Firm names are not unique: a new account makes a firm
 * of the demo subcontractor's name, a project of the demo project's name and number, and issues a sheet.
 * Its verification (and its PDF) must differ from the genuine sheet's where a copier cannot follow: the
 * firm's unique handle, and whether a site administrator has verified the firm.
 */
describe.each(testDatabases())('who issued a sheet, on %s', (kind) => {
  let t: TestApp;
  let copier: ReturnType<typeof request.agent>;
  let copierFirmId: string;
  const genuine = { runId: '', code: '', hash: '' };
  const copy = { runId: '', code: '', hash: '' };

  const verify = (code: string) => t.anonymous().get(`/api/verify/${code}`);
  const pdfOf = (agent: ReturnType<typeof request.agent>, runId: string) =>
    agent.get(`/api/check-runs/${runId}/sheet.pdf?units=SI`).buffer(true).parse(binary);

  beforeAll(async () => {
    t = await createTestApp(kind);
    // The genuine sheet: the demo subcontractor (Ridgeline, verified in the demo) runs the demo assembly.
    const sub = await t.as(demoEmail('subcontractor'));
    const projectId = await t.demoProjectId();
    const assemblyId = (await sub.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
    const sets = (await sub.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets as {
      id: string;
      name: string;
    }[];
    const setId = sets.find((s) => s.name.startsWith('Illustrative example'))!.id;
    const run = (await sub.post(`/api/assemblies/${assemblyId}/check-runs`).send({ criteriaSetId: setId }))
      .body;
    Object.assign(genuine, { runId: run.id, hash: run.hash, code: verificationCode(run.hash) });
    expect((await pdfOf(sub, run.id)).status).toBe(200);

    // The copy: a new account, a firm and a project of the same names, the same assembly.
    copier = request.agent(t.app);
    await t.signUp(copier, {
      name: 'Rafael Ducharme',
      email: 'rafael@ridgeline-copy.example',
      password: 'copy-password-1',
    });
    const me = await copier.post('/api/organisations').send({ name: GENUINE_FIRM });
    expect(me.status).toBe(201);
    copierFirmId = me.body.organisations[0].id;
    const { owner: _o, members: _m, ...demoProject } = demoScenario.projects[0]!;
    const project = await copier.post('/api/projects').send(demoProject);
    expect(project.status).toBe(201);
    const assembly = await copier
      .post(`/api/projects/${project.body.id}/assemblies`)
      .send(demoAssembly.assembly);
    expect(assembly.status).toBe(201);
    const table = await copier
      .post(`/api/organisations/${copierFirmId}/criteria-sets`)
      .send({ name: 'Illustrative example' });
    expect(table.status).toBe(201);
    const copyRun = (
      await copier
        .post(`/api/assemblies/${assembly.body.id}/check-runs`)
        .send({ criteriaSetId: table.body.id })
    ).body;
    Object.assign(copy, { runId: copyRun.id, hash: copyRun.hash, code: verificationCode(copyRun.hash) });
    expect((await pdfOf(copier, copyRun.id)).status).toBe(200);
  }, 180_000);
  afterAll(async () => {
    await t?.close();
  });

  it('names the same firm and project for both, but only the genuine issuer is verified, by its handle', async () => {
    const real = sheetVerificationSchema.parse((await verify(genuine.code)).body);
    const fake = sheetVerificationSchema.parse((await verify(copy.code)).body);
    // What a copier can reproduce…
    expect(fake.issuer.name).toBe(real.issuer.name);
    expect(fake.project).toEqual(real.project);
    // …and what they cannot: the firm's unique handle, and its verification by the site administrator.
    expect(real.issuer.handle).toBe('@demo-ridgeline');
    expect(fake.issuer.handle).toMatch(/^@ridgeline-cladding-co-demo-[0-9a-z]{8}$/);
    expect(real.issuer.verifiedAt).not.toBeNull();
    expect(fake.issuer.verifiedAt).toBeNull();
    // Who ran the checks: the name and the (confirmed) e-mail's domain, not the address.
    expect(real.ranBy).toEqual({ name: 'Rafael Ducharme', emailDomain: 'skinwright.demo' });
    expect(fake.ranBy).toEqual({ name: 'Rafael Ducharme', emailDomain: 'ridgeline-copy.example' });
    expect(JSON.stringify(fake)).not.toContain('rafael@');
    // The whole SHA-256 of the run, and the code derived from it.
    expect(real.hash).toBe(genuine.hash);
    expect(real.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(verificationCode(real.hash)).toBe(real.code);
  });

  it('prints the handle and the issuer’s standing on the sheet', async () => {
    const real = await flatText((await pdfOf(await t.as(demoEmail('viewer')), genuine.runId)).body);
    expect(real).toContain(`${GENUINE_FIRM} · @demo-ridgeline — ${VERIFIED} on `);
    expect(real).not.toContain(NOT_VERIFIED);
    // The whole hash (the sheet may break it across lines).
    expect(real.replace(/ /g, '')).toContain(genuine.hash);
    const fake = await flatText((await pdfOf(copier, copy.runId)).body);
    expect(fake).toMatch(
      new RegExp(
        `${GENUINE_FIRM.replace(/[.()]/g, '\\$&')} · @ridgeline-cladding-co-demo-[0-9a-z]{8} — ${NOT_VERIFIED}`,
      ),
    );
    expect(fake).not.toContain(`— ${VERIFIED} on`);
  });

  it('lets a site administrator verify a firm and withdraw it; the sheet follows, the same standing the same bytes', async () => {
    const admin = await t.as(demoEmail('admin'));
    const list = adminOrganisationListSchema.parse((await admin.get('/api/admin/organisations')).body);
    // Firms of one name stand side by side, the verified one and the copy.
    const same = list.organisations.filter((o) => o.name === GENUINE_FIRM);
    expect(same.map((o) => o.handle).sort()).toEqual([
      '@demo-ridgeline',
      expect.stringMatching(/^@ridgeline-/),
    ]);
    expect(Math.abs(list.organisations.indexOf(same[0]!) - list.organisations.indexOf(same[1]!))).toBe(1);
    expect(same.find((o) => o.handle === '@demo-ridgeline')).toMatchObject({
      verifiedBy: 'Ada Quarrie',
      members: 1,
    });

    const before = (await pdfOf(copier, copy.runId)).body as Buffer;
    const verified = await admin
      .put(`/api/admin/organisations/${copierFirmId}/verification`)
      .send({ verified: true });
    expect(verified.status).toBe(200);
    const firm = adminOrganisationSchema.parse(verified.body);
    expect(firm).toMatchObject({ id: copierFirmId, verifiedBy: 'Ada Quarrie' });
    expect(firm.verifiedAt).not.toBeNull();
    // Verifying again keeps who verified it and when.
    const again = await admin
      .put(`/api/admin/organisations/${copierFirmId}/verification`)
      .send({ verified: true });
    expect(again.body.verifiedAt).toBe(firm.verifiedAt);

    expect(sheetVerificationSchema.parse((await verify(copy.code)).body).issuer.verifiedAt).toBe(
      firm.verifiedAt,
    );
    const whileVerified = (await pdfOf(copier, copy.runId)).body as Buffer;
    expect(Buffer.compare(whileVerified, before)).not.toBe(0);
    expect(await flatText(whileVerified)).toContain(`— ${VERIFIED} on`);

    const withdrawn = await admin
      .put(`/api/admin/organisations/${copierFirmId}/verification`)
      .send({ verified: false });
    expect(withdrawn.status).toBe(200);
    expect(withdrawn.body).toMatchObject({ verifiedAt: null, verifiedBy: null });
    expect(sheetVerificationSchema.parse((await verify(copy.code)).body).issuer.verifiedAt).toBeNull();
    expect(Buffer.compare((await pdfOf(copier, copy.runId)).body as Buffer, before)).toBe(0);

    // Unknown and malformed firms; only site administrators.
    const unknown = '00000000-0000-4000-8000-000000000000';
    expect(
      (await admin.put(`/api/admin/organisations/${unknown}/verification`).send({ verified: true })).status,
    ).toBe(404);
    expect((await admin.put('/api/admin/organisations/x/verification').send({ verified: true })).status).toBe(
      400,
    );
    expect(
      (await admin.put(`/api/admin/organisations/${copierFirmId}/verification`).send({ verified: 'yes' }))
        .status,
    ).toBe(400);
    expect(
      (await copier.put(`/api/admin/organisations/${copierFirmId}/verification`).send({ verified: true }))
        .status,
    ).toBe(403);
    expect((await copier.get('/api/admin/organisations')).status).toBe(403);
  });

  it('gives every firm a handle of its own, even under the same name, and shows it to its members', async () => {
    const handles = new Set<string>();
    // Different names (the same person may not hold two of one name) that make the same words.
    for (const name of [
      'Façade Studio',
      'Facade Studio',
      'FACADE  studio!',
      'facade-studio',
      'Façade Studio Ø',
      'ØØ',
    ]) {
      expect((await copier.post('/api/organisations').send({ name })).status, name).toBe(201);
    }
    const me = (await copier.get('/api/me')).body as {
      organisations: { handle: string; verified: boolean }[];
    };
    for (const o of me.organisations) {
      expect(o.handle).toMatch(/^@[a-z0-9]+(?:-[a-z0-9]+)*$/);
      expect(o.verified).toBe(false);
      handles.add(o.handle);
    }
    expect(handles.size).toBe(me.organisations.length);
    expect(me.organisations.filter((o) => o.handle.startsWith('@facade-studio-'))).toHaveLength(5);
    expect(me.organisations.filter((o) => o.handle.startsWith('@firm-'))).toHaveLength(1);
    expect(
      (await (await t.as(demoEmail('subcontractor'))).get('/api/me')).body.organisations[0],
    ).toMatchObject({
      handle: '@demo-ridgeline',
      verified: true,
    });
  });
});

describe('guessing verification codes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp('pglite', { verifyRateLimit: 3 });
  });
  afterAll(async () => {
    await t?.close();
  });

  it('is limited per address: 429 with Retry-After once the minute’s checks are spent', async () => {
    const check = () => t.anonymous().get('/api/verify/AAAAAAAAAA');
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await check()).status);
    expect(statuses).toEqual([404, 404, 404, 429]);
    const limited = await check();
    expect(limited.status).toBe(429);
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(limited.headers['retry-after'])).toBeLessThanOrEqual(60);
    expect(limited.body.error.code).toBe('rate_limited');
    // Other routes are not held up.
    expect((await t.anonymous().get('/api/health')).status).toBe(200);
  });
});
