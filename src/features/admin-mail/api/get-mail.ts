import { capturedMailSchema } from '@shared/schemas/me';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api';
import { mailKeys } from '../../../lib/query-keys';

const mailResponseSchema = z.object({ messages: z.array(capturedMailSchema) });

/** `GET /api/admin/mail` — site admins only. */
export const getMail = (signal?: AbortSignal) =>
  apiRequest('/api/admin/mail', mailResponseSchema, { signal }).then((r) => r.messages);

export const mailQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.lists(),
    queryFn: ({ signal }) => getMail(signal),
    refetchInterval: 15_000,
  });

export const useMail = () => useQuery(mailQueryOptions());
