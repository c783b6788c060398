import {
  CONTINUITY_FACTOR,
  clipCapacity,
  DEFAULT_DEFLECTION_WIND_FACTOR,
  effectiveWindArea,
  interpolateColumn,
  clipSpacing as maxClipSpacing,
} from '@shared/calc/wind/attachment';
import { analyseSite, wallPressures } from '@shared/calc/wind/pressure';
import type {
  WallZone,
  WindScheduleInput,
  WindScheduleResult,
  ZonePressure,
  ZoneResult,
} from '@shared/calc/wind/schema';

/*
 * The design spacings checked against the panel table and the clip capacity, zone by zone, with the engine's own
 * pure functions (the engine gives the largest spacings; the contract has no check of the spacings the designer
 * chose). Same rules as the engine: pressures at the effective wind area of the chosen span, table values
 * interpolated linearly and never extrapolated.
 */

export type DesignCheckName = 'inward' | 'outward' | 'deflection' | 'clip';

/** meets / fails on a number; outside-table: the table has no value there (words, never a number); missing: no design spacing. */
export type DesignStatus = 'meets' | 'fails' | 'outside-table' | 'missing';

export interface DesignCheck {
  check: DesignCheckName;
  status: DesignStatus;
  /** Demand: ASD pressure (Pa) for the span checks, the deflection-level pressure for deflection, ASD load (N) for the clip. */
  required: number | null;
  /** Table value at the design span (Pa) or the clip capacity (N). */
  allowable: number | null;
  /** required / allowable. */
  utilisation: number | null;
  unit: 'Pa' | 'N';
  /** Why there is no number (outside the table, no design spacing). */
  reason?: string;
}

export interface ZoneDesign {
  zone: WallZone;
  /** The girt spacing the designer chose, m (undefined when not entered). */
  girtSpacing?: number;
  clipSpacing?: number;
  /** Verdict on the girt spacing: design ≤ the engine's maximum and every span check met. */
  girt: DesignStatus;
  /** Verdict on the clip spacing at the design girt spacing. */
  clip: DesignStatus;
  /** Overall verdict of the zone: fails if anything fails, outside the table if the table cannot say. */
  status: DesignStatus;
  checks: DesignCheck[];
  /** Largest clip spacing along the girt at the design girt spacing, m. */
  maxClipAtDesignGirt: number | null;
  /** The largest utilisation of the zone, for the schedule's one bar. */
  worst: DesignCheck | null;
}

/** Utilisation counted as met up to this (the engine's spacings converge to 1 mm). */
export const UTILISATION_TOLERANCE = 1e-6;

const governing = (p: ZonePressure) => Math.max(p.asd.inward, -p.asd.outward);

const verdict = (u: number): DesignStatus => (u <= 1 + UTILISATION_TOLERANCE ? 'meets' : 'fails');

/** Combine statuses: a failure wins, then "outside the table", then "missing", else met. */
export function combine(statuses: readonly DesignStatus[]): DesignStatus {
  if (statuses.includes('fails')) return 'fails';
  if (statuses.includes('outside-table')) return 'outside-table';
  if (statuses.includes('missing')) return 'missing';
  return 'meets';
}

function spanCheck(
  check: 'inward' | 'outward' | 'deflection',
  spans: readonly number[],
  column: readonly number[],
  span: number | undefined,
  demand: (span: number) => number,
): DesignCheck {
  if (span === undefined)
    return {
      check,
      status: 'missing',
      required: null,
      allowable: null,
      utilisation: null,
      unit: 'Pa',
      reason: 'no design girt spacing entered',
    };
  const allowable = interpolateColumn(spans, column, span);
  if (allowable === null)
    return {
      check,
      status: 'outside-table',
      required: null,
      allowable: null,
      utilisation: null,
      unit: 'Pa',
      reason:
        span > spans[spans.length - 1]!
          ? 'the design span is longer than the table’s longest span'
          : 'the design span is shorter than the table’s shortest span',
    };
  const required = demand(span);
  const utilisation = required / allowable;
  return { check, status: verdict(utilisation), required, allowable, utilisation, unit: 'Pa' };
}

/** Every zone's design-spacing checks; `input` is the engine input that produced `result`. */
export function designChecks(
  input: WindScheduleInput,
  result: WindScheduleResult,
  design: { girtSpacing?: number; clipSpacing?: number },
): ZoneDesign[] {
  const site = analyseSite(input.site);
  const { panel } = input;
  const rows = panel.loadSpanTable.rows;
  const spans = rows.map((r) => r.span);
  const width = panel.panelModuleWidth;
  const capacity = clipCapacity(panel.clip);
  const continuity = panel.continuityFactor ?? CONTINUITY_FACTOR[panel.loadSpanTable.spanCondition];
  const deflectionFactor = panel.deflectionWindFactor ?? DEFAULT_DEFLECTION_WIND_FACTOR;
  const withDeflection = rows.every((r) => r.allowableDeflectionPressure !== undefined);
  const sg = design.girtSpacing;
  const sc = design.clipSpacing;

  return result.zones.map((zone: ZoneResult): ZoneDesign => {
    const at = (span: number) => wallPressures(site, zone.zone, effectiveWindArea(span, width));
    const checks: DesignCheck[] = [
      spanCheck(
        'inward',
        spans,
        rows.map((r) => r.allowableInward),
        sg,
        (s) => at(s).asd.inward,
      ),
      spanCheck(
        'outward',
        spans,
        rows.map((r) => r.allowableOutward),
        sg,
        (s) => -at(s).asd.outward,
      ),
    ];
    if (withDeflection)
      checks.push(
        spanCheck(
          'deflection',
          spans,
          rows.map((r) => r.allowableDeflectionPressure!),
          sg,
          (s) => {
            const p = at(s).strength;
            return deflectionFactor * Math.max(p.inward, -p.outward);
          },
        ),
      );

    const pressureAt = (area: number) => governing(wallPressures(site, zone.zone, area));
    let clipCheck: DesignCheck;
    let maxClipAtDesignGirt: number | null = null;
    if (sg === undefined || sc === undefined) {
      clipCheck = {
        check: 'clip',
        status: 'missing',
        required: null,
        allowable: capacity,
        utilisation: null,
        unit: 'N',
        reason: sg === undefined ? 'no design girt spacing entered' : 'no design clip spacing entered',
      };
    } else {
      const area = sc * sg;
      const required = continuity * pressureAt(area) * area;
      const utilisation = required / capacity;
      clipCheck = {
        check: 'clip',
        status: verdict(utilisation),
        required,
        allowable: capacity,
        utilisation,
        unit: 'N',
      };
    }
    if (sg !== undefined)
      maxClipAtDesignGirt = maxClipSpacing(capacity, continuity, sg, pressureAt).maxSpacing;
    checks.push(clipCheck);

    const spanChecks = checks.filter((c) => c.check !== 'clip');
    let girt = combine(spanChecks.map((c) => c.status));
    // The engine's maximum is the authority on the spacing: a design span beyond it fails even where a
    // later part of the table would carry it again.
    if (sg !== undefined && zone.girtSpacing !== null && sg > zone.girtSpacing + 0.0005 && girt === 'meets')
      girt = 'fails';
    if (sg !== undefined && zone.status === 'outside-table' && girt === 'meets') girt = 'outside-table';
    const clip = sg === undefined ? 'missing' : clipCheck.status;
    const worst = checks
      .filter((c) => c.utilisation !== null)
      .reduce<DesignCheck | null>((w, c) => (w === null || c.utilisation! > w.utilisation! ? c : w), null);
    return {
      zone: zone.zone,
      girtSpacing: sg,
      clipSpacing: sc,
      girt,
      clip,
      status: combine([girt, clip]),
      checks,
      maxClipAtDesignGirt,
      worst,
    };
  });
}
