import type { ProjectRole } from '@shared/auth/permissions';
import {
  type Deficiency,
  type Inspection,
  type InspectionArea,
  type InspectionItem,
  type InspectionSummary,
  type ItemGroup,
  type ItemKind,
  type ItemQuantity,
  type ItemSource,
  type ItemState,
  isDeficiencyOpen,
  type Photo,
  type Tolerance,
} from '@shared/inspections/schema';
import { checkMeasured } from '@shared/inspections/tolerance';
import { and, asc, desc, eq, inArray, ne, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Db } from '../../db/client';
import {
  inspectionDeficiencies,
  inspectionItems,
  inspectionPhotos,
  inspections,
  projectMembers,
  user,
} from '../../db/schema';
import { conflict, notFound } from '../errors';
import { ownerOf } from '../owner';

export type InspectionRow = typeof inspections.$inferSelect;
export type ItemRow = typeof inspectionItems.$inferSelect;
export type DeficiencyRow = typeof inspectionDeficiencies.$inferSelect;
export type PhotoRow = typeof inspectionPhotos.$inferSelect;
export type Actor = { id: string; name: string };

const iso = (d: Date | null) => (d ? d.toISOString() : null);
export const photoUrl = (id: string) => `/api/inspection-photos/${id}`;

/** A closed inspection's checklist no longer changes (its deficiencies still go on to be corrected). */
export const closedError = (r: Pick<InspectionRow, 'number'>) =>
  conflict('closed', `inspection ${r.number} is closed: its answers no longer change`);

export function photoDto(p: PhotoRow): Photo {
  return {
    id: p.id,
    itemId: p.itemId,
    contentType: p.contentType,
    size: p.size,
    name: p.fileName,
    createdBy: p.createdBy,
    createdAt: p.createdAt.toISOString(),
    url: photoUrl(p.id),
  };
}

export function itemDto(r: ItemRow, answeredByName: string | null, photos: Photo[]): InspectionItem {
  const tolerance = r.tolerance as Tolerance | null;
  return {
    id: r.id,
    inspectionId: r.inspectionId,
    position: r.position,
    kind: r.kind as ItemKind,
    group: r.itemGroup as ItemGroup,
    label: r.label,
    designText: r.designText,
    quantity: r.quantity as ItemQuantity | null,
    designValue: r.designValue,
    tolerance,
    source: r.source as ItemSource,
    state: r.state as ItemState,
    measured: r.measured,
    check: checkMeasured({ tolerance }, r.measured),
    note: r.note,
    location: r.location,
    version: r.version,
    answeredBy: r.answeredBy,
    answeredByName,
    answeredAt: iso(r.answeredAt),
    photos,
  };
}

export function deficiencyDto(r: DeficiencyRow, itemLabel: string, ownerName: string | null): Deficiency {
  return {
    id: r.id,
    inspectionId: r.inspectionId,
    itemId: r.itemId,
    itemLabel,
    number: r.number,
    state: r.state as Deficiency['state'],
    description: r.description,
    ownerId: r.ownerId,
    ownerName,
    dueDate: r.dueDate,
    correctionPhotoId: r.correctionPhotoId,
    note: r.note,
    version: r.version,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** Reading inspections whole or as a list, one item or deficiency, and the project of each (for access). */
export function createInspectionQueries(db: Db) {
  const creator = alias(user, 'creator');
  const closer = alias(user, 'closer');

  async function row(id: string): Promise<InspectionRow> {
    const [r] = await db.select().from(inspections).where(eq(inspections.id, id));
    if (!r) throw notFound('inspection');
    return r;
  }

  async function heads(where: ReturnType<typeof eq>) {
    return db
      .select({ r: inspections, createdByName: creator.name, closedByName: closer.name })
      .from(inspections)
      .leftJoin(creator, eq(creator.id, inspections.createdBy))
      .leftJoin(closer, eq(closer.id, inspections.closedBy))
      .where(where)
      .orderBy(desc(inspections.number));
  }

  /** Items by state and open deficiencies, per inspection. */
  async function countsOf(ids: string[]) {
    const out = new Map<string, InspectionSummary['counts']>();
    if (ids.length === 0) return out;
    for (const id of ids) out.set(id, { items: 0, unseen: 0, pass: 0, fail: 0, na: 0, openDeficiencies: 0 });
    const states = await db
      .select({
        id: inspectionItems.inspectionId,
        state: inspectionItems.state,
        n: sql<number>`count(*)::int`,
      })
      .from(inspectionItems)
      .where(inArray(inspectionItems.inspectionId, ids))
      .groupBy(inspectionItems.inspectionId, inspectionItems.state);
    for (const s of states) {
      const c = out.get(s.id)!;
      c.items += Number(s.n);
      c[s.state as ItemState] += Number(s.n);
    }
    const open = await db
      .select({ id: inspectionDeficiencies.inspectionId, n: sql<number>`count(*)::int` })
      .from(inspectionDeficiencies)
      .where(
        and(inArray(inspectionDeficiencies.inspectionId, ids), ne(inspectionDeficiencies.state, 'accepted')),
      )
      .groupBy(inspectionDeficiencies.inspectionId);
    for (const o of open) out.get(o.id)!.openDeficiencies = Number(o.n);
    return out;
  }

  function summary(
    h: Awaited<ReturnType<typeof heads>>[number],
    counts: InspectionSummary['counts'],
  ): InspectionSummary {
    const r = h.r;
    return {
      id: r.id,
      projectId: r.projectId,
      number: r.number,
      title: r.title,
      status: r.status as InspectionSummary['status'],
      scope: {
        assemblyId: r.assemblyId,
        revision: r.assemblyRevision,
        elevation: r.elevation,
        area: r.area as InspectionArea,
      },
      assemblyName: r.assemblyName,
      checkRunId: r.checkRunId,
      sheetCode: r.sheetCode,
      counts,
      version: r.version,
      createdBy: r.createdBy,
      createdByName: h.createdByName,
      createdAt: r.createdAt.toISOString(),
      closedAt: iso(r.closedAt),
      closedByName: h.closedByName,
    };
  }

  async function photosOf(where: ReturnType<typeof eq>): Promise<Map<string, Photo[]>> {
    const rows = await db
      .select()
      .from(inspectionPhotos)
      .where(where)
      .orderBy(asc(inspectionPhotos.createdAt));
    const byItem = new Map<string, Photo[]>();
    for (const p of rows) byItem.set(p.itemId, [...(byItem.get(p.itemId) ?? []), photoDto(p)]);
    return byItem;
  }

  async function item(itemId: string): Promise<InspectionItem> {
    const [r] = await db
      .select({ r: inspectionItems, name: user.name })
      .from(inspectionItems)
      .leftJoin(user, eq(user.id, inspectionItems.answeredBy))
      .where(eq(inspectionItems.id, itemId));
    if (!r) throw notFound('item');
    const photos = await photosOf(eq(inspectionPhotos.itemId, itemId));
    return itemDto(r.r, r.name, photos.get(itemId) ?? []);
  }

  async function deficiencies(where: ReturnType<typeof eq>): Promise<Deficiency[]> {
    const rows = await db
      .select({ r: inspectionDeficiencies, label: inspectionItems.label, ownerName: user.name })
      .from(inspectionDeficiencies)
      .innerJoin(inspectionItems, eq(inspectionItems.id, inspectionDeficiencies.itemId))
      .leftJoin(user, eq(user.id, inspectionDeficiencies.ownerId))
      .where(where)
      .orderBy(asc(inspectionDeficiencies.number));
    return rows.map((x) => deficiencyDto(x.r, x.label, x.ownerName));
  }

  async function deficiency(id: string): Promise<Deficiency> {
    const [d] = await deficiencies(eq(inspectionDeficiencies.id, id));
    if (!d) throw notFound('deficiency');
    return d;
  }

  /** Who signed: the creator and the one who closed it, with their role on the project now. */
  async function signatures(r: InspectionRow, names: { created: string | null; closed: string | null }) {
    const ids = [r.createdBy, r.closedBy].filter((x): x is string => x !== null);
    const roles =
      ids.length === 0
        ? []
        : await db
            .select({ userId: projectMembers.userId, role: projectMembers.role })
            .from(projectMembers)
            .where(and(eq(projectMembers.projectId, r.projectId), inArray(projectMembers.userId, ids)));
    const roleOf = (id: string | null) => roles.find((x) => x.userId === id)?.role as ProjectRole | undefined;
    const out: Inspection['signatures'] = [];
    const created = roleOf(r.createdBy);
    if (names.created && created)
      out.push({ name: names.created, role: created, at: r.createdAt.toISOString(), what: 'created' });
    const closed = roleOf(r.closedBy);
    if (names.closed && closed && r.closedAt)
      out.push({ name: names.closed, role: closed, at: r.closedAt.toISOString(), what: 'closed' });
    return out;
  }

  return {
    row,
    item,
    deficiency,
    deficiencies,

    async get(id: string): Promise<Inspection> {
      const [h] = await heads(eq(inspections.id, id));
      if (!h) throw notFound('inspection');
      const [counts, itemRows, photos, defs] = await Promise.all([
        countsOf([id]),
        db
          .select({ r: inspectionItems, name: user.name })
          .from(inspectionItems)
          .leftJoin(user, eq(user.id, inspectionItems.answeredBy))
          .where(eq(inspectionItems.inspectionId, id))
          .orderBy(asc(inspectionItems.position)),
        photosOf(eq(inspectionPhotos.inspectionId, id)),
        deficiencies(eq(inspectionDeficiencies.inspectionId, id)),
      ]);
      return {
        ...summary(h, counts.get(id)!),
        items: itemRows.map((x) => itemDto(x.r, x.name, photos.get(x.r.id) ?? [])),
        deficiencies: defs,
        signatures: await signatures(h.r, { created: h.createdByName, closed: h.closedByName }),
      };
    },

    async list(projectId: string): Promise<InspectionSummary[]> {
      const hs = await heads(eq(inspections.projectId, projectId));
      const counts = await countsOf(hs.map((h) => h.r.id));
      return hs.map((h) => summary(h, counts.get(h.r.id)!));
    },

    /** The deficiencies of an inspection still to be dealt with (not accepted). */
    async openDeficiencies(id: string): Promise<Deficiency[]> {
      return (await deficiencies(eq(inspectionDeficiencies.inspectionId, id))).filter((d) =>
        isDeficiencyOpen(d.state),
      );
    },

    projectOf: ownerOf(db, { from: inspections, key: inspections.id, owner: inspections.projectId }),
    projectOfItem: ownerOf(db, {
      from: inspectionItems,
      key: inspectionItems.id,
      owner: inspections.projectId,
      join: { table: inspections, on: eq(inspections.id, inspectionItems.inspectionId) },
    }),
    projectOfDeficiency: ownerOf(db, {
      from: inspectionDeficiencies,
      key: inspectionDeficiencies.id,
      owner: inspections.projectId,
      join: { table: inspections, on: eq(inspections.id, inspectionDeficiencies.inspectionId) },
    }),
    projectOfPhoto: ownerOf(db, {
      from: inspectionPhotos,
      key: inspectionPhotos.id,
      owner: inspections.projectId,
      join: { table: inspections, on: eq(inspections.id, inspectionPhotos.inspectionId) },
    }),
  };
}
export type InspectionQueries = ReturnType<typeof createInspectionQueries>;
