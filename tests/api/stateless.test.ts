import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mountRoutes } from '../../server/http/route';
import { statelessPath } from '../../server/http/stateless';
import { apiRoutes } from '../../server/routes';
import type { Services } from '../../server/services';
import { createTestApp, type TestApp } from '../setup/app';

const statelessRoutes = apiRoutes.filter((r) => r.stateless);
/** A spelling of the JSON content type the lean path leaves to Express (so the same request takes both paths). */
const VIA_EXPRESS = 'application/json;charset=UTF-8';
/** Headers that differ between any two responses, or that Express adds to a JSON body of its own making. */
const VOLATILE = new Set(['date', 'etag', 'content-length', 'connection', 'keep-alive']);
const stable = (headers: Record<string, string>) =>
  Object.fromEntries(Object.entries(headers).filter(([k]) => !VOLATILE.has(k)));

describe('lean path for stateless routes', () => {
  it('covers the calculations, and only public POST routes without path parameters may be stateless', () => {
    expect(statelessRoutes.map((r) => r.path).sort()).toEqual([
      '/v1/calc/bridge',
      '/v1/calc/joints',
      '/v1/calc/moisture',
      '/v1/calc/sweep',
      '/v1/calc/takeoff',
      '/v1/calc/takeoff.csv',
      '/v1/calc/thermal',
      '/v1/calc/wind',
    ]);
    const services = {} as Services;
    const mount = (route: (typeof apiRoutes)[number]) => () =>
      mountRoutes({ use: () => undefined } as never, [route], services);
    expect(mount({ ...statelessRoutes[0]!, access: { kind: 'user' } })).toThrow(/stateless/);
    expect(mount({ ...statelessRoutes[0]!, method: 'get' })).toThrow(/stateless/);
    expect(mount({ ...statelessRoutes[0]!, path: '/v1/calc/:kind' })).toThrow(/stateless/);
  });

  describe('takes only plain requests', () => {
    let server: Server;
    let url: string;
    beforeAll(async () => {
      const lean = statelessPath(apiRoutes, {
        base: '/api',
        services: {} as Services,
        trusted: [],
        limitBytes: 1024,
        middleware: [],
        logger: pino({ level: 'silent' }),
      });
      // 299 marks a request the lean path left alone (Express would serve it).
      server = createServer((req, res) => {
        if (lean(req, res)) return;
        res.statusCode = 299;
        res.end();
      });
      await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
      url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    });
    afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

    const post = (path: string, headers: Record<string, string>, body: string | undefined = '{}') =>
      fetch(`${url}${path}`, { method: 'POST', headers, body }).then((r) => r.status);

    it('answers a JSON POST of known length to a stateless route', async () => {
      expect(await post('/api/v1/calc/thermal', { 'content-type': 'application/json' })).toBe(400);
      expect(await post('/api/v1/calc/joints', { 'content-type': 'application/json; charset=utf-8' })).toBe(
        400,
      );
    });

    it('leaves every other request to Express untouched', async () => {
      const json = { 'content-type': 'application/json' };
      expect(await post('/api/v1/calc/thermal/', json)).toBe(299); // another spelling of the path
      expect(await post('/api/V1/calc/thermal', json)).toBe(299);
      expect(await post('/api/projects', json)).toBe(299); // not stateless
      expect(await post('/api/v1/calc/thermal', { 'content-type': 'text/plain' })).toBe(299);
      expect(await post('/api/v1/calc/thermal', { 'content-type': VIA_EXPRESS })).toBe(299);
      expect(await post('/api/v1/calc/thermal', { ...json, 'content-encoding': 'gzip' })).toBe(299);
      expect(await post('/api/v1/calc/thermal', json, 'x'.repeat(1025))).toBe(299); // over the limit
      const chunked = new ReadableStream({
        start(c) {
          c.enqueue(new TextEncoder().encode('{}'));
          c.close();
        },
      });
      const res = await fetch(`${url}/api/v1/calc/thermal`, {
        method: 'POST',
        headers: json,
        body: chunked,
        duplex: 'half',
      } as RequestInit);
      expect(res.status).toBe(299); // no length: chunked
      expect((await fetch(`${url}/api/v1/calc/thermal`)).status).toBe(299); // GET
    });
  });

  describe('answers exactly as Express would', () => {
    let t: TestApp;
    beforeAll(async () => {
      t = await createTestApp('pglite');
    });
    afterAll(async () => {
      await t?.close();
    });

    /** Sends the same request by both paths and expects the same status, headers and body. */
    async function same(path: string, body: string, extra: Record<string, string> = {}) {
      const send = (type: string) =>
        t
          .anonymous()
          .post(path)
          .set({ ...extra, 'content-type': type })
          .send(body);
      const [lean, express] = [await send('application/json'), await send(VIA_EXPRESS)];
      expect(lean.status, `${path} ${body.slice(0, 40)}`).toBe(express.status);
      expect(stable(lean.headers)).toEqual(stable(express.headers));
      expect(lean.text).toBe(express.text);
      return lean;
    }

    it.each(statelessRoutes.map((r) => [r.path, r] as const))(
      '%s: example, refusals and errors',
      async (path, route) => {
        const api = `/api${path}`;
        expect((await same(api, JSON.stringify(route.example))).status).toBe(200);
        expect((await same(api, '')).status).toBe(400); // empty body = {} → the schema names the fields
        expect((await same(api, '{"layers": [')).status).toBe(400); // not JSON
        expect((await same(api, '"\\u0000"')).body.error.fields).toEqual({
          '(body)': 'text must not contain NUL characters',
        });
        expect((await same(api, '[1e400]')).status).toBe(400);
        expect(
          (await same(api, JSON.stringify(route.example), { origin: 'https://elsewhere.example' })).status,
        ).toBe(403);
        expect((await same(api, '\ufeff{}')).status).toBe(400);
      },
    );

    it('answers the trace steps on request by both paths, and refuses an unknown trace flag', async () => {
      const thermal = JSON.stringify(statelessRoutes.find((r) => r.path === '/v1/calc/thermal')!.example);
      expect((await same('/api/v1/calc/thermal', thermal)).body.trace).toBeUndefined();
      expect((await same('/api/v1/calc/thermal?trace=true', thermal)).body.trace.length).toBeGreaterThan(5);
      expect(
        (await same('/api/v1/calc/thermal?trace=maybe', thermal)).body.error.fields['query.trace'],
      ).toBeDefined();
    });

    it('gives the takeoff as a CSV download by both paths, and a 422 for impossible input', async () => {
      const takeoff = statelessRoutes.find((r) => r.path === '/v1/calc/takeoff.csv')!;
      const csv = await same('/api/v1/calc/takeoff.csv', JSON.stringify(takeoff.example));
      expect(csv.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(csv.headers['content-disposition']).toBe('attachment; filename="takeoff.csv"');
      expect(
        (await same('/api/v1/calc/takeoff.csv?units=cubits', JSON.stringify(takeoff.example))).status,
      ).toBe(400);
    });

    it('refuses a body over 1 MiB with 413 (Express serves it)', async () => {
      const res = await request(t.app)
        .post('/api/v1/calc/thermal')
        .set('content-type', 'application/json')
        .send(`{"x":"${'a'.repeat(1024 * 1024)}"}`);
      expect(res.status).toBe(413);
      expect(res.body.error.code).toBe('too_large');
    });
  });
});
