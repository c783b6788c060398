import { and, eq, isNull, lte, ne, or, sql } from 'drizzle-orm';
import type { Config } from '../config';
import type { Db } from '../db/client';
import { signInFailures } from '../db/schema';

/**
 * The lock of password sign-in per e-mail address: `failures` wrong passwords within `durationMs` lock the
 * address for `durationMs`. Counted for every address tried, registered or not, so that neither the count nor
 * the lock tells whether an account exists; a locked address is answered exactly as a wrong password is.
 */
export function createSignInLock(db: Db, { failures, durationMs }: Config['accountLock']) {
  const t = signInFailures;
  return {
    async isLocked(email: string): Promise<boolean> {
      const [row] = await db.select({ lockedUntil: t.lockedUntil }).from(t).where(eq(t.email, email));
      return row?.lockedUntil != null && row.lockedUntil.getTime() > Date.now();
    },

    /** One more wrong password; a failure after the window (or the lock) has passed starts a new window. */
    async recordFailure(email: string): Promise<void> {
      const now = new Date();
      const windowOver = new Date(now.getTime() - durationMs);
      // Rows of other addresses whose window and lock have both passed count for nothing any more.
      await db
        .delete(t)
        .where(
          and(
            ne(t.email, email),
            lte(t.windowStartedAt, windowOver),
            or(isNull(t.lockedUntil), lte(t.lockedUntil, now)),
          ),
        );
      const fresh = sql`(${t.windowStartedAt} <= ${windowOver} or ${t.lockedUntil} <= ${now})`;
      const count = sql`case when ${fresh} then 1 else ${t.failures} + 1 end`;
      await db
        .insert(t)
        .values({
          email,
          failures: 1,
          windowStartedAt: now,
          lockedUntil: failures <= 1 ? lockEnd(now) : null,
        })
        .onConflictDoUpdate({
          target: t.email,
          set: {
            failures: count,
            windowStartedAt: sql`case when ${fresh} then ${now} else ${t.windowStartedAt} end`,
            lockedUntil: sql`case when ${count} >= ${failures} then ${lockEnd(now)}::timestamptz else null end`,
          },
        });
    },

    /** A successful sign-in or password reset: the address starts afresh. */
    async clear(email: string): Promise<void> {
      await db.delete(t).where(eq(t.email, email));
    },
  };

  function lockEnd(from: Date) {
    return new Date(from.getTime() + durationMs);
  }
}

export type SignInLock = ReturnType<typeof createSignInLock>;
