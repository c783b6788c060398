import { CalcInputError } from '@shared/calc/errors';
import { ICE_POINT_K } from '@shared/units';

/*
 * Saturation vapour pressure, dew point, partial pressure and relative humidity. Temperatures in °C,
 * pressures in Pa, relative humidity as a fraction 0–1.
 *
 * Two formula sets:
 * - 'iso13788' — the ISO 13788:2012 formulas over water (θ ≥ 0) and over ice. The moisture engine uses this set
 *   everywhere because the standard's method prescribes it; results then match the standard's worked
 *   examples and other implementations of the method.
 * - 'hylandWexler' — ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 (ice) and eq. 6 (water), the
 *   Hyland–Wexler correlations, for psychrometric display. ASHRAE states them within 300 ppm of the
 *   tabulated values from −100 °C to +200 °C.
 * The two sets differ by under 0.7 % in p_sat and under 0.1 K in dew point from −40 °C to +50 °C
 * (derived; see the verification tests).
 */

export type SaturationFormula = 'iso13788' | 'hylandWexler';

/** ISO 13788 reference pressure at 0 °C, Pa. */
const ISO_P0 = 610.5;
/** 0 °C in K (exact). */
const KELVIN = ICE_POINT_K;
/** ASHRAE's domain of validity for eq. 5–6, °C. */
export const HYLAND_WEXLER_MIN = -100;
export const HYLAND_WEXLER_MAX = 200;
/**
 * Ice/water switch-over for Hyland–Wexler. ASHRAE writes 0 °C; the triple point 0.01 °C is used instead
 * (as psychrolib does) so that the function is continuous and its inverse converges at the freezing point.
 */
const TRIPLE_POINT = 0.01;

// ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 (over ice) coefficients C1–C7, SI.
const C1 = -5.6745359e3;
const C2 = 6.3925247;
const C3 = -9.677843e-3;
const C4 = 6.2215701e-7;
const C5 = 2.0747825e-9;
const C6 = -9.484024e-13;
const C7 = 4.1635019;
// ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 (over liquid water) coefficients C8–C13, SI.
const C8 = -5.8002206e3;
const C9 = 1.3914993;
const C10 = -4.8640239e-2;
const C11 = 4.1764768e-5;
const C12 = -1.4452093e-8;
const C13 = 6.5459673;

function requireFinite(value: number, field: string, what: string): void {
  if (!Number.isFinite(value))
    throw new CalcInputError(field, `${what} must be a finite number (got ${value})`);
}

/** p_sat = 610.5·exp(17.269θ/(237.3+θ)) for θ ≥ 0, 610.5·exp(21.875θ/(265.5+θ)) for θ < 0, Pa (ISO 13788:2012). */
export const saturationPressureIso13788 = (theta: number): number =>
  theta >= 0
    ? ISO_P0 * Math.exp((17.269 * theta) / (237.3 + theta))
    : ISO_P0 * Math.exp((21.875 * theta) / (265.5 + theta));

/** ln p_ws, T in K: eq. 5 below the triple point, eq. 6 above (ASHRAE Handbook—Fundamentals 2017 ch. 1). */
function lnPwsHylandWexler(T: number, ice: boolean): number {
  return ice
    ? C1 / T + C2 + C3 * T + C4 * T * T + C5 * T ** 3 + C6 * T ** 4 + C7 * Math.log(T)
    : C8 / T + C9 + C10 * T + C11 * T * T + C12 * T ** 3 + C13 * Math.log(T);
}

/** d(ln p_ws)/dT of eq. 5/6, 1/K — analytic derivative for the dew-point Newton iteration. */
function dLnPwsHylandWexler(T: number, ice: boolean): number {
  return ice
    ? -C1 / (T * T) + C3 + 2 * C4 * T + 3 * C5 * T * T + 4 * C6 * T ** 3 + C7 / T
    : -C8 / (T * T) + C10 + 2 * C11 * T + 3 * C12 * T * T + C13 / T;
}

/** p_ws = exp(eq. 5 or 6), Pa, valid −100 °C … +200 °C (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 5 & 6). */
export function saturationPressureHylandWexler(theta: number): number {
  if (!(theta >= HYLAND_WEXLER_MIN && theta <= HYLAND_WEXLER_MAX))
    throw new CalcInputError(
      'temperature',
      `the Hyland–Wexler equations hold from ${HYLAND_WEXLER_MIN} °C to ${HYLAND_WEXLER_MAX} °C (got ${theta})`,
    );
  return Math.exp(lnPwsHylandWexler(theta + KELVIN, theta <= TRIPLE_POINT));
}

/** Saturation vapour pressure by the chosen formula set, Pa. */
export const saturationPressure = (theta: number, formula: SaturationFormula = 'iso13788'): number =>
  formula === 'iso13788' ? saturationPressureIso13788(theta) : saturationPressureHylandWexler(theta);

/** θ = 237.3·L/(17.269 − L) over water, 265.5·L/(21.875 − L) over ice, L = ln(p/610.5) — the ISO formulas inverted. */
function dewPointIso13788(p: number): number {
  const L = Math.log(p / ISO_P0);
  return p >= ISO_P0 ? (237.3 * L) / (17.269 - L) : (265.5 * L) / (21.875 - L);
}

/** Newton iteration on ln p_ws(θ) = ln p, started from the ISO inverse (converges in 2–3 steps). */
function dewPointHylandWexler(p: number): number {
  // A relative slack of 1e-12 absorbs floating-point rounding at the ends of the range.
  if (
    !(
      p >= saturationPressureHylandWexler(HYLAND_WEXLER_MIN) * (1 - 1e-12) &&
      p <= saturationPressureHylandWexler(HYLAND_WEXLER_MAX) * (1 + 1e-12)
    )
  )
    throw new CalcInputError(
      'vapourPressure',
      `lies outside the range of the Hyland–Wexler equations (${HYLAND_WEXLER_MIN} °C to ${HYLAND_WEXLER_MAX} °C dew point)`,
    );
  const lnP = Math.log(p);
  let theta = Math.min(Math.max(dewPointIso13788(p), HYLAND_WEXLER_MIN), HYLAND_WEXLER_MAX);
  for (let i = 0; i < 50; i++) {
    const ice = theta <= TRIPLE_POINT;
    const T = theta + KELVIN;
    const step = (lnPwsHylandWexler(T, ice) - lnP) / dLnPwsHylandWexler(T, ice);
    theta = Math.min(Math.max(theta - step, HYLAND_WEXLER_MIN), HYLAND_WEXLER_MAX);
    if (Math.abs(step) < 1e-10) return theta;
  }
  return theta;
}

/**
 * Dew point of air with vapour pressure p (Pa), °C: the temperature at which p is the saturation pressure,
 * by the same formula set — analytic inverse for ISO 13788, Newton iteration for Hyland–Wexler.
 */
export function dewPoint(p: number, formula: SaturationFormula = 'iso13788'): number {
  requireFinite(p, 'vapourPressure', 'vapour pressure');
  if (p <= 0) throw new CalcInputError('vapourPressure', `must be greater than 0 Pa (got ${p})`);
  return formula === 'iso13788' ? dewPointIso13788(p) : dewPointHylandWexler(p);
}

/** p = φ·p_sat(θ), Pa. */
export function partialPressure(
  theta: number,
  relativeHumidity: number,
  formula: SaturationFormula = 'iso13788',
): number {
  requireFinite(theta, 'temperature', 'temperature');
  if (!(relativeHumidity >= 0 && relativeHumidity <= 1))
    throw new CalcInputError('relativeHumidity', `must lie between 0 and 1 (got ${relativeHumidity})`);
  return relativeHumidity * saturationPressure(theta, formula);
}

/** φ = p/p_sat(θ), fraction (above 1 means the air would be supersaturated). */
export function relativeHumidity(theta: number, p: number, formula: SaturationFormula = 'iso13788'): number {
  requireFinite(theta, 'temperature', 'temperature');
  requireFinite(p, 'vapourPressure', 'vapour pressure');
  if (p < 0) throw new CalcInputError('vapourPressure', `must be 0 Pa or more (got ${p})`);
  return p / saturationPressure(theta, formula);
}
