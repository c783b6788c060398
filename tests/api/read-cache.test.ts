import { sql } from 'drizzle-orm';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NOTICE_CONNECTION } from '../../server/db/client';
import { organisations } from '../../server/db/schema';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

/**
 * The cross-request read cache (server/db/client.ts): emptied by every write of this process, and — on a
 * PostgreSQL server — by the write notices every table sends at commit (migration 0005), so that a process
 * learns of other processes' writes. A table added without the notice trigger fails here.
 */
describe.each(testDatabases())('read cache on %s', (kind) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp(kind);
  });
  afterAll(async () => {
    await t?.close();
  });

  it('is emptied by a write of this process (a statement or a transaction), not by a read', async () => {
    const { db, readCache } = t.database;
    let loads = 0;
    const read = () =>
      readCache.get('probe', async () => {
        loads++;
        return loads;
      });
    await read();
    await db.select().from(organisations);
    await db.execute(sql`SELECT 1`);
    expect(await read()).toBe(1);
    await db.update(organisations).set({ name: sql`${organisations.name}` });
    expect(await read()).toBe(2);
    await db.transaction(async (tx) => {
      await tx.select().from(organisations);
    });
    expect(await read()).toBe(3);
    await db.execute(sql`UPDATE organisations SET name = name`);
    expect(await read()).toBe(4);
  });

  it('every table of ours has the notice trigger', async () => {
    const tables = await t.database.db.execute<{ table: string; triggered: boolean }>(
      `SELECT c.relname AS "table", EXISTS (
         SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND g.tgname = c.relname || '_notify_write'
       ) AS triggered
       FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
       WHERE c.relkind = 'r' AND n.nspname = current_schema()` as never,
    );
    const rows = (tables as unknown as { rows: { table: string; triggered: boolean }[] }).rows;
    expect(rows.length).toBeGreaterThan(10);
    expect(rows.filter((r) => !r.triggered).map((r) => r.table)).toEqual([]);
  });

  it.runIf(kind === 'postgres')(
    'a write by another connection reaches the cache; a lost notice connection is replaced',
    async () => {
      const agent = await t.as(demoEmail('admin'));
      const projectId = await t.demoProjectId();
      const nameNow = async () => (await agent.get(`/api/projects/${projectId}`)).body.name as string;
      const outside = new pg.Client({ connectionString: t.databaseUrl });
      await outside.connect();
      try {
        const rename = (name: string) =>
          outside.query('UPDATE projects SET name = $1 WHERE id = $2', [name, projectId]);
        await nameNow(); // cached now
        await rename('Renamed from psql');
        await expect.poll(nameNow, { timeout: 2000 }).toBe('Renamed from psql');

        const listeners = async () =>
          (
            await outside.query<{ pid: number }>(
              'SELECT pid FROM pg_stat_activity WHERE application_name = $1 AND datname = current_database()',
              [NOTICE_CONNECTION],
            )
          ).rows.map((r) => r.pid);
        const [before] = await listeners();
        expect(before).toBeDefined();
        await outside.query('SELECT pg_terminate_backend($1)', [before]);
        // While it is gone every read goes to the database; once it is back, notices empty the cache again.
        await expect
          .poll(async () => (await listeners()).some((pid) => pid !== before), { timeout: 5000 })
          .toBe(true);
        await nameNow();
        await rename('Renamed again');
        await expect.poll(nameNow, { timeout: 2000 }).toBe('Renamed again');
      } finally {
        await outside.end();
      }
    },
  );
});
