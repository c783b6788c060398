import { calculateJointSchedule } from '../calc/joints/joints';
import { calculateMoisture } from '../calc/moisture/monthly';
import { calculateThermal } from '../calc/thermal/thermal';
import { calculateWindSchedule } from '../calc/wind/attachment';
import type { ZoneResult } from '../calc/wind/schema';
import { jointsInputFor, moistureInputFor, thermalInputFor, windInputFor } from './inputs';
import {
  cavityInsulationR,
  continuousInsulationR,
  deflectionDenominator,
  maxSurfaceRh,
  minSealantMovementClass,
} from './metrics';
import { type CheckModule, compare, defineCheckModule, type ModuleCheck } from './module';

/*
 * The registry of check modules. Each wraps one calculation of shared/calc: how its input is built from the
 * assembly and project (shared/checks/inputs.ts), which metrics it reports for code tables, and its own
 * verdicts that hold whatever the code table says (the wind schedule, the joints, the surface humidity).
 */

export const thermalModule = defineCheckModule({
  id: 'thermal',
  label: 'Thermal calculation',
  provides: ['Ueff', 'Reff', 'continuousInsulationR', 'cavityInsulationR'],
  build: (a) => thermalInputFor(a),
  run: calculateThermal,
  metrics: (r, a) => ({
    Ueff: { value: r.Ueff, unit: 'W/(m²·K)', traceStepIds: ['thermal.Ueff'] },
    Reff: { value: r.Reff, unit: 'm²·K/W', traceStepIds: ['thermal.Reff'] },
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
      note: r.interstitial.condensationOccurs
        ? undefined
        : 'No interstitial condensation is predicted, so there is nothing to dry.',
    },
    maxSurfaceRh: maxSurfaceRh(r),
  }),
  verdicts: (r): ModuleCheck[] => {
    const { fRsi, fRsiMax, pass, criticalMonth } = r.surface;
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
          reason: 'No month is colder outside than inside: no surface condensation risk to design against.',
        },
      ];
    return [
      {
        ...base,
        ...compare('min', fRsiMax, fRsi),
        status: pass ? 'pass' : 'fail',
        reason: `ISO 13788 §5: the surface stays at or below 80 % RH when f_Rsi ≥ f_Rsi,max; critical month ${criticalMonth}. Clear field only — girts, clips and studs need their own f_Rsi.`,
      },
    ];
  },
  trace: (r) => r.trace,
  cautions: (r) => r.warnings,
});

function zoneChecks(z: ZoneResult, girtSpacing?: number, clipSpacing?: number): ModuleCheck[] {
  const at = `wind.zone${z.zone}`;
  const out: ModuleCheck[] = [
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
      reason:
        z.status === 'outside-table'
          ? 'Even the shortest span of the table does not carry this zone’s pressure: choose a stronger panel or add support.'
          : z.status === 'table-end'
            ? 'The longest span of the table still carries the pressure; spans beyond the table are not extrapolated.'
            : 'Found inside the table.',
      traceStepIds: z.status === 'outside-table' ? [] : [`${at}.girtSpacing`],
    },
  ];
  const spacing = (
    key: 'girtSpacing' | 'clipSpacing',
    label: string,
    design: number | undefined,
    max: number | null | undefined,
    what: string,
    note: string,
  ): ModuleCheck => {
    const base = {
      id: `${at}.${key}`,
      criterion: key,
      label: `${z.name}: ${label}`,
      required: max ?? null,
      unit: 'm',
      direction: 'max' as const,
      traceStepIds: max == null ? [] : [`${at}.${key}`],
    };
    if (design === undefined)
      return {
        ...base,
        provided: null,
        margin: null,
        marginRatio: null,
        status: 'not_evaluated',
        reason: `the design ${what} is not entered on the assembly`,
      };
    if (max == null)
      return {
        ...base,
        provided: design,
        margin: null,
        marginRatio: null,
        status: 'fail',
        reason: `no ${what} works: the panel table does not carry this zone’s pressure`,
      };
    return { ...base, provided: design, ...compare('max', max, design), reason: note };
  };
  out.push(
    spacing(
      'girtSpacing',
      'design girt spacing ≤ maximum',
      girtSpacing,
      z.girtSpacing,
      'girt spacing',
      z.governingCheck ? `The maximum is governed by the ${z.governingCheck} check.` : '',
    ),
    spacing(
      'clipSpacing',
      'design clip spacing ≤ maximum',
      clipSpacing,
      z.clip?.maxSpacing,
      'clip spacing',
      'The maximum clip spacing is found at the zone’s maximum girt spacing; it is conservative for a closer girt spacing.',
    ),
  );
  return out;
}

export const windModule = defineCheckModule({
  id: 'wind',
  label: 'Wind attachment schedule',
  provides: ['deflectionLimit'],
  build: windInputFor,
  run: calculateWindSchedule,
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
              note: `The girt spacing is limited by the table’s ${limit} deflection column.`,
            }
          : {
              value: null,
              reason:
                'the panel’s load–span table has no deflection column, so no deflection limit is checked',
            },
    };
  },
  verdicts: (r, a) =>
    r.zones.flatMap((z) => zoneChecks(z, a.attachment.girtSpacing, a.attachment.clipSpacing)),
  trace: (r) => r.trace,
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
            ? 'The smallest practical joint width governs.'
            : `The joint’s ${j.governing} governs the width it needs.`,
        traceStepIds: [`joints.${i}.requiredWidth`, `joints.${i}.margin`],
      }),
    ),
  trace: (r) => r.joints.flatMap((j) => j.trace),
  cautions: (r) => r.joints.flatMap((j) => j.warnings.map((w) => `${j.name}: ${w}`)),
});

/** Every module the runner evaluates, in the order of the sheet. */
export const CHECK_MODULES: readonly CheckModule[] = [
  thermalModule,
  moistureModule,
  windModule,
  jointsModule,
];
