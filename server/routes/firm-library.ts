import { versionConflictSchema } from '@shared/schemas/common';
import { z } from 'zod';
import { refusals } from '../http/responses';
import { type AnyRoute, defineRoute } from '../http/route';
import type { Services } from '../services';

export const orgParams = z.object({ orgId: z.uuid() });
export const itemParams = orgParams.extend({ itemId: z.uuid() });

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
  const path = `/organisations/:orgId/${spec.segment}`;
  const errors = refusals('firmLibrary', `firm or ${spec.entry}`);
  const tag = 'Libraries';
  const { list, add, update, remove } = spec;
  return [
    defineRoute({
      method: 'get',
      path,
      summary: list.summary,
      tag,
      access: { kind: 'organisation', action: 'firm.read' },
      params: orgParams,
      responses: { 200: { description: list.description, schema: list.schema }, ...errors },
      handler: ({ params, services }) => list.read(services, params.orgId),
    }),
    defineRoute({
      method: 'post',
      path,
      summary: add.summary,
      tag,
      access: { kind: 'organisation', action: 'firm.write' },
      params: orgParams,
      body: add.body,
      example: add.example,
      responses: { 201: { description: add.description, schema: add.schema }, ...errors },
      handler: ({ params, body, user, services }) => add.write(services, params.orgId, body, user.id),
    }),
    ...(update
      ? [
          defineRoute({
            method: 'put',
            path: `${path}/:itemId`,
            summary: update.summary,
            tag,
            access: { kind: 'organisation', action: 'firm.write' },
            params: itemParams,
            body: update.body,
            example: update.example,
            responses: {
              200: { description: add.description, schema: add.schema },
              ...errors,
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
    defineRoute({
      method: 'delete',
      path: `${path}/:itemId`,
      summary: remove.summary,
      tag,
      access: { kind: 'organisation', action: 'firm.admin' },
      params: itemParams,
      responses: { 204: { description: 'Removed' }, ...errors },
      handler: async ({ params, services }) => {
        await remove.write(services, params.orgId, params.itemId);
        return undefined;
      },
    }),
  ];
}
