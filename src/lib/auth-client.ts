import { createAuthClient } from 'better-auth/react';

/** The better-auth client; the server mounts its handler at /api/auth on the same origin. */
export const authClient = createAuthClient({ baseURL: window.location.origin });

export const MIN_PASSWORD_LENGTH = 10;

/** better-auth answers `{ data, error }`; turn an error into one sentence for a Notice. */
export function authErrorMessage(
  error: { message?: string; status?: number; code?: string } | null | undefined,
) {
  if (!error) return 'Something went wrong. Please try again.';
  if (error.status === 429) return 'Too many attempts. Wait a minute, then try again.';
  return error.message || 'Something went wrong. Please try again.';
}
