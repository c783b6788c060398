/**
 * Units. Everything inside Skinwright is SI; conversion happens only at the edges (forms, tables, sheet).
 * Branded number types keep quantities from being mixed by accident.
 *
 * The quantities, their SI and IP units, display precision and conversion factors live in one registry
 * (`registry.ts`, factors derived from mathjs's unit system at load); this module re-exports it with the names
 * the rest of the code multiplies by.
 */
import type { SI } from './brands';
import { QUANTITIES, type Quantity, shownToStored, storedToShown } from './registry';

export * from './brands';
export * from './registry';

export type Metre = SI<'length'>;
export type Celsius = SI<'temperature'>;
export type Kelvin = SI<'temperatureDifference'>;
export type Pascal = SI<'pressure'>;

/** Thermal conductivity λ, W/(m·K). */
export type WattPerMetreKelvin = SI<'conductivity'>;
/** Thermal transmittance U, W/(m²·K). */
export type WattPerSquareMetreKelvin = SI<'transmittance'>;
/** Thermal resistance R, m²·K/W. */
export type SquareMetreKelvinPerWatt = SI<'resistance'>;
/** Linear thermal transmittance ψ, W/(m·K) (same dimension as λ, different meaning). */
export type PsiValue = SI<'psi'>;
/** Point thermal transmittance χ, W/K. */
export type ChiValue = SI<'chi'>;

/**
 * A quantity's shown symbols and factors (SI value of one shown unit) per system, for a display table;
 * `siAlso` picks one of its further units for SI (`unitsOf('pressure', 'kPa')`).
 */
export function unitsOf(q: Quantity, siAlso?: string) {
  const spec = QUANTITIES[q];
  const si = (siAlso && spec.also[siAlso]) || spec.SI;
  return { unit: { SI: si.symbol, IP: spec.IP.symbol }, factor: { SI: si.scale, IP: spec.IP.scale } };
}

/*
 * The factors other code multiplies by, each read from the registry (derived from mathjs at load; checked
 * against NIST SP 811 (2008) Appendix B.8/B.9 in units.test.ts). `X_TO_SI` is the SI value of one IP unit.
 */
const ip = (q: Quantity) => QUANTITIES[q].IP.scale;
/** 1 h·ft²·°F/Btu_IT in m²·K/W (thermal resistance R). */
export const R_IP_TO_SI = ip('resistance');
/** 1 Btu_IT/(h·ft²·°F) in W/(m²·K) (thermal transmittance U). */
export const U_IP_TO_SI = ip('transmittance');
/** 1 Btu_IT·in/(h·ft²·°F) in W/(m·K) (thermal conductivity λ). */
export const K_IP_TO_SI = ip('conductivity');
/** 1 Btu_IT/(h·ft·°F) in W/(m·K) — ψ in IP. */
export const PSI_IP_TO_SI = ip('psi');
/** 1 Btu_IT/(h·°F) in W/K — χ in IP. */
export const CHI_IP_TO_SI = ip('chi');
/** 1 in in m (0.0254 exactly). */
export const INCH = ip('shortLength');
/** 1 ft in m (0.3048 exactly). */
export const FOOT = ip('length');
/** The typographic (PostScript) point, 1/72 in, in mm: type sizes are in points, the sheet's layout in mm. */
export const POINT_MM = QUANTITIES.shortLength.IP.scale / QUANTITIES.shortLength.SI.scale / 72;
/** 1 US gallon (231 in³ exactly) in m³. */
export const US_GALLON = ip('volume');
/** 1 lbf in N: 0.453 592 37 kg × 9.806 65 m/s², both exact by definition. */
export const LBF_TO_N = ip('force');
/** 1 lbf/ft² in Pa. */
export const PSF_TO_PA = ip('pressure');
/** 1 lb/ft² in kg/m² (pound avoirdupois per square foot). */
export const LB_PER_FT2_TO_KG_PER_M2 = ip('massPerArea');
/** 1 oz/ft² (avoirdupois ounce) in kg/m². */
export const OZ_PER_FT2_TO_KG_PER_M2 = QUANTITIES.massPerArea.also.ozPerFt2!.scale;
/** 1 lb/ft³ in kg/m³. */
export const LB_PER_FT3_TO_KG_PER_M3 = ip('density');
/** 1 mph in m/s (0.447 04 exactly). */
export const MPH_TO_MS = ip('speed');
/** 1 perm (23 °C) and 1 perm (0 °C) in kg/(Pa·s·m²). */
export const PERM_23C_TO_SI = ip('vapourPermeance');
export const PERM_0C_TO_SI = QUANTITIES.vapourPermeance.also.perm0C!.scale;
/** A degree Fahrenheit as a temperature difference, in kelvins (5/9). */
export const FAHRENHEIT_DEGREE_K = ip('temperatureDifference');

const fahrenheit = QUANTITIES.temperature.IP;
export const fahrenheitToCelsius = (f: number): Celsius => shownToStored(f, fahrenheit) as Celsius;
export const celsiusToFahrenheit = (c: number): number => storedToShown(c, fahrenheit);
/** A temperature difference in °F → K. */
export const deltaFahrenheitToKelvin = (df: number): Kelvin => (df * FAHRENHEIT_DEGREE_K) as Kelvin;
