import { createHash } from 'node:crypto';
import { canonicalJson } from '@shared/checks/canonical';
import { verificationCode, verificationUrl } from '@shared/sheets/verification';
import type { UnitSystem } from '@shared/units/registry';
import { asc, eq } from 'drizzle-orm';
import type { Config } from '../../config';
import type { Db } from '../../db/client';
import { fieldReportVerifications, inspectionPhotos, organisations, projects, user } from '../../db/schema';
import { type ReportPhoto, renderFieldReport } from '../../pdf/field-report';
import type { ObjectStore } from '../../storage/object-store';
import type { InspectionQueries } from './queries';

/** Photos printed beside each item, and in the whole report by count and bytes (the rest stay in the app). */
const PHOTOS_PER_ITEM = 2;
const PHOTOS_PER_REPORT = 80;
const PHOTO_BYTES_PER_REPORT = 40 * 1024 * 1024;

async function readAll(body: AsyncIterable<unknown>): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of body) chunks.push(Buffer.from(c as Uint8Array));
  return Buffer.concat(chunks);
}

/**
 * The field report of an inspection as PDF bytes (server/pdf/field-report.ts). Its code is the first 10 base32
 * characters of the SHA-256 of the canonical JSON of the inspection as read and its photos' hashes, so the
 * same content gives the same code and the same bytes. The first report printed with a code records it, with
 * the project's firm and what the report showed, for the public /verify page.
 */
export function createFieldReports(db: Db, config: Config, storage: ObjectStore, q: InspectionQueries) {
  return {
    async report(id: string, userId: string, units?: UnitSystem) {
      const inspection = await q.get(id);
      const [[project], [me], rows] = await Promise.all([
        db
          .select({
            name: projects.name,
            number: projects.number,
            organisationId: projects.organisationId,
            firm: organisations.name,
          })
          .from(projects)
          .innerJoin(organisations, eq(organisations.id, projects.organisationId))
          .where(eq(projects.id, inspection.projectId)),
        db.select({ unitSystem: user.unitSystem }).from(user).where(eq(user.id, userId)),
        db
          .select()
          .from(inspectionPhotos)
          .where(eq(inspectionPhotos.inspectionId, id))
          .orderBy(asc(inspectionPhotos.createdAt)),
      ]);
      const system: UnitSystem = units ?? (me?.unitSystem === 'IP' ? 'IP' : 'SI');
      const chosen: typeof rows = [];
      let bytes = 0;
      for (const p of inspection.items.flatMap((item) =>
        rows.filter((r) => r.itemId === item.id).slice(0, PHOTOS_PER_ITEM),
      )) {
        if (chosen.length >= PHOTOS_PER_REPORT || bytes + p.size > PHOTO_BYTES_PER_REPORT) break;
        chosen.push(p);
        bytes += p.size;
      }
      const photos: ReportPhoto[] = await Promise.all(
        chosen.map(async (p) => ({
          itemId: p.itemId,
          bytes: await readAll((await storage.get(p.storageKey)).body),
          format: p.contentType === 'image/png' ? ('PNG' as const) : ('JPEG' as const),
        })),
      );
      const hash = createHash('sha256')
        .update(canonicalJson({ inspection, photos: rows.map((p) => p.sha256) }))
        .digest('hex');
      const times = [
        inspection.createdAt,
        inspection.closedAt,
        ...inspection.items.map((i) => i.answeredAt),
        ...inspection.deficiencies.map((d) => d.updatedAt),
        ...rows.map((p) => p.createdAt.toISOString()),
      ].filter((t): t is string => t !== null);
      const asOf = times.sort().at(-1)!; // ISO times sort as text
      const code = verificationCode(hash);
      if (project) {
        const { number, title, scope, status, counts, assemblyName } = inspection;
        const summary = {
          projectName: project.name,
          projectNumber: project.number,
          inspection: { number, title, elevation: scope.elevation, area: scope.area, status, counts },
          assembly: { name: assemblyName, revision: scope.revision },
          asOf,
        };
        await db
          .insert(fieldReportVerifications)
          .values({
            code,
            inspectionId: id,
            hash,
            issuerOrganisationId: project.organisationId,
            issuerName: project.firm,
            issuedBy: userId,
            summary,
          })
          .onConflictDoNothing();
      }
      const pdf = renderFieldReport({
        inspection,
        projectName: project?.name ?? '',
        units: system,
        photos,
        hash,
        code,
        verifyUrl: verificationUrl(config.baseUrl, code),
        asOf,
      });
      return { pdf, code, filename: `inspection-${inspection.number}-${code}.pdf` };
    },
  };
}
