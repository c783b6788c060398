import { FOOT, MPH_TO_MS, PSF_TO_PA } from '@shared/units';
import type { Exposure, WindEdition } from './schema';

/*
 * Velocity pressure for components and cladding, ASCE/SEI 7-16 and 7-22 chapter 26. SI at the interface; the
 * K_z and K_e formulas are evaluated in feet, as the standard writes them.
 * For the exposure constants, the K_z and K_e formulas and K_d, the verification tests name the published source each value was checked against, and how (tests/verification/wind.verification.test.ts).
 */

/** K_d for buildings, main system and components and cladding (ASCE 7-16/7-22 Table 26.6-1). */
export const KD_BUILDINGS = 0.85;
/** Heights below 15 ft take K_z at 15 ft (ASCE 7-16/7-22 Table 26.10-1, note 1). */
export const KZ_FLOOR_HEIGHT = 15 * FOOT;
/**
 * q = 0.00256·K·V² (psf, mph) written for Pa and m/s: 0.00256·47.880 26/0.447 04² = 0.613 35. The standard's SI
 * form rounds this to 0.613 (0.05 % lower); the exact conversion keeps SI and IP users on the same number.
 */
export const Q_COEFFICIENT_SI = (0.00256 * PSF_TO_PA) / (MPH_TO_MS * MPH_TO_MS);

export interface ExposureConstants {
  /** Power-law exponent α. */
  alpha: number;
  /** Nominal height of the atmospheric boundary layer z_g, ft. */
  zgFt: number;
}

/** Terrain exposure constants α and z_g (ASCE 7-16 Table 26.11-1; ASCE 7-22 Table 26.11-1). */
export const EXPOSURE_CONSTANTS: Readonly<
  Record<WindEdition, Readonly<Record<Exposure, ExposureConstants>>>
> = {
  'ASCE 7-16': { B: { alpha: 7.0, zgFt: 1200 }, C: { alpha: 9.5, zgFt: 900 }, D: { alpha: 11.5, zgFt: 700 } },
  'ASCE 7-22': {
    B: { alpha: 7.5, zgFt: 3280 },
    C: { alpha: 9.8, zgFt: 2460 },
    D: { alpha: 11.5, zgFt: 1935 },
  },
};

/** Leading coefficient of the K_z power law (ASCE 7-16 Table 26.10-1 note 1: 2.01; ASCE 7-22: 2.41). */
export const KZ_COEFFICIENT: Readonly<Record<WindEdition, number>> = { 'ASCE 7-16': 2.01, 'ASCE 7-22': 2.41 };

/** Equation text and number of the velocity pressure of each edition (Eq. 26.10-1). */
export const VELOCITY_EQUATION: Readonly<Record<WindEdition, string>> = {
  'ASCE 7-16': 'q_z = 0.00256·K_z·K_zt·K_d·K_e·V² (psf, mph) — ASCE 7-16 Eq. 26.10-1',
  'ASCE 7-22':
    'q_z = 0.00256·K_z·K_zt·K_e·V² (psf, mph) — ASCE 7-22 Eq. 26.10-1; K_d enters p (Eq. 30.3-1/30.4-1)',
};

/**
 * K_z = c·(z/z_g)^(2/α) for 15 ft ≤ z ≤ z_g, K_z(15 ft) below 15 ft, c above z_g; c = 2.01 (7-16) or 2.41 (7-22)
 * (ASCE 7-16/7-22 Table 26.10-1, note 1). `z` in metres.
 */
export function velocityPressureExposureCoefficient(
  edition: WindEdition,
  exposure: Exposure,
  z: number,
): number {
  const { alpha, zgFt } = EXPOSURE_CONSTANTS[edition][exposure];
  const zFt = Math.min(Math.max(z, KZ_FLOOR_HEIGHT) / FOOT, zgFt);
  return KZ_COEFFICIENT[edition] * (zFt / zgFt) ** (2 / alpha);
}

/** True when z lies above the gradient height z_g, where K_z stops growing (Table 26.10-1, note 1). */
export function aboveGradientHeight(edition: WindEdition, exposure: Exposure, z: number): boolean {
  return z / FOOT > EXPOSURE_CONSTANTS[edition][exposure].zgFt;
}

/**
 * K_e = e^(−0.0000362·z_e), z_e ground elevation in ft (ASCE 7-16/7-22 Table 26.9-1, note 2); 1.00 at and below
 * sea level (the table's "< 0" row — the formula would exceed 1 there). `ze` in metres.
 */
export const groundElevationFactor = (ze: number): number =>
  ze <= 0 ? 1 : Math.exp(-0.0000362 * (ze / FOOT));

/** ASCE 7-16/7-22 Table 26.10-1 footnote: K_z = 0.70 for exposure B below 30 ft — in Chapter 28 only. */
export const EXPOSURE_B_CHAPTER_28_KZ = 0.7;
/** The height below which that footnote (and ASCE 7-10's C&C Table 30.3-1 note) held K_z at 0.70, m. */
export const EXPOSURE_B_FLOOR_HEIGHT = 30 * FOOT;

/**
 * Velocity pressure, Pa (V in m/s): 7-16 q = 0.00256·K_z·K_zt·K_d·K_e·V²; 7-22 q = 0.00256·K_z·K_zt·K_e·V²
 * (Eq. 26.10-1 of each edition, constant converted to SI exactly).
 */
export function velocityPressure(
  edition: WindEdition,
  Kz: number,
  Kzt: number,
  Kd: number,
  Ke: number,
  V: number,
): number {
  const directionality = edition === 'ASCE 7-16' ? Kd : 1;
  return Q_COEFFICIENT_SI * Kz * Kzt * directionality * Ke * V * V;
}

/** K_d applied in the pressure equation: 1 for 7-16 (already in q), K_d for 7-22 (Eq. 30.3-1/30.4-1). */
export const pressureDirectionality = (edition: WindEdition, Kd: number): number =>
  edition === 'ASCE 7-22' ? Kd : 1;
