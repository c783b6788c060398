import { type ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';

/** A free TCP port on loopback. */
export const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });

/**
 * The real server (`server/index.ts`) as a child process on a free port, with `env` added to the test
 * environment; resolves once `/api/health` answers. `stop()` kills it.
 */
export async function startServerProcess(env: Record<string, string> = {}) {
  const port = await freePort();
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      PGLITE_DIR: 'memory://',
      NODE_ENV: 'test',
      LOG_LEVEL: 'silent',
      ...env,
      PORT: String(port),
    },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  child.stderr?.on('data', (d) => process.stderr.write(d));
  const base = `http://127.0.0.1:${port}`;
  const stop = () => child.kill('SIGKILL');
  // A busy machine may take a minute or two to migrate, seed and listen.
  for (const deadline = Date.now() + 150_000; Date.now() < deadline; ) {
    if (child.exitCode !== null) throw new Error(`the server exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return { base, child, stop };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  stop();
  throw new Error('server did not start');
}
