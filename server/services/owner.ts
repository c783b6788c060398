import { eq, type SQL } from 'drizzle-orm';
import type { PgColumn, PgTable } from 'drizzle-orm/pg-core';
import type { Db } from '../db/client';

/**
 * The owner of a record for a permission check — the project of an assembly, a run, a sweep, an inspection
 * item, …; the firm of a code table — as one query: `owner` of the row of `from` whose `key` is the id (through
 * `join` where the owner stands in a parent table), or null.
 */
export const ownerOf =
  (db: Db, q: { from: PgTable; key: PgColumn; owner: PgColumn; join?: { table: PgTable; on: SQL } }) =>
  async (id: string): Promise<string | null> => {
    const select = db.select({ owner: q.owner }).from(q.from).$dynamic();
    const [r] = await (q.join ? select.innerJoin(q.join.table, q.join.on) : select).where(eq(q.key, id));
    return (r?.owner as string | null | undefined) ?? null;
  };
