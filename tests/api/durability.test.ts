import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

/**
 * Crash durability on embedded PGlite: the real server runs as a child process; a burst of acknowledged
 * writes is cut by SIGKILL; after a restart on the same data folder every acknowledged write is there and
 * the database opens cleanly. (PGlite writes through to its data folder on every commit; SIGKILL loses the
 * process, not the operating system's file cache — power loss is a different matter, see README "Backups".)
 */
const dataDir = mkdtempSync(path.join(tmpdir(), 'sw-durability-'));
let child: ChildProcess | undefined;

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });

async function startChild(port: number): Promise<string> {
  child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, PGLITE_DIR: dataDir, PORT: String(port), NODE_ENV: 'test', LOG_LEVEL: 'silent' },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  child.stderr?.on('data', (d) => process.stderr.write(d));
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return base;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('server did not start');
}

async function signIn(base: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'architect@skinwright.demo', password: 'skinwright-demo' }),
  });
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

const project = (i: number) => ({
  name: `Durability ${i}`,
  climateZone: '5A',
  buildingHeightM: 10,
  planLengthM: 50,
  planWidthM: 20,
  indoorTempC: 20,
  indoorRh: 0.4,
  winterDesignTempC: -20,
  summerDesignTempC: 30,
});

afterAll(() => {
  child?.kill('SIGKILL');
  rmSync(dataDir, { recursive: true, force: true });
});

describe('durability of acknowledged writes on PGlite', () => {
  it('keeps every acknowledged write through a SIGKILL mid-burst', { timeout: 300_000 }, async () => {
    const port = await freePort();
    let base = await startChild(port);
    let cookie = await signIn(base);
    const acknowledged: string[] = [];
    let sent = 0;
    const worker = async () => {
      while (sent < 400) {
        const i = sent++;
        try {
          const res = await fetch(`${base}/api/projects`, {
            method: 'POST',
            headers: { 'content-type': 'application/json', cookie },
            body: JSON.stringify(project(i)),
          });
          if (res.status === 201) acknowledged.push(((await res.json()) as { id: string }).id);
        } catch {
          return; // the server is gone
        }
      }
    };
    let burstDone = false;
    const burst = Promise.all(Array.from({ length: 6 }, worker)).then(() => {
      burstDone = true;
    });
    while (acknowledged.length < 60 && !burstDone) await new Promise((r) => setTimeout(r, 5));
    expect(cookie, 'signed in').toContain('session_token');
    // Listen before killing: the exit can be reported while the burst's failed requests settle.
    const exited = new Promise((r) => child!.once('exit', r));
    child!.kill('SIGKILL');
    await burst;
    await exited;
    expect(acknowledged.length).toBeGreaterThanOrEqual(60);

    base = await startChild(port);
    cookie = await signIn(base);
    const health = await fetch(`${base}/api/health`);
    expect(health.status).toBe(200);
    const res = await fetch(`${base}/api/projects`, { headers: { cookie } });
    const ids = new Set(((await res.json()) as { projects: { id: string }[] }).projects.map((p) => p.id));
    const lost = acknowledged.filter((id) => !ids.has(id));
    expect(lost).toEqual([]);
    console.log(`durability: ${acknowledged.length} acknowledged writes before SIGKILL, ${lost.length} lost`);
  });
});
