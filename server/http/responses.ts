import { apiErrorSchema } from '@shared/schemas/common';

/** A documented error response: every error body is `{ error: { code, message, fields? } }`. */
export const errorResponse = (description: string) => ({ description, schema: apiErrorSchema });

/** Who is refused, by the route's access kind (`firmLibrary`: an `organisation` route of a firm library). */
type Refused = 'user' | 'siteAdmin' | 'project' | 'organisation' | 'firmLibrary' | 'criteria';

const FORBIDDEN: Record<Exclude<Refused, 'user'>, string> = {
  siteAdmin: 'Not a site administrator',
  project: 'Your role does not allow this',
  organisation: 'Firm administrators only',
  firmLibrary:
    'Your firm role does not allow this (writing: editors and administrators; deleting: administrators)',
  criteria: 'You may read but not change this firm’s code tables',
};

/** How a 404 ends by access kind: a record of a project or firm the caller is not in is "not found" (D-003). */
const NOT_SEEN: Record<Exclude<Refused, 'user' | 'siteAdmin'>, string> = {
  project: 'or you are not a member',
  organisation: 'or you are not in the firm',
  firmLibrary: 'or you are not a member',
  criteria: 'or you cannot see it',
};

/**
 * The standard error responses of a group of routes: 400 (unless `invalid: false`), 401, 403 by access kind
 * (or `forbidden`), and 404 "No such <notFound>, <not a member>" where the access kind has something to find.
 */
export function refusals(
  who: Refused,
  notFound?: string,
  opts: { forbidden?: string; invalid?: false } = {},
): Record<number, ReturnType<typeof errorResponse>> {
  const out: Record<number, ReturnType<typeof errorResponse>> = {};
  if (opts.invalid !== false) out[400] = errorResponse('Invalid fields');
  out[401] = errorResponse('Not signed in');
  if (who === 'user') return out;
  out[403] = errorResponse(opts.forbidden ?? FORBIDDEN[who]);
  if (who !== 'siteAdmin' && notFound) out[404] = errorResponse(`No such ${notFound}, ${NOT_SEEN[who]}`);
  return out;
}
