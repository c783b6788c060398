import { z } from 'zod';
import { categoryLabelsSchema } from '../checks/criteria';
import { checkReportSchema, verdictSchema } from '../checks/report';
import type { AssemblyInput } from './assembly';
import { createdFields } from './common';
import { criteriaRowSchema } from './criteria';
import { climateZoneSchema, type ProjectClimate, type ProjectWind, projectDesignData } from './project';

const isObject = (v: unknown) => typeof v === 'object' && v !== null && !Array.isArray(v);

/** API contracts of check runs: an immutable record of one compliance run (inputs, outputs, hash). */

export const checkRunCreateSchema = z.object({
  criteriaSetId: z.uuid().describe('The version of the code table to check against'),
});

/** Everything the run read, as it was at that moment. */
export const checkRunInputsSchema = z.object({
  engineVersion: z.string(),
  assembly: z.object({
    id: z.uuid(),
    revision: z.number().int(),
    name: z.string(),
    /**
     * The assembly input exactly as stored (the assembly schema of that day). Typed, but not re-validated
     * when read, so that a stored run stays readable after the assembly schema grows.
     */
    input: z.custom<AssemblyInput>(isObject).describe('The assembly input as stored with the revision'),
  }),
  project: z.object({
    id: z.uuid(),
    name: z.string(),
    climateZone: climateZoneSchema,
    /** The site's ground elevation, m (absent from runs stored before the wind data stopped keeping its own). */
    elevationM: z.number().optional(),
    ...projectDesignData,
    /** The project's wind data and monthly climate as they were (not re-validated, for the same reason). */
    wind: z.custom<ProjectWind>(isObject).nullable(),
    climate: z.custom<ProjectClimate>(isObject).nullable(),
  }),
  criteriaSet: z.object({
    id: z.uuid(),
    lineageId: z.uuid(),
    version: z.number().int(),
    organisationId: z.uuid(),
    name: z.string(),
    jurisdiction: z.string(),
    edition: z.string(),
    effectiveDate: z.string().nullable(),
    sourceReference: z.string(),
    categoryLabels: categoryLabelsSchema,
    rows: z.array(criteriaRowSchema),
  }),
});
export type CheckRunInputs = z.infer<typeof checkRunInputsSchema>;

export const checkRunSummarySchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  assemblyId: z.uuid(),
  assemblyName: z.string(),
  assemblyRevision: z.number().int(),
  criteriaSetId: z.uuid(),
  criteriaSetName: z.string(),
  criteriaSetVersion: z.number().int(),
  verdict: verdictSchema,
  criteriaVerdict: verdictSchema,
  moduleVerdict: verdictSchema,
  counts: z.object({
    pass: z.number().int(),
    fail: z.number().int(),
    notEvaluated: z.number().int(),
  }),
  engineVersion: z.string(),
  hash: z.string().describe('SHA-256 (hex) of the canonical JSON of { engineVersion, inputs, outputs }'),
  ...createdFields,
});
export type CheckRunSummary = z.infer<typeof checkRunSummarySchema>;

export const checkRunSchema = checkRunSummarySchema.extend({
  inputsHash: z.string().describe('SHA-256 of the canonical JSON of the inputs'),
  outputsHash: z.string().describe('SHA-256 of the canonical JSON of the outputs'),
  inputs: checkRunInputsSchema,
  outputs: checkReportSchema,
});
export type CheckRun = z.infer<typeof checkRunSchema>;

export const checkRunListSchema = z.object({ checkRuns: z.array(checkRunSummarySchema) });
export const checkRunListQuerySchema = z.object({ assemblyId: z.uuid().optional() });
