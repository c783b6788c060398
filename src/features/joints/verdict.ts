import type { JointResult } from '@shared/calc/joints/schema';
import { formatPageMeasure } from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';

export interface JointVerdict {
  verdict: 'pass' | 'fail';
  glyph: '✓' | '✕';
  /** "meets" or "short". */
  word: string;
  /** "meets — margin 12 %" or "short by 3.2 mm" / "short by 0.126 in". */
  text: string;
  cls: string;
}

/**
 * The verdict of one joint in words, with a glyph for the eye and colour last: the same words the engine
 * writes (`marginText`), with the shortfall in the person's units.
 */
export function jointVerdict(
  r: Pick<JointResult, 'designWidth' | 'requiredWidth'>,
  system: UnitSystem,
): JointVerdict {
  if (r.designWidth >= r.requiredWidth) {
    const pct = Math.round(((r.designWidth - r.requiredWidth) / r.requiredWidth) * 100);
    return { verdict: 'pass', glyph: '✓', word: 'meets', text: `meets — margin ${pct} %`, cls: 'text-meets' };
  }
  const short = r.requiredWidth - r.designWidth;
  return {
    verdict: 'fail',
    glyph: '✕',
    word: 'short',
    text: `short by ${formatPageMeasure(short, 'joint', system).replace('\u202f', ' ')}`,
    cls: 'text-caution',
  };
}
