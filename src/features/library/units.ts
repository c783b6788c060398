import { type UnitSystem, unitsOf } from '@shared/units';

/** The library's quantities; shown = SI / factor. Stored values stay SI. */
export type LibraryMeasure =
  | 'conductivity'
  | 'density'
  | 'chi'
  | 'psi'
  | 'pressure'
  | 'force'
  | 'span'
  | 'width';

const SPECS: Record<
  LibraryMeasure,
  { unit: Record<UnitSystem, string>; factor: Record<UnitSystem, number>; decimals: number }
> = {
  conductivity: { ...unitsOf('conductivity'), decimals: 4 },
  density: { ...unitsOf('density'), decimals: 2 },
  chi: { ...unitsOf('chi'), decimals: 4 },
  psi: { ...unitsOf('psi'), decimals: 4 },
  pressure: { ...unitsOf('pressure', 'kPa'), decimals: 2 },
  force: { ...unitsOf('force'), decimals: 0 },
  span: { ...unitsOf('length'), decimals: 2 },
  width: { ...unitsOf('shortLength'), decimals: 1 },
};

export const libraryUnit = (m: LibraryMeasure, system: UnitSystem) => SPECS[m].unit[system];

function trimmed(value: number, decimals: number): string {
  const fixed = value.toFixed(decimals);
  const t = fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
  return t === '-0' ? '0' : t;
}

/** The number alone, in the person's units ("—" when absent). */
export function libraryNumber(si: number | null | undefined, m: LibraryMeasure, system: UnitSystem): string {
  if (si == null || !Number.isFinite(si)) return '—';
  return trimmed(si / SPECS[m].factor[system], SPECS[m].decimals);
}

/** Read a typed number in the person's units; undefined when empty, NaN when unreadable. */
export function parseLibraryNumber(text: string, m: LibraryMeasure, system: UnitSystem): number | undefined {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return undefined;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return Number.NaN;
  return Number(t) * SPECS[m].factor[system];
}
