import type { Verdict } from '@shared/checks/report';
import {
  type FieldReportVerification,
  fieldReportVerificationSchema,
  type SheetIssuer,
  type Verification,
} from '@shared/schemas/sheets';
import type { SavedSweep } from '@shared/schemas/sweeps';
import { normaliseVerificationCode, verificationCode, verificationUrl } from '@shared/sheets/verification';
import type { UnitSystem } from '@shared/units';
import { asc, eq } from 'drizzle-orm';
import type { Config } from '../config';
import type { Db } from '../db/client';
import {
  checkRuns,
  fieldReportVerifications,
  organisationMembers,
  organisations,
  projects,
  sheetVerifications,
  user,
} from '../db/schema';
import type { Mailer } from '../mail/mailer';
import { renderComplianceSheet } from '../pdf/sheet';
import type { ObjectStore } from '../storage/object-store';
import type { createCheckRunService } from './check-runs';
import { DomainError, notFound } from './errors';
import { firmHandle } from './organisations';

/** Rendered sheets, by run, units and issuer's standing: the same key always gives the same bytes, so a few are kept. */
const CACHE_SIZE = 16;

const issuerOf = (r: { name: string; slug: string | null; verifiedAt: Date | null }): SheetIssuer => ({
  name: r.name,
  handle: r.slug === null ? null : firmHandle(r.slug),
  verifiedAt: r.verifiedAt?.toISOString() ?? null,
});

/** The name and the e-mail's domain are enough to tell who it was; the whole address is not given out. */
const accountOf = (a: { name: string; email: string }) => ({
  name: a.name,
  emailDomain: a.email.slice(a.email.lastIndexOf('@') + 1),
});

export const noSuchSheet = () =>
  new DomainError('not_found', 'no_such_sheet', 'no such sheet: the code is unknown, mistyped or altered');

/**
 * Compliance sheets: the PDF of a stored check run, and the verification codes printed on them. A code is
 * recorded (with the issuing firm) the first time a run's sheet is issued — rendered or attached to a
 * submittal — and from then on the public verification page confirms it.
 */
export function createSheetService(db: Db, config: Config, runs: ReturnType<typeof createCheckRunService>) {
  const cache = new Map<string, Buffer>();

  /** The firm that issues a run's sheet: the preparer's firm (the project's firm when they belong to it). */
  async function issuingFirm(runId: string): Promise<{ organisationId: string | null; name: string }> {
    const [r] = await db
      .select({
        createdBy: checkRuns.createdBy,
        projectOrg: projects.organisationId,
        projectOrgName: organisations.name,
      })
      .from(checkRuns)
      .innerJoin(projects, eq(projects.id, checkRuns.projectId))
      .innerJoin(organisations, eq(organisations.id, projects.organisationId))
      .where(eq(checkRuns.id, runId));
    if (!r) throw notFound('check run');
    const firms = r.createdBy
      ? await db
          .select({ id: organisations.id, name: organisations.name })
          .from(organisationMembers)
          .innerJoin(organisations, eq(organisations.id, organisationMembers.organisationId))
          .where(eq(organisationMembers.userId, r.createdBy))
          .orderBy(asc(organisationMembers.createdAt), asc(organisations.name))
      : [];
    const firm = firms.find((f) => f.id === r.projectOrg) ?? firms[0];
    return firm
      ? { organisationId: firm.id, name: firm.name }
      : { organisationId: r.projectOrg, name: r.projectOrgName };
  }

  /** The issuer recorded with a code: the name it was issued under, the firm's handle and standing now. */
  async function issuerByCode(code: string): Promise<SheetIssuer | undefined> {
    const [r] = await db
      .select({
        name: sheetVerifications.issuerName,
        slug: organisations.slug,
        verifiedAt: organisations.verifiedAt,
      })
      .from(sheetVerifications)
      .leftJoin(organisations, eq(organisations.id, sheetVerifications.issuerOrganisationId))
      .where(eq(sheetVerifications.code, code));
    return r && issuerOf(r);
  }

  /**
   * Records the verification code of a run's content (once). The hash leaves out when and by whom a run
   * was made, so runs of identical inputs share one code: the record keeps the first run issued with it,
   * and later ones print (and verify as) that record.
   */
  async function issue(runId: string, hash: string): Promise<{ code: string; issuer: SheetIssuer }> {
    const code = verificationCode(hash);
    const existing = await issuerByCode(code);
    if (existing) return { code, issuer: existing };
    const firm = await issuingFirm(runId);
    await db
      .insert(sheetVerifications)
      .values({ code, runId, issuerOrganisationId: firm.organisationId, issuerName: firm.name })
      .onConflictDoNothing();
    const issuer = await issuerByCode(code);
    if (!issuer) throw new Error(`the verification code ${code} was not recorded`);
    return { code, issuer };
  }

  return {
    issue: async (runId: string) => {
      const run = await runs.get(runId);
      return issue(run.id, run.hash);
    },

    /** The sheet of a run as PDF bytes, in the units asked for (default: the caller's preference). */
    async render(runId: string, userId: string, units?: UnitSystem, sweep?: SavedSweep) {
      const run = await runs.get(runId);
      if (sweep && sweep.assemblyId !== run.assemblyId)
        throw new DomainError('not_found', 'not_found', 'sweep not found', {
          sweep: 'no saved sweep of this run’s assembly has this id',
        });
      const [p] = await db
        .select({ number: projects.number, siteAddress: projects.siteAddress })
        .from(projects)
        .where(eq(projects.id, run.projectId));
      const [me] = await db.select({ unitSystem: user.unitSystem }).from(user).where(eq(user.id, userId));
      const system: UnitSystem = units ?? (me?.unitSystem === 'IP' ? 'IP' : 'SI');
      const { code, issuer } = await issue(run.id, run.hash);
      // The issuer's standing is printed as it is now, so it is part of the key: verifying the firm (or
      // withdrawing that) gives a new sheet, the same standing the same bytes.
      const key = JSON.stringify([
        run.id,
        system,
        p?.number ?? '',
        p?.siteAddress ?? '',
        issuer,
        sweep ? [sweep.id, sweep.currentRevision] : null,
      ]);
      let pdf = cache.get(key);
      if (!pdf) {
        pdf = renderComplianceSheet({
          run,
          project: { number: p?.number ?? '', siteAddress: p?.siteAddress ?? '' },
          preparedBy: run.createdBy,
          issuer,
          code,
          verifyUrl: verificationUrl(config.baseUrl, code),
          units: system,
          sweep,
        });
        if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value!);
        cache.set(key, pdf);
      }
      const slug = run.assemblyName
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '')
        .slice(0, 50);
      return { pdf, code, filename: `compliance-sheet-${slug || 'assembly'}-${code}.pdf` };
    },

    /** Public: what a verification code confirms (a compliance sheet or a field report), or 404 "no such sheet". */
    async verify(input: string): Promise<Verification> {
      const code = normaliseVerificationCode(input);
      if (!code) throw noSuchSheet();
      return (await verifySheet(code)) ?? (await verifyFieldReport(code));
    },
  };

  /** A compliance sheet's code: what its run states, or undefined when no sheet has the code. */
  async function verifySheet(code: string): Promise<Verification | undefined> {
    const [r] = await db
      .select({
        v: sheetVerifications,
        run: checkRuns,
        projectNumber: projects.number,
        slug: organisations.slug,
        verifiedAt: organisations.verifiedAt,
        ranBy: { name: user.name, email: user.email },
      })
      .from(sheetVerifications)
      .innerJoin(checkRuns, eq(checkRuns.id, sheetVerifications.runId))
      .innerJoin(projects, eq(projects.id, checkRuns.projectId))
      .leftJoin(organisations, eq(organisations.id, sheetVerifications.issuerOrganisationId))
      .leftJoin(user, eq(user.id, checkRuns.createdBy))
      .where(eq(sheetVerifications.code, code));
    if (!r) return undefined;
    // The code must still be the one derived from the stored hash (a run is immutable; this is a guard).
    if (verificationCode(r.run.hash) !== code) throw noSuchSheet();
    const inputs = r.run.inputs as { project: { name: string } };
    return {
      kind: 'sheet',
      code,
      issuer: issuerOf({ name: r.v.issuerName, slug: r.slug, verifiedAt: r.verifiedAt }),
      ranBy: r.ranBy && accountOf(r.ranBy),
      project: { name: inputs.project.name, number: r.projectNumber },
      assembly: { name: r.run.assemblyName, revision: r.run.assemblyRevision },
      criteriaSet: { name: r.run.criteriaSetName, version: r.run.criteriaSetVersion },
      runAt: r.run.createdAt.toISOString(),
      verdict: r.run.verdict as Verdict,
      engineVersion: r.run.engineVersion,
      hash: r.run.hash,
    };
  }

  /** A field report's code: what the report showed when it was first printed, or 404. */
  async function verifyFieldReport(code: string): Promise<FieldReportVerification> {
    const [r] = await db
      .select({
        v: fieldReportVerifications,
        slug: organisations.slug,
        verifiedAt: organisations.verifiedAt,
        issuedBy: { name: user.name, email: user.email },
      })
      .from(fieldReportVerifications)
      .leftJoin(organisations, eq(organisations.id, fieldReportVerifications.issuerOrganisationId))
      .leftJoin(user, eq(user.id, fieldReportVerifications.issuedBy))
      .where(eq(fieldReportVerifications.code, code));
    if (!r || verificationCode(r.v.hash) !== code) throw noSuchSheet();
    const summary = r.v.summary as {
      projectName: string;
      projectNumber: string;
      inspection: FieldReportVerification['inspection'];
      assembly: FieldReportVerification['assembly'];
      asOf: string;
    };
    return fieldReportVerificationSchema.parse({
      kind: 'field report',
      code,
      issuer: issuerOf({ name: r.v.issuerName, slug: r.slug, verifiedAt: r.verifiedAt }),
      issuedBy: r.issuedBy && accountOf(r.issuedBy),
      project: { name: summary.projectName, number: summary.projectNumber },
      inspection: summary.inspection,
      assembly: summary.assembly,
      asOf: summary.asOf,
      issuedAt: r.v.issuedAt.toISOString(),
      hash: r.v.hash,
    });
  }
}

/** What a workflow with files, e-mail and printed sheets is built from (submittals, field inspections). */
export interface FileWorkflowDeps {
  db: Db;
  config: Config;
  mailer: Mailer;
  storage: ObjectStore;
  sheets: ReturnType<typeof createSheetService>;
}
