import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../../server/app';
import { type Config, loadConfig, parseTrustProxy } from '../../server/config';
import { type Database, openDatabase } from '../../server/db/client';
import { session } from '../../server/db/schema';
import type { OutgoingMail } from '../../server/mail/mailer';
import { createTestApp, DEMO_PASSWORD, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * Sessions, sign-in and sign-up as an attacker would try them: a copied cookie pair after sign-out or a
 * password change, guessing passwords, a forged X-Forwarded-For, and asking sign-up whether an address is
 * registered.
 */
const ORIGIN = 'http://localhost:5180';
/** How long another process may take to see a change: the arrival of PostgreSQL's write notice. */
const NOTICE = { timeout: 2000 };
type App = ReturnType<typeof createApp>['app'];
type Answer = request.Response;

/** The cookies a browser holds after signing in: the session token and the signed cookie cache. */
function cookiePair(res: Answer): string {
  const set = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  return set
    .map((c) => c.split(';')[0]!)
    .filter((c) => /session_(token|data)=./.test(c))
    .join('; ');
}
const signInAnswer = (app: App, email: string, password: string, headers: Record<string, string> = {}) =>
  request(app).post('/api/auth/sign-in/email').set(headers).send({ email, password });
async function signIn(app: App, email: string, password = DEMO_PASSWORD) {
  const res = await signInAnswer(app, email, password);
  expect(res.status).toBe(200);
  return cookiePair(res);
}
const me = (app: App, cookie: string) => request(app).get('/api/me').set('cookie', cookie);
/** What a client can tell apart: status, body and cookies. */
const seen = (res: Answer) => ({
  status: res.status,
  body: res.body,
  cookies: res.headers['set-cookie'] ?? [],
});
const WRONG_PASSWORD = {
  status: 401,
  body: { code: 'INVALID_EMAIL_OR_PASSWORD', message: 'Invalid email or password' },
  cookies: [],
};

describe.each(testDatabases())('sessions, sign-in and sign-up on %s', (kind) => {
  let t: TestApp;
  /** A second server process on the same database (its own pool and caches on PostgreSQL). */
  let other: { app: App; database: Database };
  /** E-mails sent by the apps made here with changed settings. */
  const sent: OutgoingMail[] = [];
  const withSettings = (changes: Partial<Config>) =>
    createApp({
      database: t.database,
      config: { ...t.config, ...changes },
      mailer: { send: async (m) => void sent.push(m) },
    }).app;

  beforeAll(async () => {
    t = await createTestApp(kind);
    const database = t.databaseUrl
      ? await openDatabase({ databaseUrl: t.databaseUrl, pgliteDir: 'memory://' })
      : t.database;
    other = {
      app: createApp({ database, config: t.config, mailer: { send: async () => {} } }).app,
      database,
    };
  });
  afterAll(async () => {
    if (other && other.database !== t.database) await other.database.close();
    await t?.close();
  });

  it('a signed-in read costs no database statement once its session and project are known', async () => {
    const pair = await signIn(t.app, demoEmail('engineer'));
    const projectId = await t.demoProjectId();
    const read = () => request(t.app).get(`/api/projects/${projectId}`).set('cookie', pair);
    for (const _ of [1, 2]) expect((await read()).status).toBe(200);
    // Every statement of either driver passes through its client's `query` (PGlite) or the pool's (pg).
    const client = (t.database.db as unknown as { $client: { query: (...args: unknown[]) => unknown } })
      .$client;
    const query = vi.spyOn(client, 'query');
    try {
      for (const _ of [1, 2, 3, 4, 5]) expect((await read()).status).toBe(200);
      expect(query).not.toHaveBeenCalled();
      // (The spy does see statements: the profile is read from the database on each request.)
      expect((await me(t.app, pair)).status).toBe(200);
      expect(query).toHaveBeenCalled();
    } finally {
      query.mockRestore();
    }
  });

  it('a copied cookie pair stops working the moment its session signs out, in every process', async () => {
    const pair = await signIn(t.app, demoEmail('viewer'));
    // Both processes have answered from the signed cookie cache (and remembered it).
    for (const app of [t.app, other.app])
      for (const _ of [1, 2]) expect((await me(app, pair)).status).toBe(200);
    const out = await request(t.app).post('/api/auth/sign-out').set('cookie', pair).set('origin', ORIGIN);
    expect(out.status).toBe(200);
    expect((await me(t.app, pair)).status).toBe(401);
    expect((await request(t.app).get('/api/auth/get-session').set('cookie', pair)).body).toBeNull();
    await expect.poll(async () => (await me(other.app, pair)).status, NOTICE).toBe(401);
    const rename = await request(other.app)
      .post('/api/auth/update-user')
      .set('cookie', pair)
      .set('origin', ORIGIN)
      .send({ name: 'Taken Over' });
    expect(rename.status).toBe(401);
  });

  it('a password change ends every other session at once, whatever the client asked, and keeps its own', async () => {
    const email = demoEmail('consultant');
    const mine = await signIn(t.app, email);
    const theirs = await signIn(t.app, email);
    for (const app of [t.app, other.app]) expect((await me(app, theirs)).status).toBe(200);
    const changed = await request(t.app)
      .post('/api/auth/change-password')
      .set('cookie', mine)
      .set('origin', ORIGIN)
      .send({
        currentPassword: DEMO_PASSWORD,
        newPassword: 'a-changed-password-1',
        revokeOtherSessions: false,
      });
    expect(changed.status).toBe(200);
    expect((await me(t.app, cookiePair(changed))).status).toBe(200);
    expect((await me(t.app, theirs)).status).toBe(401);
    await expect.poll(async () => (await me(other.app, theirs)).status, NOTICE).toBe(401);
    expect((await signInAnswer(t.app, email, DEMO_PASSWORD)).status).toBe(401);
    await signIn(t.app, email, 'a-changed-password-1');
  });

  it('limits password changes per address, like sign-in', async () => {
    const app = withSettings({ authRateLimit: 2 });
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++)
      statuses.push(
        (
          await request(app)
            .post('/api/auth/change-password')
            .set('origin', ORIGIN)
            .send({ currentPassword: 'a-guessed-password', newPassword: 'a-new-password-1' })
        ).status,
      );
    expect(statuses).toEqual([401, 401, 429]);
  });

  it('locks an address after repeated wrong passwords, answered exactly as a wrong password, registered or not', async () => {
    const app = withSettings({ accountLock: { failures: 3, durationMs: 15 * 60_000 } });
    const registered = demoEmail('architect');
    const unknown = 'nobody@example.com';
    const answers: ReturnType<typeof seen>[] = [];
    for (const email of [registered, unknown]) {
      for (let i = 0; i < 3; i++) answers.push(seen(await signInAnswer(app, email, 'a-guessed-password')));
      // Locked now: the right password is refused in the same words.
      answers.push(seen(await signInAnswer(app, email, DEMO_PASSWORD)));
    }
    for (const answer of answers) expect(answer).toEqual(WRONG_PASSWORD);
    // The lock is stored: every process sees it, whatever the spelling of the address.
    expect(seen(await signInAnswer(t.app, registered.toUpperCase(), DEMO_PASSWORD))).toEqual(WRONG_PASSWORD);
    expect(seen(await signInAnswer(other.app, registered, DEMO_PASSWORD))).toEqual(WRONG_PASSWORD);
    // Other addresses sign in as before.
    await signIn(app, demoEmail('engineer'));
  });

  it('a password reset lifts the lock', async () => {
    const app = withSettings({ accountLock: { failures: 2, durationMs: 15 * 60_000 } });
    const email = demoEmail('subcontractor');
    for (let i = 0; i < 2; i++) await signInAnswer(app, email, 'a-guessed-password');
    expect(seen(await signInAnswer(app, email, DEMO_PASSWORD))).toEqual(WRONG_PASSWORD);
    const ask = await request(app)
      .post('/api/auth/request-password-reset')
      .send({ email, redirectTo: '/reset-password' });
    expect(ask.status).toBe(200);
    const mail = await vi.waitFor(() => {
      const found = sent.find((m) => m.to === email && m.subject.includes('Reset'));
      if (!found) throw new Error('no reset e-mail yet');
      return found;
    });
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).pathname.split('/').pop()!;
    const reset = await request(app)
      .post('/api/auth/reset-password')
      .send({ newPassword: 'a-reset-password-1', token });
    expect(reset.status).toBe(200);
    await signIn(app, email, 'a-reset-password-1');
  });

  it('the lock lifts by itself once its time has passed', async () => {
    const app = withSettings({ accountLock: { failures: 2, durationMs: 15 * 60_000 } });
    const email = demoEmail('outsider');
    for (let i = 0; i < 2; i++) await signInAnswer(app, email, 'a-guessed-password');
    expect(seen(await signInAnswer(app, email, DEMO_PASSWORD))).toEqual(WRONG_PASSWORD);
    // The lock's times are the server's clock: a quarter of an hour later (only the clock is moved).
    vi.useFakeTimers({ toFake: ['Date'] });
    try {
      vi.setSystemTime(Date.now() + 15 * 60_000 + 1000);
      await signIn(app, email);
    } finally {
      vi.useRealTimers();
    }
  });

  it('believes X-Forwarded-For only from the proxies TRUST_PROXY names', async () => {
    const statuses = async (trustProxy: Config['trustProxy']) => {
      const app = withSettings({ authRateLimit: 2, trustProxy });
      const out: number[] = [];
      for (const address of ['198.51.100.1', '198.51.100.2', '198.51.100.3'])
        out.push(
          (
            await signInAnswer(app, 'proxied@example.com', 'a-guessed-password', {
              'x-forwarded-for': address,
            })
          ).status,
        );
      return out;
    };
    // Unset: every request counts against the socket's address, whatever it claims.
    expect(await statuses(false)).toEqual([401, 401, 429]);
    expect(await statuses('loopback')).toEqual([401, 401, 401]);

    // The address better-auth records with a session follows the same setting.
    const recorded = async (trustProxy: Config['trustProxy']) => {
      const res = await signInAnswer(withSettings({ trustProxy }), demoEmail('engineer'), DEMO_PASSWORD, {
        'x-forwarded-for': '203.0.113.7',
      });
      expect(res.status).toBe(200);
      const [row] = await t.database.db
        .select({ ip: session.ipAddress })
        .from(session)
        .where(eq(session.token, res.body.token));
      return row?.ip;
    };
    expect(await recorded(false)).toBe('127.0.0.1');
    expect(await recorded('loopback')).toBe('203.0.113.7');
  });

  it('reads TRUST_PROXY as Express does, and refuses a value that would believe any client', () => {
    expect(loadConfig({}).trustProxy).toBe(false);
    expect(loadConfig({ TRUST_PROXY: '1' }).trustProxy).toBe(1);
    const list = 'loopback, 10.0.0.0/8, fd00::/8, 192.168.1.0/255.255.255.0';
    expect(parseTrustProxy(list)).toBe(list);
    expect(() => parseTrustProxy('true')).toThrow(/number of proxies/);
    expect(() => parseTrustProxy('10.0.0.0/33')).toThrow(/"10.0.0.0\/33" is not/);
  });

  it('answers sign-up alike for a new and a registered address; only the new address can finish', async () => {
    const body = { name: 'Fresh Person', password: 'a-fresh-password-1' };
    const fresh = await request(t.app)
      .post('/api/auth/sign-up/email')
      .send({ ...body, email: 'fresh@example.com' });
    const taken = await request(t.app)
      .post('/api/auth/sign-up/email')
      .send({ ...body, email: demoEmail('admin') });
    expect(seen(fresh)).toEqual({ status: 200, body: { status: 'check_email' }, cookies: [] });
    expect(seen(taken)).toEqual(seen(fresh));
    expect(Object.keys(taken.headers).sort()).toEqual(Object.keys(fresh.headers).sort());
    // The registered account is as it was; its owner hears that someone tried.
    await signIn(t.app, demoEmail('admin'));
    expect((await t.mailTo(demoEmail('admin'), 'Someone tried to create')).text).toContain(
      '/forgot-password',
    );

    // Until the address is confirmed, the new account's right password is refused as a wrong one.
    expect(seen(await signInAnswer(t.app, 'fresh@example.com', body.password))).toEqual(WRONG_PASSWORD);
    const confirm = await t.mailTo('fresh@example.com', 'Confirm your address');
    const link = new URL(confirm.text.match(/https?:\/\/\S+/)![0]);
    const agent = request.agent(t.app);
    expect((await agent.get(link.pathname + link.search)).status).toBe(302);
    expect((await agent.get('/api/me')).body.email).toBe('fresh@example.com');
    await signIn(t.app, 'fresh@example.com', body.password);
  });
});
