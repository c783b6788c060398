// `npm run bench:api [-- --postgres]`: HTTP load benchmark. Starts the real server (child process, fresh
// PGlite folder — or the PostgreSQL server in DATABASE_URL/TEST_DATABASE_URL with --postgres) and a bare
// Express app with one empty route, then drives each with autocannon (50 connections, 20 s): reads, a
// calculation POST (its default answer, then with `?trace=true`) and a write, each bracketed by runs of the empty route before and after it, so that its
// ratio is to the mean of its two neighbours (the throughput of this shared 2-core machine drifts by ±30 %
// within minutes). Prints req/s, p50/p95/p99 latency (from every response's latency, as autocannon has no
// p95), errors, the ratio, and the load average of the machine.
// Targets: reads and calculations ≥ 50 % of the empty route, 0 errors, p99 < 50 ms (the traced calculation
// is measured for the record, with no target).
//
// Realistic client behaviour: the server runs with its production defaults (NODE_ENV=production, the default
// sign-in rate limit; the calculations' per-address limit is lifted, as every request here comes from one
// address; the log level is `warn`, so request lines are not written — errors still are). The
// signed-in scenarios sign in just before they start, as a browser holds the cookies the server last sent:
// autocannon replays one fixed Cookie header and would otherwise present a cookie cache (60 s) that expired
// minutes ago on every request. Keep BENCH_SECONDS below that minute.
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import autocannon from 'autocannon';

const DURATION = Number(process.env.BENCH_SECONDS ?? 20);
const CONNECTIONS = 50;
const TARGET_RATIO = 0.5;
const TARGET_P99_MS = 50;
const postgres = process.argv.includes('--postgres');
const children: ChildProcess[] = [];

function start(args: string[], env: Record<string, string>): ChildProcess {
  const child = spawn(process.execPath, args, { env: { ...process.env, ...env }, stdio: 'ignore' });
  children.push(child);
  return child;
}
async function waitFor(url: string) {
  for (let i = 0; i < 400; i++) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not come up`);
}

const percentile = (sorted: number[], p: number) =>
  sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]! : Number.NaN;
const load = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

const dataDir = mkdtempSync(path.join(tmpdir(), 'sw-bench-'));
const databaseUrl = postgres ? (process.env.DATABASE_URL ?? process.env.TEST_DATABASE_URL) : undefined;
if (postgres && !databaseUrl) throw new Error('--postgres needs DATABASE_URL or TEST_DATABASE_URL');
start(['--import', 'tsx', 'server/index.ts'], {
  PORT: '5401',
  PGLITE_DIR: dataDir,
  NODE_ENV: 'production',
  BETTER_AUTH_SECRET: 'bench-secret-bench-secret-bench-secret-0001',
  LOG_LEVEL: 'warn',
  CALC_RATE_LIMIT: String(1e9),
  ...(databaseUrl ? { DATABASE_URL: databaseUrl } : {}),
});
start(
  [
    '-e',
    "const e=require('express');const a=e();a.get('/empty',(q,s)=>s.json({}));a.listen(5402,'127.0.0.1')",
  ],
  {},
);
const base = 'http://127.0.0.1:5401';

/** Signs the demo architect in and returns the Cookie header a browser would send next. */
async function signIn(): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: 'http://localhost:5401' },
    body: JSON.stringify({ email: 'architect@skinwright.demo', password: 'skinwright-demo' }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

interface Scenario {
  name: string;
  /** `traced`: the calculation with its trace steps (`?trace=true`), measured beside it with no target (D-029). */
  kind: 'empty' | 'read' | 'calc' | 'traced' | 'write';
  opts: (cookie: string) => autocannon.Options;
}

try {
  await Promise.all([waitFor(`${base}/api/health`), waitFor('http://127.0.0.1:5402/empty')]);
  const firstCookie = await signIn();
  const projects = (await (
    await fetch(`${base}/api/projects`, { headers: { cookie: firstCookie } })
  ).json()) as {
    projects: { id: string }[];
  };
  const projectId = projects.projects[0]!.id;

  const empty: Scenario = {
    name: 'empty Express route',
    kind: 'empty',
    opts: () => ({ url: 'http://127.0.0.1:5402/empty' }),
  };
  const scenarios: Scenario[] = [
    {
      name: 'read: GET /api/projects/:id',
      kind: 'read',
      opts: (cookie) => ({ url: `${base}/api/projects/${projectId}`, headers: { cookie } }),
    },
    {
      name: 'read: GET /api/projects/:id/assemblies',
      kind: 'read',
      opts: (cookie) => ({ url: `${base}/api/projects/${projectId}/assemblies`, headers: { cookie } }),
    },
    {
      name: 'calculation: POST /api/v1/calc/thermal',
      kind: 'calc',
      opts: () => ({
        url: `${base}/api/v1/calc/thermal`,
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(metalPanelWall()),
      }),
    },
    {
      name: 'calculation + trace: ?trace=true',
      kind: 'traced',
      opts: () => ({
        url: `${base}/api/v1/calc/thermal?trace=true`,
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(metalPanelWall()),
      }),
    },
    {
      name: 'write: PUT /api/me/preferences',
      kind: 'write',
      opts: (cookie) => ({
        url: `${base}/api/me/preferences`,
        method: 'PUT',
        headers: { cookie, 'content-type': 'application/json' },
        body: '{"unitSystem":"SI"}',
      }),
    },
  ];
  console.log(
    `Skinwright API load — ${postgres ? 'PostgreSQL server' : 'PGlite'}, ${CONNECTIONS} connections, ${DURATION} s each, Node ${process.version}`,
  );
  console.log(`load average before: ${load()}`);
  console.log(
    `${'scenario'.padEnd(42)} ${'req/s'.padStart(7)} ${'p50'.padStart(8)} ${'p95'.padStart(8)} ${'p99'.padStart(8)} ${'of empty'.padStart(9)} ${'errors'.padStart(7)}`,
  );
  /** One autocannon run: req/s, p50/p95/p99 from every response's latency, and the errors. */
  async function run(s: Scenario) {
    const cookie = s.kind === 'read' || s.kind === 'write' ? await signIn() : '';
    const latencies: number[] = [];
    const r = await new Promise<autocannon.Result>((resolve, reject) => {
      const instance = autocannon(
        { ...s.opts(cookie), connections: CONNECTIONS, duration: DURATION },
        (err, result) => (err ? reject(err) : resolve(result)),
      );
      instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => {
        latencies.push(ms);
      });
    });
    latencies.sort((a, b) => a - b);
    const [p50, p95, p99] = [50, 95, 99].map((p) => percentile(latencies, p)) as [number, number, number];
    return { rps: r.requests.average, p50, p95, p99, errors: r.errors + r.non2xx + r.timeouts };
  }
  const ms = (v: number) => `${v.toFixed(1)} ms`.padStart(8);
  const row = (name: string, r: Awaited<ReturnType<typeof run>>, ratio: string) =>
    console.log(
      `${name.padEnd(42)} ${r.rps.toFixed(0).padStart(7)} ${ms(r.p50)} ${ms(r.p95)} ${ms(r.p99)} ${ratio.padStart(9)} ${String(r.errors).padStart(7)}`,
    );

  // The empty route brackets every scenario (before and after); a scenario's ratio is to their mean.
  let before = await run(empty);
  row(empty.name, before, '100 %');
  const missed: string[] = [];
  for (const s of scenarios) {
    const r = await run(s);
    const after = await run(empty);
    const ratio = r.rps / ((before.rps + after.rps) / 2);
    row(s.name, r, `${(ratio * 100).toFixed(0)} %`);
    row(empty.name, after, '100 %');
    before = after;
    if (r.errors > 0) missed.push(`${s.name}: ${r.errors} errors`);
    if (s.kind === 'read' || s.kind === 'calc') {
      if (ratio < TARGET_RATIO)
        missed.push(`${s.name}: ${(ratio * 100).toFixed(0)} % of the empty route (target ≥ 50 %)`);
      if (r.p99 >= TARGET_P99_MS) missed.push(`${s.name}: p99 ${r.p99.toFixed(1)} ms (target < 50 ms)`);
    }
  }
  console.log(`load average after: ${load()}`);
  console.log(
    missed.length
      ? `Targets missed:\n  ${missed.join('\n  ')}`
      : 'Targets met: reads and calculations ≥ 50 % of the empty route, p99 < 50 ms, 0 errors.',
  );
} finally {
  for (const c of children) c.kill('SIGTERM');
  await new Promise((r) => setTimeout(r, 500));
  rmSync(dataDir, { recursive: true, force: true });
}
