import { can, PERMISSIONS } from '@shared/auth/permissions';
import { demoComputedGirt } from '@shared/calc/bridge/examples';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { apiErrorSchema } from '@shared/schemas/common';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AnyRoute } from '../../server/http/route';
import { apiRoutes } from '../../server/routes';
import { createTestApp, demoEmail, type TestApp } from '../setup/app';
import { inspectionParams } from '../setup/inspections';

/**
 * Fuzzing every route that takes a body (calculations and forms), signed in as the demo owner (or, for a
 * field-inspection step the owner may not take, the first role that may): arbitrary
 * JSON, and the documented example with one leaf replaced by something hostile. Never a 5xx; a success
 * body always matches the documented response schema (so no NaN/Infinity smuggled in as null); every
 * error has the documented shape. The case count is printed at the end.
 */
const CASES_PER_ROUTE = Number(process.env.FUZZ_CASES_PER_ROUTE ?? 150);

const deep = (depth: number): unknown => (depth === 0 ? 1 : { a: deep(depth - 1) });
const HOSTILE: unknown[] = [
  1e308,
  -1e308,
  0,
  -0,
  -1,
  5e-324,
  Number.MAX_SAFE_INTEGER + 2,
  2 ** 31, // one past a database integer
  -(2 ** 31) - 1,
  Number.MAX_SAFE_INTEGER,
  '1e308',
  'NaN',
  'Infinity',
  '',
  'x'.repeat(200_000),
  'x'.repeat(201), // one past a name
  'x'.repeat(5001), // one past free text
  '\ud800', // lone surrogates: half of a character
  'ok \udfff',
  '\ud83d\ude00\ud83d', // a whole emoji, then half of one
  '../../etc/passwd',
  '\u0000\u001f',
  '<script>alert(1)</script>',
  null,
  true,
  [],
  {},
  [[[[]]]],
  deep(1000),
];

function leafPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (Array.isArray(value)) return [prefix, ...value.flatMap((v, i) => leafPaths(v, [...prefix, i]))];
  if (value && typeof value === 'object')
    return [prefix, ...Object.entries(value).flatMap(([k, v]) => leafPaths(v, [...prefix, k]))];
  return [prefix];
}

function replaceAt(value: unknown, path: (string | number)[], replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<
    string | number,
    unknown
  >;
  copy[head!] = replaceAt(copy[head!], rest, replacement);
  return copy;
}

let totalCases = 0;

/** The demo owner, or for a project action the owner may not take (field inspections) the first role that may. */
function fuzzAccount(route: AnyRoute): string {
  if (route.access.kind !== 'project' || can('owner', route.access.action)) return 'admin';
  const role = PERMISSIONS[route.access.action][0]!;
  return role === 'envelope_consultant' ? 'consultant' : role;
}

describe('fuzzing every route with a body', () => {
  let t: TestApp;
  const params: Record<string, string> = {};
  beforeAll(async () => {
    t = await createTestApp('pglite');
    const owner = await t.as(demoEmail('admin'));
    params.projectId = await t.demoProjectId();
    params.orgId = (await owner.get('/api/me')).body.organisations[0].id;
    // A member of the owner's firm whose firm role the fuzzed role changes may change.
    params.userId = (await (await t.as(demoEmail('viewer'))).get('/api/me')).body.id;
    params.assemblyId = (
      await owner.get(`/api/projects/${params.projectId}/assemblies`)
    ).body.assemblies[0].id;
    params.setId = (
      await owner.post(`/api/organisations/${params.orgId}/criteria-sets`).send({ name: 'Fuzzed code table' })
    ).body.id;
    params.runId = (
      await owner
        .post(`/api/assemblies/${params.assemblyId}/check-runs`)
        .send({ criteriaSetId: params.setId })
    ).body.id;
    params.submittalId = (
      await owner
        .post(`/api/projects/${params.projectId}/submittals`)
        .send({ title: 'Fuzzed submittal', specSection: '07 42 13', specTitle: 'Metal Wall Panels' })
    ).body.id;
    Object.assign(params, await inspectionParams(t, params.projectId));
    // A firm cost entry for the cost routes' :itemId (the other library routes' entries are not of this kind: 404).
    params.itemId = (
      await owner
        .post(`/api/organisations/${params.orgId}/sweep-costs`)
        .send({ kind: 'clip', name: 'Fuzzed clip', cost: 5, currency: 'EUR' })
    ).body.id;
  });
  /** Examples that need this database's ids to reach past the lookups. */
  const EXAMPLES: Record<string, (example: object) => object> = {
    'POST /assemblies/:assemblyId/sweeps': (example) => ({ ...example, criteriaSetId: params.setId }),
    // A computed library value: its detail, solve and map are fuzzed too.
    'POST /organisations/:orgId/bridge-values': (example) => ({
      ...example,
      kind: 'linear',
      computed: demoComputedGirt(ENGINE_VERSION),
    }),
  };
  afterAll(async () => {
    console.log(`fuzz: ${totalCases} HTTP cases run`);
    await t?.close();
  });

  const bodyRoutes = apiRoutes.filter(
    (r) => r.body && !r.path.includes(':token') && !r.path.includes(':memberId'),
  );
  it.each(bodyRoutes.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r] as const))(
    '%s',
    async (_n, route: AnyRoute) => {
      const agent = await t.as(demoEmail(fuzzAccount(route)));
      const path = `/api${route.path.replace(/:(\w+)/g, (_m, p: string) => params[p] ?? 'x')}`;
      const success = Object.entries(route.responses).find(([s]) => Number(s) < 300)?.[1]?.schema;
      const example =
        EXAMPLES[`${route.method.toUpperCase()} ${route.path}`]?.(route.example as object) ??
        route.example ??
        {};
      const paths = leafPaths(example);
      const payload = fc.oneof(
        { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) },
        {
          weight: 3,
          arbitrary: fc
            .tuple(fc.nat({ max: paths.length - 1 }), fc.constantFrom(...HOSTILE))
            .map(([i, hostile]) => replaceAt(example, paths[i]!, hostile)),
        },
      );
      await fc.assert(
        fc.asyncProperty(payload, async (body) => {
          totalCases++;
          const res = await (agent as unknown as Record<string, (p: string) => import('supertest').Test>)[
            route.method
          ]!(path)
            .set('content-type', 'application/json')
            .send(JSON.stringify(body));
          expect(res.status, res.text.slice(0, 300)).toBeLessThan(500);
          if (res.status < 300 && success && res.headers['content-type']?.includes('json'))
            expect(success.safeParse(res.body).success, 'success body matches its schema').toBe(true);
          if (res.status >= 400)
            expect(apiErrorSchema.safeParse(res.body).success, res.text.slice(0, 300)).toBe(true);
        }),
        { numRuns: CASES_PER_ROUTE },
      );
    },
  );

  // Routes whose path carries what a stranger types: a verification code, a firm's id.
  it('GET /verify/:code and PUT /admin/organisations/:orgId/verification with hostile path parameters', async () => {
    const admin = await t.as(demoEmail('admin'));
    // A URL cannot carry a lone surrogate (encodeURIComponent refuses it), so those stay in the bodies.
    const typed = HOSTILE.filter(
      (h): h is string => typeof h === 'string' && h.length < 1000 && !/\p{Cs}/u.test(h),
    );
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.string(), fc.uuid(), fc.constantFrom(...typed)), async (raw) => {
        totalCases += 2;
        const segment = encodeURIComponent(raw);
        for (const res of [
          await t.anonymous().get(`/api/verify/${segment}`),
          await admin.put(`/api/admin/organisations/${segment}/verification`).send({ verified: false }),
        ]) {
          expect(res.status, res.text.slice(0, 300)).toBeLessThan(500);
          if (res.status >= 400)
            expect(apiErrorSchema.safeParse(res.body).success, res.text.slice(0, 300)).toBe(true);
        }
      }),
      { numRuns: CASES_PER_ROUTE },
    );
  });
});
