import type { IncomingMessage, ServerResponse } from 'node:http';
import {
  can,
  canInFirm,
  type FirmAction,
  type ProjectAction,
  type ProjectRole,
} from '@shared/auth/permissions';
import { type CriteriaAccess, criteriaAllows } from '@shared/schemas/criteria';
import type { Project } from '@shared/schemas/project';
import { type Request, type Response, Router } from 'express';
import type { z } from 'zod';
import type { SessionUser } from '../auth/auth';
import type { Services } from '../services';
import { zodFields } from '../services/errors';
import { archivedError } from '../services/projects';
import { forbidden, HttpError, notFound, unauthorised } from './errors';

/**
 * Who may call a route:
 * - `public`: anyone (health, docs, public calculations, invitation preview, sheet verification);
 * - `user`: any signed-in user;
 * - `siteAdmin`: a site administrator;
 * - `project`: a member of the project whose role allows `action` (the permission table in shared/auth).
 *   Non-members get 404 so that a project's existence is not revealed to other firms. A write (any method
 *   but GET) to an archived project gets 409 `archived` unless the route says `whenArchived: 'allow'`.
 * - `organisation`: a member of the firm named by `:orgId` whose firm role allows `action` (`FIRM_PERMISSIONS`
 *   in shared/auth: `firm.read` every member, `firm.write` editors and administrators, `firm.admin`
 *   administrators); non-members get 404.
 * - `criteria`: the firm's code tables, named by `:orgId` or by `:setId` (a table of the firm). `read`: firm
 *   members and members of any of the firm's projects; `write`: the firm's editors and administrators;
 *   `admin`: firm administrators. Anyone else gets 404.
 */
export type Access =
  | { kind: 'public' }
  | { kind: 'user' }
  | { kind: 'siteAdmin' }
  | { kind: 'organisation'; action: FirmAction }
  | { kind: 'criteria'; need: CriteriaAccess }
  | {
      kind: 'project';
      action: ProjectAction;
      projectId?: (ctx: { params: Record<string, string>; services: Services }) => Promise<string | null>;
      /**
       * An archived project is read-only: every call but a GET answers 409 `archived` — unless the route says
       * `allow` (restoring the project; taking someone's access away).
       */
      whenArchived?: 'allow';
    };

/**
 * The project of a `project` route: its id, the caller's role on it and the project record (read by the same
 * query as the role, so a handler that needs the project need not read it again).
 */
export interface ProjectContext {
  id: string;
  role: ProjectRole;
  record: Project;
}

/** The code tables of a `criteria` route: the firm whose tables these are and what the caller may do. */
export interface CriteriaContext {
  organisationId: string;
  access: CriteriaAccess;
}

/** What every handler gets, whatever its access. */
export interface BaseContext<P, Q, B> {
  req: Request;
  res: Response;
  params: P;
  query: Q;
  body: B;
  services: Services;
}

/**
 * What a route's access check has established, by access kind: `public` handlers get no caller; every other
 * kind the signed-in `user`; `project` also the `project`, `criteria` the firm's `criteria`.
 */
export type AccessContext<A extends Access> = A extends { kind: 'public' }
  ? unknown
  : A extends { kind: 'project' }
    ? { user: SessionUser; project: ProjectContext }
    : A extends { kind: 'criteria' }
      ? { user: SessionUser; criteria: CriteriaContext }
      : { user: SessionUser };

/** A handler's context: the request's parts and services, and what its access kind has established. */
export type RouteContext<P, Q, B, A extends Access = Access> = BaseContext<P, Q, B> & AccessContext<A>;

/** The context `answer` is given by either path (the lean path has no caller: all three are null). */
export type ServedContext = Omit<BaseContext<unknown, unknown, unknown>, 'query' | 'body'> & {
  user: SessionUser | null;
  project: ProjectContext | null;
  criteria: CriteriaContext | null;
};

export interface RouteDef<P = unknown, Q = unknown, B = unknown, A extends Access = Access> {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Express path under /api, e.g. `/projects/:projectId` (parameter names: DEVELOPERS.md "API conventions"). */
  path: string;
  summary: string;
  tag: string;
  access: A;
  params?: z.ZodType<P>;
  query?: z.ZodType<Q>;
  body?: z.ZodType<B>;
  /** Documented responses (the success first); schemas feed the OpenAPI document. */
  responses: Record<number, { description: string; schema?: z.ZodType; contentType?: string }>;
  /** Example request body for the reference page. */
  example?: unknown;
  /**
   * The answer follows from the request alone — a public POST with no path parameters that reads no session
   * and no database (the calculations). Such a route is also served by the lean path before Express (see
   * `server/http/stateless.ts`); its handler then gets Node's bare request and response, so it uses only
   * `query` and `body` and returns its answer (JSON, or a `FileAnswer`).
   */
  stateless?: true;
  /**
   * Caps on the work one request may ask for, counted on the body as sent — before validation, which for a
   * long list costs as much as the calculation. Over a cap: 413 `too_much_work` naming the field and the cap.
   */
  workLimits?: WorkLimit[];
  /** Returns the JSON body (status = first documented response) or handles `res` itself and returns undefined. */
  // A method (not a function property), so that the registry's `AnyRoute` holds handlers of every access kind.
  handler(ctx: RouteContext<P, Q, B, A>): Promise<unknown>;
}

/** A cap on what one request may ask to compute: at most `max` of `what` (counted by `count`) under `field`. */
export interface WorkLimit {
  /** Dotted path of the field the refusal names, e.g. `joints`. */
  field: string;
  /** What is counted, plural, e.g. `joints` or `openings in all walls together`. */
  what: string;
  max: number;
  /** The count in a body not validated yet (anything else than the expected shape counts 0). */
  count: (body: unknown) => number;
}

/** The refusal of a body over one of the work limits (the first exceeded); undefined within all of them. */
export function workRefusal(limits: WorkLimit[] | undefined, body: unknown): HttpError | undefined {
  for (const { field, what, max, count } of limits ?? []) {
    const n = count(body);
    if (n > max)
      return new HttpError(413, 'too_much_work', 'the request asks for more work than one request may do', {
        [field]: `at most ${max} ${what} (got ${n}); split it into several requests`,
      });
  }
  return undefined;
}

/**
 * Identity helper that keeps the param/query/body types inferred from the zod schemas, and the handler's
 * context typed by the route's access kind.
 */
export const defineRoute = <P, Q, B, A extends Access>(def: RouteDef<P, Q, B, A>): RouteDef<P, Q, B, A> =>
  def;

// biome-ignore lint/suspicious/noExplicitAny: a registry holds routes of every shape
export type AnyRoute = RouteDef<any, any, any, Access>;

function parsePart<T>(schema: z.ZodType<T> | undefined, value: unknown, where: string): T {
  if (!schema) return undefined as T;
  const r = schema.safeParse(value);
  if (!r.success) {
    const fields = zodFields(r.error, where === 'body' ? undefined : where);
    throw new HttpError(400, 'validation_failed', `the request ${where} is not valid`, fields);
  }
  return r.data;
}

const JSON_TYPE = 'application/json; charset=utf-8';

/** A non-JSON answer a handler returns instead of writing `res` itself (e.g. a CSV download). */
export class FileAnswer {
  constructor(
    readonly contentType: string,
    readonly body: string,
    /** Offered as a download under this (plain ASCII) name. */
    readonly filename?: string,
  ) {}
}

/** JSON and ETag of deep-frozen response bodies (cached records): they cannot change, so serialise them once. */
const frozenBodies = new WeakMap<object, { json: Buffer; etag: string | undefined }>();

/** Writes a whole answer with Node's own response API (it serves Express's response and a bare one alike). */
function writeAnswer(res: ServerResponse, status: number, contentType: string, body: string | Buffer) {
  res.statusCode = status;
  res.setHeader('content-type', contentType);
  res.end(body);
}

/**
 * Sends a printed document (a compliance sheet, a field report) with its verification code: downloaded or shown
 * inline, never cached by a shared cache, and viewable in a frame of our own pages (the browser's PDF viewer).
 */
export function sendPdf(
  res: Response,
  doc: { pdf: Buffer; filename: string; code: string },
  disposition: 'attachment' | 'inline',
): undefined {
  res
    .status(200)
    .type('application/pdf')
    .set({
      'Content-Disposition': `${disposition}; filename="${doc.filename}"`,
      'Cache-Control': 'private, no-cache',
      'X-Verification-Code': doc.code,
      'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'; frame-ancestors 'self'",
    })
    .send(doc.pdf);
  return undefined;
}

/**
 * Sends a handler's result. Only GET (and HEAD) JSON responses get an ETag, so that a conditional GET can
 * answer 304 (a POST, PUT, PATCH or DELETE response is never revalidated: it is written without hashing the
 * body). A frozen body — a record shared from the read cache — is serialised and hashed once, not on every
 * request.
 */
export function sendResult(req: IncomingMessage, res: ServerResponse, status: number, body: unknown): void {
  if (body instanceof FileAnswer) {
    if (body.filename) res.setHeader('content-disposition', `attachment; filename="${body.filename}"`);
    writeAnswer(res, status, body.contentType, body.body);
    return;
  }
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    writeAnswer(res, status, JSON_TYPE, JSON.stringify(body));
    return;
  }
  // A GET is always served by Express (stateless routes are POSTs): its response API is there.
  const express = { req: req as Request, res: res as Response };
  if (!body || typeof body !== 'object' || !Object.isFrozen(body)) {
    express.res.status(status).json(body);
    return;
  }
  let sent = frozenBodies.get(body);
  if (!sent) {
    const json = Buffer.from(JSON.stringify(body));
    const etagOf = express.req.app.get('etag fn') as ((body: Buffer, encoding: string) => string) | undefined;
    sent = { json, etag: etagOf?.(json, 'utf8') };
    frozenBodies.set(body, sent);
  }
  // express keeps an ETag that is already set, and still answers a matching If-None-Match with 304.
  if (sent.etag) res.setHeader('ETag', sent.etag);
  express.res.status(status).setHeader('content-type', JSON_TYPE).send(sent.json);
}

/**
 * The part of serving a route that follows access: validates the query and body, runs the handler and sends
 * its result (status = the first documented response; undefined = the handler answered itself, else 204).
 */
export async function answer(route: AnyRoute, ctx: ServedContext, sent: { query: unknown; body: unknown }) {
  const { req, res } = ctx;
  const overWork = workRefusal(route.workLimits, sent.body);
  if (overWork) throw overWork;
  const query = parsePart(route.query, sent.query, 'query');
  const body = parsePart(route.body, sent.body, 'body');
  const result = await route.handler({ ...ctx, query, body });
  if (result === undefined) {
    if (!res.headersSent) {
      res.statusCode = 204;
      res.end();
    }
    return;
  }
  sendResult(req, res, Number(Object.keys(route.responses)[0] ?? 200), result);
}

/**
 * Mounts every route under `base` (e.g. `/api`): session → validation → permission → handler. Routes are
 * grouped by their first path segment (`/projects`, `/v1`, …), each group on a router of its own mounted at
 * `base/segment`, so a request is matched against its group's routes only, not against the whole registry.
 */
export function mountRoutes(
  router: Pick<Router, 'use'>,
  routes: AnyRoute[],
  services: Services,
  base = '',
): void {
  const groups = new Map<string, Router>();
  const groupOf = (first: string) => {
    let group = groups.get(first);
    if (!group) {
      group = Router();
      groups.set(first, group);
      router.use(`${base}/${first}`, group);
    }
    return group;
  };
  for (const route of routes) {
    const [, first = '', ...rest] = route.path.split('/');
    if (!/^[\w.-]+$/.test(first))
      throw new Error(`${route.path}: an API route path must start with a fixed segment`);
    if (
      route.stateless &&
      (route.access.kind !== 'public' || route.method !== 'post' || route.path.includes(':'))
    )
      throw new Error(`${route.path}: a stateless route is a public POST without path parameters`);
    groupOf(first)[route.method](`/${rest.join('/')}`, async (req, res) => {
      const { access } = route;
      // Public routes never need the session: skip its lookup.
      const user = access.kind === 'public' ? null : await services.auth.currentUser(req, res);
      if (access.kind !== 'public' && !user) throw unauthorised();
      if (access.kind === 'siteAdmin' && user?.role !== 'admin') throw forbidden('site administrators only');
      const params = parsePart(route.params, req.params, 'params');
      let project: ProjectContext | null = null;
      if (access.kind === 'project') {
        const projectId = access.projectId
          ? await access.projectId({ params: req.params as Record<string, string>, services })
          : (req.params as Record<string, string>).projectId;
        // One query for membership, role and record (remembered until the next write).
        const record = projectId ? await services.projects.access(projectId, user!.id) : null;
        if (!projectId || !record) throw notFound('project');
        if (!can(record.myRole, access.action)) throw forbidden();
        if (record.archivedAt && route.method !== 'get' && access.whenArchived !== 'allow')
          throw archivedError();
        project = { id: projectId, role: record.myRole, record };
      }
      if (access.kind === 'organisation') {
        const orgId = (req.params as Record<string, string>).orgId;
        const role =
          orgId && /^[0-9a-f-]{36}$/i.test(orgId) ? await services.firmMembers.roleIn(orgId, user!.id) : null;
        if (!role) throw notFound('firm');
        if (!canInFirm(role, access.action))
          throw forbidden(
            access.action === 'firm.admin'
              ? 'firm administrators only'
              : 'your firm role is reader: an editor or administrator of the firm writes its data',
          );
      }
      let criteria: CriteriaContext | null = null;
      if (access.kind === 'criteria') {
        const p = req.params as Record<string, string>;
        const uuid = (x: string | undefined) => x !== undefined && /^[0-9a-f-]{36}$/i.test(x);
        const orgId = p.orgId ?? (uuid(p.setId) ? await services.criteria.organisationOf(p.setId!) : null);
        const held = uuid(orgId ?? undefined) ? await services.criteria.accessIn(orgId!, user!.id) : null;
        if (!held) throw notFound(p.orgId ? 'firm' : 'code table');
        if (!criteriaAllows(held, access.need))
          throw forbidden(
            access.need === 'admin'
              ? 'firm administrators only'
              : 'an editor or administrator of the firm edits its code tables',
          );
        criteria = { organisationId: orgId!, access: held };
      }
      await answer(
        route,
        { req, res, params, user, project, criteria, services },
        { query: req.query, body: req.body ?? {} },
      );
    });
  }
}
