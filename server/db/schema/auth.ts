import { boolean, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { stamps } from './columns';

// better-auth core tables (user, session, account, verification), written by hand to match
// better-auth 1.7's core schema, plus our additional user fields (`role`, `unitSystem`).

/** The user a session or sign-in method belongs to: it goes with them. */
const ofUser = () => ({
  userId: text('user_id')
    .notNull()
    .references(() => user.id, { onDelete: 'cascade' }),
});

export const user = pgTable('user', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  email: text('email').notNull().unique(),
  emailVerified: boolean('email_verified').notNull().default(false),
  image: text('image'),
  ...stamps(),
  /** Site-wide role: `admin` may read the mail outbox and manage every organisation; everyone else `user`. */
  role: text('role').notNull().default('user'),
  /** Display unit preference, `SI` or `IP`. */
  unitSystem: text('unit_system').notNull().default('SI'),
});

export const session = pgTable(
  'session',
  {
    id: text('id').primaryKey(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    token: text('token').notNull().unique(),
    ...stamps(),
    ipAddress: text('ip_address'),
    userAgent: text('user_agent'),
    ...ofUser(),
  },
  (t) => [index('session_user_idx').on(t.userId)],
);

export const account = pgTable(
  'account',
  {
    id: text('id').primaryKey(),
    accountId: text('account_id').notNull(),
    providerId: text('provider_id').notNull(),
    ...ofUser(),
    accessToken: text('access_token'),
    refreshToken: text('refresh_token'),
    idToken: text('id_token'),
    accessTokenExpiresAt: timestamp('access_token_expires_at', { withTimezone: true }),
    refreshTokenExpiresAt: timestamp('refresh_token_expires_at', { withTimezone: true }),
    scope: text('scope'),
    password: text('password'),
    ...stamps(),
  },
  (t) => [index('account_user_idx').on(t.userId)],
);

export const verification = pgTable(
  'verification',
  {
    id: text('id').primaryKey(),
    identifier: text('identifier').notNull(),
    value: text('value').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    ...stamps(),
  },
  (t) => [index('verification_identifier_idx').on(t.identifier)],
);

/**
 * Wrong passwords per e-mail address — registered or not, so that a lock tells nothing about who has an
 * account — for the lock of password sign-in (server/auth/sign-in-lock.ts). A row whose window and lock have
 * passed is removed by the next failure.
 */
export const signInFailures = pgTable('sign_in_failures', {
  email: text('email').primaryKey(),
  failures: integer('failures').notNull(),
  windowStartedAt: timestamp('window_started_at', { withTimezone: true }).notNull(),
  lockedUntil: timestamp('locked_until', { withTimezone: true }),
});
