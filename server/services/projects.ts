import type { ProjectRole } from '@shared/auth/permissions';
import type { Project, ProjectClimate, ProjectInput, ProjectWind } from '@shared/schemas/project';
import { and, asc, eq, gte, isNotNull, isNull, lte, sql } from 'drizzle-orm';
import { type Db, deepFreeze, type ReadCache } from '../db/client';
import {
  assemblies,
  assemblyRevisions,
  organisationMembers,
  organisations,
  projectMembers,
  projects,
} from '../db/schema';
import { copyName, isCurrentRevision } from './assemblies';
import { recordAudit } from './audit';
import { projectForChecks } from './check-runs';
import { DomainError, notFound } from './errors';
import { STALE, versionedUpdate } from './versioned';

type ProjectRow = typeof projects.$inferSelect;

function toProject(row: ProjectRow, organisationName: string, myRole: ProjectRole): Project {
  return {
    id: row.id,
    organisationId: row.organisationId,
    organisationName,
    name: row.name,
    number: row.number,
    description: row.description,
    siteAddress: row.siteAddress,
    ...projectForChecks(row),
    archivedAt: row.archivedAt?.toISOString() ?? null,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    myRole,
  };
}

/** Opens a project in a firm with the caller as its owner, and its audit entry (`after`); the new row. */
async function openProject(
  tx: Db,
  userId: string,
  values: Omit<typeof projects.$inferInsert, 'createdBy'>,
  after: unknown,
): Promise<ProjectRow> {
  const [row] = await tx
    .insert(projects)
    .values({ ...values, createdBy: userId })
    .returning();
  await tx.insert(projectMembers).values({ projectId: row!.id, userId, role: 'owner' });
  await recordAudit(tx, {
    actorId: userId,
    projectId: row!.id,
    entity: 'project',
    entityId: row!.id,
    action: 'create',
    after,
  });
  return row!;
}

/** A save of one part of a project: its site data, its wind data or its climate. */
export type ProjectPartChange =
  | { part: 'site'; changes: ProjectInput }
  | { part: 'wind'; changes: { wind: ProjectWind } }
  | { part: 'climate'; changes: { climate: ProjectClimate } };

/** The column holding the version each part was last saved at, the audit action and the part's name. */
const SAVED_IN = { site: 'siteSavedIn', wind: 'windSavedIn', climate: 'climateSavedIn' } as const;
const PART_ACTION = { site: 'update', wind: 'update_wind', climate: 'update_climate' } as const;
const PART_NAME = { site: 'site data', wind: 'wind data', climate: 'climate' } as const;

/** Archived projects are read-only until restored. */
export const archivedError = () =>
  new DomainError('archived', 'archived', 'this project is archived; restore it before changing it');

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** `readCache`: the database's cross-request cache, emptied by every write (see server/db/client.ts). */
export function createProjectService(db: Db, readCache: ReadCache) {
  // One prepared statement answers both "may this user see the project, with which role" and "the project":
  // the membership is an inner join, so a non-member gets no row.
  const accessQuery = db
    .select({ p: projects, orgName: organisations.name, role: projectMembers.role })
    .from(projects)
    .innerJoin(organisations, eq(organisations.id, projects.organisationId))
    .innerJoin(
      projectMembers,
      and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, sql.placeholder('userId'))),
    )
    .where(eq(projects.id, sql.placeholder('projectId')))
    .prepare('sw_project_access');

  async function load(projectId: string, userId: string): Promise<Project | null> {
    if (!UUID.test(projectId)) return null;
    const [row] = await accessQuery.execute({ projectId, userId });
    // Frozen: a cached record is shared by every request that reads it.
    return row ? deepFreeze(toProject(row.p, row.orgName, row.role as ProjectRole)) : null;
  }

  /** The project with the caller's role (`myRole`), or null when it does not exist or they are not a member. */
  function access(projectId: string, userId: string): Promise<Project | null> {
    return readCache.get(`project:${projectId}:${userId}`, () => load(projectId, userId));
  }

  async function roleOf(projectId: string, userId: string): Promise<ProjectRole | null> {
    return (await access(projectId, userId))?.myRole ?? null;
  }

  async function get(projectId: string, userId: string): Promise<Project> {
    const project = await access(projectId, userId);
    if (!project) throw notFound('project');
    return project;
  }

  return {
    access,
    roleOf,
    get,

    async list(userId: string, archived: boolean): Promise<Project[]> {
      const rows = await db
        .select({ p: projects, orgName: organisations.name, role: projectMembers.role })
        .from(projects)
        .innerJoin(organisations, eq(organisations.id, projects.organisationId))
        .innerJoin(
          projectMembers,
          and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, userId)),
        )
        .where(archived ? isNotNull(projects.archivedAt) : isNull(projects.archivedAt))
        .orderBy(asc(projects.name));
      return rows.map((r) => toProject(r.p, r.orgName, r.role as ProjectRole));
    },

    /**
     * A copy of the project — site data, wind and climate — with no members but the caller as owner, in the
     * project's firm when the caller belongs to it (else the caller's first firm, or the project's if none),
     * and every assembly's current revision as revision 1 of a copy ("copied from <project> rev n", its
     * stored result kept).
     */
    async duplicate(
      projectId: string,
      userId: string,
      input: { name?: string | undefined; number?: string | undefined },
    ): Promise<Project> {
      const [src] = await db.select().from(projects).where(eq(projects.id, projectId));
      if (!src) throw notFound('project');
      const firms = await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(eq(organisationMembers.userId, userId));
      const orgId = firms.find((f) => f.id === src.organisationId)?.id ?? firms[0]?.id ?? src.organisationId;
      const current = await db
        .select({ a: assemblies, r: assemblyRevisions })
        .from(assemblies)
        .innerJoin(assemblyRevisions, isCurrentRevision)
        .where(eq(assemblies.projectId, projectId))
        .orderBy(asc(assemblies.name));
      const {
        id: _id,
        organisationId: _org,
        archivedAt: _archived,
        version: _version,
        siteSavedIn: _site,
        windSavedIn: _wind,
        climateSavedIn: _climate,
        createdBy: _by,
        createdAt: _at,
        updatedAt: _updated,
        ...data
      } = src;
      const id = await db.transaction(async (tx) => {
        const name = input.name ?? copyName(src.name);
        const row = await openProject(
          tx,
          userId,
          { ...data, name, number: input.number ?? src.number, organisationId: orgId },
          { name, copiedFrom: { project: src.name, assemblies: current.length } },
        );
        for (const { a, r } of current) {
          const [copy] = await tx
            .insert(assemblies)
            .values({ projectId: row.id, name: a.name, wallCategory: a.wallCategory, createdBy: userId })
            .returning({ id: assemblies.id });
          await tx.insert(assemblyRevisions).values({
            assemblyId: copy!.id,
            revision: 1,
            note: `copied from ${src.name} rev ${r.revision}`,
            input: r.input,
            thermalResult: r.thermalResult,
            engineVersion: r.engineVersion,
            createdBy: userId,
          });
        }
        return row.id;
      });
      return get(id, userId);
    },

    /** Creates a project owned by one of the caller's firms; the caller becomes its owner. */
    async create(userId: string, input: ProjectInput, organisationId?: string): Promise<Project> {
      const firms = await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(eq(organisationMembers.userId, userId));
      const orgId = organisationId ?? firms[0]?.id;
      if (!orgId || !firms.some((f) => f.id === orgId))
        throw new DomainError(
          'invalid',
          'no_firm',
          'a project belongs to a firm: create or join a firm first',
          {
            organisationId: 'you are not a member of this firm',
          },
        );
      const id = await db.transaction(
        async (tx) => (await openProject(tx, userId, { ...input, organisationId: orgId }, input)).id,
      );
      return get(id, userId);
    },

    /**
     * Saves one part of the project — its site data, its wind data or its climate — with optimistic
     * concurrency per part: the save applies when nobody saved the same part after the version the caller
     * read (a colleague's save of another part does not stand in the way), else 409 with the current record.
     * Every save makes a new project version.
     */
    async update(
      projectId: string,
      userId: string,
      baseVersion: number,
      change: ProjectPartChange,
    ): Promise<Project> {
      const current = await get(projectId, userId);
      if (current.archivedAt) throw archivedError();
      const { part, changes } = change;
      const before = Object.fromEntries(Object.keys(changes).map((k) => [k, current[k as keyof Project]]));
      const next = sql`${projects.version} + 1`;
      return versionedUpdate(db, {
        conflictMessage: `someone else saved this project’s ${PART_NAME[part]} after you opened it`,
        current: () => get(projectId, userId),
        write: async (tx) => {
          const rows = await tx
            .update(projects)
            .set({ ...changes, version: next, [SAVED_IN[part]]: next, updatedAt: new Date() })
            .where(
              and(
                eq(projects.id, projectId),
                lte(projects[SAVED_IN[part]], baseVersion),
                gte(projects.version, baseVersion),
              ),
            )
            .returning({ id: projects.id });
          if (rows.length === 0) return STALE;
          return {
            audit: [
              {
                actorId: userId,
                projectId,
                entity: 'project',
                entityId: projectId,
                action: PART_ACTION[part],
                before,
                after: changes,
              },
            ],
          };
        },
      });
    },

    async setArchived(projectId: string, userId: string, archived: boolean): Promise<Project> {
      await db.transaction(async (tx) => {
        await tx
          .update(projects)
          .set({ archivedAt: archived ? new Date() : null, updatedAt: new Date() })
          .where(eq(projects.id, projectId));
        await recordAudit(tx, {
          actorId: userId,
          projectId,
          entity: 'project',
          entityId: projectId,
          action: archived ? 'archive' : 'unarchive',
        });
      });
      return get(projectId, userId);
    },
  };
}
