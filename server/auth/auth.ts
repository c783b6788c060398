import { APIError, BASE_ERROR_CODES, betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { createAuthMiddleware, isAPIError } from 'better-auth/api';
import { fromNodeHeaders, toNodeHandler } from 'better-auth/node';
import { and, eq, gt, sql } from 'drizzle-orm';
import type { Request, RequestHandler, Response } from 'express';
import type { Config } from '../config';
import type { Database, Db, ReadCache } from '../db/client';
import { account, session, user, verification } from '../db/schema';
import type { Mailer } from '../mail/mailer';
import { ACCOUNT_FIELD_PATHS, checkAccountFields } from './account-fields';
import { createSignInLock } from './sign-in-lock';

export const MIN_PASSWORD_LENGTH = 10;

/** The signed-in person as a request sees them (the session cookie's user). */
export interface SessionUser {
  id: string;
  name: string;
  email: string;
  role: string;
}

/** The header through which better-auth learns the client's address: Express's `req.ip` (see `authHandler`). */
const CLIENT_IP_HEADER = 'x-skinwright-client-ip';

/**
 * Whether a session token still names a session, through the read cache: a request answered from the signed
 * cookie cache costs no statement until the next write, and a sign-out, a revoked session or a password
 * change (rows of `session` deleted) is seen on the next request — in another process once its write notice
 * has arrived (server/db/client.ts).
 */
function createSessionCheck(db: Db, readCache: ReadCache) {
  const query = db
    .select({ id: session.id })
    .from(session)
    .where(and(eq(session.token, sql.placeholder('token')), gt(session.expiresAt, sql`now()`)))
    .prepare('sw_session_live');
  return (token: string) =>
    readCache.get(`session:${token}`, async () => (await query.execute({ token })).length > 0);
}

/** better-auth lower-cases the address it looks up; so does the sign-in lock. */
const emailOf = (body: unknown) => {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.toLowerCase() : null;
};

/**
 * better-auth with e-mail + password, database sessions, verification and reset by e-mail.
 * - Sign-up never tells whether an address is registered: a new address gets a link that confirms it and signs
 *   in, a registered one an e-mail saying someone tried (see `authHandler` for the answer itself).
 * - Password sign-in needs a confirmed address; an unconfirmed one is answered as a wrong password (and sent a
 *   new link). `config.accountLock` wrong passwords lock an address for a while, answered the same way.
 * - A revoked session ends at once although the signed cookie cache still vouches for it (cookie `version`).
 * - Changing the password always ends every other session of the account.
 */
export function createAuth(
  { db, readCache }: Pick<Database, 'db' | 'readCache'>,
  config: Config,
  mailer: Mailer,
) {
  const origin = new URL(config.baseUrl);
  const alternates = [origin.origin];
  // localhost and 127.0.0.1 are different origins to a browser; accept both for the local demo.
  if (origin.hostname === 'localhost') alternates.push(origin.origin.replace('localhost', '127.0.0.1'));
  if (origin.hostname === '127.0.0.1') alternates.push(origin.origin.replace('127.0.0.1', 'localhost'));
  const sessionLive = createSessionCheck(db, readCache);
  const lock = createSignInLock(db, config.accountLock);
  const invalid = () => APIError.from('UNAUTHORIZED', BASE_ERROR_CODES.INVALID_EMAIL_OR_PASSWORD);
  const auth = betterAuth({
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
      // Also makes sign-up answer a registered address as a new one, and never sign in at once.
      requireEmailVerification: true,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user: u, url }) => {
        await mailer.send({
          to: u.email,
          subject: 'Reset your Skinwright password',
          text: `Someone (hopefully you) asked to reset the password of ${u.email}.\n\nChoose a new password here: ${url}\n\nThe link expires in one hour. If you did not ask for this, ignore this message.`,
        });
      },
      // The reset link proved the mailbox: the address counts as confirmed and its sign-in lock is lifted.
      onPasswordReset: async ({ user: u }) => {
        await lock.clear(u.email.toLowerCase());
        if (!u.emailVerified) await db.update(user).set({ emailVerified: true }).where(eq(user.id, u.id));
      },
      onExistingUserSignUp: async ({ user: u }) => {
        await mailer.send({
          to: u.email,
          subject: 'Someone tried to create a Skinwright account with your address',
          text: `Someone (perhaps you) tried to create a new Skinwright account for ${u.email}, which already has one. Nothing was changed.\n\nIf it was you, sign in: ${origin.origin}/sign-in\nForgotten the password? Choose a new one: ${origin.origin}/forgot-password\n\nIf it was not you, ignore this message.`,
        });
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      // An unconfirmed account that signs in with the right password is sent a fresh link.
      sendOnSignIn: true,
      autoSignInAfterVerification: true,
      expiresIn: 60 * 60,
      sendVerificationEmail: async ({ user: u, url }) => {
        await mailer.send({
          to: u.email,
          subject: 'Confirm your address to finish your Skinwright account',
          text: `Someone (hopefully you) created a Skinwright account for ${u.email}.\n\nOpen this link to confirm the address and sign in: ${url}\n\nThe link expires in one hour. If it was not you, ignore this message: the account cannot be used without it.`,
        });
      },
    },
    // The signed cookie cache spares a database read per request; its `version` is checked on every use, and
    // names a session that no longer exists "revoked", so better-auth reads the database and finds it gone.
    session: {
      expiresIn: 60 * 60 * 24 * 7,
      updateAge: 60 * 60 * 24,
      cookieCache: {
        enabled: true,
        maxAge: 60,
        version: async (s) => ((await sessionLive(s.token)) ? '1' : 'revoked'),
      },
    },
    hooks: {
      before: createAuthMiddleware(async (ctx) => {
        if (ACCOUNT_FIELD_PATHS.includes(ctx.path)) checkAccountFields(ctx.body);
        // Changing the password ends every other session, whatever the client asked.
        if (ctx.path === '/change-password')
          return { context: { body: { ...ctx.body, revokeOtherSessions: true } } };
        if (ctx.path === '/sign-in/email') {
          const email = emailOf(ctx.body);
          if (email && (await lock.isLocked(email))) {
            // As long as checking a wrong password takes (one hash), and answered as one.
            await ctx.context.password.hash(String(ctx.body?.password ?? ''));
            throw invalid();
          }
        }
      }),
      after: createAuthMiddleware(async (ctx) => {
        if (ctx.path !== '/sign-in/email') return;
        const email = emailOf(ctx.body);
        if (!email) return;
        const returned = ctx.context.returned;
        if (!isAPIError(returned)) await lock.clear(email);
        else if ((returned.body as { code?: string } | undefined)?.code === 'INVALID_EMAIL_OR_PASSWORD')
          await lock.recordFailure(email);
      }),
    },
    advanced: {
      useSecureCookies: config.baseUrl.startsWith('https://'),
      defaultCookieAttributes: { httpOnly: true, sameSite: 'lax' },
      // The address Express found (it follows TRUST_PROXY), never a header the client wrote.
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      // E-mails go out after the answer, so no answer takes longer for a registered address.
      backgroundTasks: { handler: () => {} },
    },
  });
  return Object.assign(auth, { sessionLive });
}

export type Auth = ReturnType<typeof createAuth>;

/** What every accepted sign-up answers, for a new address and a registered one alike. */
export const SIGN_UP_ANSWER = Object.freeze({ status: 'check_email' });
/**
 * Every accepted sign-up is answered this long after it arrived at the earliest (better-auth's own floor for
 * resending a verification link), so the extra writes of a new account do not show in the time either.
 */
const SIGN_UP_ANSWER_MS = 500;

/** The `code` of better-auth's error answer, if it is one. */
async function errorCode(response: globalThis.Response): Promise<string | undefined> {
  const body = (await response
    .clone()
    .json()
    .catch(() => null)) as { code?: unknown } | null;
  return typeof body?.code === 'string' ? body.code : undefined;
}

/**
 * better-auth's handler for Express, with two answers made uniform and the client's address passed on:
 * - every accepted sign-up (200) answers `SIGN_UP_ANSWER`, no earlier than `SIGN_UP_ANSWER_MS` (a refused
 *   one — bad address, short password — depends on the request alone and is passed on as it is);
 * - a sign-in that better-auth refuses because the address is unconfirmed (403, after a right password) is
 *   answered as a wrong password (401), so a sign-up followed by a sign-in cannot tell a new address either;
 * - better-auth records `req.ip` as the client's address (it follows TRUST_PROXY), never a header the client
 *   wrote.
 */
export function authHandler(auth: Auth): RequestHandler {
  const handle = toNodeHandler(async (request: globalThis.Request) => {
    const path = request.method === 'POST' ? new URL(request.url).pathname : '';
    const started = performance.now();
    const response = await auth.handler(request);
    if (path === '/api/auth/sign-up/email' && response.ok) {
      const wait = SIGN_UP_ANSWER_MS - (performance.now() - started);
      if (wait > 0) await new Promise((resolve) => setTimeout(resolve, wait));
      return Response.json(SIGN_UP_ANSWER);
    }
    // (Only that 403: a refused origin stays a 403 of its own.)
    const unconfirmed =
      path === '/api/auth/sign-in/email' &&
      response.status === 403 &&
      (await errorCode(response)) === BASE_ERROR_CODES.EMAIL_NOT_VERIFIED.code;
    if (unconfirmed) {
      const { body } = APIError.from('UNAUTHORIZED', BASE_ERROR_CODES.INVALID_EMAIL_OR_PASSWORD);
      return Response.json(body, { status: 401 });
    }
    return response;
  });
  return (req, res) => {
    if (req.ip) req.headers[CLIENT_IP_HEADER] = req.ip;
    else delete req.headers[CLIENT_IP_HEADER];
    return handle(req, res);
  };
}

const SESSION_MEMO_ENTRIES = 10_000;

/** When the signed cookie cache (`session_data`, compact strategy) in this Cookie header expires, if it has one. */
function cookieCacheExpiry(cookieHeader: string, name: string): number | null {
  for (const part of cookieHeader.split(';')) {
    const at = part.indexOf('=');
    if (at < 0 || part.slice(0, at).trim() !== name) continue;
    try {
      const payload = JSON.parse(Buffer.from(part.slice(at + 1).trim(), 'base64url').toString('utf8')) as {
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
 *   holds what the signed cookie itself proves; whether the session still exists is asked on every request
 *   (`auth.sessionLive`, through the read cache: no statement until the next write), so a signed-out, revoked
 *   or password-changed session ends at once, in every process. A changed site role still takes effect
 *   within `cookieCache.maxAge` seconds. Project and firm permissions are read per request, not here.
 */
export function createSessionReader(auth: Auth) {
  const memo = new Map<string, { user: SessionUser; token: string; until: number }>();
  const maxAgeMs = (auth.options.session?.cookieCache?.maxAge ?? 300) * 1000;
  let dataCookieName: string | undefined;
  return async function currentUser(req: Request, res?: Response): Promise<SessionUser | null> {
    const cookie = req.headers.cookie;
    // Sessions live in cookies only (no bearer plugin): no cookie, no session.
    if (!cookie) return null;
    const now = Date.now();
    const known = memo.get(cookie);
    if (known) {
      if (known.until > now && (await auth.sessionLive(known.token))) return known.user;
      // Expired, or the session is gone: better-auth answers (and clears the client's cookies).
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
          memo.set(cookie, { user, token: response.session.token, until });
        }
      }
    }
    return user;
  };
}
