import type { UnitSystem } from '@shared/units';

/** What a number box read: nothing, something that is not a number, or a number (already SI). */
export type ParsedEntry = { kind: 'empty' } | { kind: 'invalid' } | { kind: 'ok'; si: number };

/**
 * How one measure crosses the SI/IP edge in an editable box — the small interface through which every units
 * table (`lib/quantities`, `lib/sheet-units`, `features/wind/units`, `features/assemblies/units`) plugs into
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
