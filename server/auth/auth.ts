import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { fromNodeHeaders } from 'better-auth/node';
import type { Request } from 'express';
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

export async function sessionUser(auth: Auth, req: Request): Promise<SessionUser | null> {
  const s = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
  if (!s) return null;
  const u = s.user as typeof s.user & { role?: string };
  return { id: u.id, name: u.name, email: u.email, role: u.role ?? 'user' };
}
