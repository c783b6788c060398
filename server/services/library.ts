import { createHash, randomUUID } from 'node:crypto';
import type {
  BridgeValue,
  bridgeValueInputSchema,
  OrgMaterial,
  orgMaterialInputSchema,
} from '@shared/schemas/assembly';
import {
  type AttachmentProduct,
  type AttachmentProductInput,
  attachmentProductSchema,
} from '@shared/schemas/attachment-library';
import { and, asc, eq } from 'drizzle-orm';
import type { z } from 'zod';
import type { Db } from '../db/client';
import { orgAttachmentProducts, organisationMembers, orgBridgeValues, orgMaterials } from '../db/schema';
import { HttpError, notFound } from '../http/errors';
import type { UploadedFile } from '../http/upload';
import { detectAllowedType, displayName, withTypeExtension } from '../storage/files';
import type { ObjectStore } from '../storage/object-store';

type ProductRow = typeof orgAttachmentProducts.$inferSelect;

/** A stored row as the API shows it; the values in `data` are checked against the schema on the way out too. */
function toProduct(r: ProductRow): AttachmentProduct {
  return attachmentProductSchema.parse({
    ...(r.data as object),
    kind: r.kind,
    id: r.id,
    name: r.name,
    source: r.source,
    notes: r.notes,
    createdAt: r.createdAt.toISOString(),
    dataSheet:
      r.dataSheetKey && r.dataSheetUploadedAt
        ? {
            name: r.dataSheetName ?? 'data sheet',
            contentType: r.dataSheetType ?? 'application/octet-stream',
            size: r.dataSheetSize ?? 0,
            sha256: r.dataSheetSha256 ?? '',
            uploadedAt: r.dataSheetUploadedAt.toISOString(),
          }
        : null,
  });
}

/** The row of a new entry: the common fields in columns, the values (table or clip) in `data`. */
export function attachmentProductRow(
  organisationId: string,
  createdBy: string,
  { kind, name, source, notes, ...data }: AttachmentProductInput,
) {
  return { organisationId, kind, name, source, notes, data, createdBy };
}

/**
 * An organisation's own libraries, each entry with its source: materials, χ/ψ values, and the attachment
 * data of the wind check (panel load–span tables and clip capacities, with the maker's data sheet).
 */
export function createLibraryService(db: Db, storage: ObjectStore) {
  async function productRow(organisationId: string, id: string): Promise<ProductRow> {
    const [r] = await db
      .select()
      .from(orgAttachmentProducts)
      .where(and(eq(orgAttachmentProducts.id, id), eq(orgAttachmentProducts.organisationId, organisationId)));
    if (!r) throw notFound('library entry');
    return r;
  }
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

    async attachmentProducts(organisationId: string): Promise<AttachmentProduct[]> {
      const rows = await db
        .select()
        .from(orgAttachmentProducts)
        .where(eq(orgAttachmentProducts.organisationId, organisationId))
        .orderBy(asc(orgAttachmentProducts.kind), asc(orgAttachmentProducts.name));
      return rows.map(toProduct);
    },
    async addAttachmentProduct(
      organisationId: string,
      userId: string,
      input: AttachmentProductInput,
    ): Promise<AttachmentProduct> {
      const [r] = await db
        .insert(orgAttachmentProducts)
        .values(attachmentProductRow(organisationId, userId, input))
        .returning();
      return toProduct(r!);
    },
    /**
     * Stores the maker's data sheet of an entry (one PDF, PNG or JPEG, checked by its content), replacing
     * the one before. The new object is stored before the row points at it; the old one goes afterwards.
     */
    async uploadDataSheet(
      organisationId: string,
      id: string,
      files: UploadedFile[],
    ): Promise<AttachmentProduct> {
      const before = await productRow(organisationId, id);
      if (files.length !== 1)
        throw new HttpError(400, 'one_file', 'upload exactly one data sheet; nothing was stored', {
          files: `${files.length} files sent`,
        });
      const file = files[0]!;
      const name = displayName(file.originalName);
      const contentType = await detectAllowedType(file.bytes, name);
      const key = `organisations/${organisationId}/data-sheets/${randomUUID()}`;
      await storage.put(key, file.bytes, contentType);
      let r: ProductRow | undefined;
      try {
        [r] = await db
          .update(orgAttachmentProducts)
          .set({
            dataSheetKey: key,
            dataSheetName: withTypeExtension(name, contentType),
            dataSheetType: contentType,
            dataSheetSize: file.bytes.length,
            dataSheetSha256: createHash('sha256').update(file.bytes).digest('hex'),
            dataSheetUploadedAt: new Date(),
          })
          .where(
            and(eq(orgAttachmentProducts.id, id), eq(orgAttachmentProducts.organisationId, organisationId)),
          )
          .returning();
      } catch (err) {
        await storage.delete(key).catch(() => undefined);
        throw err;
      }
      if (!r) {
        await storage.delete(key).catch(() => undefined);
        throw notFound('library entry');
      }
      if (before.dataSheetKey) await storage.delete(before.dataSheetKey).catch(() => undefined);
      return toProduct(r);
    },
    /** The stored data sheet of an entry, to stream back; 404 when none was uploaded. */
    async dataSheet(organisationId: string, id: string) {
      const r = await productRow(organisationId, id);
      if (!r.dataSheetKey) throw notFound('data sheet');
      const object = await storage.get(r.dataSheetKey);
      return {
        body: object.body,
        name: r.dataSheetName ?? 'data sheet',
        contentType: r.dataSheetType ?? 'application/octet-stream',
        size: r.dataSheetSize ?? object.size,
      };
    },
    /** Removes an entry and its data sheet. Assemblies keep the values and source they copied from it. */
    async removeAttachmentProduct(organisationId: string, id: string): Promise<void> {
      const [r] = await db
        .delete(orgAttachmentProducts)
        .where(
          and(eq(orgAttachmentProducts.id, id), eq(orgAttachmentProducts.organisationId, organisationId)),
        )
        .returning({ key: orgAttachmentProducts.dataSheetKey });
      if (!r) throw notFound('library entry');
      if (r.key) await storage.delete(r.key).catch(() => undefined);
    },
  };
}
