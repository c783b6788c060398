import type { ComputedBridge } from '@shared/calc/bridge/computed';
import { ENGINE_VERSION } from '@shared/calc/trace';
import type {
  SavedSweep,
  SavedSweepSummary,
  SweepComparison,
  SweepCostEntries,
  SweepSave,
  SweepSummary,
} from '@shared/schemas/sweeps';
import { clipEntryOf, productOf } from '@shared/sweep/library';
import { checkCosts, rankVariants } from '@shared/sweep/rank';
import type { SweepCosts, SweepParameter } from '@shared/sweep/schema';
import { SWEEP_SEARCH_MAX_COMBINATIONS, SWEEP_SEARCH_MAX_VALUES, searchSweep } from '@shared/sweep/search';
import { compareSweeps, summarizeSweep } from '@shared/sweep/summary';
import { planSweep } from '@shared/sweep/sweep';
import { and, desc, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/client';
import {
  assemblies,
  assemblySweeps,
  organisationMembers,
  orgBridgeValues,
  orgMaterials,
  user,
} from '../db/schema';
import { currentAssembly } from './assemblies';
import { recordAudit } from './audit';
import { projectForChecks, usableCodeTable } from './check-runs';
import type { createCriteriaService } from './criteria';
import { DomainError, notFound } from './errors';
import { ownerOf } from './owner';
import type { createSweepCostService } from './sweep-costs';

type SweepRow = typeof assemblySweeps.$inferSelect;

function head(r: SweepRow, currentRevision: number, by: string | null) {
  return {
    id: r.id,
    projectId: r.projectId,
    assemblyId: r.assemblyId,
    name: r.name,
    assemblyRevision: r.assemblyRevision,
    currentRevision,
    stale: currentRevision !== r.assemblyRevision,
    criteriaSetId: r.criteriaSetId,
    criteriaSetVersion: r.criteriaSetVersion,
    criteriaSetName: r.criteriaSetName,
    engineVersion: r.engineVersion,
    createdBy: by,
    createdAt: r.createdAt.toISOString(),
  };
}

function toSummary(r: SweepRow, currentRevision: number, by: string | null): SavedSweepSummary {
  const s = r.summary as SweepSummary;
  return {
    ...head(r, currentRevision, by),
    count: s.count,
    verdicts: s.verdicts,
    cheapest: s.ranking?.top[0] ?? null,
  };
}

function toSweep(r: SweepRow, currentRevision: number, by: string | null): SavedSweep {
  const stored = r.costs as { costs: SweepCosts | null; costEntries: SweepCostEntries | null } | null;
  return {
    ...head(r, currentRevision, by),
    parameters: r.parameters as SweepParameter[],
    costs: stored?.costs ?? null,
    costEntries: stored?.costEntries ?? null,
    summary: r.summary as SweepSummary,
  };
}

/** Refusal of a library entry a sweep names: deleted, of another firm, or of the wrong kind — at its field. */
const refuseEntry = (field: string, reason: string) =>
  new DomainError('invalid', 'invalid_input', 'a library entry cannot be used', { [field]: reason });
const DELETED = 'no such entry in the firm library (it may have been deleted)';

/**
 * The parameters with the firm library's own values for every product and clip type named by its entry
 * (`libraryEntryId`), read from the firms in `organisationIds` only — so the sweep runs what the library holds
 * now, not what a page sent. A deleted or foreign entry, or a ψ value named as a clip, is refused at its field.
 */
async function withLibraryValues(
  db: Db,
  organisationIds: string[],
  parameters: readonly SweepParameter[],
): Promise<SweepParameter[]> {
  const productIds = parameters.flatMap((p) =>
    p.kind === 'insulationProduct' ? p.products.flatMap((x) => x.libraryEntryId ?? []) : [],
  );
  const clipIds = parameters.flatMap((p) =>
    p.kind === 'clipChi' ? (p.entries ?? []).flatMap((e) => e.source?.libraryEntryId ?? []) : [],
  );
  const [materials, bridges] = await Promise.all([
    productIds.length === 0
      ? []
      : db
          .select()
          .from(orgMaterials)
          .where(
            and(inArray(orgMaterials.id, productIds), inArray(orgMaterials.organisationId, organisationIds)),
          ),
    clipIds.length === 0
      ? []
      : db
          .select()
          .from(orgBridgeValues)
          .where(
            and(
              inArray(orgBridgeValues.id, clipIds),
              inArray(orgBridgeValues.organisationId, organisationIds),
            ),
          ),
  ]);
  const material = new Map(materials.map((r) => [r.id, r]));
  const bridge = new Map(bridges.map((r) => [r.id, r]));
  return parameters.map((p, i) => {
    if (p.kind === 'insulationProduct')
      return {
        ...p,
        products: p.products.map((x, j) => {
          if (!x.libraryEntryId) return x;
          const r = material.get(x.libraryEntryId);
          if (!r) throw refuseEntry(`parameters.${i}.products.${j}.libraryEntryId`, DELETED);
          return productOf({
            ...r,
            density: r.density ?? undefined,
            vapourResistanceFactor: r.vapourResistanceFactor ?? undefined,
          });
        }),
      };
    if (p.kind === 'clipChi' && p.entries)
      return {
        ...p,
        entries: p.entries.map((e, j) => {
          const id = e.source?.libraryEntryId;
          if (!id) return e;
          const field = `parameters.${i}.entries.${j}.source.libraryEntryId`;
          const r = bridge.get(id);
          if (!r) throw refuseEntry(field, DELETED);
          if (r.kind !== 'point') throw refuseEntry(field, 'the entry is a girt’s ψ, not a clip’s χ');
          return clipEntryOf({ ...r, computed: (r.computed as ComputedBridge | null) ?? undefined });
        }),
      };
    return p;
  });
}

/**
 * Saved sweeps of an assembly: run on the server against the current revision and one code table version
 * (frozen, as a check run freezes it), with the costs of the firm library entries named, and kept as a
 * summary (shared/sweep/summary.ts). A sweep of more variants than `maxVariants` is searched within that many
 * (shared/sweep/search.ts). Reading one says whether the assembly has changed since (`stale`).
 */
export function createSavedSweepService(
  db: Db,
  criteria: ReturnType<typeof createCriteriaService>,
  costs: ReturnType<typeof createSweepCostService>,
  maxVariants: number,
) {
  const selectSweep = () =>
    db
      .select({ s: assemblySweeps, current: assemblies.currentRevision, by: user.name })
      .from(assemblySweeps)
      .innerJoin(assemblies, eq(assemblies.id, assemblySweeps.assemblyId))
      .leftJoin(user, eq(user.id, assemblySweeps.createdBy));

  async function get(sweepId: string): Promise<SavedSweep> {
    const [r] = await selectSweep().where(eq(assemblySweeps.id, sweepId));
    if (!r) throw notFound('sweep');
    return toSweep(r.s, r.current, r.by);
  }

  return {
    get,

    /** The project a saved sweep belongs to (for the permission check), or null. */
    projectOf: ownerOf(db, { from: assemblySweeps, key: assemblySweeps.id, owner: assemblySweeps.projectId }),

    async list(assemblyId: string): Promise<SavedSweepSummary[]> {
      const rows = await selectSweep()
        .where(eq(assemblySweeps.assemblyId, assemblyId))
        .orderBy(desc(assemblySweeps.createdAt), desc(assemblySweeps.id));
      return rows.map((r) => toSummary(r.s, r.current, r.by));
    },

    /**
     * Runs a sweep of the assembly's current revision and saves it. Refused before any variant runs: a
     * parameter the assembly does not have, steps, lists and the search's limits (422, the field named), a
     * code table the project may not use (404), a deleted or foreign cost entry, or a varied thing without a
     * cost when costs are given (422).
     */
    async create(assemblyId: string, userId: string, body: SweepSave): Promise<SavedSweep> {
      const a = await currentAssembly(db, assemblyId);
      const { input } = a;
      const firms = await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(eq(organisationMembers.userId, userId));
      const organisationIds = [a.p.organisationId, ...firms.map((f) => f.id)];
      const parameters = await withLibraryValues(db, organisationIds, body.parameters);
      const plan = planSweep(input, parameters, SWEEP_SEARCH_MAX_COMBINATIONS, SWEEP_SEARCH_MAX_VALUES);
      await usableCodeTable(db, criteria, body.criteriaSetId, a.p.organisationId, userId);
      const priced = await costs.resolve(organisationIds, body.costs, body.costEntries);
      // A missing price is refused at its field before anything runs.
      if (priced) checkCosts(plan, input, priced);
      const project = projectForChecks(a.p);

      const id = await db.transaction(async (tx) => {
        const { set, rows } = await criteria.freezeForRun(tx, body.criteriaSetId, userId);
        const {
          plan: ran,
          exploration,
          ...result
        } = searchSweep(input, project, rows, parameters, maxVariants);
        const ranking = priced ? rankVariants(ran, input, result.variants, priced) : null;
        const summary = summarizeSweep(
          result.count,
          result.parameters,
          result.variants,
          exploration,
          ranking,
        );
        const [row] = await tx
          .insert(assemblySweeps)
          .values({
            projectId: a.p.id,
            assemblyId: a.a.id,
            assemblyRevision: a.a.currentRevision,
            name: body.name,
            criteriaSetId: set.id,
            criteriaSetVersion: set.version,
            criteriaSetName: set.name,
            parameters,
            costs: priced ? { costs: priced, costEntries: body.costEntries ?? null } : null,
            summary,
            engineVersion: ENGINE_VERSION,
            createdBy: userId,
          })
          .returning({ id: assemblySweeps.id });
        await recordAudit(tx, {
          actorId: userId,
          projectId: a.p.id,
          entity: 'sweep',
          entityId: row!.id,
          action: 'create',
          after: {
            name: body.name,
            assembly: a.a.name,
            revision: a.a.currentRevision,
            criteriaSet: set.name,
            version: set.version,
            variants: result.count,
            passing: summary.verdicts.pass,
          },
        });
        return row!.id;
      });
      return get(id);
    },

    async remove(sweepId: string, userId: string): Promise<void> {
      await db.transaction(async (tx) => {
        const [r] = await tx
          .delete(assemblySweeps)
          .where(eq(assemblySweeps.id, sweepId))
          .returning({ projectId: assemblySweeps.projectId, name: assemblySweeps.name });
        if (!r) throw notFound('sweep');
        await recordAudit(tx, {
          actorId: userId,
          projectId: r.projectId,
          entity: 'sweep',
          entityId: sweepId,
          action: 'delete',
          before: { name: r.name },
        });
      });
    },

    /** Two saved sweeps of the assembly side by side; one of another assembly is 404. */
    async compare(assemblyId: string, fromId: string, toId: string): Promise<SweepComparison> {
      const rows = await selectSweep().where(
        and(eq(assemblySweeps.assemblyId, assemblyId), inArray(assemblySweeps.id, [fromId, toId])),
      );
      const pick = (id: string, field: string) => {
        const r = rows.find((x) => x.s.id === id);
        if (!r)
          throw new DomainError('not_found', 'not_found', 'sweep not found', {
            [field]: 'no saved sweep of this assembly has this id',
          });
        return r;
      };
      const from = pick(fromId, 'from');
      const to = pick(toId, 'to');
      return {
        from: toSummary(from.s, from.current, from.by),
        to: toSummary(to.s, to.current, to.by),
        ...compareSweeps(toSweep(from.s, from.current, from.by), toSweep(to.s, to.current, to.by)),
      };
    },
  };
}
