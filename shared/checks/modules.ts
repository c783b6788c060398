import { calculateJointSchedule } from '../calc/joints/joints';
import { calculateMoisture } from '../calc/moisture/monthly';
import { RSI_SURFACE } from '../calc/moisture/surface';
import type { ThermalResult } from '../calc/thermal/schema';
import { calculateThermal, METHOD_LABELS } from '../calc/thermal/thermal';
import { calculateWindSchedule } from '../calc/wind/attachment';
import { checkDesignSpacing } from '../calc/wind/design';
import type {
  DesignSpacingResult,
  DesignStatus,
  WindDesignInput,
  WindScheduleResult,
  ZoneDesign,
  ZoneResult,
} from '../calc/wind/schema';
import { type EngineMessage, engineMessage } from '../format/message-schema';
import { jointsInputFor, moistureInputFor, thermalInputFor, windDesignInputFor } from './inputs';
import {
  cavityInsulationR,
  continuousInsulationR,
  deflectionDenominator,
  maxSurfaceRh,
  minSealantMovementClass,
} from './metrics';
import { type CheckModule, compare, defineCheckModule, type ModuleCheck } from './module';
import type { CheckMethod } from './report';

/*
 * The registry of check modules. Each wraps one calculation of shared/calc: how its input is built from the
 * assembly and project (shared/checks/inputs.ts), which metrics it reports for code tables, and its own
 * verdicts that hold whatever the code table says (the wind schedule, the joints, the surface humidity).
 */

/**
 * The method that decides a thermal criterion (DEVELOPERS.md D-012): the thermal result's own R₀ method —
 * the energy-code path for a steel-framed wall the table covers, ISO 6946 where no metal bridges the layers,
 * otherwise the lowest R offered — with the other methods and their spread.
 */
export function thermalMethod(r: ThermalResult): CheckMethod {
  return {
    method: r.defaultMethod,
    label: METHOD_LABELS[r.defaultMethod],
    kind: r.basis.kind,
    text: r.basis.text,
    others: r.offeredMethods
      .filter((m) => m !== r.defaultMethod)
      .map((m) => ({ method: m, label: METHOD_LABELS[m], R: r.methods[m]! })),
    spread: r.methodSpread,
  };
}

export const thermalModule = defineCheckModule({
  id: 'thermal',
  label: 'Thermal calculation',
  provides: ['Ueff', 'Reff', 'continuousInsulationR', 'cavityInsulationR'],
  build: (a) => thermalInputFor(a),
  run: calculateThermal,
  metrics: (r, a) => ({
    Ueff: {
      value: r.Ueff,
      unit: 'W/(m²·K)',
      traceStepIds: ['thermal.Ueff', 'thermal.R0'],
      method: thermalMethod(r),
    },
    Reff: {
      value: r.Reff,
      unit: 'm²·K/W',
      traceStepIds: ['thermal.Reff', 'thermal.R0'],
      method: thermalMethod(r),
    },
    continuousInsulationR: continuousInsulationR(a.thermal.layers),
    cavityInsulationR: cavityInsulationR(a.thermal.layers),
  }),
  verdicts: () => [],
  trace: (r) => r.trace,
  cautions: (r) => r.warnings,
});

export const moistureModule = defineCheckModule({
  id: 'moisture',
  label: 'Moisture calculation',
  provides: ['maxAccumulation', 'driesOut', 'maxSurfaceRh'],
  build: moistureInputFor,
  run: calculateMoisture,
  metrics: (r) => ({
    maxAccumulation: {
      value: r.interstitial.maxAccumulation,
      unit: 'kg/m²',
      traceStepIds: ['moisture.maxAccumulation'],
    },
    driesOut: {
      value: r.interstitial.driesOut,
      unit: '',
      traceStepIds: ['moisture.finalAccumulation'],
      note: r.interstitial.condensationOccurs ? undefined : engineMessage('nothing_to_dry', '', {}),
    },
    maxSurfaceRh: maxSurfaceRh(r),
  }),
  verdicts: (r): ModuleCheck[] => {
    const { fRsi, fRsiMax, criticalMonth } = r.surface;
    const base = {
      id: 'moisture.surface',
      criterion: 'surface',
      label: 'Interior surface humidity (mould risk): f_Rsi ≥ f_Rsi,max',
      required: fRsiMax,
      provided: fRsi,
      unit: '1',
      direction: 'min' as const,
      traceStepIds: ['moisture.fRsi', 'moisture.fRsiMax'],
    };
    if (fRsiMax === null)
      return [
        {
          ...base,
          margin: null,
          marginRatio: null,
          status: 'pass',
          reason: engineMessage('surface_not_applicable', '', {}),
        },
      ];
    const atBridges = r.surface.bridges.map(
      (b, i): ModuleCheck => ({
        ...base,
        id: `moisture.surface.bridge.${i}`,
        label: `Interior surface at ${b.name} (mould risk): f_Rsi ≥ f_Rsi,max`,
        provided: b.fRsi,
        traceStepIds: [`moisture.bridge.${i}.fRsi`, 'moisture.fRsiMax'],
        ...compare('min', fRsiMax, b.fRsi),
        status: b.pass ? 'pass' : 'fail',
        reason: engineMessage('surface_at_bridge', '', { month: criticalMonth, rsi: RSI_SURFACE }),
      }),
    );
    const clearPass = r.months.every((m) => m.surface.pass);
    return [
      {
        ...base,
        ...compare('min', fRsiMax, fRsi),
        status: clearPass ? 'pass' : 'fail',
        reason: engineMessage('surface_clear_field', '', {
          month: criticalMonth,
          bridgesSolved: atBridges.length > 0,
        }),
      },
      ...atBridges,
    ];
  },
  trace: (r) => r.trace,
  cautions: (r) => r.warnings,
});

interface SpacingVerdict {
  key: 'girtSpacing' | 'clipSpacing';
  label: string;
  status: DesignStatus;
  design: number | undefined;
  max: number | null;
  /** Why it is not evaluated (missing, outside the table), why it fails without a maximum, what governs. */
  reasons: { missing: EngineMessage; outside: EngineMessage; none: EngineMessage; note: EngineMessage };
  traceStepIds: string[];
}

/** One design-spacing verdict of `checkDesignSpacing` as a check: its status, and the margin against the maximum. */
function spacingCheck(z: ZoneResult, v: SpacingVerdict): ModuleCheck {
  const base = {
    id: `wind.zone${z.zone}.${v.key}`,
    criterion: v.key,
    label: `${z.name}: ${v.label}`,
    required: v.max,
    provided: v.design ?? null,
    unit: 'm',
    direction: 'max' as const,
    traceStepIds: v.traceStepIds,
  };
  const open = { margin: null, marginRatio: null };
  if (v.status === 'missing') return { ...base, ...open, status: 'not_evaluated', reason: v.reasons.missing };
  if (v.status === 'outside-table')
    return { ...base, ...open, status: 'not_evaluated', reason: v.reasons.outside };
  if (v.max === null || v.design === undefined)
    return { ...base, ...open, status: 'fail', reason: v.reasons.none };
  const { margin, marginRatio } = compare('max', v.max, v.design);
  return {
    ...base,
    margin,
    marginRatio,
    status: v.status === 'meets' ? 'pass' : 'fail',
    reason: v.reasons.note,
  };
}

/** The checks of `d` that fail at the design spacing, with their utilisation (the clip's, or the others). */
const failures = (d: ZoneDesign, clip: boolean) =>
  d.checks
    .filter((c) => (c.check === 'clip') === clip && c.status === 'fails')
    .map((c) => ({ check: c.check, utilisation: c.utilisation! }));

/**
 * The wind module's own verdicts per zone: the table carries the pressure, and the design girt and clip spacing as
 * `checkDesignSpacing` judged them, with the margin against the maximum it compared each with.
 */
function zoneChecks(z: ZoneResult, d: ZoneDesign): ModuleCheck[] {
  const at = `wind.zone${z.zone}`;
  const capped = d.maxGirtSpacing !== null && z.girtSpacing !== null && d.maxGirtSpacing < z.girtSpacing;
  return [
    {
      id: `${at}.table`,
      criterion: 'table',
      label: `${z.name}: the panel’s load–span table carries the pressure`,
      required: null,
      provided: null,
      unit: '',
      direction: null,
      margin: null,
      marginRatio: null,
      status: z.status === 'outside-table' ? 'fail' : 'pass',
      reason: engineMessage(
        z.status === 'outside-table'
          ? 'table_outside'
          : z.status === 'table-end'
            ? 'table_end'
            : 'table_inside',
        'windPanel.loadSpanTable',
        {},
      ),
      traceStepIds: z.status === 'outside-table' ? [] : [`${at}.girtSpacing`],
    },
    spacingCheck(z, {
      key: 'girtSpacing',
      label: 'design girt spacing ≤ maximum',
      status: d.girt,
      design: d.girtSpacing,
      max: d.maxGirtSpacing,
      reasons: {
        missing: engineMessage('girt_spacing_missing', 'attachment.girtSpacing', {}),
        outside: engineMessage('girt_outside_table', 'attachment.girtSpacing', {
          detail: d.checks.find((c) => c.status === 'outside-table')?.reason ?? null,
        }),
        none: engineMessage('no_girt_spacing_works', 'windPanel.loadSpanTable', {}),
        note: engineMessage('girt_governed', '', {
          governing: z.governingCheck ?? null,
          failed: failures(d, false),
        }),
      },
      traceStepIds: [
        ...(d.maxGirtSpacing === null ? [] : [`${at}.girtSpacing`]),
        ...(capped ? [`${at}.design.maxGirtSpacing`] : []),
        ...d.checks
          .filter((c) => c.check !== 'clip' && c.utilisation !== null)
          .map((c) => `${at}.design.${c.check}`),
      ],
    }),
    spacingCheck(z, {
      key: 'clipSpacing',
      label: 'design clip spacing ≤ maximum at the design girt spacing',
      status: d.clip,
      design: d.clipSpacing,
      max: d.maxClipAtDesignGirt,
      reasons: {
        missing:
          d.clipSpacing === undefined
            ? engineMessage('clip_spacing_missing', 'attachment.clipSpacing', {})
            : engineMessage('clip_needs_girt_spacing', 'attachment.girtSpacing', {}),
        outside: engineMessage('clip_outside_table', 'attachment.girtSpacing', {}),
        none: engineMessage('no_clip_spacing_works', 'attachment.girtSpacing', {}),
        note: engineMessage('clip_at_design_girt', '', { failed: failures(d, true) }),
      },
      traceStepIds: [
        ...(d.maxClipAtDesignGirt === null ? [] : [`${at}.design.maxClipSpacing`]),
        ...(d.checks.some((c) => c.check === 'clip' && c.utilisation !== null) ? [`${at}.design.clip`] : []),
      ],
    }),
  ];
}

/** The wind schedule with the check of the assembly's design spacings beside it (`design`). */
export function runWind(input: WindDesignInput): WindScheduleResult & { design: DesignSpacingResult } {
  const schedule = calculateWindSchedule(input);
  return { ...schedule, design: checkDesignSpacing(input, schedule) };
}

export const windModule = defineCheckModule({
  id: 'wind',
  label: 'Wind attachment schedule',
  provides: ['deflectionLimit'],
  build: windDesignInputFor,
  run: runWind,
  metrics: (r, a) => {
    const checked = r.zones.some((z) => z.spanChecks.some((c) => c.check === 'deflection'));
    const limit = a.windPanel?.loadSpanTable.deflectionLimit;
    return {
      deflectionLimit:
        checked && limit
          ? {
              value: deflectionDenominator(limit),
              unit: 'L/x',
              traceStepIds: r.zones.map((z) => `wind.zone${z.zone}.girtSpacing`),
              note: engineMessage('deflection_column', '', { limit }),
            }
          : {
              value: null,
              reason: engineMessage('no_deflection_column', 'windPanel.loadSpanTable', {}),
            },
    };
  },
  verdicts: (r) => r.zones.flatMap((z) => zoneChecks(z, r.design.zones.find((d) => d.zone === z.zone)!)),
  trace: (r) => [...r.trace, ...r.design.trace],
  cautions: (r) => [...r.warnings, ...r.cautions],
});

export const jointsModule = defineCheckModule({
  id: 'joints',
  label: 'Sealant joints',
  provides: ['minSealantMovementClass'],
  build: jointsInputFor,
  run: calculateJointSchedule,
  metrics: (_r, a) => ({ minSealantMovementClass: minSealantMovementClass(a.joints ?? []) }),
  verdicts: (r) =>
    r.joints.map(
      (j, i): ModuleCheck => ({
        id: `joints.${i}`,
        criterion: 'joint',
        label: `${j.name}: joint width for its movement`,
        required: j.requiredWidth,
        provided: j.designWidth,
        unit: 'm',
        direction: 'min',
        margin: j.designWidth - j.requiredWidth,
        marginRatio: j.margin,
        status: j.verdict,
        reason:
          j.governing === 'minimum'
            ? engineMessage('joint_minimum_governs', `joints.${i}`, {})
            : engineMessage('joint_governs', `joints.${i}`, { governing: j.governing }),
        traceStepIds: [`joints.${i}.requiredWidth`, `joints.${i}.margin`],
      }),
    ),
  trace: (r) => r.joints.flatMap((j) => j.trace),
  cautions: (r) =>
    r.joints.flatMap((j, i) =>
      j.warnings.map((warning) => engineMessage('joint_warning', `joints.${i}`, { joint: j.name, warning })),
    ),
});

/** Every module the runner evaluates, in the order of the sheet. */
export const CHECK_MODULES: readonly CheckModule[] = [
  thermalModule,
  moistureModule,
  windModule,
  jointsModule,
];
