import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes } from '../../server/routes';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { inspectionParams } from '../setup/inspections';

/**
 * The permission matrix, written out by hand and independent of the table in shared/auth: for every route
 * in the registry, who may call it. A route added to the registry without an entry here fails this test.
 * `public` = anyone; `user` = any signed-in user; `siteAdmin`; or the list of project roles allowed.
 */
const PROJECT_ROLES = [
  'owner',
  'architect',
  'envelope_consultant',
  'engineer',
  'subcontractor',
  'viewer',
] as const;
type Role = (typeof PROJECT_ROLES)[number];
const ALL: Role[] = [...PROJECT_ROLES];
/** The submitting side of submittals, and the reviewing side (reviewers must also be named on the submittal). */
const SUBMITTING: Role[] = ['owner', 'subcontractor'];
const REVIEWING: Role[] = ['architect', 'envelope_consultant', 'engineer'];
/** Field inspections: the inspectors (accept, reopen), and with the crew (fill in, photograph). */
const INSPECTING: Role[] = ['envelope_consultant', 'engineer'];
const INSPECTING_AND_CREW: Role[] = [...INSPECTING, 'subcontractor'];
/**
 * `firmMember` / `firmEditor` / `firmAdmin`: the firm's own data by firm role (any role; editor or admin;
 * admin); people outside the firm get 404.
 * `criteriaRead` / `criteriaWrite` / `criteriaAdmin`: the firm's code tables (see server/http/route.ts):
 * read = firm members and members of the firm's projects; write = the firm's editors and administrators (no
 * project role writes them); admin = firm administrators. Everyone else gets 404.
 */
type Expectation =
  | 'public'
  | 'user'
  | 'siteAdmin'
  | 'firmMember'
  | 'firmEditor'
  | 'firmAdmin'
  | 'criteriaRead'
  | 'criteriaWrite'
  | 'criteriaAdmin'
  | Role[];
const EXPECTED: Record<string, Expectation> = {
  'GET /health': 'public',
  'GET /me': 'user',
  'GET /session': 'public',
  'PUT /me/preferences': 'user',
  'POST /organisations': 'user',
  'GET /admin/mail': 'siteAdmin',
  'GET /admin/backup': 'siteAdmin',
  'GET /admin/organisations': 'siteAdmin',
  'PUT /admin/organisations/:orgId/verification': 'siteAdmin',
  'GET /projects': 'user',
  'POST /projects': 'user',
  'GET /projects/:projectId': ALL,
  'PUT /projects/:projectId': ['owner', 'architect'],
  'PUT /projects/:projectId/wind': ['owner', 'architect', 'engineer'],
  'PUT /projects/:projectId/climate': ['owner', 'architect', 'envelope_consultant'],
  'POST /projects/:projectId/archive': ['owner'],
  'POST /projects/:projectId/unarchive': ['owner'],
  'GET /projects/:projectId/audit': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'GET /projects/:projectId/members': ALL,
  'POST /projects/:projectId/invitations': ['owner', 'architect'],
  'PUT /projects/:projectId/members/:memberId': ['owner'],
  'DELETE /projects/:projectId/members/:memberId': ['owner'],
  'GET /invitations/:token': 'public',
  'POST /invitations/:token/accept': 'user',
  'GET /projects/:projectId/assemblies': ALL,
  'POST /projects/:projectId/assemblies': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'GET /assemblies/:assemblyId': ALL,
  'PUT /assemblies/:assemblyId': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'POST /projects/:projectId/duplicate': ['owner', 'architect'],
  // Read on the source; a copy into the same project (the default) needs assembly.write there.
  'POST /assemblies/:assemblyId/duplicate': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'GET /assemblies/:assemblyId/revisions': ALL,
  'GET /assemblies/:assemblyId/revisions/:revision': ALL,
  'GET /organisations/:orgId/materials': 'firmMember',
  'POST /organisations/:orgId/materials': 'firmEditor',
  'DELETE /organisations/:orgId/materials/:itemId': 'firmAdmin',
  'GET /organisations/:orgId/bridge-values': 'firmMember',
  'POST /organisations/:orgId/bridge-values': 'firmEditor',
  'DELETE /organisations/:orgId/bridge-values/:itemId': 'firmAdmin',
  'GET /organisations/:orgId/attachment-products': 'firmMember',
  'POST /organisations/:orgId/attachment-products': 'firmEditor',
  'POST /organisations/:orgId/attachment-products/:itemId/data-sheet': 'firmEditor',
  'GET /organisations/:orgId/attachment-products/:itemId/data-sheet': 'firmMember',
  'DELETE /organisations/:orgId/attachment-products/:itemId': 'firmAdmin',
  'GET /organisations/:orgId/sweep-costs': 'firmMember',
  'POST /organisations/:orgId/sweep-costs': 'firmEditor',
  'PUT /organisations/:orgId/sweep-costs/:itemId': 'firmEditor',
  'DELETE /organisations/:orgId/sweep-costs/:itemId': 'firmAdmin',
  'GET /assemblies/:assemblyId/sweeps': ALL,
  'POST /assemblies/:assemblyId/sweeps': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'GET /assemblies/:assemblyId/sweeps/compare': ALL,
  'GET /sweeps/:sweepId': ALL,
  'DELETE /sweeps/:sweepId': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'GET /organisations/:orgId/members': 'firmMember',
  'POST /organisations/:orgId/members': 'firmAdmin',
  'PUT /organisations/:orgId/members/:userId': 'firmAdmin',
  'DELETE /organisations/:orgId/members/:userId': 'firmAdmin',
  'POST /v1/calc/thermal': 'public',
  'POST /v1/calc/bridge': 'public',
  'POST /v1/calc/sweep': 'public',
  'POST /v1/calc/moisture': 'public',
  'POST /v1/calc/wind': 'public',
  'POST /v1/calc/joints': 'public',
  'POST /v1/calc/takeoff': 'public',
  'POST /v1/calc/takeoff.csv': 'public',
  'GET /reference/materials': 'public',
  'GET /organisations/:orgId/criteria-sets': 'criteriaRead',
  'POST /organisations/:orgId/criteria-sets': 'criteriaWrite',
  'GET /criteria-sets/:setId': 'criteriaRead',
  'PUT /criteria-sets/:setId': 'criteriaWrite',
  'DELETE /criteria-sets/:setId': 'criteriaAdmin',
  'PUT /criteria-sets/:setId/rows': 'criteriaWrite',
  'POST /criteria-sets/:setId/import': 'criteriaWrite',
  'GET /criteria-sets/:setId/export.csv': 'criteriaRead',
  'GET /criteria-sets/:setId/versions': 'criteriaRead',
  'GET /criteria-sets/:setId/diff': 'criteriaRead',
  'GET /projects/:projectId/criteria-sets': ALL,
  'POST /assemblies/:assemblyId/check-runs': [
    'owner',
    'architect',
    'envelope_consultant',
    'engineer',
    'subcontractor',
  ],
  'GET /projects/:projectId/check-runs': ALL,
  'GET /check-runs/:runId': ALL,
  'GET /check-runs/:runId/sheet.pdf': ALL,
  'GET /verify/:code': 'public',
  'GET /projects/:projectId/submittals': ALL,
  'POST /projects/:projectId/submittals': SUBMITTING,
  'GET /submittals/:submittalId': ALL,
  'PUT /submittals/:submittalId': SUBMITTING,
  'POST /submittals/:submittalId/sheets': SUBMITTING,
  'POST /submittals/:submittalId/files': SUBMITTING,
  'DELETE /submittals/:submittalId/items/:submittalItemId': SUBMITTING,
  'GET /submittals/:submittalId/items/:submittalItemId/file': ALL,
  'POST /submittals/:submittalId/submit': SUBMITTING,
  'POST /submittals/:submittalId/review': REVIEWING,
  'POST /submittals/:submittalId/decision': REVIEWING,
  'POST /submittals/:submittalId/comments': [
    'owner',
    'architect',
    'envelope_consultant',
    'engineer',
    'subcontractor',
  ],
  'GET /projects/:projectId/inspections': ALL,
  'POST /projects/:projectId/inspections': INSPECTING_AND_CREW,
  'GET /inspections/:inspectionId': ALL,
  'GET /inspections/:inspectionId/report.pdf': ALL,
  'PUT /inspection-items/:inspectionItemId': INSPECTING_AND_CREW,
  'POST /inspection-items/:inspectionItemId/photos': INSPECTING_AND_CREW,
  'GET /inspection-photos/:photoId': ALL,
  'POST /inspections/:inspectionId/close': ['owner', 'architect', 'envelope_consultant', 'engineer'],
  'PUT /deficiencies/:deficiencyId': INSPECTING,
  'POST /deficiencies/:deficiencyId/correct': ['subcontractor'],
  'POST /deficiencies/:deficiencyId/accept': INSPECTING,
  'POST /deficiencies/:deficiencyId/reopen': INSPECTING,
  'GET /organisations/:orgId/inspection-template': 'firmMember',
  'PUT /organisations/:orgId/inspection-template': 'firmEditor',
  'POST /submittals/:submittalId/inspection-reports': SUBMITTING,
};

/**
 * The firm whose libraries the matrix exercises (Larchmere: the owner's account is its administrator, the
 * architect an editor, the viewer a reader).
 */
const FIRM_ADMINS: string[] = ['owner'];
const FIRM_EDITORS: string[] = ['owner', 'architect'];
const FIRM_MEMBERS: string[] = ['owner', 'architect', 'viewer'];
/** Only the firm's editors and administrators write its code tables (a project role never does). */
const CRITERIA_WRITERS: string[] = FIRM_EDITORS;

/** Demo account per project role; `owner` is also the site administrator. */
const emailOf: Record<Role | 'outsider', string> = {
  owner: demoEmail('admin'),
  architect: demoEmail('architect'),
  envelope_consultant: demoEmail('consultant'),
  engineer: demoEmail('engineer'),
  subcontractor: demoEmail('subcontractor'),
  viewer: demoEmail('viewer'),
  outsider: demoEmail('outsider'),
};

/** Bodies for routes that document no example. */
const BODIES: Record<string, (params: Record<string, string>) => unknown> = {
  'PUT /me/preferences': () => ({ unitSystem: 'SI' }),
  'POST /organisations': () => ({ name: `Firm ${Math.random().toString(36).slice(2)}` }),
  'PUT /projects/:projectId/members/:memberId': () => ({ role: 'viewer' }),
  'POST /assemblies/:assemblyId/check-runs': (p) => ({ criteriaSetId: p.setId }),
  'POST /submittals/:submittalId/sheets': (p) => ({ checkRunId: p.runId }),
  'POST /assemblies/:assemblyId/sweeps': (p) => ({ ...sweepBody, criteriaSetId: p.setId }),
  'PUT /organisations/:orgId/sweep-costs/:itemId': () => ({ ...costBody, version: 1 }),
};
const sweepBody = {
  name: 'Insulation',
  parameters: [{ kind: 'insulationThickness', layer: 3, list: [0.05, 0.1] }],
};
const costBody = { kind: 'clip', name: 'Clip', cost: 5, currency: 'EUR' };

/**
 * Routes whose allowed callers each need a fresh object (a delete by one allowed caller leaves the next
 * nothing to delete): made anew before each call.
 */
const FRESH: Record<string, (params: Record<string, string>, t: TestApp) => Promise<void>> = {
  'DELETE /sweeps/:sweepId': async (p, t) => {
    p.sweepId = (
      await (
        await t.as(emailOf.owner)
      )
        .post(`/api/assemblies/${p.assemblyId}/sweeps`)
        .send({ ...sweepBody, criteriaSetId: p.setId })
    ).body.id;
  },
};

const key = (r: { method: string; path: string }) => `${r.method.toUpperCase()} ${r.path}`;

describe('every registered route has an entry in the permission matrix', () => {
  it('has no route without an expectation, and no stale expectation', () => {
    expect(apiRoutes.map(key).sort()).toEqual(Object.keys(EXPECTED).sort());
  });
});

describe.each(testDatabases())('permission matrix on %s', (kind) => {
  let t: TestApp;
  const params: Record<string, string> = {};
  beforeAll(async () => {
    t = await createTestApp(kind);
    params.projectId = await t.demoProjectId();
    // A spare member whom the member routes may change and remove without disturbing the callers.
    const owner = await t.as(emailOf.owner);
    await owner
      .post(`/api/projects/${params.projectId}/invitations`)
      .send({ email: 'spare@example.com', role: 'viewer' });
    const token = (await t.mail())
      .find((m) => m.to.includes('spare@example.com'))!
      .text.match(/\/invite\/([\w-]+)/)![1]!;
    const spare = await t.signUp(request.agent(t.app), {
      name: 'Spare',
      email: 'spare@example.com',
      password: 'spare-password-1',
    });
    await spare.post(`/api/invitations/${token}/accept`);
    const members = (await owner.get(`/api/projects/${params.projectId}/members`)).body.members as {
      id: string;
      email: string;
    }[];
    params.memberId = members.find((m) => m.email === 'spare@example.com')!.id;
    await owner
      .post(`/api/projects/${params.projectId}/invitations`)
      .send({ email: 'pending@example.com', role: 'viewer' });
    params.token = (await t.mail())
      .find((m) => m.to.includes('pending@example.com'))!
      .text.match(/\/invite\/([\w-]+)/)![1]!;
    const example = (k: string) => apiRoutes.find((r) => key(r) === k)!.example as object;
    params.assemblyId = (
      await owner
        .post(`/api/projects/${params.projectId}/assemblies`)
        .send(example('POST /projects/:projectId/assemblies'))
    ).body.id;
    params.revision = '1';
    params.orgId = (await owner.get('/api/me')).body.organisations[0].id;
    // The spare account joins the firm too, so that the firm member routes may change and remove it.
    params.userId = (
      await owner
        .post(`/api/organisations/${params.orgId}/members`)
        .send({ email: 'spare@example.com', role: 'reader' })
    ).body.userId;
    params.materialId = (
      await owner
        .post(`/api/organisations/${params.orgId}/materials`)
        .send(example('POST /organisations/:orgId/materials'))
    ).body.id;
    params.setId = (
      await owner
        .post(`/api/organisations/${params.orgId}/criteria-sets`)
        .send(example('POST /organisations/:orgId/criteria-sets'))
    ).body.id;
    params.runId = (
      await owner
        .post(`/api/assemblies/${params.assemblyId}/check-runs`)
        .send({ criteriaSetId: params.setId })
    ).body.id;
    params.sweepId = (
      await owner
        .post(`/api/assemblies/${params.assemblyId}/sweeps`)
        .send({ ...sweepBody, criteriaSetId: params.setId })
    ).body.id;
    params.compareQuery = `?from=${params.sweepId}&to=${params.sweepId}`;
    params.costId = (
      await owner.post(`/api/organisations/${params.orgId}/sweep-costs`).send(costBody)
    ).body.id;
    params.bridgeId = (
      await owner
        .post(`/api/organisations/${params.orgId}/bridge-values`)
        .send(example('POST /organisations/:orgId/bridge-values'))
    ).body.id;
    params.productId = (
      await owner
        .post(`/api/organisations/${params.orgId}/attachment-products`)
        .send(example('POST /organisations/:orgId/attachment-products'))
    ).body.id;
    await owner
      .post(`/api/organisations/${params.orgId}/attachment-products/${params.productId}/data-sheet`)
      .attach('files', Buffer.from('%PDF-1.4\n%%EOF\n'), 'data-sheet.pdf');
    // A submittal naming every reviewing role (only named reviewers review), with a sheet and a file.
    const people = (await owner.get(`/api/projects/${params.projectId}/members`)).body.members as {
      userId: string;
      role: string;
    }[];
    params.submittalId = (
      await owner.post(`/api/projects/${params.projectId}/submittals`).send({
        ...example('POST /projects/:projectId/submittals'),
        reviewerIds: people.filter((m) => (REVIEWING as string[]).includes(m.role)).map((m) => m.userId),
      })
    ).body.id;
    // Attaching the run's sheet issues its verification code.
    const attached = await owner
      .post(`/api/submittals/${params.submittalId}/sheets`)
      .send({ checkRunId: params.runId });
    params.code = attached.body.items[0].sheet.verificationCode;
    params.submittalItemId = (
      await owner
        .post(`/api/submittals/${params.submittalId}/files`)
        .attach('files', Buffer.from('%PDF-1.4\n%%EOF\n'), 'specification.pdf')
    ).body.items[0].id;
    Object.assign(params, await inspectionParams(t, params.projectId));
  });
  afterAll(async () => {
    await t?.close();
  });

  // Destructive routes last, so that earlier rows still find the spare member.
  const ordered = [...apiRoutes].sort(
    (a, b) => Number(a.method === 'delete') - Number(b.method === 'delete'),
  );
  it.each(ordered.map((r) => [key(r), r] as const))('%s', async (_name, route) => {
    const expected = EXPECTED[key(route)]!;
    const itemId = route.path.includes('/materials/')
      ? params.materialId
      : route.path.includes('/attachment-products/')
        ? params.productId
        : route.path.includes('/sweep-costs/')
          ? params.costId
          : params.bridgeId;
    const query = route.path.endsWith('/sweeps/compare') ? params.compareQuery : '';
    const pathNow = () =>
      `/api${route.path.replace(/:(\w+)/g, (_m, p: string) => (p === 'itemId' ? itemId : params[p])!)}${query}`;
    const body = BODIES[key(route)]?.(params) ?? route.example ?? {};
    const call = async (agent: { [m: string]: (p: string) => request.Test } | null) => {
      await FRESH[key(route)]?.(params, t);
      const req = (agent ?? (t.anonymous() as unknown as { [m: string]: (p: string) => request.Test }))[
        route.method
      ]!(pathNow());
      const res =
        route.method === 'get' || route.method === 'delete' ? await req : await req.send(body as object);
      return res.status;
    };
    const anon = await call(null);
    if (expected === 'public') expect(anon, 'signed out').toBeLessThan(400);
    else expect(anon, 'signed out').toBe(401);

    const callers = [...PROJECT_ROLES, 'outsider'] as const;
    // Allowed callers last: a successful destructive call must not change what the others see.
    const isAllowed = (c: (typeof callers)[number]) => {
      if (expected === 'public' || expected === 'user') return true;
      if (expected === 'siteAdmin') return c === 'owner';
      if (expected === 'firmMember') return FIRM_MEMBERS.includes(c);
      if (expected === 'firmEditor') return FIRM_EDITORS.includes(c);
      if (expected === 'firmAdmin') return FIRM_ADMINS.includes(c);
      if (expected === 'criteriaRead') return c !== 'outsider';
      if (expected === 'criteriaWrite') return CRITERIA_WRITERS.includes(c);
      if (expected === 'criteriaAdmin') return FIRM_ADMINS.includes(c);
      return c !== 'outsider' && expected.includes(c);
    };
    const hiddenFrom = (c: (typeof callers)[number]) =>
      ((Array.isArray(expected) || expected.startsWith('criteria')) && c === 'outsider') ||
      (!Array.isArray(expected) && expected.startsWith('firm') && !FIRM_MEMBERS.includes(c));
    for (const caller of [...callers].sort((a, b) => Number(isAllowed(a)) - Number(isAllowed(b)))) {
      const status = await call((await t.as(emailOf[caller])) as never);
      if (isAllowed(caller)) {
        expect(status, `${caller} is allowed`).toBeLessThan(500);
        expect(
          [401, 403, 404].includes(status) && !(route.path.includes('/accept') && status === 403),
          `${caller} got ${status}`,
        ).toBe(false);
      } else if (hiddenFrom(caller)) {
        expect(status, 'a non-member must not learn that the project or firm exists').toBe(404);
      } else {
        expect(status, `${caller} is refused`).toBe(403);
      }
    }
  });
});
