import { versionConflictSchema } from '@shared/schemas/common';
import type { z } from 'zod';
import { refusals } from '../http/responses';
import type { AnyRoute } from '../http/route';
import { firm, routeGroup } from '../http/route-group';
import type { Services } from '../services';

/** One resource of a firm library, its routes' words and the service calls behind them. */
export interface FirmLibrarySpec<B, U> {
  /** The path below the firm, e.g. `materials` → `/organisations/:orgId/materials[/:itemId]`. */
  segment: string;
  /** What one entry is called in a 404 ("No such firm or <entry>"). */
  entry: string;
  list: {
    summary: string;
    description: string;
    schema: z.ZodType;
    read: (services: Services, orgId: string) => Promise<unknown>;
  };
  add: {
    summary: string;
    description: string;
    schema: z.ZodType;
    body: z.ZodType<B>;
    example: unknown;
    write: (services: Services, orgId: string, body: B, userId: string) => Promise<unknown>;
  };
  /** An optimistic update (the whole entry with the `version` read; 409 with `current` on a stale one). */
  update?: {
    summary: string;
    body: z.ZodType<U>;
    example: unknown;
    write: (services: Services, orgId: string, itemId: string, body: U) => Promise<unknown>;
  };
  remove: { summary: string; write: (services: Services, orgId: string, itemId: string) => Promise<unknown> };
}

/**
 * The routes of a firm library resource (materials, bridge values, attachment products, sweep costs): list
 * (`firm.read`), add and update (`firm.write`), remove (`firm.admin`), all tagged `Libraries`.
 */
export function firmLibraryRoutes<B, U = never>(spec: FirmLibrarySpec<B, U>): AnyRoute[] {
  const path = `/organisations/:orgId/${spec.segment}` as const;
  const route = routeGroup('Libraries', refusals('firmLibrary', `firm or ${spec.entry}`));
  const { list, add, update, remove } = spec;
  return [
    route.get(path, firm('firm.read'), {
      summary: list.summary,
      responses: { 200: { description: list.description, schema: list.schema } },
      handler: ({ params, services }) => list.read(services, params.orgId),
    }),
    route.post(path, firm('firm.write'), {
      summary: add.summary,
      body: add.body,
      example: add.example,
      responses: { 201: { description: add.description, schema: add.schema } },
      handler: ({ params, body, user, services }) => add.write(services, params.orgId, body, user.id),
    }),
    ...(update
      ? [
          route.put(`${path}/:itemId`, firm('firm.write'), {
            summary: update.summary,
            body: update.body,
            example: update.example,
            responses: {
              200: { description: add.description, schema: add.schema },
              409: {
                description: 'Changed by someone else since: `current` is the entry now',
                schema: versionConflictSchema(add.schema),
              },
            },
            handler: ({ params, body, services }) =>
              update.write(services, params.orgId, params.itemId, body),
          }),
        ]
      : []),
    route.delete(`${path}/:itemId`, firm('firm.admin'), {
      summary: remove.summary,
      responses: { 204: { description: 'Removed' } },
      handler: async ({ params, services }) => {
        await remove.write(services, params.orgId, params.itemId);
        return undefined;
      },
    }),
  ];
}
