import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { Logger } from 'pino';
import request from 'supertest';
import { inject } from 'vitest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { openDatabase } from '../../server/db/client';
import { demoScenario, seedDemo } from '../../server/db/seed';
import { startMailCapture } from '../../server/mail/capture';
import { createSmtpMailer } from '../../server/mail/mailer';
import { startLocalS3 } from '../../server/storage/local-s3';
import { createS3Store } from '../../server/storage/object-store';

export type DatabaseKind = 'pglite' | 'postgres';

/** The databases every database test runs on: PGlite always, PostgreSQL when the global setup found one. */
export function testDatabases(): DatabaseKind[] {
  return inject('postgresAdminUrl') ? ['pglite', 'postgres'] : ['pglite'];
}

export const DEMO_PASSWORD = demoScenario.password;
export const demoEmail = (role: string) => `${role}@skinwright.demo`;

/** A fresh app on a fresh database (in-memory PGlite, or a new database on the PostgreSQL server), seeded with the demo. */
export async function createTestApp(
  kind: DatabaseKind = 'pglite',
  opts: { authRateLimit?: number; verifyRateLimit?: number; calcRateLimit?: number; logger?: Logger } = {},
) {
  let databaseUrl: string | undefined;
  let dropDatabase = async () => {};
  if (kind === 'postgres') {
    const adminUrl = inject('postgresAdminUrl');
    const name = `sw_test_${randomBytes(6).toString('hex')}`;
    const admin = new pg.Client({ connectionString: adminUrl });
    await admin.connect();
    await admin.query(`CREATE DATABASE ${name}`);
    await admin.end();
    const u = new URL(adminUrl);
    u.pathname = `/${name}`;
    databaseUrl = u.toString();
    dropDatabase = async () => {
      const c = new pg.Client({ connectionString: adminUrl });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await c.end();
    };
  }
  const config = loadConfig(
    { NODE_ENV: 'test' },
    {
      databaseUrl,
      pgliteDir: 'memory://',
      baseUrl: 'http://localhost:5180',
      authRateLimit: opts.authRateLimit ?? 10_000,
      verifyRateLimit: opts.verifyRateLimit ?? 10_000,
      calcRateLimit: opts.calcRateLimit ?? 100_000,
    },
  );
  const database = await openDatabase(config);
  const capture = await startMailCapture(database.db);
  const mailer = createSmtpMailer(capture.url, config.mailFrom);
  // The local fake S3 server in a temporary folder, removed on close (like the mail capture).
  const s3 = await startLocalS3();
  const storage = createS3Store(s3.target);
  const { app, auth, services } = createApp({ database, config, mailer, storage, logger: opts.logger });
  await seedDemo(database.db, auth);

  const agents = new Map<string, ReturnType<typeof request.agent>>();
  /**
   * The latest e-mail to `address` whose subject contains `subject`, waited for: better-auth sends its e-mails
   * (confirmation, reset) after answering.
   */
  async function mailTo(address: string, subject: string) {
    for (let waited = 0; ; waited += 25) {
      const found = (await services.me.capturedMail()).find(
        (m) => m.to.includes(address) && m.subject.includes(subject),
      );
      if (found) return found;
      if (waited > 5000) throw new Error(`no e-mail "${subject}…" to ${address}`);
      await new Promise((resolve) => setTimeout(resolve, 25));
    }
  }
  /** A supertest agent signed in as the demo user with this e-mail (cached per app). */
  async function as(email: string) {
    const cached = agents.get(email);
    if (cached) return cached;
    const agent = request.agent(app);
    const res = await agent.post('/api/auth/sign-in/email').send({ email, password: DEMO_PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${res.text}`);
    agents.set(email, agent);
    return agent;
  }
  async function demoProjectId(): Promise<string> {
    const res = await (await as(demoEmail('admin'))).get('/api/projects');
    return res.body.projects[0].id;
  }
  return {
    app,
    database,
    /** The PostgreSQL database of this app (undefined on PGlite), for a second app on the same data. */
    databaseUrl,
    config,
    services,
    as,
    demoProjectId,
    anonymous: () => request(app),
    mail: () => services.me.capturedMail(),
    mailTo,
    /** Signs `agent` up and opens the e-mailed confirmation link, which signs it in (as a person would). */
    async signUp(agent: Agent, body: { name: string; email: string; password: string }) {
      const res = await agent.post('/api/auth/sign-up/email').send(body);
      if (res.status !== 200) throw new Error(`sign-up of ${body.email} failed: ${res.status} ${res.text}`);
      const mail = await mailTo(body.email, 'Confirm your address');
      const link = new URL(mail.text.match(/https?:\/\/\S+/)![0]);
      const confirmed = await agent.get(link.pathname + link.search);
      if (confirmed.status !== 302) throw new Error(`confirming ${body.email} failed: ${confirmed.status}`);
      return agent;
    },
    /** Object storage of uploads and the folder the local fake keeps it in. */
    storage,
    storageDir: s3.directory,
    async close() {
      await capture.close();
      await s3.close();
      await database.close();
      await dropDatabase();
    },
  };
}
export type TestApp = Awaited<ReturnType<typeof createTestApp>>;
type Agent = ReturnType<typeof request.agent>;
