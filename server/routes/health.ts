import { ENGINE_VERSION } from '@shared/calc/trace';
import { z } from 'zod';
import { defineRoute } from '../http/route';

export const healthRoutes = [
  defineRoute({
    method: 'get',
    path: '/health',
    summary: 'Liveness and database check',
    tag: 'System',
    access: { kind: 'public' },
    responses: {
      200: {
        description: 'Healthy',
        schema: z.object({
          status: z.literal('ok'),
          engineVersion: z.string(),
          database: z.enum(['pglite', 'postgres']),
        }),
      },
    },
    handler: async ({ services }) => ({
      status: 'ok' as const,
      engineVersion: ENGINE_VERSION,
      database: services.databaseKind,
    }),
  }),
];
