import type { Enclosure, Exposure, SpanCondition, WindEdition } from '@shared/calc/wind/schema';

/** Plain words for the wind data's choices. */
export const EDITIONS: readonly WindEdition[] = ['ASCE 7-16', 'ASCE 7-22'];

export const EXPOSURE_LABELS: Record<Exposure, string> = {
  B: 'B — urban, suburban or wooded terrain',
  C: 'C — open terrain with scattered obstructions',
  D: 'D — flat, unobstructed terrain or water',
};

export const ENCLOSURE_LABELS: Record<Enclosure, string> = {
  enclosed: 'Enclosed',
  partially_enclosed: 'Partially enclosed',
  open: 'Open (walls not covered by the cladding figures)',
};

export const RISK_CATEGORIES = ['I', 'II', 'III', 'IV'] as const;

export const SPAN_CONDITION_LABELS: Record<SpanCondition, string> = {
  single: 'Single span',
  double: 'Two spans (double)',
  triple: 'Three spans (triple)',
};

export const CHECK_LABELS = {
  inward: 'Inward pressure',
  outward: 'Outward (suction)',
  deflection: 'Deflection',
  clip: 'Clip load',
} as const;

export const ZONE_SHORT: Record<4 | 5, string> = {
  4: 'Zone 4 — interior',
  5: 'Zone 5 — end zones',
};
