import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import type { PageMeasure } from '@shared/format/page-measures';
import { TAKEOFF_TYPE_LABELS } from './labels';

const WORDS: Record<string, string> = {
  name: 'name',
  length: 'length',
  height: 'height',
  width: 'width',
  count: 'how many',
  corners: 'corners',
  abutments: 'abutments',
  openings: 'openings',
  kind: 'kind',
  stockLength: 'stock length',
  lapAllowance: 'lap',
  diameter: 'diameter',
  leg: 'leg',
  depth: 'depth',
  spacingAlongGirt: 'spacing along each girt',
  girtSpacing: 'girt spacing',
  rollLength: 'roll length',
  appliesTo: 'joint lines',
  orientation: 'orientation',
  wasteFactor: 'waste',
};

/** Plain words for a takeoff path (`takeoff.walls.0.openings.1.width` → "North elevation, opening W1: width"). */
export function describeTakeoffPath(path: string, input: TakeoffInput | undefined): string {
  const p = path.replace(/^takeoff\./, '').split('.');
  const last = WORDS[p[p.length - 1] ?? ''] ?? p[p.length - 1] ?? '';
  if (p[0] === 'walls' && p[1] !== undefined) {
    const w = input?.walls[Number(p[1])];
    const wall = w?.name || `Wall ${Number(p[1]) + 1}`;
    if (p[2] === 'openings' && p[3] !== undefined) {
      const o = w?.openings[Number(p[3])];
      return `${wall}, opening ${o?.name || Number(p[3]) + 1}${p[4] ? `: ${WORDS[p[4]] ?? p[4]}` : ''}`;
    }
    return p[2] ? `${wall}: ${last}` : wall;
  }
  if (p[0] === 'beads' && p[1]) {
    const type = TAKEOFF_TYPE_LABELS[p[1] as keyof typeof TAKEOFF_TYPE_LABELS] ?? p[1];
    return `Bead for ${type.toLowerCase()}${p[2] ? `: ${last}` : ''}`;
  }
  if (p[0] === 'trims' && p[1] !== undefined) {
    const t = input?.trims[Number(p[1])];
    return `Trim ${t?.name || Number(p[1]) + 1}${p[2] ? `: ${last}` : ''}`;
  }
  if (p[0] === 'module') return `Panel module${p[1] ? `: ${last}` : ''}`;
  if (p[0] === 'fasteners') return `Fasteners${p[1] ? `: ${last}` : ''}`;
  if (p[0] === 'tape') return `Tape${p[1] ? `: ${last}` : ''}`;
  return last.charAt(0).toUpperCase() + last.slice(1);
}

/** The measure of a takeoff path, so a range problem is worded in the person's units. */
export function takeoffPathMeasure(path: string): PageMeasure | undefined {
  const p = path.replace(/^takeoff\./, '');
  if (/^beads\./.test(p) || p === 'tape.width') return 'joint';
  if (/lapAllowance$|spacingAlongGirt$/.test(p)) return 'spacing';
  if (p === 'wasteFactor') return 'percent';
  if (/(length|height|width|stockLength|girtSpacing|rollLength)$/i.test(p)) return 'length';
  return undefined;
}
