import { demoPanel, demoSite } from '@shared/calc/wind/examples';
import type { ProjectForChecks } from '@shared/checks/inputs';
import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';

/** The invented demo panel and site as an assembly and a project (tests only). */
export function demoAssembly(design: { girtSpacing?: number; clipSpacing?: number } = {}): AssemblyInput {
  const { girtOrientation, ...windPanel } = demoPanel();
  return {
    name: 'Demo wall',
    description: '',
    wallCategory: 'metal_building',
    attachment: { girtOrientation, clipType: '', fastenerType: '', ...design },
    thermal: { heatFlow: 'horizontal', layers: [], bridges: [] },
    windPanel,
  };
}

export function demoProject(withWind = true): ProjectForChecks {
  const {
    meanRoofHeight,
    planLength,
    planWidth,
    heightOfComponent: _z,
    groundElevation,
    ...wind
  } = demoSite();
  return {
    climateZone: '5A',
    elevationM: groundElevation,
    buildingHeightM: meanRoofHeight,
    planLengthM: planLength,
    planWidthM: planWidth,
    indoorTempC: 20,
    indoorRh: 0.4,
    winterDesignTempC: -20,
    summerDesignTempC: 30,
    wind: withWind ? wind : null,
    climate: null,
  };
}

/** The demo project as the API gives it to a member in `role` (tests only). */
export function testProject(role: Project['myRole']): Project {
  return {
    ...demoProject(),
    id: '00000000-0000-4000-8000-000000000001',
    organisationId: '00000000-0000-4000-8000-000000000002',
    organisationName: 'Test firm',
    name: 'Test project',
    number: '',
    description: '',
    siteAddress: '',
    climateZone: '5A',
    elevationM: 150,
    archivedAt: null,
    version: 1,
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    myRole: role,
  };
}

/** An assembly of the test project at its first revision, with this input (tests only). */
export function testAssembly(input: AssemblyInput): Assembly {
  return {
    id: '00000000-0000-4000-8000-000000000003',
    projectId: '00000000-0000-4000-8000-000000000001',
    name: input.name,
    wallCategory: input.wallCategory,
    revision: 1,
    version: 1,
    updatedAt: '2026-01-01T00:00:00.000Z',
    Ueff: null,
    Reff: null,
    current: {
      revision: 1,
      note: '',
      input,
      thermalResult: null,
      engineVersion: '0.1.0',
      createdBy: 'Test',
      createdAt: '2026-01-01T00:00:00.000Z',
    },
  };
}
