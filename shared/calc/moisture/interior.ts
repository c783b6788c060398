import { CalcInputError } from '@shared/calc/errors';
import { saturationPressureIso13788 } from './psychrometrics';
import type { Interior } from './schema';

/*
 * Interior design conditions of ISO 13788:2012 Annex A: a humidity class gives the vapour pressure excess
 * Δp over the exterior as a function of the monthly exterior temperature; a factor (1.10) is put on Δp.
 * The verification tests name the published source each value was checked against, and how.
 */

/** Default factor on the interior vapour pressure excess (ISO 13788:2012 Annex A). */
export const SAFETY_FACTOR_DEFAULT = 1.1;
/** Δp at θ_e ≤ 0 °C for humidity classes 1–5, Pa (ISO 13788 Annex A). */
export const HUMIDITY_CLASS_EXCESS = [270, 540, 810, 1080, 1350] as const;
/** Above this exterior temperature the class excess is 0, °C (ISO 13788 Annex A). */
const HUMIDITY_CLASS_ZERO_AT = 20;

/** Δp = Δp₀ for θ_e ≤ 0, Δp₀·(1 − θ_e/20) up to 20 °C, 0 above, Pa (ISO 13788:2012 Annex A). */
export function humidityClassExcess(humidityClass: number, thetaE: number): number {
  const dp0 = HUMIDITY_CLASS_EXCESS[humidityClass - 1];
  if (dp0 === undefined)
    throw new CalcInputError('interior.humidityClass', `must be an integer 1–5 (got ${humidityClass})`);
  if (thetaE <= 0) return dp0;
  return thetaE >= HUMIDITY_CLASS_ZERO_AT ? 0 : dp0 * (1 - thetaE / HUMIDITY_CLASS_ZERO_AT);
}

/** p_i = p_e + f·(p_i,nominal − p_e) when the interior is more humid than outside, else p_i,nominal, Pa. */
export const designInteriorPressure = (pe: number, pNominal: number, factor: number): number =>
  pNominal > pe ? pe + factor * (pNominal - pe) : pNominal;

export interface InteriorMonth {
  theta: number;
  p: number;
  capped: boolean;
}

/** Design interior temperature and vapour pressure for one month (`monthName` only words the error). */
export function interiorMonth(
  interior: Interior,
  thetaE: number,
  pe: number,
  factor: number,
  monthName: string,
): InteriorMonth {
  const theta = interior.temperature;
  const psat = saturationPressureIso13788(theta);
  if (interior.kind === 'fixed') {
    const p = designInteriorPressure(pe, interior.relativeHumidity * psat, factor);
    if (p > psat)
      throw new CalcInputError(
        'interior.relativeHumidity',
        `with the factor ${factor} on Δp the design interior vapour pressure in ${monthName} (${p.toFixed(0)} Pa) exceeds saturation at ${theta} °C (${psat.toFixed(0)} Pa); lower the humidity or the factor`,
      );
    return { theta, p, capped: false };
  }
  const p = pe + factor * humidityClassExcess(interior.humidityClass, thetaE);
  return p > psat ? { theta, p: psat, capped: true } : { theta, p, capped: false };
}
