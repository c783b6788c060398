/**
 * Units. Everything inside Skinwright is SI; conversion happens only at the edges (forms, tables, sheet).
 * Branded number types keep quantities from being mixed by accident.
 *
 * Conversion factors are the exact-definition values tabulated in NIST SP 811 (2008), Appendix B.8/B.9,
 * and in ASHRAE Handbook—Fundamentals (2021) ch. 38 "Units and conversions".
 */
declare const brand: unique symbol;
export type Brand<T, B extends string> = T & { readonly [brand]: B };

export type Metre = Brand<number, 'm'>;
export type Celsius = Brand<number, '°C'>;
export type Kelvin = Brand<number, 'K'>;
export type Pascal = Brand<number, 'Pa'>;
/** Thermal conductivity λ, W/(m·K). */
export type WattPerMetreKelvin = Brand<number, 'W/(m·K)'>;
/** Thermal transmittance U, W/(m²·K). */
export type WattPerSquareMetreKelvin = Brand<number, 'W/(m²·K)'>;
/** Thermal resistance R, m²·K/W. */
export type SquareMetreKelvinPerWatt = Brand<number, 'm²·K/W'>;
/** Linear thermal transmittance ψ, W/(m·K) (same dimension as λ, different meaning). */
export type PsiValue = Brand<number, 'ψ W/(m·K)'>;
/** Point thermal transmittance χ, W/K. */
export type ChiValue = Brand<number, 'W/K'>;

/** 1 h·ft²·°F/Btu = 0.176 110 2 m²·K/W (NIST SP 811 B.9, Btu_IT). */
export const R_IP_TO_SI = 0.1761102;
/** 1 Btu/(h·ft²·°F) = 5.678 263 W/(m²·K) (NIST SP 811 B.9, Btu_IT). */
export const U_IP_TO_SI = 5.678263;
/** 1 Btu·in/(h·ft²·°F) = 0.144 227 9 W/(m·K) (NIST SP 811 B.9, Btu_IT). */
export const K_IP_TO_SI = 0.1442279;
/** 1 Btu/(h·ft·°F) = 1.730 735 W/(m·K) (NIST SP 811 B.9, Btu_IT) — ψ in IP. */
export const PSI_IP_TO_SI = 1.730735;
/** 1 Btu/(h·°F) = 0.527 527 9 W/K (NIST SP 811 B.9, Btu_IT) — χ in IP. */
export const CHI_IP_TO_SI = 0.5275279;
/** 1 in = 0.0254 m exactly. */
export const INCH = 0.0254;
/** 1 ft = 0.3048 m exactly. */
export const FOOT = 0.3048;
/** The typographic (PostScript) point, 1/72 in, in mm: type sizes are in points, the sheet's layout in mm. */
export const POINT_MM = (INCH * 1000) / 72;
/** 1 US gallon = 231 in³ exactly (NIST Handbook 44, Appendix C). */
export const US_GALLON = 231 * INCH ** 3;
/**
 * 1 lbf = 4.448 221 615 260 5 N exactly: 0.453 592 37 kg × 9.806 65 m/s², the avoirdupois pound times standard
 * gravity, both exact by definition (NIST SP 811 (2008) Appendix B.8/B.9, pound-force; tabulated 4.448 222 E+00).
 */
export const LBF_TO_N = 4.4482216152605;
/** 1 lbf/ft² = 47.880 26 Pa (NIST SP 811 B.9). */
export const PSF_TO_PA = 47.88026;
/** 1 lb/ft² = 4.882 428 kg/m² (NIST SP 811 B.9, pound avoirdupois per square foot). */
export const LB_PER_FT2_TO_KG_PER_M2 = 4.882428;
/** 1 mph = 0.447 04 m/s exactly. */
export const MPH_TO_MS = 0.44704;
/** 1 US perm (23 °C) = 57.452 5 ng/(Pa·s·m²); 1 perm (0 °C) = 57.2135 ng/(Pa·s·m²) (NIST SP 811 B.9). */
export const PERM_23C_TO_SI = 57.4525e-12;
export const PERM_0C_TO_SI = 57.2135e-12;

export const fahrenheitToCelsius = (f: number): Celsius => (((f - 32) * 5) / 9) as Celsius;
export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
/** A temperature difference: 1 °F = 5/9 K. */
export const deltaFahrenheitToKelvin = (df: number): Kelvin => ((df * 5) / 9) as Kelvin;

export type UnitSystem = 'SI' | 'IP';
