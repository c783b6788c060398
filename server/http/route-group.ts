import type { FirmAction, ProjectAction } from '@shared/auth/permissions';
import type { CriteriaAccess } from '@shared/schemas/criteria';
import { z } from 'zod';
import type { Services } from '../services';
import type { errorResponse } from './responses';
import { type Access, defineRoute, type RouteDef } from './route';

/** Who may call a route, written short (see `Access` in `./route.ts`). */
export const anyone = { kind: 'public' } as const;
export const signedIn = { kind: 'user' } as const;
export const siteAdmin = { kind: 'siteAdmin' } as const;
/** A project member whose role allows `action`; `whenArchived: 'allow'` also on an archived project. */
export const member = (
  action: ProjectAction,
  opts: { whenArchived?: 'allow' } = {},
): { kind: 'project'; action: ProjectAction; whenArchived?: 'allow' } => ({
  kind: 'project',
  action,
  ...opts,
});
/** A member of the firm named by `:orgId` whose firm role allows `action`. */
export const firm = (action: FirmAction): { kind: 'organisation'; action: FirmAction } => ({
  kind: 'organisation',
  action,
});
/** The firm's code tables, named by `:orgId` or `:setId`. */
export const codeTables = (need: CriteriaAccess): { kind: 'criteria'; need: CriteriaAccess } => ({
  kind: 'criteria',
  need,
});

/**
 * How the project of a `project` route is found when its path does not name `:projectId`: by the record of
 * the project its first parameter names (an assembly, a run, a sweep, a submittal, an inspection, its item,
 * deficiency or photo).
 */
const PROJECT_OF: Record<string, (services: Services, id: string) => Promise<string | null>> = {
  assemblyId: (s, id) => s.assemblies.projectOf(id),
  runId: (s, id) => s.checkRuns.projectOf(id),
  sweepId: (s, id) => s.sweeps.projectOf(id),
  submittalId: (s, id) => s.submittals.projectOf(id),
  inspectionId: (s, id) => s.inspections.projectOf(id),
  inspectionItemId: (s, id) => s.inspections.projectOfItem(id),
  deficiencyId: (s, id) => s.inspections.projectOfDeficiency(id),
  photoId: (s, id) => s.inspections.projectOfPhoto(id),
};

type ProjectResolver = NonNullable<Extract<Access, { kind: 'project' }>['projectId']>;

/** One segment's parameter: `:runId` → `{ runId: string }`. */
type SegmentParam<S extends string> = S extends `:${infer Name}` ? { [K in Name]: string } : unknown;
/** The parameters a path names, segment by segment: `/submittals/:submittalId/items/:submittalItemId` → both ids. */
type PathParams<S extends string> = S extends `${infer Head}/${infer Tail}`
  ? SegmentParam<Head> & PathParams<Tail>
  : SegmentParam<S>;

const paramNames = (path: string) => [...path.matchAll(/:(\w+)/g)].map((m) => m[1]!);

/** A path's parameters as uuids — the rule for every `:…Id` (a natural key such as `:token` says its own). */
const uuidParams = (path: string) => {
  const names = paramNames(path);
  return names.length ? z.object(Object.fromEntries(names.map((n) => [n, z.uuid()]))) : undefined;
};

/**
 * The access of a route at `path`, with the project found through the record the path names if need be: the
 * project that record belongs to, or null (→ 404) for a malformed or unknown id.
 */
function accessAt<A extends Access>(path: string, access: A): A {
  if (access.kind !== 'project' || access.projectId) return access;
  const [first] = paramNames(path);
  if (first === 'projectId') return access;
  const projectOf = first ? PROJECT_OF[first] : undefined;
  if (!first || !projectOf)
    throw new Error(`${path}: a project route names :projectId or a record of a project`);
  const projectId: ProjectResolver = ({ params, services }) => {
    const id = params[first];
    return id !== undefined && z.uuid().safeParse(id).success
      ? projectOf(services, id)
      : Promise.resolve(null);
  };
  return { ...access, projectId };
}

/**
 * What a route of a group says itself; its tag, its standard refusals and (by default) its params come from the
 * group and the path.
 */
type GroupRoute<P, Q, B, A extends Access> = Omit<
  RouteDef<P, Q, B, A>,
  'method' | 'path' | 'tag' | 'access' | 'params'
> & { params?: z.ZodType<P> };

type Method = RouteDef['method'];

/**
 * The routes of one group (a file of `server/routes/`, or part of one): `route.get(path, access, { summary,
 * responses, handler, … })`. Each gets the group's `tag` and its `refused` responses (its own responses win), the
 * path's `:…Id` parameters as uuids unless it names `params`, and — a project route whose path names a record of
 * the project — the resolver of that record's project (`PROJECT_OF`).
 */
export function routeGroup(tag: string, refused: Record<number, ReturnType<typeof errorResponse>> = {}) {
  const add =
    (method: Method) =>
    <Path extends string, A extends Access, P = PathParams<Path>, Q = unknown, B = unknown>(
      path: Path,
      access: A,
      def: GroupRoute<P, Q, B, A>,
    ): RouteDef<P, Q, B, A> =>
      defineRoute<P, Q, B, A>({
        ...def,
        method,
        path,
        tag,
        access: accessAt(path, access),
        params: def.params ?? (uuidParams(path) as z.ZodType<P> | undefined),
        responses: { ...refused, ...def.responses },
      });
  return { get: add('get'), post: add('post'), put: add('put'), patch: add('patch'), delete: add('delete') };
}
