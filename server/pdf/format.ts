import { CRITERION_TYPES, type CriterionSpec } from '@shared/checks/criteria';
import type { Check, CheckStatus, Verdict } from '@shared/checks/report';
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
} from '@shared/units';
import { trimmedFixed } from '@shared/units/rounding';

/*
 * How the figures of a stored run read on the sheet: SI values in, the chosen unit system out (conversion
 * at the edge only), pass / fail in words. The same conventions as the screen (src/lib/check-format.ts).
 */

const MINUS = '\u2212';
const NNBSP = '\u202f';

/** Rounded, trailing zeros trimmed, a true minus sign. */
export function num(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  return trimmedFixed(value, decimals).replace(/^-/, MINUS);
}

/** Decimals that keep three significant figures for small numbers. */
const sig3 = (v: number) => (v === 0 ? 0 : Math.max(0, Math.min(6, 2 - Math.floor(Math.log10(Math.abs(v))))));

const withUnit = (text: string, unit: string) => (unit ? `${text}${NNBSP}${unit}` : text);

const specByUnit = new Map<string, CriterionSpec>(Object.values(CRITERION_TYPES).map((s) => [s.unit, s]));

export type Formatter = ReturnType<typeof formatter>;

export function formatter(system: UnitSystem) {
  const ip = system === 'IP';
  const f = {
    system,
    num,
    /** Layer thickness: mm or in. */
    /** Layer thickness as the screen shows it: mm to 0.01 (a 0.15 mm film reads 0.15), in to 0.001. */
    thickness: (m: number) => (ip ? withUnit(num(m / INCH, 3), 'in') : withUnit(num(m * 1000, 2), 'mm')),
    /** Spacing or span: mm below 0.1 m, else m; in IP in below 0.3 m, else ft. */
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
      ip
        ? withUnit(num(mm2PerM / ((INCH * INCH * 1e6) / FOOT), 3), 'in²/ft')
        : withUnit(num(mm2PerM, 0), 'mm²/m'),
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
    pressure: (pa: number) => (ip ? withUnit(num(pa / PSF_TO_PA, 1), 'psf') : withUnit(num(pa, 0), 'Pa')),
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
    percent: (ratio: number) => withUnit(num(ratio * 100, 0), '%').replace(NNBSP, '\u00a0'),

    /** A value of a check or trace step, by its SI unit symbol. */
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
      if (unit === 'W/K') return f.chi(value);
      if (unit === '1' || unit === '') return num(value, 3);
      const spec = specByUnit.get(unit);
      if (!spec) return withUnit(num(value, sig3(value)), unit);
      const d = spec.display[system];
      return withUnit(num(value / d.toSI, spec.decimals[system]), d.symbol);
    },

    /** "meets — margin 12 %", "fails — short by 0.008 W/(m²·K)", "not evaluated — <reason>". */
    checkResult(c: Check): string {
      const word = STATUS_WORD[c.status];
      if (c.status === 'not_evaluated') return `${word} — ${c.reason}`;
      if (c.margin === null) return word;
      if (c.status === 'fail') return `${word} — short by ${f.siValue(Math.abs(c.margin), c.unit)}`;
      if (c.marginRatio !== null) return `${word} — margin ${f.percent(c.marginRatio)}`;
      return `${word} — margin ${f.siValue(c.margin, c.unit)}`;
    },
  };
  return f;
}

export const STATUS_WORD: Record<CheckStatus, string> = {
  pass: 'meets',
  fail: 'fails',
  not_evaluated: 'not evaluated',
};

export const VERDICT_WORDS: Record<Verdict, { word: string; sentence: string }> = {
  pass: { word: 'PASS', sentence: 'every check is met' },
  fail: { word: 'FAIL', sentence: 'at least one check fails' },
  incomplete: { word: 'INCOMPLETE', sentence: 'nothing fails, but some checks could not be evaluated' },
};

export const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "2 Dec 2026" in UTC — the sheet prints the same date wherever it is produced. */
export function sheetDate(iso: string): string {
  const d = new Date(iso);
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

export function sheetDateTime(iso: string): string {
  const d = new Date(iso);
  const hh = String(d.getUTCHours()).padStart(2, '0');
  const mm = String(d.getUTCMinutes()).padStart(2, '0');
  return `${sheetDate(iso)}, ${hh}:${mm} UTC`;
}
