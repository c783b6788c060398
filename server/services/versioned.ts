import type { Db } from '../db/client';
import { type AuditRecord, recordAudit } from './audit';
import { conflict } from './errors';

/** What a versioned write returns when the record no longer has the version the caller read. */
export const STALE: unique symbol = Symbol('stale');

/** A stale version: 409 `version_conflict` with the record as it is now (`current`), so the client can show it. */
export const versionConflict = (message: string, current: unknown) =>
  conflict('version_conflict', message, current);

export interface VersionedUpdate<C, R, T> {
  /**
   * In one transaction: the update guarded by the version the caller read — `STALE` when the record no
   * longer has it (nothing is written) — and whatever else the change writes. Returns the audit entries of
   * the change, in order (written in the same transaction), and a result for `answer`.
   */
  write: (tx: Db) => Promise<typeof STALE | { audit: AuditRecord[]; result?: R }>;
  /** The record as it is now: `current` of a conflict, and the answer unless `answer` is given. */
  current: () => Promise<C>;
  /** After the commit: the answer (work that must follow the commit, such as e-mail, goes here too). */
  answer?: (result: R) => Promise<T>;
  /** Why a stale version was refused, in the record's words. */
  conflictMessage: string;
}

/**
 * One optimistic, audited update: the version check, the update and its audit entries in one transaction;
 * the new record back, or — on a version mismatch — 409 `version_conflict` carrying the current record.
 */
export async function versionedUpdate<C, R = undefined, T = C>(
  db: Db,
  u: VersionedUpdate<C, R, T>,
): Promise<T> {
  const saved = await db.transaction(async (tx) => {
    const w = await u.write(tx);
    if (w === STALE) return STALE;
    for (const entry of w.audit) await recordAudit(tx, entry);
    return w;
  });
  if (saved === STALE) throw versionConflict(u.conflictMessage, await u.current());
  return u.answer ? u.answer(saved.result as R) : ((await u.current()) as unknown as T);
}
