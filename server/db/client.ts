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
  /** Cross-request cache of reads, emptied by every write (see `createReadCache`). */
  readCache: ReadCache;
  close(): Promise<void>;
  /** PGlite only: a consistent gzip tarball of the data folder, taken while the server runs. */
  dumpDataDir?: () => Promise<Blob>;
}

/** Reads remembered across requests until the next write. */
export interface ReadCache {
  /** The remembered value of `key`, else `load()`'s (remembered only if no write was seen while it loaded). */
  get<T>(key: string, load: () => Promise<T>): Promise<T>;
}

/** Frozen through and through: a value kept in the read cache is shared by every request that reads it. */
export function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}
/** No caching: every read goes to the database (one-off work such as seeding). */
export const noReadCache: ReadCache = { get: (_key, load) => load() };

const READ_CACHE_ENTRIES = 5000;
/** The channel on which every write to one of our tables is announced at commit (migration 0005). */
export const WRITES_CHANNEL = 'skinwright_writes';
/** The `application_name` of each process's connection that listens on `WRITES_CHANNEL`. */
export const NOTICE_CONNECTION = 'skinwright-write-notices';

/**
 * A cache of reads that is emptied whenever a write is seen (`invalidate`), and that only serves while it is
 * `live` (a PostgreSQL process that has lost its notice connection loads every read). A value that was
 * loading while a write was seen is not kept, so it never outlives a write seen after its load started.
 */
function createReadCache(live: boolean) {
  const entries = new Map<string, unknown>();
  let generation = 0;
  const invalidate = () => {
    generation++;
    entries.clear();
  };
  const cache: ReadCache = {
    async get<T>(key: string, load: () => Promise<T>): Promise<T> {
      if (!live) return load();
      if (entries.has(key)) return entries.get(key) as T;
      const before = generation;
      const value = await load();
      if (generation === before && live) {
        if (entries.size >= READ_CACHE_ENTRIES) entries.delete(entries.keys().next().value!);
        entries.set(key, value);
      }
      return value;
    },
  };
  return {
    cache,
    invalidate,
    /** Serving (or not) from now on; either way the cache starts empty, as writes may have been missed. */
    setLive(value: boolean) {
      live = value;
      invalidate();
    },
  };
}

type Method = (...args: unknown[]) => Promise<unknown>;
/**
 * Wraps `target[name]` so that a call that may write empties the cache when it is issued and again when it
 * ends (its effects are visible to this process's next statement as soon as it ends).
 */
function invalidateAround(
  target: object,
  name: string,
  writes: (args: unknown[]) => boolean,
  invalidate: () => void,
) {
  const methods = target as Record<string, Method>;
  const original = methods[name]!.bind(target);
  methods[name] = (...args: unknown[]) => {
    if (!writes(args)) return original(...args);
    invalidate();
    return original(...args).finally(invalidate);
  };
}

/** Whether a single statement (text or node-postgres query config) may write: anything but a SELECT. */
const mayWrite = (args: unknown[]) => {
  const q = args[0];
  return !/^\s*select\s/i.test(typeof q === 'string' ? q : String((q as { text?: string })?.text));
};

/**
 * PGlite: correct as it stands, because PGlite is embedded — one process owns the data folder (a second one
 * may not open it) and every statement of this process passes through `client`. Every statement that may
 * write — anything but a single `select` through `query()`, every `exec()` script, every transaction, any raw
 * protocol message — empties the cache. So a read served from the cache always equals what the database
 * would answer now: a removed member or a changed role takes effect on the very next request.
 */
function pgliteReadCache(client: PGlite): ReadCache {
  const { cache, invalidate } = createReadCache(true);
  // `query` runs one statement (extended protocol), so a leading SELECT means the whole statement reads.
  invalidateAround(client, 'query', mayWrite, invalidate);
  // Drizzle (and so better-auth's adapter) runs every statement through `query` and `transaction`; the
  // others are public entry points too. (`execProtocolStream`/`execProtocolRaw` are PGlite's own per-query
  // internals, reached only through these.)
  for (const name of ['exec', 'transaction', 'runExclusive', 'execProtocol'])
    invalidateAround(client, name, () => true, invalidate);
  return cache;
}

/**
 * PostgreSQL server: this process's own writes empty the cache as on PGlite (every non-SELECT through the
 * pool, every checked-out client — drizzle's transactions — on checkout and release), and writes by any other
 * process arrive as notices on `WRITES_CHANNEL`, sent at commit by a trigger on every table (the notices of
 * this pool's own connections are ignored: those writes were seen as they ran). The cache serves
 * only while the notice connection is listening; when it drops, every read goes to the database until it is
 * back. A change committed by another process is seen here when its notice arrives — normally within a
 * millisecond of the commit (as a read that started just before the commit would also have missed it).
 */
function postgresReadCache(pool: pg.Pool, connectionString: string) {
  const { cache, invalidate, setLive } = createReadCache(false);
  invalidateAround(pool, 'query', mayWrite, invalidate);
  // This pool's own writes were already seen as they ran: their notices (backend process ids of its
  // connections) are ignored, so the cache is not emptied twice per write.
  const ownBackends = new Set<number>();
  pool.on('connect', (client) => {
    const pid = (client as unknown as { processID: number }).processID;
    ownBackends.add(pid);
    client.once('end', () => ownBackends.delete(pid));
  });
  // A checked-out client (drizzle's transactions) may write anything until it is released. (`pool.query`
  // checks out with a callback of its own: that statement is judged by the `query` wrapper above.)
  const connect = pool.connect.bind(pool) as (...args: unknown[]) => Promise<pg.PoolClient>;
  (pool as { connect: (...args: unknown[]) => unknown }).connect = (...args: unknown[]) => {
    if (args.length > 0) return connect(...args);
    invalidate();
    return connect().then((client) => {
      const release = client.release.bind(client);
      client.release = (err?: Error | boolean) => {
        invalidate();
        client.release = release;
        return release(err);
      };
      return client;
    });
  };

  let closed = false;
  /** The notice connection being opened or listening; a connection that is no longer it is ignored. */
  let current: pg.Client | null = null;
  let retry: NodeJS.Timeout | undefined;
  async function listen() {
    const client = new pg.Client({ connectionString, keepAlive: true, application_name: NOTICE_CONNECTION });
    current = client;
    const lost = () => {
      if (current !== client) return;
      current = null;
      setLive(false);
      client.end().catch(() => {});
      if (!closed)
        retry = setTimeout(() => {
          void listen();
        }, 1000);
    };
    client.on('notification', (notice) => {
      if (!ownBackends.has(notice.processId)) invalidate();
    });
    client.on('error', lost);
    client.on('end', lost);
    try {
      await client.connect();
      await client.query(`LISTEN ${WRITES_CHANNEL}`);
      if (current === client) setLive(true);
    } catch {
      lost();
    }
  }
  return {
    cache,
    listen,
    async close() {
      closed = true;
      clearTimeout(retry);
      setLive(false);
      const client = current;
      current = null;
      await client?.end();
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
    // Before the first statement, so that the cache knows every connection of the pool as its own.
    const reads = postgresReadCache(pool, opts.databaseUrl);
    const db = drizzleNodePg({ client: pool, schema });
    await migrateNodePg(db, { migrationsFolder });
    await reads.listen();
    return {
      db: db as unknown as Db,
      kind: 'postgres',
      readCache: reads.cache,
      close: async () => {
        await reads.close();
        await pool.end();
      },
    };
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
