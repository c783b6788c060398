import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzleNodePg } from 'drizzle-orm/node-postgres';
import { migrate as migrateNodePg } from 'drizzle-orm/node-postgres/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import pg from 'pg';
import * as schema from './schema';

export type Schema = typeof schema;
/** The one database type the services use; PGlite and node-postgres both satisfy it. */
export type Db = PgDatabase<PgQueryResultHKT, Schema>;

export interface Database {
  db: Db;
  kind: 'pglite' | 'postgres';
  close(): Promise<void>;
  /** PGlite only: a consistent gzip tarball of the data folder, taken while the server runs. */
  dumpDataDir?: () => Promise<Blob>;
}

const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

/**
 * Opens the database and applies the committed drizzle-kit migrations.
 * `databaseUrl` → PostgreSQL server through node-postgres; otherwise embedded PGlite in `pgliteDir`
 * (`memory://` for tests).
 */
export async function openDatabase(opts: {
  databaseUrl?: string;
  pgliteDir: string;
  /** Restore: start a new PGlite data folder from this tarball (see server/db/backup-cli.ts). */
  loadDataDir?: Blob;
}): Promise<Database> {
  if (opts.databaseUrl) {
    const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 10 });
    const db = drizzleNodePg({ client: pool, schema });
    await migrateNodePg(db, { migrationsFolder });
    return { db: db as unknown as Db, kind: 'postgres', close: () => pool.end() };
  }
  if (!opts.pgliteDir.startsWith('memory://')) mkdirSync(opts.pgliteDir, { recursive: true });
  const client = new PGlite(opts.pgliteDir, opts.loadDataDir ? { loadDataDir: opts.loadDataDir } : {});
  const db = drizzlePglite({ client, schema });
  await migratePglite(db, { migrationsFolder });
  return {
    db: db as unknown as Db,
    kind: 'pglite',
    close: () => client.close(),
    dumpDataDir: () => client.dumpDataDir('gzip'),
  };
}
