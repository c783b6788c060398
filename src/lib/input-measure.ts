import {
  formatPageBound,
  PAGE_MEASURES,
  type PageMeasure,
  type ParsedEntry,
  pageInputText,
  pageMeasureUnit,
  parsePageInput,
} from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';

export type { ParsedEntry };

/**
 * How one measure crosses the SI/IP edge in an editable box — the small interface through which every units
 * table (`lib/quantities`, the joints and takeoff pages' `pageInput` below, `features/wind/units`, `features/assemblies/units`) plugs into
 * `QuantityInput`. The box stores SI; only what is shown and typed is converted.
 */
export interface InputMeasure {
  /** The unit symbol in this system; '' for a pure number (a ratio, a count). */
  unit: (system: UnitSystem) => string;
  /** SI → the text the box holds; '' when there is no number (never "NaN"). */
  toText: (si: number | null | undefined, system: UnitSystem) => string;
  /** What was typed → SI. */
  parse: (text: string, system: UnitSystem) => ParsedEntry;
  /** A schema limit (SI) in this measure's shown units ("200 mm"), for range problems. */
  bound?: (si: number, system: UnitSystem) => string;
  /** The example offered when an entry is not a number; "12.5" unless given. */
  example?: (system: UnitSystem) => string;
  /** 'text' where fractions with spaces and slashes are typed ("1 1/4"); 'decimal' otherwise. */
  inputMode?: 'decimal' | 'text';
}

/**
 * A joints or takeoff page measure (`@shared/format/page-measures`) as a number box shows and reads it: range
 * problems worded in its units, inch fractions typed where they apply (a keyboard with space and slash).
 */
export const pageInput = (m: PageMeasure): InputMeasure => ({
  unit: (system) => pageMeasureUnit(m, system),
  toText: (si, system) => pageInputText(si, m, system),
  parse: (text, system) => parsePageInput(text, m, system),
  bound: (si, system) => formatPageBound(si, m, system),
  example: (system) => (m === 'joint' && system === 'IP' ? '3/4 or 0.75' : '12.5'),
  inputMode: PAGE_MEASURES[m].fractions ? 'text' : 'decimal',
});
