import type { InspectionArea, InspectionScope, InspectionSummary } from '@shared/inspections/schema';

const ZONE_WORDS = { field: 'field zone', edge: 'edge zone', corner: 'corner zone' } as const;

/** The part of the wall in words: "grid A to D", "corner zone". */
export const areaText = (area: InspectionArea) =>
  area.kind === 'grid' ? `grid ${area.from} to ${area.to}` : ZONE_WORDS[area.zone];

/** "North elevation · grid A to D". */
export const scopeText = (scope: Pick<InspectionScope, 'elevation' | 'area'>) =>
  `${scope.elevation} · ${areaText(scope.area)}`;

export type ElevationState = 'open' | 'in_progress' | 'passed';

/**
 * Where an inspected part of the wall stands: open deficiencies (or failed items) first, then items not yet
 * seen, else passed.
 */
export function elevationState(i: Pick<InspectionSummary, 'counts'>): ElevationState {
  if (i.counts.openDeficiencies > 0 || i.counts.fail > 0) return 'open';
  if (i.counts.unseen > 0) return 'in_progress';
  return 'passed';
}

/** The inspections grouped by elevation, in the order the elevations first appear. */
export function byElevation<T extends { scope: Pick<InspectionScope, 'elevation'> }>(inspections: T[]) {
  const groups = new Map<string, T[]>();
  for (const i of inspections) groups.set(i.scope.elevation, [...(groups.get(i.scope.elevation) ?? []), i]);
  return [...groups].map(([elevation, list]) => ({ elevation, inspections: list }));
}
