import { CalcInputError, requireInRange } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { type EngineMessage, engineMessage, type MoistureWarning } from '@shared/format/message-schema';
import { type Assembly, assemble } from './assembly';
import {
  type DiffusionPath,
  type GlaserWork,
  glaserProfile,
  glaserWork,
  nodeTemperatures,
  saturationPressures,
} from './glaser';
import { type InteriorMonth, interiorMonth, SAFETY_FACTOR_DEFAULT } from './interior';
import { saturationPressureIso13788 } from './psychrometrics';
import type { MoistureInput, MoistureNode, MoistureResult, MonthResult } from './schema';
import { KGM2, ONE, PA, SRC_GLASER, SRC_INTERIOR, SRC_START, SRC_SURFACE } from './sources';
import { minSurfaceTemperature, minTemperatureFactor, surfaceTemperature } from './surface';

/*
 * Monthly interstitial condensation balance (ISO 13788:2012 §6) and surface check (§5) of a layered wall.
 * For the clause numbers, the humidity classes, the 1.10 factor, the start-month rule and Rsi = 0.25,
 * the verification tests name the published source each value was checked against, and how.
 */

/** Days per month, January first (365-day year). */
export const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;
/** Month names, January first (the climate form, the moisture page and the engine's messages). */
export const MONTH_NAMES = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
] as const;

/** Checks the climate, interior, start month and factor; returns the factor on Δp. */
function validateConditions(input: MoistureInput): number {
  if (input.months.length !== 12)
    throw new CalcInputError(
      'months',
      `needs exactly 12 months, January to December (got ${input.months.length})`,
    );
  input.months.forEach((m, k) => {
    requireInRange(m.exteriorTemperature, -60, 60, `months.${k}.exteriorTemperature`, 'exterior temperature');
    requireInRange(
      m.exteriorRelativeHumidity,
      0,
      1,
      `months.${k}.exteriorRelativeHumidity`,
      'relative humidity',
    );
  });
  const interior = input.interior;
  requireInRange(interior.temperature, -60, 60, 'interior.temperature', 'interior temperature');
  if (interior.kind === 'fixed')
    requireInRange(interior.relativeHumidity, 0, 1, 'interior.relativeHumidity', 'relative humidity');
  else if (
    !Number.isInteger(interior.humidityClass) ||
    interior.humidityClass < 1 ||
    interior.humidityClass > 5
  )
    throw new CalcInputError(
      'interior.humidityClass',
      `must be an integer 1–5 (got ${interior.humidityClass})`,
    );
  if (
    input.startMonth !== undefined &&
    !(Number.isInteger(input.startMonth) && input.startMonth >= 1 && input.startMonth <= 12)
  )
    throw new CalcInputError(
      'startMonth',
      `must be a calendar month, an integer 1–12 (got ${input.startMonth})`,
    );
  return requireInRange(input.safetyFactor ?? SAFETY_FACTOR_DEFAULT, 1, 2, 'safetyFactor', 'safety factor');
}

// ------------------------------------------------------------------------------------------ calculation

type StartRule = MoistureResult['startMonthRule'];

/** ISO 13788 start: the first month with condensation that follows a month without (dry-start profiles). */
function chooseStart(
  condensing: readonly boolean[],
  startMonth: number | undefined,
): { index: number; rule: StartRule } {
  if (startMonth !== undefined) return { index: startMonth - 1, rule: 'input' };
  if (!condensing.includes(true)) return { index: 0, rule: 'noCondensation' };
  for (let m = 0; m < 12; m++)
    if (condensing[m] && !condensing[(m + 11) % 12]) return { index: m, rule: 'firstCondensingMonth' };
  return { index: 0, rule: 'condensationEveryMonth' };
}

/** Boundary conditions, node temperatures and p_sat of all 12 months. */
interface Climate {
  theta: number[][];
  psat: number[][];
  pe: number[];
  interior: InteriorMonth[];
}

function monthlyClimate(
  input: MoistureInput,
  path: DiffusionPath,
  factor: number,
  warnings: MoistureWarning[],
): Climate {
  const theta: number[][] = [];
  const psat: number[][] = [];
  const pe: number[] = [];
  const capped: number[] = [];
  const interior = input.months.map((c, m) => {
    const p = c.exteriorRelativeHumidity * saturationPressureIso13788(c.exteriorTemperature);
    pe.push(p);
    const im = interiorMonth(input.interior, c.exteriorTemperature, p, factor, MONTH_NAMES[m]!);
    if (im.capped) capped.push(m + 1);
    const t = nodeTemperatures(path, im.theta, c.exteriorTemperature);
    theta.push(t);
    psat.push(saturationPressures(t));
    return im;
  });
  if (capped.length > 0) warnings.push(engineMessage('interior_capped', 'interior', { months: capped }));
  return { theta, psat, pe, interior };
}

/** For each month: does the dry-start profile (no water held anywhere) condense? */
function condensingMonths(path: DiffusionPath, climate: Climate, work: GlaserWork): boolean[] {
  const dry = new Array<number>(path.nodeCount).fill(0);
  const condensing: boolean[] = [];
  for (let m = 0; m < 12; m++) {
    glaserProfile(path, climate.psat[m]!, climate.pe[m]!, climate.interior[m]!.p, dry, work);
    let any = false;
    for (const g of work.rate) any ||= g > 0;
    condensing.push(any);
  }
  return condensing;
}

/** ISO 13788 surface check of one month (§5): θ_si ≥ θ_si,min, i.e. f_Rsi ≥ f_Rsi,min. */
function surfaceMonth(fRsi: number, thetaI: number, thetaE: number, pi: number): MonthResult['surface'] {
  const surface = surfaceTemperature(fRsi, thetaI, thetaE);
  const minimum = minSurfaceTemperature(pi);
  return {
    surfaceTemperature: surface,
    minSurfaceTemperature: minimum,
    fRsiMin: minTemperatureFactor(minimum, thetaI, thetaE),
    pass: surface >= minimum,
  };
}

/**
 * One month of the balance (ISO 13788:2012 §6): Glaser profile with the wet planes pinned at p_sat, then
 * M_a = max(0, M_a + g·t) at every plane. `Ma` is updated in place.
 */
function balanceMonth(
  m: number,
  input: MoistureInput,
  asm: Assembly,
  climate: Climate,
  Ma: number[],
  work: GlaserWork,
): MonthResult {
  const { path, fRsi } = asm;
  const n = path.nodeCount;
  const c = input.months[m]!;
  const im = climate.interior[m]!;
  const seconds = MONTH_DAYS[m]! * 86400;
  glaserProfile(path, climate.psat[m]!, climate.pe[m]!, im.p, Ma, work);
  const rate = work.rate.slice();
  const amount: number[] = [];
  const condensationNodes: number[] = [];
  const evaporationNodes: number[] = [];
  let condensed = 0;
  let evaporated = 0;
  let total = 0;
  for (let k = 0; k < n; k++) {
    const gt = rate[k]! * seconds;
    amount.push(gt * 1000);
    if (gt > 0) {
      condensationNodes.push(k);
      condensed += gt;
      Ma[k] = Ma[k]! + gt;
    } else if (gt < 0) {
      evaporationNodes.push(k);
      const ev = Math.min(Ma[k]!, -gt);
      evaporated += ev;
      Ma[k] = ev === Ma[k] ? 0 : Ma[k]! - ev;
    }
    total += Ma[k]!;
  }
  return {
    month: m + 1,
    seconds,
    exteriorTemperature: c.exteriorTemperature,
    exteriorVapourPressure: climate.pe[m]!,
    interiorTemperature: im.theta,
    interiorVapourPressure: im.p,
    temperature: climate.theta[m]!,
    saturationPressure: climate.psat[m]!,
    vapourPressure: work.p.slice(),
    rate,
    amount,
    accumulation: Ma.slice(),
    condensationNodes,
    evaporationNodes,
    condensed,
    evaporated,
    totalAccumulation: total,
    surface: surfaceMonth(fRsi, im.theta, c.exteriorTemperature, im.p),
  };
}

type Interstitial = MoistureResult['interstitial'];
type Plane = Interstitial['planes'][number];

/** Year summary: maxima, what is left after 12 months, and every node that ever held water. */
function summarise(months: readonly MonthResult[], nodes: readonly MoistureNode[]): Interstitial {
  let maxAccumulation = 0;
  let maxAccumulationMonth: number | null = null;
  let totalCondensed = 0;
  let totalEvaporated = 0;
  const planes = new Map<number, Plane>();
  for (const month of months) {
    totalCondensed += month.condensed;
    totalEvaporated += month.evaporated;
    if (month.totalAccumulation > maxAccumulation) {
      maxAccumulation = month.totalAccumulation;
      maxAccumulationMonth = month.month;
    }
    for (const k of month.condensationNodes)
      if (!planes.has(k))
        planes.set(k, {
          node: k,
          label: nodes[k]!.label,
          maxAccumulation: 0,
          maxAccumulationMonth: month.month,
          finalAccumulation: 0,
        });
    for (const plane of planes.values()) {
      const held = month.accumulation[plane.node]!;
      if (held > plane.maxAccumulation) {
        plane.maxAccumulation = held;
        plane.maxAccumulationMonth = month.month;
      }
    }
  }
  const last = months[months.length - 1]!;
  for (const plane of planes.values()) plane.finalAccumulation = last.accumulation[plane.node]!;
  return {
    condensationOccurs: totalCondensed > 0,
    maxAccumulation,
    maxAccumulationMonth,
    finalAccumulation: last.totalAccumulation,
    driesOut: last.accumulation.every((x) => x === 0),
    totalCondensed,
    totalEvaporated,
    planes: [...planes.values()].sort((a, b) => a.node - b.node),
  };
}

/** Year summary of the surface check: critical month = highest f_Rsi,min. */
function surfaceSummary(
  months: readonly MonthResult[],
  fRsi: number,
  given: MoistureInput['bridges'] = [],
): MoistureResult['surface'] {
  let fRsiMax: number | null = null;
  let criticalMonth: number | null = null;
  for (const month of months) {
    const f = month.surface.fRsiMin;
    if (f !== null && (fRsiMax === null || f > fRsiMax)) {
      fRsiMax = f;
      criticalMonth = month.month;
    }
  }
  // At a bridge the check is the same (ISO 13788:2012 §5 with ISO 10211): f_Rsi at the bridge ≥ f_Rsi,max.
  const bridges = given.map((b) => ({ ...b, pass: fRsiMax === null || b.fRsi >= fRsiMax }));
  const pass = months.every((month) => month.surface.pass) && bridges.every((b) => b.pass);
  return { fRsi, criticalMonth, fRsiMax, bridges, pass };
}

/** The result as data (shared/format words it): condensation, the clear-field surface and the solved bridges. */
function verdict(
  interstitial: Interstitial,
  surface: MoistureResult['surface'],
  months: readonly MonthResult[],
): EngineMessage {
  const worst = interstitial.planes.reduce<Plane | undefined>(
    (a, b) => (a === undefined || b.maxAccumulation > a.maxAccumulation ? b : a),
    undefined,
  );
  return engineMessage('moisture_verdict', '', {
    condensation: !interstitial.condensationOccurs ? 'none' : interstitial.driesOut ? 'dries' : 'builds',
    maxAccumulation: interstitial.maxAccumulation,
    finalAccumulation: interstitial.finalAccumulation,
    month: interstitial.maxAccumulationMonth ?? null,
    plane: worst?.label ?? null,
    fRsi: surface.fRsi,
    fRsiMax: surface.fRsiMax,
    failingMonths: months.filter((m) => !m.surface.pass).map((m) => m.month),
    bridges: surface.bridges.map(({ name, fRsi, pass }) => ({ name, fRsi, pass })),
  });
}

const START_FORMULA: Record<StartRule, string> = {
  input: 'given',
  firstCondensingMonth: 'first month with condensation after a month without',
  noCondensation: 'no month condenses: January',
  condensationEveryMonth: 'every month condenses: January',
};

/** Interstitial condensation (monthly Glaser) and surface humidity of a wall; `input` is already parsed. */
export function calculateMoisture(input: MoistureInput): MoistureResult {
  if (input.layers.length === 0) throw new CalcInputError('layers', 'needs at least one layer');
  const factor = validateConditions(input);
  const trace: TraceStep[] = [];
  const warnings: MoistureWarning[] = [];
  const asm = assemble(input, trace, warnings);
  const climate = monthlyClimate(input, asm.path, factor, warnings);
  const work = glaserWork(asm.path.nodeCount);
  const start = chooseStart(condensingMonths(asm.path, climate, work), input.startMonth);
  if (start.rule === 'condensationEveryMonth')
    warnings.push(engineMessage('condensation_every_month', '', {}));
  trace.push(
    step(
      'moisture.safetyFactor',
      'Factor on the interior vapour pressure excess',
      'p_i = p_e + f·Δp',
      SRC_INTERIOR,
      {},
      factor,
      ONE,
    ),
    step(
      'moisture.startMonth',
      'Month in which the balance starts',
      START_FORMULA[start.rule],
      SRC_START,
      {},
      start.index + 1,
      'month',
    ),
  );

  const Ma = new Array<number>(asm.path.nodeCount).fill(0);
  const months: MonthResult[] = [];
  for (let i = 0; i < 12; i++) {
    const m = (start.index + i) % 12;
    const month = balanceMonth(m, input, asm, climate, Ma, work);
    months.push(month);
    trace.push(
      step(
        `moisture.month.${m + 1}.Ma`,
        `${MONTH_NAMES[m]}: accumulated water ΣM_a`,
        'M_a = max(0, M_a,prev + g_c·t) at every plane',
        SRC_GLASER,
        {
          p_e: v(month.exteriorVapourPressure, PA),
          p_i: v(month.interiorVapourPressure, PA),
          condensed: v(month.condensed, KGM2),
          evaporated: v(month.evaporated, KGM2),
        },
        month.totalAccumulation,
        KGM2,
      ),
    );
  }
  const interstitial = summarise(months, asm.nodes);
  const surface = surfaceSummary(months, asm.fRsi, input.bridges);
  trace.push(
    step(
      'moisture.maxAccumulation',
      'Largest accumulated water ΣM_a',
      'max over the 12 months',
      SRC_GLASER,
      {},
      interstitial.maxAccumulation,
      KGM2,
    ),
    step(
      'moisture.finalAccumulation',
      'Water left after 12 months',
      'ΣM_a at the end of the cycle',
      SRC_GLASER,
      {},
      interstitial.finalAccumulation,
      KGM2,
    ),
  );
  if (surface.fRsiMax !== null)
    trace.push(
      step(
        'moisture.fRsiMax',
        'Design temperature factor f_Rsi,max (critical month)',
        'max f_Rsi,min over the months',
        SRC_SURFACE,
        { f_Rsi: v(asm.fRsi, ONE) },
        surface.fRsiMax,
        ONE,
      ),
    );
  trace.push(
    ...surface.bridges.map((b, i) =>
      step(
        `moisture.bridge.${i}.fRsi`,
        `Temperature factor at ${b.name}`,
        'f_Rsi = (θsi,min − θe) / (θi − θe), solved with Rsi = 0.25 m²·K/W',
        'ISO 10211:2017 (2-D/3-D solve); ISO 13788:2012 §5',
        {},
        b.fRsi,
        ONE,
        b.pass ? undefined : 'below f_Rsi,max: mould risk at the bridge',
      ),
    ),
  );

  return {
    layers: asm.layers,
    nodes: asm.nodes,
    Rsi: asm.Rsi,
    Rse: asm.Rse,
    totalResistance: asm.path.totalResistance,
    totalSd: asm.path.totalSd,
    safetyFactor: factor,
    startMonth: start.index + 1,
    startMonthRule: start.rule,
    months,
    interstitial,
    surface,
    verdict: verdict(interstitial, surface, months),
    trace,
    warnings,
  };
}
