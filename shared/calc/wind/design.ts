import { requirePositive } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { M, M2, N, ONE, PA } from '@shared/calc/trace-units';
import { engineMessage } from '@shared/format/message-schema';
import {
  CONTINUITY_FACTOR,
  calculateWindSchedule,
  clipCapacity,
  clipSpacing,
  DEFAULT_DEFLECTION_WIND_FACTOR,
  effectiveWindArea,
  interpolateColumn,
} from './attachment';
import { analyseSite, type SiteAnalysis, wallPressures } from './pressure';
import type {
  DesignCheck,
  DesignSpacingResult,
  DesignStatus,
  SpanCheckName,
  WallZone,
  WindDesignInput,
  WindScheduleResult,
  ZoneDesign,
  ZonePressure,
  ZoneResult,
} from './schema';

/*
 * The girt and clip spacing the designer chose, checked zone by zone with the schedule's own rules: pressures at the
 * effective wind area of the design spacing (ASCE 7 §26.2), table values interpolated linearly and never
 * extrapolated, demand ≤ allowable at ASD. The schedule's maximum spacings are the authority: a design spacing
 * beyond one fails even where a later part of the table would carry it again.
 */

/** Utilisation counted as met up to 1 + this: floating-point round-off only. */
export const UTILISATION_TOLERANCE = 1e-9;

/** Combine verdicts: a failure wins, then "outside the table", then "missing", else met. */
export function combineStatus(statuses: readonly DesignStatus[]): DesignStatus {
  if (statuses.includes('fails')) return 'fails';
  if (statuses.includes('outside-table')) return 'outside-table';
  if (statuses.includes('missing')) return 'missing';
  return 'meets';
}

/** Met when u = demand / allowable ≤ 1 (allowable-stress design, ASD values of the table and the clip). */
export const utilisationStatus = (u: number): DesignStatus =>
  u <= 1 + UTILISATION_TOLERANCE ? 'meets' : 'fails';

const GIRT_MISSING = engineMessage('design_girt_missing', 'design.girtSpacing', {});

/**
 * One span check at the design girt spacing s_g: u = p(A(s_g)) / allowable(s_g), A = s_g × max(w, s_g/3)
 * (ASCE 7 §26.2), allowable interpolated linearly in the load–span table and never extrapolated.
 */
export function spanAtDesign(
  check: SpanCheckName,
  spans: readonly number[],
  column: readonly number[],
  span: number | undefined,
  demandAt: (span: number) => number,
): DesignCheck {
  const none = { check, required: null, allowable: null, utilisation: null, unit: 'Pa' } as const;
  if (span === undefined) return { ...none, status: 'missing', reason: GIRT_MISSING };
  const allowable = interpolateColumn(spans, column, span);
  if (allowable === null)
    return {
      ...none,
      status: 'outside-table',
      reason:
        span > spans[spans.length - 1]!
          ? engineMessage('span_beyond_table', 'design.girtSpacing', {
              span,
              longest: spans[spans.length - 1]!,
            })
          : engineMessage('span_below_table', 'design.girtSpacing', { span, shortest: spans[0]! }),
    };
  const required = demandAt(span);
  const utilisation = required / allowable;
  return { check, status: utilisationStatus(utilisation), required, allowable, utilisation, unit: 'Pa' };
}

/**
 * Load on one clip at the design spacings: N = C·p(A_c)·A_c, A_c = s_c·s_g (a fastener's effective wind area is its
 * tributary area, ASCE 7 §26.2), p the ASD pressure magnitude; u = N / P with P the clip's allowable load.
 */
export function clipAtDesign(
  capacity: number,
  continuity: number,
  girtSpacing: number | undefined,
  clipSpacingDesign: number | undefined,
  pressureAt: (area: number) => number,
): DesignCheck {
  if (girtSpacing === undefined || clipSpacingDesign === undefined)
    return {
      check: 'clip',
      status: 'missing',
      required: null,
      allowable: capacity,
      utilisation: null,
      unit: 'N',
      reason:
        girtSpacing === undefined
          ? GIRT_MISSING
          : engineMessage('design_clip_missing', 'design.clipSpacing', {}),
    };
  const area = clipSpacingDesign * girtSpacing;
  const required = continuity * pressureAt(area) * area;
  const utilisation = required / capacity;
  return {
    check: 'clip',
    status: utilisationStatus(utilisation),
    required,
    allowable: capacity,
    utilisation,
    unit: 'N',
  };
}

/**
 * Verdict on one design spacing: missing without it (or without what its checks need); fails when no spacing works
 * (max null) or when it exceeds the maximum (equal meets); otherwise the checks at the design spacing decide.
 */
export function spacingVerdict(
  design: number | undefined,
  max: number | null,
  checks: readonly DesignStatus[],
): DesignStatus {
  if (design === undefined || checks.includes('missing')) return 'missing';
  if (max === null || design > max) return 'fails';
  return combineStatus(checks);
}

/**
 * The end zones never allow more than the interior: zone 5 pressures are at least zone 4's at every area (ASCE 7
 * Figure 30.3-1 / 30.5-1 / 30.4-1: one positive curve, zone 5 suction ≥ zone 4's), so max₅ ≤ max₄; this removes a
 * sub-millimetre excess that the two fixed-point searches (each stopped at |Δs| < 1 mm) can leave.
 */
export const atMost = (own: number | null, interior: number | null): number | null =>
  own === null || interior === null ? null : Math.min(own, interior);

const governingMagnitude = (p: ZonePressure) => Math.max(p.asd.inward, -p.asd.outward);

interface Setup {
  site: SiteAnalysis;
  spans: number[];
  columns: { check: SpanCheckName; values: number[]; demand: (p: ZonePressure) => number }[];
  width: number;
  capacity: number;
  continuity: number;
  deflectionFactor: number;
  deflectionLimit: string;
  girtSpacing?: number;
  clipSpacing?: number;
}

function setupOf(input: WindDesignInput): Setup {
  const { panel, design } = input;
  const rows = panel.loadSpanTable.rows;
  const deflectionFactor = panel.deflectionWindFactor ?? DEFAULT_DEFLECTION_WIND_FACTOR;
  const columns: Setup['columns'] = [
    { check: 'inward', values: rows.map((r) => r.allowableInward), demand: (p) => p.asd.inward },
    { check: 'outward', values: rows.map((r) => r.allowableOutward), demand: (p) => -p.asd.outward },
  ];
  if (rows.every((r) => r.allowableDeflectionPressure !== undefined))
    columns.push({
      check: 'deflection',
      values: rows.map((r) => r.allowableDeflectionPressure!),
      demand: (p) => deflectionFactor * Math.max(p.strength.inward, -p.strength.outward),
    });
  return {
    site: analyseSite(input.site),
    spans: rows.map((r) => r.span),
    columns,
    width: panel.panelModuleWidth,
    capacity: clipCapacity(panel.clip),
    continuity: panel.continuityFactor ?? CONTINUITY_FACTOR[panel.loadSpanTable.spanCondition],
    deflectionFactor,
    deflectionLimit: panel.loadSpanTable.deflectionLimit,
    ...(design.girtSpacing === undefined
      ? {}
      : { girtSpacing: requirePositive(design.girtSpacing, 'design.girtSpacing', 'design girt spacing') }),
    ...(design.clipSpacing === undefined
      ? {}
      : { clipSpacing: requirePositive(design.clipSpacing, 'design.clipSpacing', 'design clip spacing') }),
  };
}

const SPAN_WORDS: Record<SpanCheckName, { label: string; formula: string }> = {
  inward: {
    label: 'inward pressure at the design girt spacing',
    formula: 'u = p_ASD,in(A) / allowable_in(s_g), A = s_g × max(w, s_g/3)',
  },
  outward: {
    label: 'suction at the design girt spacing',
    formula: 'u = |p_ASD,out(A)| / allowable_out(s_g), A = s_g × max(w, s_g/3)',
  },
  deflection: {
    label: 'deflection pressure at the design girt spacing',
    formula: 'u = k·max(W_in, |W_out|)(A) / p_defl(s_g), A = s_g × max(w, s_g/3)',
  },
};

/** The maxima a zone's design is compared with (zone 5 capped by zone 4's, see `atMost`). */
interface Maxima {
  girt: number | null;
  clip: number | null;
}

/** Trace of one zone's design check: each span check and the clip load with a number, the clip maximum, any cap. */
function designTrace(
  zone: ZoneResult,
  s: Setup,
  d: ZoneDesign,
  ownClip: ReturnType<typeof clipSpacing> | null,
  interior: Maxima | null,
): TraceStep[] {
  const sg = d.girtSpacing;
  if (sg === undefined) return [];
  const at = `wind.zone${zone.zone}.design`;
  const Z = `Zone ${zone.zone}`;
  const fastener = 'Clip or fastener capacity (ASD); ASCE 7 §26.2 effective wind area of a fastener';
  const out: TraceStep[] = [];
  d.checks.forEach((c, i) => {
    if (c.utilisation === null || c.check === 'clip') return;
    const words = SPAN_WORDS[s.columns[i]!.check];
    out.push(
      step(
        `${at}.${c.check}`,
        `${Z}: ${words.label}`,
        words.formula,
        `Load–span table of the panel, interpolated linearly (never extrapolated); ${s.site.velocity.edition} §26.2 effective wind area`,
        {
          s_g: v(sg, M),
          w: v(s.width, M),
          A: v(effectiveWindArea(sg, s.width), M2),
          p: v(c.required!, PA),
          allowable: v(c.allowable!, PA),
          ...(c.check === 'deflection' ? { k: v(s.deflectionFactor, ONE) } : {}),
        },
        c.utilisation,
        ONE,
        c.check === 'deflection' ? `${s.deflectionLimit} column of the table` : undefined,
      ),
    );
  });
  if (ownClip !== null && d.maxClipAtDesignGirt !== null)
    out.push(
      step(
        `${at}.maxClipSpacing`,
        `${Z}: maximum clip spacing along the girt at the design girt spacing`,
        's_c = P/(C·p_ASD(A_c)·s_g), A_c = s_c·s_g',
        fastener,
        { P: v(s.capacity, N), C: v(s.continuity, ONE), s_g: v(sg, M), p: v(ownClip.pressure, PA) },
        d.maxClipAtDesignGirt,
        M,
        d.maxClipAtDesignGirt < ownClip.maxSpacing
          ? `Taken at most zone 4’s (${ownClip.maxSpacing.toFixed(4)} m found here): the end zones never allow more than the interior`
          : undefined,
      ),
    );
  const clip = d.checks.find((c) => c.check === 'clip')!;
  if (clip.utilisation !== null && d.clipSpacing !== undefined) {
    const area = d.clipSpacing * sg;
    out.push(
      step(
        `${at}.clip`,
        `${Z}: load on one clip at the design spacings`,
        'N = C·p_ASD(A_c)·A_c, A_c = s_c·s_g; u = N/P',
        fastener,
        {
          C: v(s.continuity, ONE),
          s_c: v(d.clipSpacing, M),
          s_g: v(sg, M),
          A_c: v(area, M2),
          p: v(clip.required! / (s.continuity * area), PA),
          N: v(clip.required!, N),
          P: v(s.capacity, N),
        },
        clip.utilisation,
        ONE,
      ),
    );
  }
  if (d.maxGirtSpacing !== null && zone.girtSpacing !== null && d.maxGirtSpacing < zone.girtSpacing)
    out.push(
      step(
        `${at}.maxGirtSpacing`,
        `${Z}: maximum girt spacing the design is compared with`,
        's_g,max = min(s_g,max of this zone, s_g,max of zone 4)',
        `${s.site.figure}: zone 5 pressures are at least zone 4’s at every area`,
        { 'this zone': v(zone.girtSpacing, M), 'zone 4': v(interior!.girt!, M) },
        d.maxGirtSpacing,
        M,
        'The end zones never allow more than the interior; the two searches each stop within 1 mm',
      ),
    );
  return out;
}

/** One zone's design check; its trace steps are appended to `trace`. */
function designZone(zone: ZoneResult, s: Setup, interior: Maxima | null, trace: TraceStep[]): ZoneDesign {
  const sg = s.girtSpacing;
  const sc = s.clipSpacing;
  const pressuresAt = (span: number) => wallPressures(s.site, zone.zone, effectiveWindArea(span, s.width));
  const spanChecks = s.columns.map((c) =>
    spanAtDesign(c.check, s.spans, c.values, sg, (span) => c.demand(pressuresAt(span))),
  );
  const pressureAt = (area: number) => governingMagnitude(wallPressures(s.site, zone.zone, area));
  const clipCheck = clipAtDesign(s.capacity, s.continuity, sg, sc, pressureAt);
  const ownClip = sg === undefined ? null : clipSpacing(s.capacity, s.continuity, sg, pressureAt);

  const maxGirtSpacing = interior ? atMost(zone.girtSpacing, interior.girt) : zone.girtSpacing;
  const clipMax = ownClip?.maxSpacing ?? null;
  const maxClipAtDesignGirt = interior ? atMost(clipMax, interior.clip) : clipMax;
  const girt = spacingVerdict(
    sg,
    maxGirtSpacing,
    spanChecks.map((c) => c.status),
  );
  const clip = spacingVerdict(sc, maxClipAtDesignGirt, [clipCheck.status]);
  const checks = [...spanChecks, clipCheck];
  const worst = checks
    .filter((c) => c.utilisation !== null)
    .reduce<DesignCheck | null>((w, c) => (w === null || c.utilisation! > w.utilisation! ? c : w), null);
  const design: ZoneDesign = {
    zone: zone.zone,
    ...(sg === undefined ? {} : { girtSpacing: sg }),
    ...(sc === undefined ? {} : { clipSpacing: sc }),
    maxGirtSpacing,
    maxClipAtDesignGirt,
    girt,
    clip,
    status: combineStatus([girt, clip]),
    checks,
    worst,
  };
  trace.push(...designTrace(zone, s, design, ownClip, interior));
  return design;
}

/**
 * Checks the design girt and clip spacing of every wall zone of the schedule: each span check of the load–span
 * table and the clip load at the design spacings, and each spacing against the schedule's maximum. `schedule` is the
 * schedule of the same input (computed when not given); `input` is already parsed by the zod schema.
 */
export function checkDesignSpacing(
  input: WindDesignInput,
  schedule: WindScheduleResult = calculateWindSchedule(input),
): DesignSpacingResult {
  const setup = setupOf(input);
  const trace: TraceStep[] = [];
  const byZone = new Map<WallZone, ZoneDesign>();
  // Zone 4 first: the end zones are compared with at most its maxima.
  for (const zone of [...schedule.zones].sort((a, b) => a.zone - b.zone)) {
    const interior = byZone.get(4);
    const maxima =
      zone.zone === 5 && interior
        ? { girt: interior.maxGirtSpacing, clip: interior.maxClipAtDesignGirt }
        : null;
    byZone.set(zone.zone, designZone(zone, setup, maxima, trace));
  }
  return { zones: schedule.zones.map((z) => byZone.get(z.zone)!), trace };
}
