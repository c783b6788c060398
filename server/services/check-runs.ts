import { createHash } from 'node:crypto';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { canonicalJson } from '@shared/checks/canonical';
import type { CategoryLabels } from '@shared/checks/criteria';
import type { ProjectForChecks } from '@shared/checks/inputs';
import type { CheckReport } from '@shared/checks/report';
import { runChecks } from '@shared/checks/runner';
import type { CheckRun, CheckRunInputs, CheckRunSummary } from '@shared/schemas/check-runs';
import type { ProjectClimate, ProjectWind } from '@shared/schemas/project';
import { and, desc, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { checkRuns, organisationMembers, type projects, user } from '../db/schema';
import { currentAssembly } from './assemblies';
import { recordAudit } from './audit';
import type { createCriteriaService } from './criteria';
import { notFound } from './errors';
import { ownerOf } from './owner';
import { archivedError } from './projects';

type RunRow = typeof checkRuns.$inferSelect;

const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

/** The three hashes of a run: of the inputs, of the outputs, and of both with the engine version. */
export function checkRunHashes(engineVersion: string, inputs: CheckRunInputs, outputs: CheckReport) {
  return {
    inputsHash: sha256(canonicalJson(inputs)),
    outputsHash: sha256(canonicalJson(outputs)),
    hash: sha256(canonicalJson({ engineVersion, inputs, outputs })),
  };
}

/** A stored project's data as the checks read it. */
export function projectForChecks(p: typeof projects.$inferSelect): ProjectForChecks {
  return {
    climateZone: p.climateZone as ProjectForChecks['climateZone'],
    elevationM: p.elevationM,
    buildingHeightM: p.buildingHeightM,
    planLengthM: p.planLengthM,
    planWidthM: p.planWidthM,
    indoorTempC: p.indoorTempC,
    indoorRh: p.indoorRh,
    winterDesignTempC: p.winterDesignTempC,
    summerDesignTempC: p.summerDesignTempC,
    wind: (p.wind as ProjectWind | null) ?? null,
    climate: (p.climate as ProjectClimate | null) ?? null,
  };
}

/**
 * Refuses (404 `code table`) a code table a project's checks may not use: one must belong to the project's
 * firm or to one of the caller's firms. Returns the table's firm.
 */
export async function usableCodeTable(
  db: Db,
  criteria: ReturnType<typeof createCriteriaService>,
  criteriaSetId: string,
  projectOrganisationId: string | null,
  userId: string,
): Promise<string> {
  const setOrg = await criteria.organisationOf(criteriaSetId);
  const mine = setOrg
    ? await db
        .select({ id: organisationMembers.organisationId })
        .from(organisationMembers)
        .where(and(eq(organisationMembers.organisationId, setOrg), eq(organisationMembers.userId, userId)))
    : [];
  if (!setOrg || (setOrg !== projectOrganisationId && mine.length === 0)) throw notFound('code table');
  return setOrg;
}

function toSummary(r: RunRow, by: string | null): CheckRunSummary {
  return {
    id: r.id,
    projectId: r.projectId,
    assemblyId: r.assemblyId,
    assemblyName: r.assemblyName,
    assemblyRevision: r.assemblyRevision,
    criteriaSetId: r.criteriaSetId,
    criteriaSetName: r.criteriaSetName,
    criteriaSetVersion: r.criteriaSetVersion,
    verdict: r.verdict as CheckRunSummary['verdict'],
    criteriaVerdict: r.criteriaVerdict as CheckRunSummary['verdict'],
    moduleVerdict: r.moduleVerdict as CheckRunSummary['verdict'],
    counts: { pass: r.passCount, fail: r.failCount, notEvaluated: r.notEvaluatedCount },
    engineVersion: r.engineVersion,
    hash: r.hash,
    createdBy: by,
    createdAt: r.createdAt.toISOString(),
  };
}

/**
 * Check runs: each is computed from a snapshot of its inputs and stored once, immutable. Storing a run
 * freezes the code-table version it used (in the same transaction).
 */
export function createCheckRunService(db: Db, criteria: ReturnType<typeof createCriteriaService>) {
  async function get(runId: string): Promise<CheckRun> {
    const [r] = await db
      .select({ run: checkRuns, by: user.name })
      .from(checkRuns)
      .leftJoin(user, eq(user.id, checkRuns.createdBy))
      .where(eq(checkRuns.id, runId));
    if (!r) throw notFound('check run');
    return {
      ...toSummary(r.run, r.by),
      inputsHash: r.run.inputsHash,
      outputsHash: r.run.outputsHash,
      inputs: r.run.inputs as CheckRunInputs,
      outputs: r.run.outputs as CheckReport,
    };
  }

  return {
    get,

    /** The project a run belongs to (for the permission check), or null. */
    projectOf: ownerOf(db, { from: checkRuns, key: checkRuns.id, owner: checkRuns.projectId }),

    async list(projectId: string, assemblyId?: string): Promise<CheckRunSummary[]> {
      const rows = await db
        .select({ run: checkRuns, by: user.name })
        .from(checkRuns)
        .leftJoin(user, eq(user.id, checkRuns.createdBy))
        .where(
          assemblyId
            ? and(eq(checkRuns.projectId, projectId), eq(checkRuns.assemblyId, assemblyId))
            : eq(checkRuns.projectId, projectId),
        )
        .orderBy(desc(checkRuns.createdAt), desc(checkRuns.id));
      return rows.map((r) => toSummary(r.run, r.by));
    },

    /**
     * Runs every check of the assembly's current revision against one version of a code table and stores
     * the run. The table must belong to the project's firm or to one of the caller's firms.
     */
    async create(assemblyId: string, userId: string, criteriaSetId: string): Promise<CheckRun> {
      const a = await currentAssembly(db, assemblyId);
      if (a.p.archivedAt) throw archivedError();
      await usableCodeTable(db, criteria, criteriaSetId, a.p.organisationId, userId);

      const id = await db.transaction(async (tx) => {
        const { set, rows } = await criteria.freezeForRun(tx, criteriaSetId, userId);
        const assemblyInput = a.input;
        const project = { id: a.p.id, name: a.p.name, ...projectForChecks(a.p) };
        const inputs: CheckRunInputs = {
          engineVersion: ENGINE_VERSION,
          assembly: { id: a.a.id, revision: a.a.currentRevision, name: a.a.name, input: assemblyInput },
          project,
          criteriaSet: {
            id: set.id,
            lineageId: set.lineageId,
            version: set.version,
            organisationId: set.organisationId,
            name: set.name,
            jurisdiction: set.jurisdiction,
            edition: set.edition,
            effectiveDate: set.effectiveDate,
            sourceReference: set.sourceReference,
            categoryLabels: set.categoryLabels as CategoryLabels,
            rows,
          },
        };
        // The run reads only the snapshot, so that anyone can recompute it from the stored inputs.
        const outputs = runChecks(assemblyInput, project, inputs.criteriaSet.rows);
        const hashes = checkRunHashes(ENGINE_VERSION, inputs, outputs);
        const count = (s: string) => outputs.checks.filter((c) => c.status === s).length;
        const [run] = await tx
          .insert(checkRuns)
          .values({
            projectId: a.p.id,
            assemblyId: a.a.id,
            assemblyRevision: a.a.currentRevision,
            assemblyName: a.a.name,
            criteriaSetId: set.id,
            criteriaSetVersion: set.version,
            criteriaSetName: set.name,
            verdict: outputs.verdict,
            criteriaVerdict: outputs.criteriaVerdict,
            moduleVerdict: outputs.moduleVerdict,
            passCount: count('pass'),
            failCount: count('fail'),
            notEvaluatedCount: count('not_evaluated'),
            engineVersion: ENGINE_VERSION,
            inputs,
            outputs,
            ...hashes,
            createdBy: userId,
          })
          .returning({ id: checkRuns.id });
        await recordAudit(tx, {
          actorId: userId,
          projectId: a.p.id,
          entity: 'check_run',
          entityId: run!.id,
          action: 'create',
          after: {
            assembly: a.a.name,
            revision: a.a.currentRevision,
            criteriaSet: set.name,
            version: set.version,
            verdict: outputs.verdict,
            hash: hashes.hash,
          },
        });
        return run!.id;
      });
      return get(id);
    },
  };
}
