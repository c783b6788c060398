import { dewPoint } from './psychrometrics';

/*
 * Surface temperature to avoid critical surface humidity (ISO 13788:2012 §5), for a plane, clear-field
 * element. Thermal bridges (girts, clips, studs) need their own f_Rsi from ISO 10211 or a published value.
 */

/** Internal surface resistance for the surface-humidity check on opaque elements, m²·K/W (ISO 13788:2012 §5). */
export const RSI_SURFACE = 0.25;
/** Surface relative humidity taken as critical for mould growth (ISO 13788:2012 §5). */
export const CRITICAL_SURFACE_RH = 0.8;
/** Dew point of (nearly) dry air is taken at this vapour pressure, Pa, so that φ = 0 stays finite. */
const DRY_AIR_PRESSURE = 1e-3;

/** f_Rsi = (θ_si − θ_e)/(θ_i − θ_e) = 1 − Rsi/R_T for a plane element, R_T computed with that Rsi. */
export const temperatureFactor = (totalResistance: number, Rsi = RSI_SURFACE): number =>
  1 - Rsi / totalResistance;

/** θ_si = θ_i − (1 − f_Rsi)·(θ_i − θ_e), °C. */
export const surfaceTemperature = (fRsi: number, thetaI: number, thetaE: number): number =>
  thetaI - (1 - fRsi) * (thetaI - thetaE);

/** θ_si,min = dew point of p_i/φ_si,cr: the coldest surface on which the RH stays at or below 80 %, °C. */
export const minSurfaceTemperature = (pi: number, criticalRh = CRITICAL_SURFACE_RH): number =>
  dewPoint(Math.max(pi, DRY_AIR_PRESSURE) / criticalRh);

/**
 * f_Rsi,min = (θ_si,min − θ_e)/(θ_i − θ_e) (ISO 13788:2012 §5); null — not applicable — when θ_e ≥ θ_i (no
 * outward heat flow, as in a cooling season) or when θ_e itself is at or above θ_si,min, so no surface
 * between the two air temperatures can reach 80 % RH and the factor would be 0 or negative.
 */
export function minTemperatureFactor(thetaSiMin: number, thetaI: number, thetaE: number): number | null {
  if (!(thetaI > thetaE)) return null;
  const f = (thetaSiMin - thetaE) / (thetaI - thetaE);
  // A difference of air temperatures too small to divide by (below ~1e-308 K) is no heat flow either.
  return f > 0 && Number.isFinite(f) ? f : null;
}
