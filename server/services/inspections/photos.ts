import type { Photo } from '@shared/inspections/schema';
import { eq } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { inspectionPhotos } from '../../db/schema';
import { IMAGE_TYPES, type ReceiveFiles, type StoredUpload, storedDownload } from '../../storage/files';
import type { ObjectStore } from '../../storage/object-store';
import { recordAudit } from '../audit';
import { notFound } from '../errors';
import { projectIntake, projectStoredBytes, takeQuotaTurn } from '../project-storage';
import { type Actor, type InspectionQueries, photoDto } from './queries';

/**
 * Photos of items: PNG or JPEG by their bytes, at most 15 MB each (the client shrinks them first), streamed to
 * object storage under `projects/<project>/inspections/<uuid>` within the project's storage quota, which they
 * share with the submittal files. A photo may be added to a closed inspection too: deficiencies are corrected
 * after sign-off, and the correction needs one.
 */
export function createInspectionPhotos(db: Db, config: Config, storage: ObjectStore, q: InspectionQueries) {
  return {
    async upload(itemId: string, actor: Actor, receive: ReceiveFiles) {
      const item = await q.item(itemId);
      const r = await q.row(item.inspectionId);
      const quota = config.storage.projectQuotaBytes;
      const used = await projectStoredBytes(db, r.projectId);
      const intake = projectIntake(storage, {
        projectId: r.projectId,
        folder: 'inspections',
        used,
        quota,
        what: 'the photo',
        allowed: IMAGE_TYPES,
      });
      const files = await receive<StoredUpload>(intake);
      let photos: Photo[];
      try {
        photos = await db.transaction(async (tx) => {
          const size = files.reduce((sum, f) => sum + f.size, 0);
          await takeQuotaTurn(tx, r.projectId, size, quota, 'the photo');
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
      return storedDownload(storage, p.storageKey, {
        name: p.fileName,
        contentType: p.contentType,
        size: p.size,
      });
    },
  };
}
