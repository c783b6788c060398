import demo from '@data/seed/demo-assembly.json';
import { type Assembly, type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { ApiRequestError } from './api';

/* A project, assemblies and a 409 for the client's component tests (not used by the app). */

export const demoInput: AssemblyInput = assemblyInputSchema.parse(demo.assembly);

/** An invented project as the API gives it to its owner. */
export const sampleProject: Project = {
  id: '11111111-1111-4111-8111-111111111111',
  organisationId: '22222222-2222-4222-8222-222222222222',
  organisationName: 'Arch & Co',
  name: 'Harbour Depot',
  number: '24-017',
  description: '',
  siteAddress: '1 Quay Street',
  climateZone: '5A',
  elevationM: 12,
  buildingHeightM: 9.144,
  planLengthM: 60,
  planWidthM: 30,
  indoorTempC: 21,
  indoorRh: 0.35,
  winterDesignTempC: -20,
  summerDesignTempC: 31,
  wind: null,
  climate: null,
  archivedAt: null,
  version: 3,
  createdAt: '2025-01-01T00:00:00Z',
  updatedAt: '2025-01-02T00:00:00Z',
  myRole: 'owner',
};

/** The demo assembly at revision `n` with this input. */
export function revisionOf(n: number, input: AssemblyInput, createdBy = 'Ada Quarrie', note = ''): Assembly {
  return {
    id: '33333333-3333-4333-8333-333333333333',
    projectId: '11111111-1111-4111-8111-111111111111',
    name: input.name,
    wallCategory: input.wallCategory,
    revision: n,
    version: n,
    updatedAt: '2025-01-02T00:00:00Z',
    Ueff: null,
    Reff: null,
    current: {
      revision: n,
      note,
      input,
      thermalResult: null,
      engineVersion: '0.1.0',
      createdBy,
      createdAt: '2025-01-02T00:00:00Z',
    },
  };
}

/** The server's answer to a stale save: 409 with the assembly as it now stands. */
export const conflictError = (current: Assembly) =>
  new ApiRequestError(409, 'version_conflict', 'someone else saved', undefined, { error: {}, current });

export const conflictOf = (e: unknown) =>
  e instanceof ApiRequestError && e.status === 409 ? (e.body as { current: Assembly }).current : null;
