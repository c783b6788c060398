import {
  CHI_IP_TO_SI,
  FOOT,
  INCH,
  K_IP_TO_SI,
  LB_PER_FT3_TO_KG_PER_M3,
  LBF_TO_N,
  PSF_TO_PA,
  PSI_IP_TO_SI,
  type UnitSystem,
} from '@shared/units';

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
  conductivity: {
    unit: { SI: 'W/(m·K)', IP: 'Btu·in/(h·ft²·°F)' },
    factor: { SI: 1, IP: K_IP_TO_SI },
    decimals: 4,
  },
  density: {
    unit: { SI: 'kg/m³', IP: 'lb/ft³' },
    factor: { SI: 1, IP: LB_PER_FT3_TO_KG_PER_M3 },
    decimals: 2,
  },
  chi: { unit: { SI: 'W/K', IP: 'Btu/(h·°F)' }, factor: { SI: 1, IP: CHI_IP_TO_SI }, decimals: 4 },
  psi: { unit: { SI: 'W/(m·K)', IP: 'Btu/(h·ft·°F)' }, factor: { SI: 1, IP: PSI_IP_TO_SI }, decimals: 4 },
  pressure: { unit: { SI: 'kPa', IP: 'psf' }, factor: { SI: 1000, IP: PSF_TO_PA }, decimals: 2 },
  force: { unit: { SI: 'N', IP: 'lbf' }, factor: { SI: 1, IP: LBF_TO_N }, decimals: 0 },
  span: { unit: { SI: 'm', IP: 'ft' }, factor: { SI: 1, IP: FOOT }, decimals: 2 },
  width: { unit: { SI: 'mm', IP: 'in' }, factor: { SI: 0.001, IP: INCH }, decimals: 1 },
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
