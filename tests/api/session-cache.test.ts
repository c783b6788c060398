import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, DEMO_PASSWORD, demoEmail, type TestApp, testDatabases } from '../setup/app';

/** The session cookie cache (better-auth `session_data`, 60 s) as the API routes use it. */
describe.each(testDatabases())('session cookie cache on %s', (kind) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp(kind);
  });
  afterAll(async () => {
    await t?.close();
  });

  async function signIn() {
    const res = await request(t.app)
      .post('/api/auth/sign-in/email')
      .send({ email: demoEmail('viewer'), password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const cookies = (res.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]!);
    return {
      token: cookies.find((c) => c.includes('session_token'))!,
      data: cookies.find((c) => c.includes('session_data'))!,
    };
  }

  it('sends a fresh cookie cache with an API response when the request had none (or an expired one)', async () => {
    const { token } = await signIn();
    const res = await request(t.app).get('/api/me').set('cookie', token);
    expect(res.status).toBe(200);
    const set = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
    expect(set.some((c) => c.includes('session_data='))).toBe(true);
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('answers from the signed cookie cache, and refuses it once altered', async () => {
    const { token, data } = await signIn();
    const ok = await request(t.app).get('/api/me').set('cookie', `${token}; ${data}`);
    expect(ok.status).toBe(200);
    expect(ok.headers['set-cookie']).toBeUndefined();
    // Another user's identity in an unsigned payload: better-auth rejects the cache and reads the session.
    const [name, value] = data.split('=') as [string, string];
    const payload = JSON.parse(Buffer.from(value, 'base64url').toString('utf8'));
    payload.session.user.email = demoEmail('admin');
    payload.session.user.role = 'admin';
    const forged = `${name}=${Buffer.from(JSON.stringify(payload)).toString('base64url')}`;
    const res = await request(t.app).get('/api/me').set('cookie', `${token}; ${forged}`);
    expect(res.status).toBe(200);
    expect(res.body.email).toBe(demoEmail('viewer'));
    const admin = await request(t.app).get('/api/admin/mail').set('cookie', `${token}; ${forged}`);
    expect(admin.status).toBe(403);
  });

  it('refuses a signed-out session that carries no cookie cache at once', async () => {
    const { token, data } = await signIn();
    const out = await request(t.app)
      .post('/api/auth/sign-out')
      .set('cookie', `${token}; ${data}`)
      .set('origin', 'http://localhost:5180');
    expect(out.status).toBe(200);
    expect((await request(t.app).get('/api/me').set('cookie', token)).status).toBe(401);
  });
});
