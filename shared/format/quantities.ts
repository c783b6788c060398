import { CRITERION_TYPES, type CriterionSpec } from '../checks/criteria';
import {
  CHI_IP_TO_SI,
  celsiusToFahrenheit,
  FOOT,
  INCH,
  K_IP_TO_SI,
  LB_PER_FT2_TO_KG_PER_M2,
  LBF_TO_N,
  MPH_TO_MS,
  PSF_TO_PA,
  PSI_IP_TO_SI,
  R_IP_TO_SI,
  U_IP_TO_SI,
  type UnitSystem,
} from '../units';
import { trimmedFixed } from '../units/rounding';

/*
 * How a figure reads — on every screen and on the compliance sheet alike: an SI value in, the person's unit
 * system out (conversion at the edge only, factors from shared/units), rounded by the one rule of
 * shared/units/rounding.ts, trailing zeros trimmed, a true minus sign and a narrow space before the unit.
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

const specByUnit = new Map<string, CriterionSpec>(Object.values(CRITERION_TYPES).map((s) => [s.unit, s]));

/** 1 in²/ft in mm²/m: the vent area of an air layer in IP. */
const IN2_PER_FT = (INCH * INCH * 1e6) / FOOT;

export type QuantityFormatter = ReturnType<typeof quantityFormatter>;

/** Every figure's words in one unit system. */
export function quantityFormatter(system: UnitSystem) {
  const ip = system === 'IP';
  const f = {
    system,
    num,
    /** Layer thickness: mm to 0.01 (a 0.15 mm film reads 0.15), in to 0.001. */
    thickness: (m: number) => (ip ? withUnit(num(m / INCH, 3), 'in') : withUnit(num(m * 1000, 2), 'mm')),
    /** Spacing, span or joint width: mm below 0.1 m, else m; in IP in below 0.3 m, else ft. */
    length: (m: number) =>
      ip
        ? Math.abs(m) < 0.3
          ? withUnit(num(m / INCH, 2), 'in')
          : withUnit(num(m / FOOT, 2), 'ft')
        : Math.abs(m) < 0.1
          ? withUnit(num(m * 1000, 1), 'mm')
          : withUnit(num(m, 3), 'm'),
    /** Site dimensions (height, plan): m or ft. */
    dimension: (m: number) => (ip ? withUnit(num(m / FOOT, 1), 'ft') : withUnit(num(m, 2), 'm')),
    temperature: (c: number) =>
      ip ? withUnit(num(celsiusToFahrenheit(c), 1), '°F') : withUnit(num(c, 1), '°C'),
    temperatureValue: (c: number) => (ip ? celsiusToFahrenheit(c) : c),
    temperatureUnit: ip ? '°F' : '°C',
    rh: (fraction: number) => withUnit(num(fraction * 100, 1), '%'),
    /** Vent area of an air layer (ISO 6946 §6.9.3), stored in mm²/m: mm²/m or in²/ft. */
    ventArea: (mm2PerM: number) =>
      ip ? withUnit(num(mm2PerM / IN2_PER_FT, 3), 'in²/ft') : withUnit(num(mm2PerM, 0), 'mm²/m'),
    rValue: (v: number) =>
      ip
        ? withUnit(num(v / R_IP_TO_SI, v / R_IP_TO_SI < 1 ? sig3(v / R_IP_TO_SI) : 1), 'h·ft²·°F/Btu')
        : withUnit(num(v, v < 0.1 ? Math.min(4, sig3(v)) : 2), 'm²·K/W'),
    uValue: (v: number) =>
      ip ? withUnit(num(v / U_IP_TO_SI, 3), 'Btu/(h·ft²·°F)') : withUnit(num(v, 3), 'W/(m²·K)'),
    lambda: (v: number) =>
      ip
        ? withUnit(num(v / K_IP_TO_SI, sig3(v / K_IP_TO_SI)), 'Btu·in/(h·ft²·°F)')
        : withUnit(num(v, sig3(v)), 'W/(m·K)'),
    chi: (v: number) => (ip ? withUnit(num(v / CHI_IP_TO_SI, 4), 'Btu/(h·°F)') : withUnit(num(v, 4), 'W/K')),
    psi: (v: number) =>
      ip ? withUnit(num(v / PSI_IP_TO_SI, 4), 'Btu/(h·ft·°F)') : withUnit(num(v, 4), 'W/(m·K)'),
    /** Wind pressure: kPa to 0.001 (as the wind sheet reads it) or psf to 0.1. */
    pressure: (pa: number) =>
      ip ? withUnit(num(pa / PSF_TO_PA, 1), 'psf') : withUnit(num(pa / 1000, 3), 'kPa'),
    force: (n: number) => (ip ? withUnit(num(n / LBF_TO_N, 0), 'lbf') : withUnit(num(n, 0), 'N')),
    speed: (ms: number) => (ip ? withUnit(num(ms / MPH_TO_MS, 0), 'mph') : withUnit(num(ms, 1), 'm/s')),
    accumulation: (kg: number) =>
      ip ? withUnit(num(kg / LB_PER_FT2_TO_KG_PER_M2, 4), 'lb/ft²') : withUnit(num(kg, 3), 'kg/m²'),
    accumulationValue: (kg: number) => (ip ? kg / LB_PER_FT2_TO_KG_PER_M2 : kg),
    accumulationUnit: ip ? 'lb/ft²' : 'kg/m²',
    lengthValue: (m: number) => (ip ? m / FOOT : m),
    lengthUnit: ip ? 'ft' : 'm',
    thicknessValue: (m: number) => (ip ? m / INCH : m * 1000),
    thicknessUnit: ip ? 'in' : 'mm',
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
