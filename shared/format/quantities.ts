import { CRITERION_TYPES, type CriterionSpec } from '../checks/criteria';
import { type DisplayUnit, QUANTITIES, storedToShown, type UnitSystem } from '../units';
import { trimmedFixed } from '../units/rounding';
import { exactFraction } from './inches';

/*
 * How a figure reads — on every screen and on the compliance sheet alike: an SI value in, the person's unit
 * system out, rounded by the one rule of shared/units/rounding.ts, trailing zeros trimmed, a true minus sign and
 * a narrow space before the unit. Units, symbols, conversions and default decimals come from the registry of
 * shared/units; where a figure reads finer or coarser than its unit's default, the decimals are given here.
 */

const MINUS = '\u2212';
const NNBSP = '\u202f';

/** Rounded, trailing zeros trimmed, a true minus sign; "—" for a non-number. */
export function num(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  return trimmedFixed(value, decimals).replace(/^-/, MINUS);
}

/** Decimals that keep three significant figures for small numbers. */
const sig3 = (v: number) => (v === 0 ? 0 : Math.max(0, Math.min(6, 2 - Math.floor(Math.log10(Math.abs(v))))));

const withUnit = (text: string, unit: string) => (unit ? `${text}${NNBSP}${unit}` : text);

/** A stored value in the shown unit `d`, to `decimals` (the unit's default unless given), with its symbol. */
const figure = (stored: number, d: DisplayUnit, decimals = d.decimals) =>
  withUnit(num(storedToShown(stored, d), decimals), d.symbol);

const specByUnit = new Map<string, CriterionSpec>(Object.values(CRITERION_TYPES).map((s) => [s.unit, s]));

const Q = QUANTITIES;
/** Wind pressures read in kPa in SI (as the wind sheet shows them), psf in IP. */
const KPA = Q.pressure.also.kPa!;

export type QuantityFormatter = ReturnType<typeof quantityFormatter>;

/** Every figure's words in one unit system. */
export function quantityFormatter(system: UnitSystem) {
  const ip = system === 'IP';
  const unit = (q: keyof typeof QUANTITIES) => Q[q][system];
  const f = {
    system,
    num,
    /** Layer thickness: mm to 0.01 (a 0.15 mm film reads 0.15), in to 0.001. */
    thickness: (m: number) => figure(m, unit('shortLength'), ip ? 3 : 2),
    /**
     * Spacing, span or joint width: mm below 0.1 m, else m; in IP in (to 0.01) below 0.3 m, else ft.
     * `inchFractions`: inches that are a whole number of 64ths read as the trade draws them ("3/4 in").
     */
    length: (m: number, options: { inchFractions?: boolean } = {}) => {
      if (!ip) return figure(m, Math.abs(m) < 0.1 ? Q.shortLength.SI : Q.length.SI);
      if (Math.abs(m) >= 0.3) return figure(m, Q.length.IP);
      const fraction = options.inchFractions ? exactFraction(storedToShown(m, Q.shortLength.IP)) : null;
      return fraction === null
        ? figure(m, Q.shortLength.IP, 2)
        : withUnit(fraction.replace(/^-/, MINUS), Q.shortLength.IP.symbol);
    },
    /** Site dimensions (height, plan): m to 0.01 or ft to 0.1. */
    dimension: (m: number) => figure(m, unit('length'), ip ? 1 : 2),
    temperature: (c: number) => figure(c, unit('temperature')),
    temperatureValue: (c: number) => storedToShown(c, unit('temperature')),
    temperatureUnit: unit('temperature').symbol,
    rh: (fraction: number) => withUnit(num(fraction * 100, 1), '%'),
    /** Vent area of an air layer (ISO 6946 §6.9.3), stored in mm²/m: mm²/m or in²/ft. */
    ventArea: (mm2PerM: number) => figure(mm2PerM, unit('ventArea')),
    /** The bare R number (a column head carries the unit): the unit's decimals, three significant figures when small (a film, a membrane). */
    rNumber: (v: number) => {
      const shown = storedToShown(v, unit('resistance'));
      const small = ip ? shown < 1 : shown < 0.1;
      return num(shown, small ? Math.min(ip ? 6 : 4, sig3(shown)) : unit('resistance').decimals);
    },
    /** R with its unit, "2.31 m²·K/W"; `rPrefix` reads IP as practitioners say it, "R-13.1". */
    rValue: (v: number, options: { rPrefix?: boolean } = {}) =>
      ip && options.rPrefix ? `R-${f.rNumber(v)}` : withUnit(f.rNumber(v), unit('resistance').symbol),
    /** The bare U number. */
    uNumber: (v: number) => num(storedToShown(v, unit('transmittance')), unit('transmittance').decimals),
    uValue: (v: number) => figure(v, unit('transmittance')),
    /** λ to three significant figures. */
    lambda: (v: number) => figure(v, unit('conductivity'), sig3(storedToShown(v, unit('conductivity')))),
    chi: (v: number) => figure(v, unit('chi')),
    psi: (v: number) => figure(v, unit('psi')),
    pressure: (pa: number) => figure(pa, ip ? Q.pressure.IP : KPA),
    force: (n: number) => figure(n, unit('force')),
    speed: (ms: number) => figure(ms, unit('speed')),
    accumulation: (kg: number) => figure(kg, unit('massPerArea')),
    accumulationValue: (kg: number) => storedToShown(kg, unit('massPerArea')),
    accumulationUnit: unit('massPerArea').symbol,
    lengthValue: (m: number) => storedToShown(m, unit('length')),
    lengthUnit: unit('length').symbol,
    thicknessValue: (m: number) => storedToShown(m, unit('shortLength')),
    thicknessUnit: unit('shortLength').symbol,
    /** A ratio as a whole percentage, "12 %" (a no-break space: the figure and its sign stay together). */
    percent: (ratio: number) => `${num(ratio * 100, 0)}\u00a0%`,

    /** A value of a check, metric or trace step, by its SI unit symbol: "0.3 W/(m²·K)", "L/180", "yes". */
    siValue(value: number | boolean | null, unit: string): string {
      if (value === null) return '—';
      if (typeof value === 'boolean') return value ? 'yes' : 'no';
      if (!Number.isFinite(value)) return '—';
      if (unit === 'L/x') return `L/${num(value, 0)}`;
      if (unit === 'm') return f.length(value);
      if (unit === 'W/(m²·K)') return f.uValue(value);
      if (unit === 'm²·K/W') return f.rValue(value);
      if (unit === '°C') return f.temperature(value);
      if (unit === 'Pa') return f.pressure(value);
      if (unit === 'N') return f.force(value);
      if (unit === 'W/K') return f.chi(value);
      if (unit === '1' || unit === '') return num(value, 3);
      const spec = specByUnit.get(unit);
      if (!spec) return withUnit(num(value, sig3(value)), unit);
      const d = spec.display[system];
      return withUnit(num(value / d.toSI, spec.decimals[system]), d.symbol);
    },
  };
  return f;
}

const FORMATTERS: Record<UnitSystem, QuantityFormatter> = {
  SI: quantityFormatter('SI'),
  IP: quantityFormatter('IP'),
};

/** The formatter of a unit system, made once. */
export const formatterFor = (system: UnitSystem): QuantityFormatter => FORMATTERS[system];

/** A value of a check, metric or trace step with its unit in `system` (see `siValue`). */
export const formatSiValue = (value: number | boolean | null, siUnit: string, system: UnitSystem): string =>
  FORMATTERS[system].siValue(value, siUnit);

/** R as the build-up page and the sheet read it ("2.31 m²·K/W", "R-13.1" in IP); "—" without a number. */
export const formatR = (si: number | null | undefined, system: UnitSystem): string =>
  si == null || !Number.isFinite(si) ? '—' : FORMATTERS[system].rValue(si, { rPrefix: true });
/** U with its unit ("0.433 W/(m²·K)"); "—" without a number. */
export const formatU = (si: number | null | undefined, system: UnitSystem): string =>
  si == null || !Number.isFinite(si) ? '—' : FORMATTERS[system].uValue(si);
/** The bare R number for a table whose head carries the unit; "—" without a number. */
export const rNumber = (si: number | null | undefined, system: UnitSystem): string =>
  si == null || !Number.isFinite(si) ? '—' : FORMATTERS[system].rNumber(si);
/** The bare U number; "—" without a number. */
export const uNumber = (si: number | null | undefined, system: UnitSystem): string =>
  si == null || !Number.isFinite(si) ? '—' : FORMATTERS[system].uNumber(si);
