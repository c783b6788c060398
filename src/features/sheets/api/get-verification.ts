import { verificationSchema } from '@shared/schemas/sheets';
import { useQuery } from '@tanstack/react-query';
import { apiPath, isApiRequestError } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { verificationKeys } from '../../../lib/query-keys';

/** `GET /api/verify/:code` (public) → what the sheet or field report states; 404 = no such code; 429 = too many checks. */
export const verificationQueryOptions = (code: string) =>
  getQuery(verificationKeys.detail(code), apiPath`/api/verify/${code}`, verificationSchema, {
    // No retry for "no such sheet", nor when this address has used up its checks for the minute (429).
    retry: (count, e) => !(isApiRequestError(e) && (e.status === 404 || e.status === 429)) && count < 2,
  });

export const useVerification = (code: string) => useQuery(verificationQueryOptions(code));
