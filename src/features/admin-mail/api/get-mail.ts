import { capturedMailSchema } from '@shared/schemas/me';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { getQuery } from '../../../lib/api-cache';
import { mailKeys } from '../../../lib/query-keys';

const mailResponseSchema = z.object({ messages: z.array(capturedMailSchema) });

/** `GET /api/admin/mail` — site admins only. */
export const mailQueryOptions = () =>
  getQuery(mailKeys.lists(), '/api/admin/mail', mailResponseSchema, {
    pick: (r) => r.messages,
    refetchInterval: 15_000,
  });

export const useMail = () => useQuery(mailQueryOptions());
