import type { CategoryLabels } from '@shared/checks/criteria';
import { diffFields, diffRows } from '@shared/checks/criteria-diff';
import type {
  CriteriaAccess,
  CriteriaDiff,
  CriteriaRow,
  CriteriaSet,
  CriteriaSetMeta,
  CriteriaSetSummary,
} from '@shared/schemas/criteria';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import {
  criteriaRows,
  criteriaSets,
  organisationMembers,
  organisations,
  projects,
  user,
} from '../../db/schema';
import { DomainError, notFound } from '../errors';
import { toRow } from './rows-csv';

export type SetRow = typeof criteriaSets.$inferSelect;

/** The fields of a table's details (compared by an edit and by the diff of two versions). */
export const META_FIELDS = [
  'name',
  'jurisdiction',
  'edition',
  'effectiveDate',
  'notes',
  'sourceReference',
  'categoryLabels',
] as const;

export const metaOf = (s: SetRow): CriteriaSetMeta => ({
  name: s.name,
  jurisdiction: s.jurisdiction,
  edition: s.edition,
  effectiveDate: s.effectiveDate,
  notes: s.notes,
  sourceReference: s.sourceReference,
  categoryLabels: s.categoryLabels as CategoryLabels,
});

/** Reading code tables: one version whole, the latest of a firm's or a project's tables, a lineage's versions, a diff. */
export function createCriteriaQueries(db: Db) {
  const summaryColumns = {
    s: criteriaSets,
    orgName: organisations.name,
    by: user.name,
    rowCount: sql<number>`(select count(*)::int from criteria_rows r where r.set_id = ${criteriaSets.id})`,
    latest: sql<number>`(select max(v.version)::int from criteria_sets v where v.lineage_id = ${criteriaSets.lineageId})`,
  };
  type SummaryRow = { s: SetRow; orgName: string; by: string | null; rowCount: number; latest: number };

  const summaries = () =>
    db
      .select(summaryColumns)
      .from(criteriaSets)
      .innerJoin(organisations, eq(organisations.id, criteriaSets.organisationId))
      .leftJoin(user, eq(user.id, criteriaSets.createdBy));

  function toSummary({ s, orgName, by, rowCount, latest }: SummaryRow): CriteriaSetSummary {
    return {
      id: s.id,
      organisationId: s.organisationId,
      organisationName: orgName,
      lineageId: s.lineageId,
      version: s.version,
      previousVersionId: s.previousVersionId,
      revision: s.revision,
      name: s.name,
      jurisdiction: s.jurisdiction,
      edition: s.edition,
      effectiveDate: s.effectiveDate,
      frozenAt: s.frozenAt?.toISOString() ?? null,
      isLatest: Number(latest) === s.version,
      rowCount: Number(rowCount),
      createdBy: by,
      createdAt: s.createdAt.toISOString(),
      updatedAt: s.updatedAt.toISOString(),
    };
  }

  async function summary(setId: string): Promise<CriteriaSetSummary> {
    const [r] = await summaries().where(eq(criteriaSets.id, setId));
    if (!r) throw notFound('code table');
    return toSummary(r);
  }

  async function rowsOf(setId: string, tx: Db = db): Promise<CriteriaRow[]> {
    const rows = await tx
      .select()
      .from(criteriaRows)
      .where(eq(criteriaRows.setId, setId))
      .orderBy(asc(criteriaRows.position));
    return rows.map(toRow);
  }

  async function get(setId: string, access: CriteriaAccess): Promise<CriteriaSet> {
    const [r] = await summaries().where(eq(criteriaSets.id, setId));
    if (!r) throw notFound('code table');
    return {
      ...toSummary(r),
      notes: r.s.notes,
      sourceReference: r.s.sourceReference,
      categoryLabels: r.s.categoryLabels as CategoryLabels,
      rows: await rowsOf(setId),
      myAccess: access,
    };
  }

  /** The latest version of every table of these firms, by name. */
  async function latestOf(organisationIds: string[]): Promise<CriteriaSetSummary[]> {
    if (organisationIds.length === 0) return [];
    const rows = await summaries()
      .where(inArray(criteriaSets.organisationId, organisationIds))
      .orderBy(asc(criteriaSets.name), desc(criteriaSets.version));
    return rows.map(toSummary).filter((s) => s.isLatest);
  }

  return {
    get,
    summary,
    rowsOf,

    /** The latest version of each of the firm's tables. */
    list: (organisationId: string) => latestOf([organisationId]),

    /** Tables a member of the project may check against: the project firm's and the caller's own firms'. */
    async forProject(projectId: string, userId: string): Promise<CriteriaSetSummary[]> {
      const firms = await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(eq(organisationMembers.userId, userId));
      const [p] = await db
        .select({ org: projects.organisationId })
        .from(projects)
        .where(eq(projects.id, projectId));
      const ids = [...new Set([...(p ? [p.org] : []), ...firms.map((f) => f.id)])];
      const sets = await latestOf(ids);
      // The project's own firm first.
      return [
        ...sets.filter((s) => s.organisationId === p?.org),
        ...sets.filter((s) => s.organisationId !== p?.org),
      ];
    },

    async versions(setId: string): Promise<CriteriaSetSummary[]> {
      const [s] = await db
        .select({ lineage: criteriaSets.lineageId })
        .from(criteriaSets)
        .where(eq(criteriaSets.id, setId));
      if (!s) throw notFound('code table');
      const rows = await summaries()
        .where(eq(criteriaSets.lineageId, s.lineage))
        .orderBy(desc(criteriaSets.version));
      return rows.map(toSummary);
    },

    async diff(setId: string, from: number, to: number): Promise<CriteriaDiff> {
      const [s] = await db
        .select({ lineage: criteriaSets.lineageId })
        .from(criteriaSets)
        .where(eq(criteriaSets.id, setId));
      if (!s) throw notFound('code table');
      const version = async (v: number) => {
        const [r] = await summaries().where(
          and(eq(criteriaSets.lineageId, s.lineage), eq(criteriaSets.version, v)),
        );
        if (!r) throw new DomainError('not_found', 'not_found', `this code table has no version ${v}`);
        return { summary: toSummary(r), meta: metaOf(r.s), rows: await rowsOf(r.s.id) };
      };
      const a = await version(from);
      const b = await version(to);
      return {
        lineageId: s.lineage,
        from: a.summary,
        to: b.summary,
        meta: diffFields(a.meta, b.meta, META_FIELDS),
        ...diffRows(a.rows, b.rows),
      };
    },
  };
}

export type CriteriaQueries = ReturnType<typeof createCriteriaQueries>;
