import { createServer, request as httpRequest, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { demoJointSchedule } from '@shared/calc/joints/examples';
import { demoElevation } from '@shared/calc/takeoff/examples';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_JSON_DEPTH } from '../../server/http/guards';
import { apiRoutes } from '../../server/routes';
import { CALC_WORK_LIMITS } from '../../server/routes/calc';
import { createTestApp, type TestApp } from '../setup/app';
import { startServerProcess } from '../setup/server-process';

/**
 * Limits found by a security review: a body nested thousands of levels deep overflowed the stack of the body
 * guard (on the lean path that ended the process), the sign-in routes read bodies of any size, and the public
 * calculations had no per-address rate limit and no cap on the work of one request.
 */

/** A spelling of the JSON content type the lean path leaves to Express (so a request takes the Express path). */
const VIA_EXPRESS = 'application/json;charset=UTF-8';
const nested = (levels: number) => `${'['.repeat(levels)}${']'.repeat(levels)}`;
/** ≈ 7 kB: deep enough to overflow a recursive walk. */
const DEEP = nested(3500);

/** Plausible path parameters: a UUID for ids, a revision number, a verification code. */
const fillPath = (path: string) =>
  path.replace(/:(\w+)/g, (_, name: string) =>
    name === 'revision' ? '1' : name === 'code' ? 'ABCDE-FGHIJ' : '00000000-0000-4000-8000-000000000000',
  );

interface Sent {
  status: number;
  headers: IncomingHttpHeaders;
  text: string;
}

/** Any method with a body (fetch refuses a GET with one), optionally from another loopback address. */
function send(
  base: string,
  method: string,
  path: string,
  body: string | Buffer,
  type = 'application/json',
  localAddress?: string,
) {
  return new Promise<Sent>((resolve, reject) => {
    const headers = { 'content-type': type, 'content-length': String(Buffer.byteLength(body)) };
    const req = httpRequest(`${base}${path}`, { method, headers, localAddress }, (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (d: string) => {
        text += d;
      });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
    });
    req.on('error', reject);
    req.end(body);
  });
}

describe('a body nested too deeply', () => {
  let server: Awaited<ReturnType<typeof startServerProcess>>;
  beforeAll(async () => {
    server = await startServerProcess();
  }, 180_000);
  afterAll(() => server?.stop());

  it('is refused with 400 invalid_json on every route, by both paths, and the process stays up', {
    timeout: 120_000,
  }, async () => {
    const sends = apiRoutes.flatMap((r) => {
      const path = `/api${fillPath(r.path)}`;
      return r.stateless
        ? [[r.method, path, 'application/json'] as const, [r.method, path, VIA_EXPRESS] as const]
        : [[r.method, path, 'application/json'] as const];
    });
    for (const [method, path, type] of sends) {
      const res = await send(server.base, method.toUpperCase(), path, DEEP, type);
      expect(res.status, `${method} ${path} (${type}): ${res.text.slice(0, 200)}`).toBe(400);
      expect(JSON.parse(res.text).error).toEqual({
        code: 'invalid_json',
        message: `the body nests arrays and objects more than ${MAX_JSON_DEPTH} levels deep`,
      });
    }
    // better-auth reads its own bodies: whatever it answers, never a 500.
    for (const path of ['/api/auth/sign-in/email', '/api/auth/sign-up/email', '/api/auth/sign-out']) {
      const res = await send(server.base, 'POST', path, DEEP);
      expect(res.status, `${path}: ${res.text.slice(0, 200)}`).toBeLessThan(500);
    }
    expect(server.child.exitCode).toBeNull();
    expect((await fetch(`${server.base}/api/health`)).status).toBe(200);
  });

  it.each([
    ['the lean path', 'application/json'],
    ['Express', VIA_EXPRESS],
  ])(
    `takes ${MAX_JSON_DEPTH} levels, refuses ${MAX_JSON_DEPTH + 1}, and names a NUL or lone surrogate beside deep nesting (%s)`,
    async (_path, type) => {
      const thermal = '/api/v1/calc/thermal';
      const traced = `${thermal}?trace=true`;
      const post = async (body: string | Buffer) => {
        const res = await send(server.base, 'POST', thermal, body, type);
        return { status: res.status, error: JSON.parse(res.text).error };
      };
      // Within the limit the schema speaks (an array is not a wall); one level more is refused before it.
      expect(await post(nested(MAX_JSON_DEPTH))).toMatchObject({
        status: 400,
        error: { code: 'validation_failed' },
      });
      expect(await post(nested(MAX_JSON_DEPTH + 1))).toMatchObject({
        status: 400,
        error: { code: 'invalid_json' },
      });
      // Objects count as arrays do, and brackets inside strings do not count.
      const objects = `${'{"a":'.repeat(MAX_JSON_DEPTH)}"[[[["${'}'.repeat(MAX_JSON_DEPTH)}`;
      expect((await post(objects)).error.code).toBe('validation_failed');
      expect((await post(`{"a":${objects}}`)).error.code).toBe('invalid_json');
      expect(await post(`{"a":${nested(60)},"b":{"c":"x\\u0000"}}`)).toEqual({
        status: 400,
        error: {
          code: 'validation_failed',
          message: 'the request is not valid',
          fields: { 'b.c': 'text must not contain NUL characters' },
        },
      });
      expect((await post(`{"a":${nested(60)},"b":["\\ud800"]}`)).error.fields).toEqual({
        'b.0': 'text must not contain a lone UTF-16 surrogate (half of a character)',
      });
      // Only an escape brings either: a raw NUL is not JSON, an encoded lone surrogate (ED A0 80) is decoded
      // as replacement characters, and an escaped backslash before "u0000" is ordinary text (the layer's name
      // comes back in the trace's labels).
      const wall = (name: Buffer) => {
        const [before, after] = JSON.stringify(metalPanelWall()).split('Steel face sheet');
        return Buffer.concat([Buffer.from(before!), name, Buffer.from(after!)]);
      };
      expect((await post(wall(Buffer.from([0x61, 0x00])))).error.code).toBe('invalid_json');
      const decoded = await send(server.base, 'POST', traced, wall(Buffer.from([0xed, 0xa0, 0x80])), type);
      expect(decoded.status).toBe(200);
      expect(decoded.text).toContain('\ufffd');
      const backslash = await send(server.base, 'POST', traced, wall(Buffer.from('a\\\\u0000')), type);
      expect(backslash.status).toBe(200);
      expect(backslash.text).toContain('a\\\\u0000');
    },
  );
});

describe('limits of one app', () => {
  let t: TestApp;
  let limited: TestApp;
  let server: Server;
  let base: string;
  beforeAll(async () => {
    t = await createTestApp('pglite');
    limited = await createTestApp('pglite', { calcRateLimit: 3 });
    server = createServer(t.app);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  }, 120_000);
  afterAll(async () => {
    await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    await t?.close();
    await limited?.close();
  });

  describe('auth routes take at most 64 KiB', () => {
    const authRoutes = [
      '/api/auth/sign-in/email',
      '/api/auth/sign-up/email',
      '/api/auth/sign-out',
      '/api/auth/request-password-reset',
      '/api/auth/reset-password',
      '/api/auth/update-user',
    ];

    it.each(authRoutes)('%s: 413 by Content-Length before the body is read', async (path) => {
      const res = await new Promise<Sent>((resolve, reject) => {
        const req = httpRequest(`${base}${path}`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', 'content-length': String(50 * 1024 * 1024) },
        });
        req.on('response', (r) => {
          let text = '';
          r.on('data', (d) => {
            text += d;
          });
          r.on('end', () => {
            req.destroy();
            resolve({ status: r.statusCode ?? 0, headers: r.headers, text });
          });
        });
        req.on('error', reject);
        req.write('{"email":"'); // a start, never the 50 MB announced
      });
      expect(res.status).toBe(413);
      expect(JSON.parse(res.text).error.code).toBe('too_large');
    });

    it('refuses a chunked body as soon as it passes the limit, without reading the rest', async () => {
      const chunk = Buffer.alloc(64 * 1024, 'a');
      const total = 50 * 1024 * 1024;
      const { status, written, text } = await new Promise<{ status: number; written: number; text: string }>(
        (resolve, reject) => {
          let written = 0;
          let answered = false;
          const req = httpRequest(`${base}/api/auth/sign-out`, {
            method: 'POST',
            headers: { 'content-type': 'application/json' }, // no length: chunked
          });
          req.on('response', (r) => {
            answered = true;
            let text = '';
            r.on('data', (d) => {
              text += d;
            });
            r.on('end', () => {
              req.destroy();
              resolve({ status: r.statusCode ?? 0, written, text });
            });
          });
          req.on('error', (err) => {
            if (!answered) reject(err);
          });
          const pump = () => {
            while (!answered && written < total) {
              written += chunk.length;
              if (!req.write(chunk)) return void req.once('drain', pump);
            }
            if (!answered) req.end();
          };
          pump();
        },
      );
      expect(status).toBe(413);
      expect(JSON.parse(text).error.code).toBe('too_large');
      // The answer came while the client was still sending (what it sent is in socket buffers, not read).
      expect(written).toBeLessThan(16 * 1024 * 1024);
    });

    it('still signs in, and a body under the limit reaches better-auth', async () => {
      await t.as('architect@skinwright.demo');
      const big = await t
        .anonymous()
        .post('/api/auth/sign-in/email')
        .send({ email: 'nobody@skinwright.demo', password: 'x'.repeat(60 * 1024) });
      expect(big.status).not.toBe(413);
      expect(big.status).toBeLessThan(500);
    });
  });

  describe('public calculations', () => {
    const thermal = JSON.stringify(metalPanelWall());
    const post = (app: TestApp, path: string, body: string, headers: Record<string, string> = {}) =>
      app
        .anonymous()
        .post(path)
        .set({ 'content-type': 'application/json', ...headers })
        .send(body);

    it('are limited per address and minute by both paths, with Retry-After', async () => {
      const server = createServer(limited.app);
      await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
      const at = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
      const calc = (path: string, body: string, type = 'application/json', from = '127.0.0.1') =>
        send(at, 'POST', path, body, type, from);
      try {
        expect((await calc('/api/v1/calc/thermal', thermal)).status).toBe(200);
        expect((await calc('/api/v1/calc/thermal', thermal, VIA_EXPRESS)).status).toBe(200);
        expect((await calc('/api/v1/calc/wind', '{}')).status).toBe(400);
        for (const type of ['application/json', VIA_EXPRESS]) {
          const res = await calc('/api/v1/calc/thermal', thermal, type);
          expect(res.status).toBe(429);
          expect(JSON.parse(res.text)).toEqual({
            error: {
              code: 'rate_limited',
              message: 'too many calculations from this address; wait a minute',
            },
          });
          expect(Number(res.headers['retry-after'])).toBeGreaterThanOrEqual(1);
          expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
        }
        // Another address has a count of its own, by both paths.
        expect((await calc('/api/v1/calc/thermal', thermal, 'application/json', '127.0.0.2')).status).toBe(
          200,
        );
        expect((await calc('/api/v1/calc/thermal', thermal, VIA_EXPRESS, '127.0.0.2')).status).toBe(200);
        // Other routes are not counted.
        expect((await fetch(`${at}/api/health`)).status).toBe(200);
      } finally {
        await new Promise<void>((resolve) => server.close(() => resolve()));
      }
    });

    const joints = (n: number) =>
      JSON.stringify({ joints: Array.from({ length: n }, (_, i) => demoJointSchedule()[i % 3]) });
    const openings = (walls: number, perWall: number) => {
      const elevation = demoElevation();
      const wall = {
        name: 'Long wall',
        length: 1000,
        height: 50,
        openings: Array.from({ length: perWall }, () => ({ width: 1.2, height: 1.5, count: 1 })),
      };
      return JSON.stringify({ ...elevation, walls: Array.from({ length: walls }, () => wall) });
    };

    it('refuse more work than one request may do, naming the field and the limit, by both paths', async () => {
      const { joints: j, openings: o } = CALC_WORK_LIMITS;
      expect(j.max).toBe(300);
      expect(o.max).toBe(2000);
      for (const headers of [{}, { 'content-type': VIA_EXPRESS }] as Record<string, string>[]) {
        expect((await post(t, '/api/v1/calc/joints', joints(300), headers)).status).toBe(200);
        const tooMany = await post(t, '/api/v1/calc/joints', joints(301), headers);
        expect(tooMany.status).toBe(413);
        expect(tooMany.body.error).toEqual({
          code: 'too_much_work',
          message: 'the request asks for more work than one request may do',
          fields: { joints: 'at most 300 joints (got 301); split it into several requests' },
        });
        expect((await post(t, '/api/v1/calc/takeoff', openings(10, 200), headers)).status).toBe(200);
        const tooManyOpenings = await post(t, '/api/v1/calc/takeoff.csv', openings(11, 200), headers);
        expect(tooManyOpenings.status).toBe(413);
        expect(tooManyOpenings.body.error.fields).toEqual({
          walls: 'at most 2000 openings in all walls together (got 2200); split it into several requests',
        });
      }
    });
  });
});
