import demo from '@data/seed/demo-assembly.json';
import { type Assembly, type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import { ApiRequestError } from './api';

/* Assemblies and a 409 for the tests of the shared revision editing and its save bar (not used by the app). */

export const demoInput: AssemblyInput = assemblyInputSchema.parse(demo.assembly);

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
