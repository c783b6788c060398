import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { fromNodeHeaders } from 'better-auth/node';
import type { Request, Response } from 'express';
import type { Config } from '../config';
import type { Db } from '../db/client';
import { account, session, user, verification } from '../db/schema';
import type { SessionUser } from '../http/route';
import type { Mailer } from '../mail/mailer';

export const MIN_PASSWORD_LENGTH = 10;

/** better-auth with e-mail + password, database sessions and reset-by-e-mail. */
export function createAuth(db: Db, config: Config, mailer: Mailer) {
  const origin = new URL(config.baseUrl);
  const alternates = [origin.origin];
  // localhost and 127.0.0.1 are different origins to a browser; accept both for the local demo.
  if (origin.hostname === 'localhost') alternates.push(origin.origin.replace('localhost', '127.0.0.1'));
  if (origin.hostname === '127.0.0.1') alternates.push(origin.origin.replace('127.0.0.1', 'localhost'));
  return betterAuth({
    baseURL: config.baseUrl,
    basePath: '/api/auth',
    secret: config.authSecret,
    trustedOrigins: alternates,
    telemetry: { enabled: false },
    // Rate limits on sign-in/up/reset are applied by express-rate-limit in front of this handler.
    rateLimit: { enabled: false },
    database: drizzleAdapter(db, { provider: 'pg', schema: { user, session, account, verification } }),
    user: {
      additionalFields: {
        role: { type: 'string', required: false, defaultValue: 'user', input: false },
        unitSystem: { type: 'string', required: false, defaultValue: 'SI', input: false },
      },
    },
    emailAndPassword: {
      enabled: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user: u, url }) => {
        await mailer.send({
          to: u.email,
          subject: 'Reset your Skinwright password',
          text: `Someone (hopefully you) asked to reset the password of ${u.email}.\n\nChoose a new password here: ${url}\n\nThe link expires in one hour. If you did not ask for this, ignore this message.`,
        });
      },
    },
    // The signed cookie cache spares a database read per request; a revoked session stays usable for at
    // most cookieCache.maxAge seconds.
    session: {
      expiresIn: 60 * 60 * 24 * 7,
      updateAge: 60 * 60 * 24,
      cookieCache: { enabled: true, maxAge: 60 },
    },
    advanced: {
      useSecureCookies: config.baseUrl.startsWith('https://'),
      defaultCookieAttributes: { httpOnly: true, sameSite: 'lax' },
    },
  });
}

export type Auth = ReturnType<typeof createAuth>;

const SESSION_MEMO_ENTRIES = 10_000;

/** When the signed cookie cache (`session_data`, compact strategy) in this Cookie header expires, if it has one. */
function cookieCacheExpiry(cookieHeader: string, name: string): number | null {
  for (const part of cookieHeader.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    try {
      const payload = JSON.parse(Buffer.from(part.slice(eq + 1).trim(), 'base64url').toString('utf8')) as {
        expiresAt?: unknown;
      };
      return typeof payload.expiresAt === 'number' ? payload.expiresAt : null;
    } catch {
      return null;
    }
  }
  return null;
}

/**
 * The signed-in user of a request (better-auth session), or null.
 *
 * - Cookies better-auth sets while answering (the refreshed cookie cache once it has expired, the extended
 *   session cookie once a day) are passed on to the response; dropping them made every request after the
 *   cookie cache's first minute read the session from the database.
 * - Verifying the signed cookie cache costs ≈ 0.7 ms per request, so its outcome is remembered per exact
 *   Cookie header — only when better-auth answered from the cookie cache (it set no cookie), and only until
 *   that cookie cache expires (≤ `cookieCache.maxAge` seconds, and never past the session's expiry). The memo
 *   holds what the signed cookie itself proves, no database state, so it is as safe with several processes as
 *   the cookie cache alone: a revoked session or a changed site role still takes effect within
 *   `cookieCache.maxAge` seconds, as before. Project and firm permissions are read per request, not here.
 */
export function createSessionReader(auth: Auth) {
  const memo = new Map<string, { user: SessionUser; until: number }>();
  const maxAgeMs = (auth.options.session?.cookieCache?.maxAge ?? 300) * 1000;
  let dataCookieName: string | undefined;
  return async function currentUser(req: Request, res?: Response): Promise<SessionUser | null> {
    const cookie = req.headers.cookie;
    // Sessions live in cookies only (no bearer plugin): no cookie, no session.
    if (!cookie) return null;
    const now = Date.now();
    const known = memo.get(cookie);
    if (known) {
      if (known.until > now) return known.user;
      memo.delete(cookie);
    }
    const { headers, response } = await auth.api.getSession({
      headers: fromNodeHeaders(req.headers),
      returnHeaders: true,
    });
    const setCookies = headers.getSetCookie();
    if (setCookies.length > 0 && res && !res.headersSent) {
      res.append('set-cookie', setCookies);
      res.setHeader('cache-control', 'no-store');
    }
    if (!response) return null;
    const u = response.user as typeof response.user & { role?: string };
    const user: SessionUser = Object.freeze({
      id: u.id,
      name: u.name,
      email: u.email,
      role: u.role ?? 'user',
    });
    if (setCookies.length === 0) {
      dataCookieName ??= (await auth.$context).authCookies.sessionData.name;
      const cacheExpiry = cookieCacheExpiry(cookie, dataCookieName);
      if (cacheExpiry !== null) {
        const until = Math.min(cacheExpiry, now + maxAgeMs, new Date(response.session.expiresAt).getTime());
        if (until > now) {
          if (memo.size >= SESSION_MEMO_ENTRIES) memo.delete(memo.keys().next().value!);
          memo.set(cookie, { user, until });
        }
      }
    }
    return user;
  };
}
