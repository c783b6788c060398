import { CalcInputError } from '@shared/calc/errors';
import type { TemperatureRange } from './schema';

/*
 * Default surface-temperature range for a joint, offered by the form and always editable: the sealant
 * sees the temperature of the moving material's surface, not the air. Outer surfaces run above the air in
 * sun and below it on clear nights (radiation to the sky) — NRC Canadian Building Digest CBD-47
 * "Extreme Temperatures at the Outer Surfaces of Buildings" (Stephenson, 1963) and NBS BMS 64 "Solar
 * Heating of Various Surfaces" (1941) describe both effects. The magnitudes below are common trade practice
 * for lightweight insulated cladding — a project surface-temperature analysis replaces them.
 */

export const SURFACE_FINISHES = ['light', 'medium', 'dark'] as const;
export const EXPOSURES = ['sun', 'shade'] as const;
export type SurfaceFinish = (typeof SURFACE_FINISHES)[number];
export type Exposure = (typeof EXPOSURES)[number];

/** Hottest surface above hottest air, K — common trade practice. */
export const SURFACE_RISE_ABOVE_AIR: Readonly<Record<Exposure, Readonly<Record<SurfaceFinish, number>>>> = {
  sun: { light: 10, medium: 25, dark: 40 },
  shade: { light: 0, medium: 0, dark: 0 },
};

/** Coldest surface below coldest air on a clear night, K — common trade practice. */
export const NIGHT_SKY_DROP = 5;

/** T_surface,max = T_air,max + rise(finish, exposure); T_surface,min = T_air,min − night-sky drop. */
export function defaultSurfaceTemperatureRange(
  air: TemperatureRange,
  finish: SurfaceFinish,
  exposure: Exposure,
): TemperatureRange {
  if (!(Number.isFinite(air.min) && Number.isFinite(air.max) && air.min < air.max))
    throw new CalcInputError(
      'air',
      `the coldest air (${air.min} °C) must be below the hottest (${air.max} °C)`,
    );
  const rise = SURFACE_RISE_ABOVE_AIR[exposure]?.[finish];
  if (rise === undefined)
    throw new CalcInputError('finish', 'finish must be light, medium or dark and exposure sun or shade');
  return { min: air.min - NIGHT_SKY_DROP, max: air.max + rise };
}
