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
  /**
   * Cross-request cache of reads — PGlite only (see `pgliteReadCache`); null for a PostgreSQL server, which
   * other processes may write to without this one knowing, so there every read goes to the database.
   */
  readCache: ReadCache | null;
  close(): Promise<void>;
  /** PGlite only: a consistent gzip tarball of the data folder, taken while the server runs. */
  dumpDataDir?: () => Promise<Blob>;
}

/** Reads remembered across requests until the next statement that may write. */
export interface ReadCache {
  /** The remembered value of `key`, else `load()`'s (remembered only if no write ran while it loaded). */
  get<T>(key: string, load: () => Promise<T>): Promise<T>;
}

const READ_CACHE_ENTRIES = 5000;

/**
 * A read cache that is correct because PGlite is embedded: one process owns the data folder (a second one may
 * not open it) and every statement of this process passes through `client`. Every statement that may write —
 * anything but a single `select` through `query()`, every `exec()` script, every transaction, any raw
 * protocol message — empties the cache when it is issued and again when it ends, and a value that was
 * loading meanwhile is not kept. So a read served from the cache always equals what the database would
 * answer now: a removed member or a changed role takes effect on the very next request.
 */
function pgliteReadCache(client: PGlite): ReadCache {
  const entries = new Map<string, unknown>();
  let generation = 0;
  const invalidate = () => {
    generation++;
    entries.clear();
  };
  type Method = (this: PGlite, ...args: unknown[]) => Promise<unknown>;
  const wrap = (name: string, writes: (args: unknown[]) => boolean) => {
    const target = client as unknown as Record<string, Method>;
    const original = target[name]!.bind(client);
    target[name] = (...args: unknown[]) => {
      if (!writes(args)) return original(...args);
      invalidate();
      return original(...args).finally(invalidate);
    };
  };
  // `query` runs one statement (extended protocol), so a leading SELECT means the whole statement reads.
  wrap('query', (args) => !/^\s*select\s/i.test(String(args[0])));
  // Drizzle (and so better-auth's adapter) runs every statement through `query` and `transaction`; the
  // others are public entry points too. (`execProtocolStream`/`execProtocolRaw` are PGlite's own per-query
  // internals, reached only through these.)
  for (const name of ['exec', 'transaction', 'runExclusive', 'execProtocol']) wrap(name, () => true);
  return {
    async get<T>(key: string, load: () => Promise<T>): Promise<T> {
      if (entries.has(key)) return entries.get(key) as T;
      const before = generation;
      const value = await load();
      if (generation === before) {
        if (entries.size >= READ_CACHE_ENTRIES) entries.delete(entries.keys().next().value!);
        entries.set(key, value);
      }
      return value;
    },
  };
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
    // No cross-request read cache: other server processes may share this database.
    return { db: db as unknown as Db, kind: 'postgres', readCache: null, close: () => pool.end() };
  }
  if (!opts.pgliteDir.startsWith('memory://')) mkdirSync(opts.pgliteDir, { recursive: true });
  const client = new PGlite(opts.pgliteDir, opts.loadDataDir ? { loadDataDir: opts.loadDataDir } : {});
  const db = drizzlePglite({ client, schema });
  await migratePglite(db, { migrationsFolder });
  return {
    db: db as unknown as Db,
    kind: 'pglite',
    readCache: pgliteReadCache(client),
    close: () => client.close(),
    dumpDataDir: () => client.dumpDataDir('gzip'),
  };
}
