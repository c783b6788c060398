import type { Photo } from '@shared/inspections/schema';
import { and, eq, isNotNull, sql } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { inspectionPhotos, inspections, projects, submittalItems, submittals } from '../../db/schema';
import { fileIntake, IMAGE_TYPES, type ReceiveFiles, type StoredUpload } from '../../storage/files';
import type { ObjectStore } from '../../storage/object-store';
import { recordAudit } from '../audit';
import { DomainError, notFound } from '../errors';
import { type Actor, type InspectionQueries, photoDto } from './queries';

const MB = 1024 * 1024;

/**
 * Photos of items: PNG or JPEG by their bytes, at most 15 MB each (the client shrinks them first), streamed to
 * object storage under `projects/<project>/inspections/<uuid>` within the project's storage quota, which they
 * share with the submittal files. A photo may be added to a closed inspection too: deficiencies are corrected
 * after sign-off, and the correction needs one.
 */
export function createInspectionPhotos(db: Db, config: Config, storage: ObjectStore, q: InspectionQueries) {
  /** Bytes the project stores: its submittal files (each object once) and its inspection photos. */
  async function storedBytes(tx: Db, projectId: string): Promise<number> {
    const objects = tx
      .selectDistinct({ key: submittalItems.storageKey, size: submittalItems.size })
      .from(submittalItems)
      .innerJoin(submittals, eq(submittals.id, submittalItems.submittalId))
      .where(and(eq(submittals.projectId, projectId), isNotNull(submittalItems.storageKey)))
      .as('objects');
    const [[files], [photos]] = await Promise.all([
      tx.select({ bytes: sql<string>`coalesce(sum(${objects.size}), 0)` }).from(objects),
      tx
        .select({ bytes: sql<string>`coalesce(sum(${inspectionPhotos.size}), 0)` })
        .from(inspectionPhotos)
        .innerJoin(inspections, eq(inspections.id, inspectionPhotos.inspectionId))
        .where(eq(inspections.projectId, projectId)),
    ]);
    return Number(files?.bytes ?? 0) + Number(photos?.bytes ?? 0);
  }

  const quotaFull = (used: number) => {
    const quota = config.storage.projectQuotaBytes;
    return new DomainError(
      'too_large',
      'storage_quota_exceeded',
      `this project’s file storage is full (${(used / MB).toFixed(1)} of ${(quota / MB).toFixed(0)} MB used) and the photo does not fit; nothing was stored`,
      { files: 'project storage quota reached' },
    );
  };

  return {
    async upload(itemId: string, actor: Actor, receive: ReceiveFiles) {
      const item = await q.item(itemId);
      const r = await q.row(item.inspectionId);
      const quota = config.storage.projectQuotaBytes;
      const used = await storedBytes(db, r.projectId);
      if (used >= quota) throw quotaFull(used);
      const intake = fileIntake(storage, {
        keyPrefix: `projects/${r.projectId}/inspections/`,
        room: quota - used,
        full: () => quotaFull(used),
        allowed: IMAGE_TYPES,
      });
      const files = await receive<StoredUpload>(intake);
      let photos: Photo[];
      try {
        photos = await db.transaction(async (tx) => {
          // Uploads to the project take their turn on its row for the quota.
          await tx
            .select({ id: projects.id })
            .from(projects)
            .where(eq(projects.id, r.projectId))
            .for('update');
          const now = await storedBytes(tx, r.projectId);
          if (now + files.reduce((sum, f) => sum + f.size, 0) > quota) throw quotaFull(now);
          const rows = await tx
            .insert(inspectionPhotos)
            .values(
              files.map((f) => ({
                inspectionId: r.id,
                itemId,
                storageKey: f.key,
                fileName: f.name,
                contentType: f.contentType,
                size: f.size,
                sha256: f.sha256,
                createdBy: actor.id,
              })),
            )
            .returning();
          await recordAudit(tx, {
            actorId: actor.id,
            projectId: r.projectId,
            entity: 'inspection',
            entityId: r.id,
            action: 'photo',
            after: {
              item: item.label,
              files: files.map((f) => ({ name: f.name, size: f.size, sha256: f.sha256 })),
            },
          });
          return rows.map(photoDto);
        });
      } catch (err) {
        await Promise.allSettled(files.map(intake.remove));
        throw err;
      }
      return { photos, item: await q.item(itemId) };
    },

    /** A stored photo, to stream back. */
    async file(photoId: string) {
      const [p] = await db.select().from(inspectionPhotos).where(eq(inspectionPhotos.id, photoId));
      if (!p) throw notFound('photo');
      const object = await storage.get(p.storageKey);
      return { body: object.body, name: p.fileName, contentType: p.contentType, size: p.size };
    },
  };
}
