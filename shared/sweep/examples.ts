import { criteriaRow, demoAssembly, demoProject } from '../checks/fixtures';
import type { SweepRequest } from './schema';

/**
 * The invented demo sweep: the demo assembly's mineral wool (layer 3) from 25 to 150 mm by 25 mm × its clip
 * spacing 0.4 / 0.6 / 0.8 / 1.0 m, with its first joint only (the demo's other two are too narrow), against a demo code table (U ≤ 0.35, accumulation ≤ 0.5 kg/m², surface RH
 * ≤ 80 %, sealant class ≥ 25) — for tests, the API example and the benchmark.
 */
export const demoSweep = (): SweepRequest => ({
  assembly: { ...demoAssembly(), joints: demoAssembly().joints?.slice(0, 1) },
  project: demoProject(),
  rows: [
    criteriaRow('max_u_factor', 0.35),
    criteriaRow('max_condensation_accumulation', 0.5),
    criteriaRow('max_surface_rh', 0.8),
    criteriaRow('min_sealant_movement_class', 25),
  ],
  parameters: [
    { kind: 'insulationThickness', layer: 3, range: { start: 0.025, stop: 0.15, step: 0.025 } },
    { kind: 'clipSpacing', list: [0.4, 0.6, 0.8, 1.0] },
  ],
  costs: { insulation: 4.5, clip: 6, girt: 9 },
});
