import { CalcInputError, requireInRange, requirePositive } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { M, N, ONE, PA } from '@shared/calc/trace-units';
import { engineMessage, type WindWarning } from '@shared/format/message-schema';
import { analyseSite, MINIMUM_PRESSURE, type SiteAnalysis, tracePressures, wallPressures } from './pressure';
import type {
  ClipResult,
  Iteration,
  LoadSpanTable,
  Panel,
  SpanCheck,
  SpanCheckName,
  SpanCondition,
  TableStatus,
  WallZone,
  WindScheduleInput,
  WindScheduleResult,
  ZonePressure,
  ZoneResult,
} from './schema';

/*
 * Girt and clip spacing of metal wall panels from a maker's load–span table and clip capacity, per wall zone.
 * The pressure depends on the effective wind area, which depends on the spacing being sought, so each spacing is
 * found by fixed-point iteration started from the smallest area (largest pressure): every iterate satisfies the
 * check, the sequence only grows, and it stops when the spacing changes by less than 1 mm.
 */

/** Convergence tolerance on a spacing, m. */
export const SPACING_TOLERANCE = 0.001;
/** Iteration cap of the fixed-point searches. */
export const MAX_ITERATIONS = 100;
/** Deflection check at 0.6 W unless the caller gives another factor. */
export const DEFAULT_DEFLECTION_WIND_FACTOR = 0.6;

/**
 * Largest support reaction of a continuous panel under uniform load ÷ (w·L): interior support of two equal spans
 * 10/8 = 1.25, of three equal spans 1.10; single span 1.0 (beam theory, three-moment equation — derived).
 */
export const CONTINUITY_FACTOR: Readonly<Record<SpanCondition, number>> = {
  single: 1,
  double: 1.25,
  triple: 1.1,
};

/** The span condition in words, as sheets and libraries print it. */
export const SPAN_CONDITION_WORDS: Readonly<Record<SpanCondition, string>> = {
  single: 'single span',
  double: 'two-span',
  triple: 'three-span',
};

export const CAUTIONS: readonly string[] = [
  'The engineer of record or the delegated-design engineer is responsible for the cladding design; this schedule is a design aid, not a sealed design.',
  'The manufacturer’s tested values govern: enter the load–span table and clip or fastener capacities of the actual product, gauge and fastener pattern, and check that the table’s span condition matches the layout.',
  'Girt bending, girt deflection and the fastener’s pull-out from the girt or substrate are not checked here.',
  'Allowable values are compared with ASD pressures 0.6 W; the strength-level pressures are reported for reference.',
  'ASCE 7 values marked as not yet verified in the verification suite must be checked against the standard before the schedule is issued.',
];

/** Effective wind area A = span × max(width, span/3) (ASCE 7-16/7-22 §26.2, "effective wind area"). */
export const effectiveWindArea = (span: number, width: number): number => span * Math.max(width, span / 3);

/** Linear interpolation in a column of the load–span table; null outside the tabulated spans (never extrapolated). */
export function interpolateColumn(
  spans: readonly number[],
  values: readonly number[],
  span: number,
): number | null {
  const last = spans.length - 1;
  if (!(span >= spans[0]! && span <= spans[last]!)) return null;
  let i = 0;
  while (i < last - 1 && span > spans[i + 1]!) i++;
  const t = (span - spans[i]!) / (spans[i + 1]! - spans[i]!);
  return values[i]! + t * (values[i + 1]! - values[i]!);
}

/**
 * Largest span whose allowable pressure is at least p, by linear interpolation in a column that does not increase
 * with span; `table-end` when the longest tabulated span still carries p; null when even the shortest does not.
 */
export function spanForPressure(
  spans: readonly number[],
  allowable: readonly number[],
  p: number,
): { span: number; status: Exclude<TableStatus, 'outside-table'> } | null {
  let j = allowable.length - 1;
  if (allowable[j]! >= p) return { span: spans[j]!, status: 'table-end' };
  while (j >= 0 && allowable[j]! < p) j--;
  if (j < 0) return null;
  const t = (allowable[j]! - p) / (allowable[j]! - allowable[j + 1]!);
  return { span: spans[j]! + t * (spans[j + 1]! - spans[j]!), status: 'ok' };
}

interface Columns {
  spans: number[];
  inward: number[];
  outward: number[];
  deflection: number[] | null;
}

function nonIncreasing(values: readonly number[], column: string): void {
  for (let i = 1; i < values.length; i++)
    if (values[i]! > values[i - 1]!)
      throw new CalcInputError(
        `panel.loadSpanTable.rows.${i}.${column}`,
        `allowable pressures must not increase with span (${values[i]} Pa after ${values[i - 1]} Pa)`,
      );
}

/** Refuse a table that is not a load–span table: fewer than 2 rows, spans not increasing, allowables rising. */
export function tableColumns(table: LoadSpanTable): Columns {
  const rows = table.rows;
  if (rows.length < 2) throw new CalcInputError('panel.loadSpanTable.rows', 'needs at least two rows');
  const withDeflection = rows.filter((r) => r.allowableDeflectionPressure !== undefined).length;
  if (withDeflection !== 0 && withDeflection !== rows.length)
    throw new CalcInputError(
      'panel.loadSpanTable.rows',
      'give the deflection column for every row or for none',
    );
  rows.forEach((r, i) => {
    const at = `panel.loadSpanTable.rows.${i}`;
    requirePositive(r.span, `${at}.span`, 'span');
    requirePositive(r.allowableInward, `${at}.allowableInward`, 'allowable inward pressure');
    requirePositive(r.allowableOutward, `${at}.allowableOutward`, 'allowable outward pressure');
    if (r.allowableDeflectionPressure !== undefined)
      requirePositive(
        r.allowableDeflectionPressure,
        `${at}.allowableDeflectionPressure`,
        'deflection pressure',
      );
    if (i > 0 && !(r.span > rows[i - 1]!.span))
      throw new CalcInputError(
        `${at}.span`,
        `spans must increase row by row (${r.span} m after ${rows[i - 1]!.span} m)`,
      );
  });
  const columns: Columns = {
    spans: rows.map((r) => r.span),
    inward: rows.map((r) => r.allowableInward),
    outward: rows.map((r) => r.allowableOutward),
    deflection: withDeflection === 0 ? null : rows.map((r) => r.allowableDeflectionPressure!),
  };
  nonIncreasing(columns.inward, 'allowableInward');
  nonIncreasing(columns.outward, 'allowableOutward');
  if (columns.deflection) nonIncreasing(columns.deflection, 'allowableDeflectionPressure');
  return columns;
}

/** Allowable ASD load of one clip, N: its rating, or fastener capacity × fasteners per clip. */
export function clipCapacity(clip: Panel['clip']): number {
  if ('allowableLoad' in clip)
    return requirePositive(clip.allowableLoad, 'panel.clip.allowableLoad', 'clip load');
  requirePositive(clip.fastenerCapacity, 'panel.clip.fastenerCapacity', 'fastener capacity');
  if (!Number.isInteger(clip.fastenersPerClip) || clip.fastenersPerClip < 1)
    throw new CalcInputError('panel.clip.fastenersPerClip', 'must be a whole number of 1 or more');
  return clip.fastenerCapacity * clip.fastenersPerClip;
}

/**
 * Largest panel span for one check: s₀ = shortest tabulated span, s_{k+1} = span at which the table allows the
 * demand at A(s_k); stops when |Δs| < 1 mm or at the iteration cap.
 */
export function spanCheck(
  check: SpanCheckName,
  spans: readonly number[],
  allowable: readonly number[],
  demandAt: (span: number) => number,
): SpanCheck {
  let s = spans[0]!;
  let status: TableStatus = 'ok';
  let lastChange = Number.POSITIVE_INFINITY;
  let iterations = 0;
  while (iterations < MAX_ITERATIONS) {
    iterations++;
    const next = spanForPressure(spans, allowable, demandAt(s));
    if (next === null)
      return {
        check,
        status: 'outside-table',
        maxSpan: null,
        demand: null,
        allowable: null,
        utilisation: null,
        iteration: { converged: true, iterations, lastChange: 0 },
      };
    lastChange = Math.abs(next.span - s);
    s = next.span;
    status = next.status;
    if (lastChange < SPACING_TOLERANCE) break;
  }
  const demand = demandAt(s);
  const allowed = interpolateColumn(spans, allowable, s)!;
  return {
    check,
    status,
    maxSpan: s,
    demand,
    allowable: allowed,
    utilisation: demand / allowed,
    iteration: { converged: lastChange < SPACING_TOLERANCE, iterations, lastChange },
  };
}

/**
 * Largest clip spacing along the girt: s_c = P/(C·p·s_g), p the ASD pressure magnitude at the clip’s own
 * tributary area s_c·s_g (ASCE 7 §26.2: a fastener’s effective area is at most its tributary area); iterated from
 * s_c = 0 (largest pressure) until |Δs_c| < 1 mm.
 */
export function clipSpacing(
  capacity: number,
  continuity: number,
  girtSpacing: number,
  pressureAt: (area: number) => number,
): Omit<ClipResult, 'capacity' | 'continuityFactor'> {
  let s = 0;
  let lastChange = Number.POSITIVE_INFINITY;
  let iterations = 0;
  while (iterations < MAX_ITERATIONS && !(lastChange < SPACING_TOLERANCE)) {
    iterations++;
    const next = capacity / (continuity * pressureAt(s * girtSpacing) * girtSpacing);
    lastChange = Math.abs(next - s);
    s = next;
  }
  const area = s * girtSpacing;
  const pressure = pressureAt(area);
  const demand = continuity * pressure * area;
  const iteration: Iteration = { converged: lastChange < SPACING_TOLERANCE, iterations, lastChange };
  return { maxSpacing: s, effectiveArea: area, pressure, demand, utilisation: demand / capacity, iteration };
}

const governingMagnitude = (p: ZonePressure): number => Math.max(p.asd.inward, -p.asd.outward);

interface ZoneSetup {
  site: SiteAnalysis;
  columns: Columns;
  width: number;
  capacity: number;
  continuity: number;
  deflectionFactor: number;
  deflectionLimit: string;
}

function scheduleZone(zone: WallZone, z: ZoneSetup, trace: TraceStep[]): ZoneResult {
  const at = (span: number) => wallPressures(z.site, zone, effectiveWindArea(span, z.width));
  const checks: SpanCheck[] = [
    spanCheck('outward', z.columns.spans, z.columns.outward, (s) => -at(s).asd.outward),
    spanCheck('inward', z.columns.spans, z.columns.inward, (s) => at(s).asd.inward),
  ];
  if (z.columns.deflection)
    checks.push(
      spanCheck('deflection', z.columns.spans, z.columns.deflection, (s) => {
        const p = at(s).strength;
        return z.deflectionFactor * Math.max(p.inward, -p.outward);
      }),
    );
  const name = zone === 4 ? 'Zone 4 — wall interior' : 'Zone 5 — wall end zones (width a at each corner)';
  if (checks.some((c) => c.status === 'outside-table')) {
    return {
      zone,
      name,
      status: 'outside-table',
      governingCheck: null,
      girtSpacing: null,
      spanChecks: checks,
      pressures: null,
      clip: null,
    };
  }
  let governing = checks[0]!;
  for (const c of checks) if (c.maxSpan! < governing.maxSpan!) governing = c;
  const girtSpacing = governing.maxSpan!;
  const pressures = at(girtSpacing);
  const clip = clipSpacing(z.capacity, z.continuity, girtSpacing, (area) =>
    governingMagnitude(wallPressures(z.site, zone, area)),
  );
  trace.push(
    ...tracePressures(z.site, zone, pressures, girtSpacing),
    step(
      `wind.zone${zone}.girtSpacing`,
      `${name}: maximum girt spacing (panel span)`,
      'largest s with allowable(s) ≥ p_ASD(A(s)), A = s × max(w, s/3), fixed-point iteration',
      'Load–span table of the panel; ASCE 7 §26.2 effective wind area',
      { w: v(z.width, M), 'allowable(s)': v(governing.allowable!, PA), 'p(s)': v(governing.demand!, PA) },
      girtSpacing,
      M,
      `Governed by the ${governing.check} check${governing.check === 'deflection' ? ` (${z.deflectionLimit} at ${z.deflectionFactor}·W)` : ''}${governing.status === 'table-end' ? '; the table ends here — longer spans are outside the table' : ''}`,
    ),
    step(
      `wind.zone${zone}.clipSpacing`,
      `${name}: maximum clip spacing along the girt`,
      's_c = P/(C·p_ASD(A_c)·s_g), A_c = s_c·s_g',
      'Clip or fastener capacity (ASD); ASCE 7 §26.2 effective wind area of a fastener',
      { P: v(z.capacity, N), C: v(z.continuity, ONE), s_g: v(girtSpacing, M), p: v(clip.pressure, PA) },
      clip.maxSpacing,
      M,
    ),
  );
  return {
    zone,
    name,
    status: governing.status,
    governingCheck: governing.check,
    girtSpacing,
    spanChecks: checks,
    pressures,
    clip: { ...clip, capacity: z.capacity, continuityFactor: z.continuity },
  };
}

function zoneWarnings(zone: ZoneResult, site: SiteAnalysis, panel: Panel): WindWarning[] {
  const out: WindWarning[] = [];
  const at = { zone: zone.zone };
  const notConverged = (check: string) =>
    engineMessage('spacing_not_converged', '', { ...at, check, iterations: MAX_ITERATIONS });
  for (const c of zone.spanChecks) {
    if (c.status === 'outside-table')
      out.push(engineMessage('span_outside_table', 'panel.loadSpanTable', { ...at, check: c.check }));
    else if (!c.iteration.converged) out.push(notConverged(c.check));
  }
  if (zone.status === 'table-end') out.push(engineMessage('table_end_governs', 'panel.loadSpanTable', at));
  if (zone.clip && zone.clip.maxSpacing < panel.panelModuleWidth)
    out.push(engineMessage('clip_below_module', '', { ...at, clipSpacing: zone.clip.maxSpacing }));
  if (zone.clip && !zone.clip.iteration.converged) out.push(notConverged('clip'));
  if (zone.zone === 5 && panel.girtOrientation === 'horizontal' && panel.panelModuleWidth > site.edgeWidth)
    out.push(engineMessage('module_wider_than_end_zone', 'panel.panelModuleWidth', {}));
  if (zone.zone === 4 && panel.girtOrientation === 'vertical' && (zone.girtSpacing ?? 0) > site.edgeWidth)
    out.push(engineMessage('panels_cross_end_zone', '', {}));
  return out;
}

/** Per-zone girt and clip spacing schedule of a metal-panel wall; `input` is already parsed by the zod schema. */
export function calculateWindSchedule(input: WindScheduleInput): WindScheduleResult {
  const { panel } = input;
  const site = analyseSite(input.site);
  const columns = tableColumns(panel.loadSpanTable);
  requirePositive(panel.panelModuleWidth, 'panel.panelModuleWidth', 'panel module width');
  const capacity = clipCapacity(panel.clip);
  const continuity = panel.continuityFactor ?? CONTINUITY_FACTOR[panel.loadSpanTable.spanCondition];
  requireInRange(continuity, 1, 1.5, 'panel.continuityFactor', 'continuity factor');
  const deflectionFactor = panel.deflectionWindFactor ?? DEFAULT_DEFLECTION_WIND_FACTOR;
  requireInRange(deflectionFactor, 0.42, 1, 'panel.deflectionWindFactor', 'deflection wind factor');

  const trace: TraceStep[] = [...site.trace];
  trace.push(
    step(
      'wind.pmin',
      'Minimum net C&C pressure (strength level)',
      '|p| ≥ 16 psf',
      `${site.velocity.edition} §30.2.2`,
      {},
      MINIMUM_PRESSURE,
      PA,
    ),
    step(
      'wind.clip.capacity',
      'Allowable load per clip (ASD)',
      'allowableLoad' in panel.clip ? 'P = clip rating' : 'P = fastener capacity × fasteners per clip',
      'Manufacturer’s tested values',
      {},
      capacity,
      N,
    ),
    step(
      'wind.continuity',
      'Reaction factor at the clip',
      panel.continuityFactor === undefined
        ? `C for a ${panel.loadSpanTable.spanCondition}-span panel`
        : 'C as entered',
      'Beam theory: interior reaction of equal continuous spans (derived)',
      {},
      continuity,
      ONE,
    ),
  );
  const setup: ZoneSetup = {
    site,
    columns,
    width: panel.panelModuleWidth,
    capacity,
    continuity,
    deflectionFactor,
    deflectionLimit: panel.loadSpanTable.deflectionLimit,
  };
  const zones = [scheduleZone(4, setup, trace), scheduleZone(5, setup, trace)];
  const warnings = [...site.warnings, ...zones.flatMap((z) => zoneWarnings(z, site, panel))];
  return {
    velocity: site.velocity,
    lowRise: site.lowRise,
    figure: site.figure,
    edgeWidth: site.edgeWidth,
    GCpi: site.GCpi,
    minimumPressure: MINIMUM_PRESSURE,
    zones,
    trace,
    warnings,
    cautions: [...CAUTIONS],
  };
}
