import type { ComputedBridge } from '@shared/calc/bridge/computed';
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
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import type { z } from 'zod';
import type { StorageConfig } from '../config';
import type { Db } from '../db/client';
import { orgAttachmentProducts, organisations, orgBridgeValues, orgMaterials } from '../db/schema';
import type { ReceiveFiles } from '../storage/files';
import { fileIntake, type StoredUpload, skipFile, storedDownload } from '../storage/files';
import type { ObjectStore } from '../storage/object-store';
import { DomainError, notFound } from './errors';

type ProductRow = typeof orgAttachmentProducts.$inferSelect;
const MB = 1024 * 1024;

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
export function createLibraryService(
  db: Db,
  storage: ObjectStore,
  quota: Pick<StorageConfig, 'firmQuotaBytes'>,
) {
  async function productRow(organisationId: string, id: string): Promise<ProductRow> {
    const [r] = await db
      .select()
      .from(orgAttachmentProducts)
      .where(and(eq(orgAttachmentProducts.id, id), eq(orgAttachmentProducts.organisationId, organisationId)));
    if (!r) throw notFound('library entry');
    return r;
  }
  /** Bytes of the firm's stored data sheets, leaving out the entry whose sheet is being replaced. */
  async function dataSheetBytes(q: Db, organisationId: string, except: string): Promise<number> {
    const [r] = await q
      .select({ bytes: sql<string>`coalesce(sum(${orgAttachmentProducts.dataSheetSize}), 0)` })
      .from(orgAttachmentProducts)
      .where(
        and(eq(orgAttachmentProducts.organisationId, organisationId), ne(orgAttachmentProducts.id, except)),
      );
    return Number(r?.bytes ?? 0);
  }
  const libraryFull = (used: number) =>
    new DomainError(
      'too_large',
      'storage_quota_exceeded',
      `the firm’s library storage is full (${(used / MB).toFixed(1)} of ${(quota.firmQuotaBytes / MB).toFixed(0)} MB of data sheets) and this one does not fit; remove entries that are no longer needed, or ask the site administrator to raise the quota. Nothing was stored`,
      { files: 'firm library storage quota reached' },
    );
  return {
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
        ...(r.computed ? { computed: r.computed as ComputedBridge } : {}),
        createdAt: r.createdAt.toISOString(),
      }));
    },
    async addBridgeValue(
      organisationId: string,
      input: z.infer<typeof bridgeValueInputSchema>,
    ): Promise<BridgeValue> {
      const [r] = await db
        .insert(orgBridgeValues)
        .values({ organisationId, ...input, computed: input.computed ?? null })
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
     * Stores the maker's data sheet of an entry (one PDF, PNG or JPEG, judged by its first bytes and streamed
     * to object storage), replacing the one before. Data sheets count against the firm's library quota (the
     * sheet being replaced does not). The new object is stored before the row points at it — in a
     * transaction that takes its turn on the firm's row for the quota and on the entry's for the old key —
     * and the old one goes afterwards.
     */
    async uploadDataSheet(
      organisationId: string,
      id: string,
      receive: ReceiveFiles,
    ): Promise<AttachmentProduct> {
      await productRow(organisationId, id);
      const used = await dataSheetBytes(db, organisationId, id);
      if (used >= quota.firmQuotaBytes) throw libraryFull(used);
      const intake = fileIntake(storage, {
        keyPrefix: `organisations/${organisationId}/data-sheets/`,
        room: quota.firmQuotaBytes - used,
        full: () => libraryFull(used),
      });
      // The first file is the data sheet; any more are read past (not stored) only to be counted.
      let arrived = 0;
      const files = await receive<StoredUpload | null>({
        store: (file) => (arrived++ === 0 ? intake.store(file) : skipFile(file)),
        remove: async (stored) => {
          if (stored) await intake.remove(stored);
        },
      });
      const [sheet] = files;
      let old: string | null;
      try {
        if (files.length !== 1 || !sheet)
          throw new DomainError(
            'malformed',
            'one_file',
            'upload exactly one data sheet; nothing was stored',
            {
              files: `${files.length} files sent`,
            },
          );
        old = await db.transaction(async (tx) => {
          await tx
            .select({ id: organisations.id })
            .from(organisations)
            .where(eq(organisations.id, organisationId))
            .for('update');
          const now = await dataSheetBytes(tx, organisationId, id);
          if (now + sheet.size > quota.firmQuotaBytes) throw libraryFull(now);
          const [entry] = await tx
            .select({ key: orgAttachmentProducts.dataSheetKey })
            .from(orgAttachmentProducts)
            .where(
              and(eq(orgAttachmentProducts.id, id), eq(orgAttachmentProducts.organisationId, organisationId)),
            )
            .for('update');
          if (!entry) throw notFound('library entry');
          await tx
            .update(orgAttachmentProducts)
            .set({
              dataSheetKey: sheet.key,
              dataSheetName: sheet.name,
              dataSheetType: sheet.contentType,
              dataSheetSize: sheet.size,
              dataSheetSha256: sheet.sha256,
              dataSheetUploadedAt: new Date(),
            })
            .where(eq(orgAttachmentProducts.id, id));
          return entry.key;
        });
      } catch (err) {
        await Promise.allSettled(files.map((f) => f && intake.remove(f)));
        throw err;
      }
      if (old) await storage.delete(old).catch(() => undefined);
      return toProduct(await productRow(organisationId, id));
    },
    /** The stored data sheet of an entry, to stream back; 404 when none was uploaded. */
    async dataSheet(organisationId: string, id: string) {
      const r = await productRow(organisationId, id);
      if (!r.dataSheetKey) throw notFound('data sheet');
      return storedDownload(storage, r.dataSheetKey, {
        name: r.dataSheetName ?? 'data sheet',
        contentType: r.dataSheetType,
        size: r.dataSheetSize,
      });
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
