import { ENGINE_VERSION } from '@shared/calc/trace';
import { z } from 'zod';
import type { AnyRoute } from './route';

const toSchema = (schema: z.ZodType, io: 'input' | 'output') =>
  z.toJSONSchema(schema, { target: 'draft-2020-12', io, unrepresentable: 'any' });

/** `/projects/:id` → `/projects/{id}` */
const openApiPath = (path: string) => path.replace(/:([A-Za-z_]+)/g, '{$1}');

const accessText: Record<AnyRoute['access']['kind'], string> = {
  public: 'Public — no sign-in.',
  user: 'Any signed-in user.',
  siteAdmin: 'Site administrators only.',
  organisation: 'Members of the firm',
  criteria: 'Code tables of the firm:',
  project: 'Project members whose role allows',
};

const CRITERIA_ACCESS_TEXT = {
  read: 'members of the firm and of its projects.',
  write: 'editors and administrators of the firm.',
  admin: 'firm administrators.',
} as const;

/** The OpenAPI 3.1 document, generated from the same route registry and zod schemas that validate requests. */
export function buildOpenApi(routes: AnyRoute[]) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) {
    const parameters: unknown[] = [];
    for (const [where, schema] of [
      ['path', r.params],
      ['query', r.query],
    ] as const) {
      if (!schema) continue;
      const js = toSchema(schema, 'input') as { properties?: Record<string, unknown>; required?: string[] };
      for (const [name, s] of Object.entries(js.properties ?? {}))
        parameters.push({
          name,
          in: where,
          required: where === 'path' || (js.required ?? []).includes(name),
          schema: s,
        });
    }
    const access =
      r.access.kind === 'project'
        ? `${accessText.project} \`${r.access.action}\`.`
        : r.access.kind === 'organisation'
          ? `${accessText.organisation} whose firm role allows \`${r.access.action}\`.`
          : r.access.kind === 'criteria'
            ? `${accessText.criteria} ${CRITERIA_ACCESS_TEXT[r.access.need]}`
            : accessText[r.access.kind];
    const op: Record<string, unknown> = {
      tags: [r.tag],
      summary: r.summary,
      description: access,
      operationId: `${r.method}${r.path.replace(/[/:{}-]+(\w)/g, (_m, c: string) => c.toUpperCase())}`,
      parameters,
      responses: Object.fromEntries(
        Object.entries(r.responses).map(([status, resp]) => [
          status,
          resp.schema
            ? {
                description: resp.description,
                content: {
                  [resp.contentType ?? 'application/json']: { schema: toSchema(resp.schema, 'output') },
                },
              }
            : { description: resp.description },
        ]),
      ),
    };
    if (r.body)
      op.requestBody = {
        required: true,
        content: {
          'application/json': {
            schema: toSchema(r.body, 'input'),
            ...(r.example ? { example: r.example } : {}),
          },
        },
      };
    paths[`/api${openApiPath(r.path)}`] ??= {};
    paths[`/api${openApiPath(r.path)}`]![r.method] = op;
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Skinwright API',
      version: ENGINE_VERSION,
      description:
        'Projects, assemblies and wall checks. Calculations under `/api/v1/calc` are stateless and public. ' +
        'Every error is `{ error: { code, message, fields? } }`. Sign-in is by session cookie through `/api/auth` (better-auth). ' +
        'Results are an aid to, never a substitute for, the licensed professional of record and the local code official.',
    },
    paths,
  };
}
