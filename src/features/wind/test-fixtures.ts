import { demoPanel, demoSite } from '@shared/calc/wind/examples';
import type { ProjectForChecks } from '@shared/checks/inputs';
import type { AssemblyInput } from '@shared/schemas/assembly';

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
