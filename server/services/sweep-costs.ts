import type { MovementClass } from '@shared/calc/joints/schema';
import type { CostKind, SweepCost, SweepCostEntries, SweepCostInput } from '@shared/schemas/sweeps';
import type { SweepCosts } from '@shared/sweep/schema';
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/client';
import { orgSweepCosts } from '../db/schema';
import { DomainError, notFound } from './errors';
import { STALE, versionedUpdate } from './versioned';

type CostRow = typeof orgSweepCosts.$inferSelect;

const toCost = (r: CostRow): SweepCost => ({
  id: r.id,
  kind: r.kind as CostKind,
  name: r.name,
  cost: r.cost,
  currency: r.currency,
  ...(r.movementClass ? { movementClass: r.movementClass as MovementClass } : {}),
  source: r.source,
  notes: r.notes,
  version: r.version,
  createdAt: r.createdAt.toISOString(),
  updatedAt: r.updatedAt.toISOString(),
});

const columns = (c: SweepCostInput) => ({
  kind: c.kind,
  name: c.name,
  cost: c.cost,
  currency: c.currency,
  movementClass: c.movementClass ?? null,
  source: c.source,
  notes: c.notes,
});

/** Refusal of a cost entry a sweep names: deleted, of another firm, or of the wrong kind — at its field. */
const refuse = (field: string, reason: string) =>
  new DomainError('invalid', 'invalid_input', 'a cost entry cannot be used', { [field]: reason });

/**
 * A firm's costs of what a sweep varies (library entries with their source): read by every member, written by
 * editors and administrators, removed by administrators (the routes' firm roles).
 */
export function createSweepCostService(db: Db) {
  async function one(organisationId: string, id: string): Promise<SweepCost> {
    const [r] = await db
      .select()
      .from(orgSweepCosts)
      .where(and(eq(orgSweepCosts.id, id), eq(orgSweepCosts.organisationId, organisationId)));
    if (!r) throw notFound('cost entry');
    return toCost(r);
  }
  return {
    async list(organisationId: string): Promise<SweepCost[]> {
      const rows = await db
        .select()
        .from(orgSweepCosts)
        .where(eq(orgSweepCosts.organisationId, organisationId))
        .orderBy(asc(orgSweepCosts.kind), asc(orgSweepCosts.name), asc(orgSweepCosts.id));
      return rows.map(toCost);
    },
    async add(organisationId: string, userId: string, input: SweepCostInput): Promise<SweepCost> {
      const [r] = await db
        .insert(orgSweepCosts)
        .values({ organisationId, createdBy: userId, ...columns(input) })
        .returning();
      return toCost(r!);
    },
    update(
      organisationId: string,
      id: string,
      input: SweepCostInput & { version: number },
    ): Promise<SweepCost> {
      return versionedUpdate(db, {
        write: async (tx) => {
          const rows = await tx
            .update(orgSweepCosts)
            .set({ ...columns(input), version: input.version + 1, updatedAt: new Date() })
            .where(
              and(
                eq(orgSweepCosts.id, id),
                eq(orgSweepCosts.organisationId, organisationId),
                eq(orgSweepCosts.version, input.version),
              ),
            )
            .returning({ id: orgSweepCosts.id });
          return rows.length === 0 ? STALE : { audit: [] };
        },
        current: () => one(organisationId, id),
        conflictMessage: 'the cost entry was changed by someone else since you opened it',
      });
    },
    async remove(organisationId: string, id: string): Promise<void> {
      const rows = await db
        .delete(orgSweepCosts)
        .where(and(eq(orgSweepCosts.id, id), eq(orgSweepCosts.organisationId, organisationId)))
        .returning({ id: orgSweepCosts.id });
      if (rows.length === 0) throw notFound('cost entry');
    },

    /**
     * The prices of the entries a sweep names, over the costs typed in (an entry wins), from the firms in
     * `organisationIds` only. A missing (deleted) entry, one of another firm, or one of the wrong kind is refused
     * at its field (`costEntries.clip`, `costEntries.sealant.entries.1`) before the sweep runs.
     */
    async resolve(
      organisationIds: readonly string[],
      typed: SweepCosts | undefined,
      entries: SweepCostEntries | undefined,
    ): Promise<SweepCosts | undefined> {
      if (!entries) return typed;
      const named: [string, string, CostKind][] = [];
      for (const kind of ['insulation', 'clip', 'girt'] as const) {
        const id = entries[kind];
        if (id) named.push([`costEntries.${kind}`, id, kind]);
      }
      entries.sealant?.entries.forEach((id, i) => {
        named.push([`costEntries.sealant.entries.${i}`, id, 'sealant']);
      });
      const rows =
        named.length === 0 || organisationIds.length === 0
          ? []
          : await db
              .select()
              .from(orgSweepCosts)
              .where(
                and(
                  inArray(
                    orgSweepCosts.id,
                    named.map(([, id]) => id),
                  ),
                  inArray(orgSweepCosts.organisationId, [...organisationIds]),
                ),
              );
      const byId = new Map(rows.map((r) => [r.id, r]));
      const costs: SweepCosts = { ...typed };
      const perMetre: Partial<Record<MovementClass, number>> = {};
      for (const [field, id, kind] of named) {
        const r = byId.get(id);
        if (!r) throw refuse(field, 'no such entry in the firm library (it may have been deleted)');
        if (r.kind !== kind) throw refuse(field, `the entry is a ${r.kind} price, not a ${kind} price`);
        if (kind === 'sealant') {
          const cls = r.movementClass as MovementClass;
          if (perMetre[cls] !== undefined)
            throw refuse(field, `two sealant entries for movement class ${cls}: name one per class`);
          perMetre[cls] = r.cost;
        } else costs[kind] = r.cost;
      }
      if (entries.sealant)
        costs.sealant = { perMetre, metresPerSquareMetre: entries.sealant.metresPerSquareMetre };
      const currencies = new Set(named.map(([, id]) => byId.get(id)!.currency));
      if (currencies.size > 1)
        throw refuse(
          'costEntries',
          `the entries are in different currencies (${[...currencies].join(', ')})`,
        );
      return costs;
    },
  };
}
