import type { AnyRoute } from '../http/route';
import { assemblyRoutes } from './assemblies';
import { calcRoutes } from './calc';
import { checkRunRoutes } from './check-runs';
import { criteriaRoutes } from './criteria';
import { firmMemberRoutes } from './firm-members';
import { healthRoutes } from './health';
import { inspectionRoutes } from './inspections';
import { libraryRoutes } from './library';
import { meRoutes } from './me';
import { memberRoutes } from './members';
import { adminRoutes } from './organisations';
import { projectRoutes } from './projects';
import { sheetRoutes } from './sheets';
import { submittalRoutes } from './submittals';
import { sweepRoutes } from './sweeps';

/** Every API route, in one registry: it mounts the routes, generates the OpenAPI document and drives the permission tests. */
export const apiRoutes: AnyRoute[] = [
  ...healthRoutes,
  ...meRoutes,
  ...adminRoutes,
  ...projectRoutes,
  ...memberRoutes,
  ...assemblyRoutes,
  ...libraryRoutes,
  ...firmMemberRoutes,
  ...criteriaRoutes,
  ...checkRunRoutes,
  ...sweepRoutes,
  ...sheetRoutes,
  ...submittalRoutes,
  ...inspectionRoutes,
  ...calcRoutes,
];
