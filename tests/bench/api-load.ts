// `npm run bench:api [-- --postgres]`: HTTP load benchmark. Starts the real server (child process, fresh
// PGlite folder — or the PostgreSQL server in TEST_DATABASE_URL/DATABASE_URL with --postgres) and a bare
// Express app with one empty route, then drives each with autocannon (50 connections, 20 s): a read, a
// calculation POST, a write, and the empty route. Prints req/s, p50/p95/p99 latency and the ratio to the
// empty route. Targets: reads and calculations ≥ 50 % of the empty route, 0 errors, p99 < 50 ms.
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { metalPanelWall } from '@shared/calc/thermal/fixtures';
import autocannon from 'autocannon';

const DURATION = Number(process.env.BENCH_SECONDS ?? 20);
const CONNECTIONS = 50;
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

const dataDir = mkdtempSync(path.join(tmpdir(), 'sw-bench-'));
const databaseUrl = postgres ? (process.env.DATABASE_URL ?? process.env.TEST_DATABASE_URL) : undefined;
if (postgres && !databaseUrl) throw new Error('--postgres needs DATABASE_URL or TEST_DATABASE_URL');
start(['--import', 'tsx', 'server/index.ts'], {
  PORT: '5401',
  PGLITE_DIR: dataDir,
  NODE_ENV: 'production',
  BETTER_AUTH_SECRET: 'bench-secret-bench-secret-bench-secret-0001',
  LOG_LEVEL: 'silent',
  AUTH_RATE_LIMIT: '100000',
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
try {
  await Promise.all([waitFor(`${base}/api/health`), waitFor('http://127.0.0.1:5402/empty')]);
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: 'http://localhost:5401' },
    body: JSON.stringify({ email: 'architect@skinwright.demo', password: 'skinwright-demo' }),
  });
  if (!signIn.ok) throw new Error(`sign-in failed: ${signIn.status} ${await signIn.text()}`);
  const cookie = signIn.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const projects = (await (await fetch(`${base}/api/projects`, { headers: { cookie } })).json()) as {
    projects: { id: string }[];
  };
  const projectId = projects.projects[0]!.id;

  const scenarios: { name: string; opts: autocannon.Options }[] = [
    { name: 'empty Express route', opts: { url: 'http://127.0.0.1:5402/empty' } },
    {
      name: 'read: GET /api/projects/:id',
      opts: { url: `${base}/api/projects/${projectId}`, headers: { cookie } },
    },
    {
      name: 'calculation: POST /api/v1/calc/thermal',
      opts: {
        url: `${base}/api/v1/calc/thermal`,
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(metalPanelWall()),
      },
    },
    {
      name: 'write: PUT /api/me/preferences',
      opts: {
        url: `${base}/api/me/preferences`,
        method: 'PUT',
        headers: { cookie, 'content-type': 'application/json' },
        body: '{"unitSystem":"SI"}',
      },
    },
  ];
  console.log(
    `Skinwright API load — ${postgres ? 'PostgreSQL server' : 'PGlite'}, ${CONNECTIONS} connections, ${DURATION} s each, Node ${process.version}`,
  );
  let emptyRps = 0;
  for (const s of scenarios) {
    const r = await autocannon({ ...s.opts, connections: CONNECTIONS, duration: DURATION });
    const rps = r.requests.average;
    if (s.name.startsWith('empty')) emptyRps = rps;
    const errors = r.errors + r.non2xx + r.timeouts;
    console.log(
      `${s.name.padEnd(42)} ${rps.toFixed(0).padStart(7)} req/s  p50 ${r.latency.p50} ms  p95 ${(r.latency as unknown as Record<string, number>).p97_5 ?? '-'}* ms  p99 ${r.latency.p99} ms  ${((rps / emptyRps) * 100).toFixed(0).padStart(4)} % of empty  errors ${errors}`,
    );
  }
  console.log('* autocannon reports p97.5 in place of p95.');
} finally {
  for (const c of children) c.kill('SIGTERM');
  await new Promise((r) => setTimeout(r, 500));
  rmSync(dataDir, { recursive: true, force: true });
}
