import type {
  BridgeValue,
  bridgeValueInputSchema,
  OrgMaterial,
  orgMaterialInputSchema,
} from '@shared/schemas/assembly';
import { and, asc, eq } from 'drizzle-orm';
import type { z } from 'zod';
import type { Db } from '../db/client';
import { organisationMembers, orgBridgeValues, orgMaterials } from '../db/schema';
import { notFound } from '../http/errors';

/** An organisation's own libraries: materials and χ/ψ values, each with its source. */
export function createLibraryService(db: Db) {
  return {
    async roleIn(organisationId: string, userId: string): Promise<'admin' | 'member' | null> {
      const [m] = await db
        .select({ role: organisationMembers.role })
        .from(organisationMembers)
        .where(
          and(eq(organisationMembers.organisationId, organisationId), eq(organisationMembers.userId, userId)),
        );
      return m ? (m.role === 'admin' ? 'admin' : 'member') : null;
    },
    async materials(organisationId: string): Promise<OrgMaterial[]> {
      const rows = await db
        .select()
        .from(orgMaterials)
        .where(eq(orgMaterials.organisationId, organisationId))
        .orderBy(asc(orgMaterials.name));
      return rows.map((r) => ({
        id: r.id,
        name: r.name,
        conductivity: r.conductivity,
        density: r.density ?? undefined,
        vapourResistanceFactor: r.vapourResistanceFactor ?? undefined,
        source: r.source,
        createdAt: r.createdAt.toISOString(),
      }));
    },
    async addMaterial(
      organisationId: string,
      input: z.infer<typeof orgMaterialInputSchema>,
    ): Promise<OrgMaterial> {
      const [r] = await db
        .insert(orgMaterials)
        .values({ organisationId, ...input })
        .returning();
      return { ...input, id: r!.id, createdAt: r!.createdAt.toISOString() };
    },
    async bridgeValues(organisationId: string): Promise<BridgeValue[]> {
      const rows = await db
        .select()
        .from(orgBridgeValues)
        .where(eq(orgBridgeValues.organisationId, organisationId))
        .orderBy(asc(orgBridgeValues.name));
      return rows.map((r) => ({
        id: r.id,
        name: r.name,
        kind: r.kind as BridgeValue['kind'],
        value: r.value,
        sourceType: r.sourceType as BridgeValue['sourceType'],
        source: r.source,
        notes: r.notes,
        createdAt: r.createdAt.toISOString(),
      }));
    },
    async addBridgeValue(
      organisationId: string,
      input: z.infer<typeof bridgeValueInputSchema>,
    ): Promise<BridgeValue> {
      const [r] = await db
        .insert(orgBridgeValues)
        .values({ organisationId, ...input })
        .returning();
      return { ...input, id: r!.id, createdAt: r!.createdAt.toISOString() };
    },
    async remove(kind: 'material' | 'bridge', organisationId: string, id: string): Promise<void> {
      const table = kind === 'material' ? orgMaterials : orgBridgeValues;
      const rows = await db
        .delete(table)
        .where(and(eq(table.id, id), eq(table.organisationId, organisationId)))
        .returning({ id: table.id });
      if (rows.length === 0) throw notFound(kind);
    },
  };
}
