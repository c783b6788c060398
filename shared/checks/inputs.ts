import type { JointInput } from '../calc/joints/schema';
import type { MoistureInput } from '../calc/moisture/schema';
import type { TakeoffInput } from '../calc/takeoff/schema';
import type { ThermalInput } from '../calc/thermal/schema';
import type { WindDesignInput, WindScheduleInput } from '../calc/wind/schema';
import { engineMessage, type InputMissing } from '../format/message-schema';
import type { AssemblyInput } from '../schemas/assembly';
import type { Project } from '../schemas/project';

/** The project data every check reads (a stored project satisfies it; a check-run snapshot stores it). */
export type ProjectForChecks = Pick<
  Project,
  | 'climateZone'
  | 'elevationM'
  | 'buildingHeightM'
  | 'planLengthM'
  | 'planWidthM'
  | 'indoorTempC'
  | 'indoorRh'
  | 'winterDesignTempC'
  | 'summerDesignTempC'
  | 'wind'
  | 'climate'
>;

/** Either the calculation input, or what is still missing to build it (messages, worded by shared/format). */
export type CheckInput<T> = { status: 'ready'; input: T } | { status: 'missing'; missing: InputMissing[] };

const missing = <T>(...items: InputMissing[]): CheckInput<T> => ({ status: 'missing', missing: items });

export const thermalInputFor = (a: AssemblyInput): CheckInput<ThermalInput> => ({
  status: 'ready',
  input: a.thermal,
});

/** Layers with their vapour data, the project's indoor conditions (or humidity class) and its 12 months. */
export function moistureInputFor(a: AssemblyInput, p: ProjectForChecks): CheckInput<MoistureInput> {
  const gaps: InputMissing[] = [];
  const vapour = a.vapour ?? [];
  a.thermal.layers.forEach((layer, i) => {
    if (!vapour[i]) gaps.push(engineMessage('vapour_missing', `vapour.${i}`, { layer: i, name: layer.name }));
  });
  if (!p.climate) gaps.push(engineMessage('climate_missing', 'project.climate', {}));
  if (gaps.length > 0 || !p.climate) return missing(...gaps);
  return {
    status: 'ready',
    input: {
      layers: a.thermal.layers.map((layer, i) => ({ ...layer, vapour: vapour[i]! })),
      heatFlow: a.thermal.heatFlow,
      interior:
        p.climate.humidityClass === undefined
          ? { kind: 'fixed', temperature: p.indoorTempC, relativeHumidity: p.indoorRh }
          : { kind: 'humidityClass', temperature: p.indoorTempC, humidityClass: p.climate.humidityClass },
      months: p.climate.months,
      bridges: solvedBridgeSurfaces(a.thermal.bridges),
    },
  };
}

/** The bridges whose χ/ψ was computed here: their name and f_Rsi of the surface-check solve (Rsi 0.25). */
export const solvedBridgeSurfaces = (bridges: AssemblyInput['thermal']['bridges']) =>
  bridges.flatMap((b, i) =>
    b.kind !== 'fastener' && b.source?.computed
      ? [{ name: b.name || `Bridge ${i + 1}`, fRsi: b.source.computed.surface.fRsi }]
      : [],
  );

/** The project's ASCE 7 site data with its height and plan, and the assembly's panel table and clip. */
export function windInputFor(a: AssemblyInput, p: ProjectForChecks): CheckInput<WindScheduleInput> {
  const gaps = [
    ...(p.wind ? [] : [engineMessage('wind_missing', 'project.wind', {})]),
    ...(a.windPanel ? [] : [engineMessage('panel_missing', 'windPanel', {})]),
  ];
  if (!p.wind || !a.windPanel) return missing(...gaps);
  return {
    status: 'ready',
    input: {
      site: {
        ...p.wind,
        groundElevation: p.elevationM,
        meanRoofHeight: p.buildingHeightM,
        planLength: p.planLengthM,
        planWidth: p.planWidthM,
      },
      panel: { ...a.windPanel, girtOrientation: a.attachment.girtOrientation },
    },
  };
}

/** The wind schedule input with the assembly's design girt and clip spacing (absent ones are left out). */
export function windDesignInputFor(a: AssemblyInput, p: ProjectForChecks): CheckInput<WindDesignInput> {
  const schedule = windInputFor(a, p);
  if (schedule.status === 'missing') return schedule;
  const { girtSpacing, clipSpacing } = a.attachment;
  return {
    status: 'ready',
    input: {
      ...schedule.input,
      design: {
        ...(girtSpacing === undefined ? {} : { girtSpacing }),
        ...(clipSpacing === undefined ? {} : { clipSpacing }),
      },
    },
  };
}

export const jointsInputFor = (a: AssemblyInput): CheckInput<JointInput[]> =>
  a.joints && a.joints.length > 0
    ? { status: 'ready', input: a.joints }
    : missing(engineMessage('joints_missing', 'joints', {}));

export const takeoffInputFor = (a: AssemblyInput): CheckInput<TakeoffInput> =>
  a.takeoff
    ? { status: 'ready', input: a.takeoff }
    : missing(engineMessage('takeoff_missing', 'takeoff', {}));
