import { and, eq, isNotNull, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { inspectionPhotos, inspections, projects, submittalItems, submittals } from '../db/schema';
import { fileIntake } from '../storage/files';
import type { ObjectStore } from '../storage/object-store';
import { DomainError } from './errors';

const MB = 1024 * 1024;

/**
 * Bytes a project stores against its quota (`config.storage.projectQuotaBytes`): its submittal files (each
 * object once — revisions share their objects) and its inspection photos. Submittal uploads and photo uploads
 * both check this one figure.
 */
export async function projectStoredBytes(tx: Db, projectId: string): Promise<number> {
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

/** 413 `storage_quota_exceeded`: the project's storage is full and `what` ("the upload", "the photo") does not fit. */
export const quotaFull = (used: number, quota: number, what: string) =>
  new DomainError(
    'too_large',
    'storage_quota_exceeded',
    `this project’s file storage is full (${(used / MB).toFixed(1)} of ${(quota / MB).toFixed(0)} MB used) and ${what} does not fit; remove files that are no longer needed, or ask the site administrator to raise the quota. Nothing was stored`,
    { files: 'project storage quota reached' },
  );

/**
 * Inside the transaction that records new files: takes the project's turn on its row (uploads to one project
 * wait for each other) and checks that `adding` more bytes still fit `quota` — 413 otherwise.
 */
export async function takeQuotaTurn(tx: Db, projectId: string, adding: number, quota: number, what: string) {
  await tx.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId)).for('update');
  const now = await projectStoredBytes(tx, projectId);
  if (now + adding > quota) throw quotaFull(now, quota, what);
}

/**
 * Before an upload: 413 when the project's storage is already full (`used` of `quota` bytes), else the intake
 * that streams the files to `projects/<project>/<folder>/` within the room left (413 once they outgrow it).
 */
export function projectIntake(
  storage: ObjectStore,
  p: {
    projectId: string;
    folder: string;
    used: number;
    quota: number;
    what: string;
    allowed?: readonly string[];
  },
) {
  const full = () => quotaFull(p.used, p.quota, p.what);
  if (p.used >= p.quota) throw full();
  return fileIntake(storage, {
    keyPrefix: `projects/${p.projectId}/${p.folder}/`,
    room: p.quota - p.used,
    full,
    allowed: p.allowed,
  });
}
