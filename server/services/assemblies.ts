import type { ThermalResult } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { canonicalJson } from '@shared/checks/canonical';
import type {
  Assembly,
  AssemblyHead,
  AssemblyInput,
  AssemblyRevision,
  AssemblySummary,
} from '@shared/schemas/assembly';
import { TEXT_MAX } from '@shared/schemas/common';
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import { type Db, deepFreeze, type ReadCache } from '../db/client';
import { assemblies, assemblyRevisions, checkRuns, projects, user } from '../db/schema';
import { recordAudit } from './audit';
import { notFound } from './errors';
import { ownerOf } from './owner';
import { STALE, versionedUpdate } from './versioned';

type AssemblyRow = typeof assemblies.$inferSelect;
type RevisionRow = typeof assemblyRevisions.$inferSelect;

function toRevision(r: RevisionRow, createdBy: string | null): AssemblyRevision {
  return {
    revision: r.revision,
    note: r.note,
    input: r.input as AssemblyInput,
    thermalResult: (r.thermalResult as ThermalResult | null) ?? null,
    engineVersion: r.engineVersion,
    createdBy,
    createdAt: r.createdAt.toISOString(),
  };
}

function toHead(a: AssemblyRow, result: { Ueff: number | null; Reff: number | null } | null): AssemblyHead {
  return {
    id: a.id,
    projectId: a.projectId,
    name: a.name,
    wallCategory: a.wallCategory as AssemblySummary['wallCategory'],
    revision: a.currentRevision,
    version: a.version,
    updatedAt: a.updatedAt.toISOString(),
    Ueff: result?.Ueff ?? null,
    Reff: result?.Reff ?? null,
  };
}

/** "Wall A" → "Wall A (copy)", kept within the name limit. */
export const copyName = (name: string) => `${name.slice(0, TEXT_MAX.name - ' (copy)'.length)} (copy)`;

/** Join condition: an assembly row with its current revision's row. */
export const isCurrentRevision = and(
  eq(assemblyRevisions.assemblyId, assemblies.id),
  eq(assemblyRevisions.revision, assemblies.currentRevision),
);

/** An assembly with its current revision's input and its project — what a check run or a sweep starts from; 404 if none. */
export async function currentAssembly(db: Db, assemblyId: string) {
  const [a] = await db
    .select({ a: assemblies, input: assemblyRevisions.input, p: projects })
    .from(assemblies)
    .innerJoin(assemblyRevisions, isCurrentRevision)
    .innerJoin(projects, eq(projects.id, assemblies.projectId))
    .where(eq(assemblies.id, assemblyId));
  if (!a) throw notFound('assembly');
  return { ...a, input: a.input as AssemblyInput };
}

export function createAssemblyService(db: Db, readCache: ReadCache) {
  async function get(assemblyId: string): Promise<Assembly> {
    const [a] = await db.select().from(assemblies).where(eq(assemblies.id, assemblyId));
    if (!a) throw notFound('assembly');
    const [r] = await db
      .select({ rev: assemblyRevisions, by: user.name })
      .from(assemblyRevisions)
      .leftJoin(user, eq(user.id, assemblyRevisions.createdBy))
      .where(
        and(eq(assemblyRevisions.assemblyId, assemblyId), eq(assemblyRevisions.revision, a.currentRevision)),
      );
    const current = toRevision(r!.rev, r!.by);
    return { ...toHead(a, current.thermalResult), current };
  }

  async function create(
    projectId: string,
    userId: string,
    input: AssemblyInput,
    note: string,
    after: Record<string, unknown>,
  ): Promise<Assembly> {
    const thermalResult = calculateThermal(input.thermal);

    const id = await db.transaction(async (tx) => {
      const [a] = await tx
        .insert(assemblies)
        .values({ projectId, name: input.name, wallCategory: input.wallCategory, createdBy: userId })
        .returning();
      await tx.insert(assemblyRevisions).values({
        assemblyId: a!.id,
        revision: 1,
        note,
        input,
        thermalResult,
        engineVersion: ENGINE_VERSION,
        createdBy: userId,
      });
      await recordAudit(tx, {
        actorId: userId,
        projectId,
        entity: 'assembly',
        entityId: a!.id,
        action: 'create',
        after,
      });
      return a!.id;
    });
    return get(id);
  }

  async function loadList(projectId: string): Promise<readonly AssemblySummary[]> {
    // Only the two headline figures of each current result: the stored result carries its whole trace
    // (kilobytes per assembly), which the list would otherwise read, parse and drop. The last check run's
    // verdict and time come from a lateral join (one index probe per assembly; never the run's JSON).
    const lastRun = db
      .select({ verdict: checkRuns.verdict, at: checkRuns.createdAt })
      .from(checkRuns)
      .where(eq(checkRuns.assemblyId, assemblies.id))
      .orderBy(desc(checkRuns.createdAt))
      .limit(1)
      .as('last_run');
    const rows = await db
      .select({
        a: assemblies,
        Ueff: sql<number | null>`(${assemblyRevisions.thermalResult} ->> 'Ueff')::float8`,
        Reff: sql<number | null>`(${assemblyRevisions.thermalResult} ->> 'Reff')::float8`,
        runVerdict: lastRun.verdict,
        runAt: lastRun.at,
      })
      .from(assemblies)
      .innerJoin(assemblyRevisions, isCurrentRevision)
      .leftJoinLateral(lastRun, sql`true`)
      .where(eq(assemblies.projectId, projectId))
      .orderBy(asc(assemblies.name));
    return deepFreeze(
      rows.map(
        (r): AssemblySummary => ({
          ...toHead(r.a, r),
          lastRun:
            r.runVerdict && r.runAt
              ? {
                  verdict: r.runVerdict as NonNullable<AssemblySummary['lastRun']>['verdict'],
                  at: r.runAt.toISOString(),
                }
              : null,
        }),
      ),
    );
  }

  return {
    get,

    /** The project an assembly belongs to (for the permission check), or null. */
    projectOf: ownerOf(db, { from: assemblies, key: assemblies.id, owner: assemblies.projectId }),

    /** The project's assemblies, from the read cache (emptied by every write) once loaded. */
    list(projectId: string): Promise<readonly AssemblySummary[]> {
      return readCache.get(`assemblies:${projectId}`, () => loadList(projectId));
    },

    create: (projectId: string, userId: string, input: AssemblyInput) =>
      create(projectId, userId, input, 'first issue', { name: input.name }),

    /**
     * A copy of the assembly's current revision as revision 1 of a new assembly in `projectId` (the route
     * has checked the caller may write there), named "<name> (copy)" unless `name` is given.
     */
    async duplicate(assemblyId: string, projectId: string, userId: string, name?: string): Promise<Assembly> {
      const source = await get(assemblyId);
      const [from] = await db
        .select({ name: projects.name })
        .from(projects)
        .where(eq(projects.id, source.projectId));
      const input = { ...source.current.input, name: name ?? copyName(source.name) };
      return create(projectId, userId, input, `copied from ${from!.name} rev ${source.revision}`, {
        name: input.name,
        copiedFrom: { assembly: source.name, project: from!.name, revision: source.revision },
      });
    },

    /**
     * Each save with other values is a new revision; a save whose input is canonically the same as the
     * current revision's (only the note differs) puts the note on that revision instead — no revision with
     * identical values. Either applies only to the version the caller read (409 otherwise).
     */
    async update(
      assemblyId: string,
      userId: string,
      version: number,
      input: AssemblyInput,
      note: string,
    ): Promise<Assembly> {
      return versionedUpdate(db, {
        conflictMessage: 'someone else saved this assembly after you opened it; your changes were not saved',
        current: () => get(assemblyId),
        write: async (tx) => {
          const [current] = await tx
            .select({ projectId: assemblies.projectId, rev: assemblyRevisions })
            .from(assemblies)
            .innerJoin(assemblyRevisions, isCurrentRevision)
            .where(and(eq(assemblies.id, assemblyId), eq(assemblies.version, version)))
            .for('update', { of: assemblies });
          if (!current) return STALE;
          if (canonicalJson(current.rev.input) === canonicalJson(input)) {
            if (note === current.rev.note) return { audit: [] };
            await tx.update(assemblyRevisions).set({ note }).where(eq(assemblyRevisions.id, current.rev.id));
            return {
              audit: [
                {
                  actorId: userId,
                  projectId: current.projectId,
                  entity: 'assembly',
                  entityId: assemblyId,
                  action: 'note',
                  before: { revision: current.rev.revision, note: current.rev.note },
                  after: { revision: current.rev.revision, note },
                },
              ],
            };
          }
          const thermalResult = calculateThermal(input.thermal);
          const [a] = await tx
            .update(assemblies)
            .set({
              name: input.name,
              wallCategory: input.wallCategory,
              version: version + 1,
              currentRevision: version + 1,
              updatedAt: new Date(),
            })
            .where(eq(assemblies.id, assemblyId))
            .returning();
          await tx.insert(assemblyRevisions).values({
            assemblyId,
            revision: a!.currentRevision,
            note,
            input,
            thermalResult,
            engineVersion: ENGINE_VERSION,
            createdBy: userId,
          });
          return {
            audit: [
              {
                actorId: userId,
                projectId: a!.projectId,
                entity: 'assembly',
                entityId: assemblyId,
                action: 'revise',
                after: { revision: a!.currentRevision, note },
              },
            ],
          };
        },
      });
    },

    async revisions(assemblyId: string) {
      const rows = await db
        .select({ rev: assemblyRevisions, by: user.name })
        .from(assemblyRevisions)
        .leftJoin(user, eq(user.id, assemblyRevisions.createdBy))
        .where(eq(assemblyRevisions.assemblyId, assemblyId))
        .orderBy(desc(assemblyRevisions.revision));
      return rows.map(({ rev, by }) => ({
        revision: rev.revision,
        note: rev.note,
        engineVersion: rev.engineVersion,
        createdBy: by,
        createdAt: rev.createdAt.toISOString(),
        Ueff: (rev.thermalResult as ThermalResult | null)?.Ueff ?? null,
      }));
    },

    async revision(assemblyId: string, revision: number): Promise<AssemblyRevision> {
      const [r] = await db
        .select({ rev: assemblyRevisions, by: user.name })
        .from(assemblyRevisions)
        .leftJoin(user, eq(user.id, assemblyRevisions.createdBy))
        .where(and(eq(assemblyRevisions.assemblyId, assemblyId), eq(assemblyRevisions.revision, revision)));
      if (!r) throw notFound('revision');
      return toRevision(r.rev, r.by);
    },
  };
}
