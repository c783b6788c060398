import { ENGINE_VERSION } from '@shared/calc/trace';
import { runChecks } from '@shared/checks/runner';
import { type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import type { CheckRun, CheckRunInputs } from '@shared/schemas/check-runs';
import { criteriaSetCreateSchema } from '@shared/schemas/criteria';
import { projectClimateSchema, projectWindSchema } from '@shared/schemas/project';
import { verificationCode, verificationUrl } from '@shared/sheets/verification';
import { z } from 'zod';
import demo from '../../data/seed/demo.json' with { type: 'json' };
import demoAssembly from '../../data/seed/demo-assembly.json' with { type: 'json' };
import demoCriteria from '../../data/seed/demo-criteria.json' with { type: 'json' };
import { checkRunHashes } from '../services/check-runs';
import type { SheetData } from './sheet-data';

/**
 * The demo sheet without a database: the invented demo assembly (or `assembly`, e.g. the demo panel wall) and
 * project checked against the demo firm's illustrative code table, shaped exactly as a stored run (for the
 * sheet's unit test, the screen-and-sheet test and the bench).
 */
export function demoSheetData(units: 'SI' | 'IP' = 'SI', assembly?: AssemblyInput): SheetData {
  const parsed = z
    .object({ assembly: assemblyInputSchema, wind: projectWindSchema, climate: projectClimateSchema })
    .parse(demoAssembly);
  const content = { ...parsed, assembly: assembly ?? parsed.assembly };
  const set = criteriaSetCreateSchema.parse(demoCriteria.set);
  const p = demo.projects[0]!;
  const ids = {
    project: '00000000-0000-4000-8000-000000000001',
    assembly: '00000000-0000-4000-8000-000000000002',
    set: '00000000-0000-4000-8000-000000000003',
    org: '00000000-0000-4000-8000-000000000004',
    run: '00000000-0000-4000-8000-000000000005',
  };
  const inputs: CheckRunInputs = {
    engineVersion: ENGINE_VERSION,
    assembly: { id: ids.assembly, revision: 1, name: content.assembly.name, input: content.assembly },
    project: {
      id: ids.project,
      name: p.name,
      climateZone: p.climateZone as CheckRunInputs['project']['climateZone'],
      elevationM: p.elevationM,
      buildingHeightM: p.buildingHeightM,
      planLengthM: p.planLengthM,
      planWidthM: p.planWidthM,
      indoorTempC: p.indoorTempC,
      indoorRh: p.indoorRh,
      winterDesignTempC: p.winterDesignTempC,
      summerDesignTempC: p.summerDesignTempC,
      wind: content.wind,
      climate: content.climate,
    },
    criteriaSet: {
      id: ids.set,
      lineageId: ids.set,
      version: 1,
      organisationId: ids.org,
      name: set.name,
      jurisdiction: set.jurisdiction,
      edition: set.edition,
      effectiveDate: set.effectiveDate ?? null,
      sourceReference: set.sourceReference,
      categoryLabels: set.categoryLabels,
      rows: set.rows.map((r, i) => ({ ...r, id: `00000000-0000-4000-8001-${String(i).padStart(12, '0')}` })),
    },
  };
  const outputs = runChecks(
    inputs.assembly.input,
    { ...inputs.project, elevationM: p.elevationM },
    inputs.criteriaSet.rows,
  );
  const hashes = checkRunHashes(ENGINE_VERSION, inputs, outputs);
  const count = (s: string) => outputs.checks.filter((c) => c.status === s).length;
  const run: CheckRun = {
    id: ids.run,
    projectId: ids.project,
    assemblyId: ids.assembly,
    assemblyName: content.assembly.name,
    assemblyRevision: 1,
    criteriaSetId: ids.set,
    criteriaSetName: set.name,
    criteriaSetVersion: 1,
    verdict: outputs.verdict,
    criteriaVerdict: outputs.criteriaVerdict,
    moduleVerdict: outputs.moduleVerdict,
    counts: { pass: count('pass'), fail: count('fail'), notEvaluated: count('not_evaluated') },
    engineVersion: ENGINE_VERSION,
    createdBy: 'Rafael Ducharme',
    createdAt: '2026-12-02T09:30:00.000Z',
    inputs,
    outputs,
    ...hashes,
  };
  const code = verificationCode(run.hash);
  return {
    run,
    project: { number: p.number, siteAddress: p.siteAddress },
    preparedBy: 'Rafael Ducharme',
    issuer: {
      name: 'Ridgeline Cladding Co. (demo)',
      handle: '@demo-ridgeline',
      verifiedAt: '2026-11-30T08:00:00.000Z',
    },
    code,
    verifyUrl: verificationUrl('http://localhost:5180', code),
    units,
  };
}
