import type { Project } from '@shared/schemas/project';
import { describe, expect, it } from 'vitest';
import { mergeEdits } from './ProjectEditor';
import { projectToFormValues } from './ProjectForm';

const base: Project = {
  id: '11111111-1111-4111-8111-111111111111',
  organisationId: '22222222-2222-4222-8222-222222222222',
  organisationName: 'Arch & Co',
  name: 'Harbour Depot',
  number: '24-017',
  description: '',
  siteAddress: '1 Quay Street',
  climateZone: '5A',
  elevationM: 12,
  buildingHeightM: 9,
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

describe('mergeEdits (version conflict)', () => {
  it('keeps my changes, takes theirs elsewhere, and mine where both changed', () => {
    const mine = { ...projectToFormValues(base), buildingHeightM: 12, planWidthM: 25 } as never;
    const theirs: Project = { ...base, version: 4, indoorTempC: 22, planWidthM: 28 };
    const merged = mergeEdits({ base, theirs, mine });
    expect(merged.buildingHeightM).toBe(12); // mine only
    expect(merged.indoorTempC).toBe(22); // theirs only
    expect(merged.planWidthM).toBe(25); // both: mine kept
    expect(merged.name).toBe('Harbour Depot');
  });
});
