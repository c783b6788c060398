/*
 * The quantities as defined: for each, the SI unit its values are stored in and the unit shown in each unit
 * system (symbol, mathjs expression, display precision). `derive.ts` turns them into factors with mathjs;
 * `registry.ts` joins them with the derived numbers.
 */

export interface UnitDef {
  symbol: string;
  math: string;
  decimals: number;
  /** A temperature scale's degree as a difference (degC → K, degF → degR), for its scale. */
  interval?: string;
}
export interface QuantityDef {
  name: string;
  si: string;
  /** The stored unit as mathjs writes it. */
  stored: string;
  SI: UnitDef;
  IP: UnitDef;
  also?: Record<string, UnitDef>;
}

const u = (symbol: string, mathExpr: string, decimals: number, interval?: string): UnitDef => ({
  symbol,
  math: mathExpr,
  decimals,
  ...(interval ? { interval } : {}),
});

export const DEFS = {
  length: { name: 'length', si: 'm', stored: 'm', SI: u('m', 'm', 3), IP: u('ft', 'ft', 2) },
  /** Thicknesses, spacings, joint widths: stored in m, shown in mm / in. */
  shortLength: {
    name: 'short length',
    si: 'm',
    stored: 'm',
    SI: u('mm', 'mm', 1),
    IP: u('in', 'in', 3),
    also: { m: u('m', 'm', 3), ft: u('ft', 'ft', 2) },
  },
  area: { name: 'area', si: 'm²', stored: 'm^2', SI: u('m²', 'm^2', 2), IP: u('ft²', 'ft^2', 1) },
  volume: { name: 'volume', si: 'm³', stored: 'm^3', SI: u('L', 'L', 2), IP: u('US gal', 'gallon', 2) },
  temperature: {
    name: 'temperature',
    si: '°C',
    stored: 'degC',
    SI: u('°C', 'degC', 1, 'K'),
    IP: u('°F', 'degF', 1, 'degR'),
  },
  temperatureDifference: {
    name: 'temperature difference',
    si: 'K',
    stored: 'K',
    SI: u('K', 'K', 1),
    IP: u('°F', 'degR', 1),
  },
  /** Linear expansion α, per kelvin (tables print it in units of 10⁻⁶). */
  expansion: {
    name: 'coefficient of linear expansion α',
    si: '1/K',
    stored: 'K^-1',
    SI: u('1/K', 'K^-1', 8),
    IP: u('1/°F', 'degR^-1', 8),
  },
  resistance: {
    name: 'thermal resistance R',
    si: 'm²·K/W',
    stored: 'm^2 K / W',
    SI: u('m²·K/W', 'm^2 K / W', 2),
    IP: u('h·ft²·°F/Btu', 'h ft^2 degR / BTU', 1),
  },
  transmittance: {
    name: 'thermal transmittance U',
    si: 'W/(m²·K)',
    stored: 'W / (m^2 K)',
    SI: u('W/(m²·K)', 'W / (m^2 K)', 3),
    IP: u('Btu/(h·ft²·°F)', 'BTU / (h ft^2 degR)', 3),
  },
  conductivity: {
    name: 'thermal conductivity λ',
    si: 'W/(m·K)',
    stored: 'W / (m K)',
    SI: u('W/(m·K)', 'W / (m K)', 4),
    IP: u('Btu·in/(h·ft²·°F)', 'BTU in / (h ft^2 degR)', 4),
  },
  psi: {
    name: 'linear thermal transmittance ψ',
    si: 'W/(m·K)',
    stored: 'W / (m K)',
    SI: u('W/(m·K)', 'W / (m K)', 4),
    IP: u('Btu/(h·ft·°F)', 'BTU / (h ft degR)', 4),
  },
  chi: {
    name: 'point thermal transmittance χ',
    si: 'W/K',
    stored: 'W / K',
    SI: u('W/K', 'W / K', 4),
    IP: u('Btu/(h·°F)', 'BTU / (h degR)', 4),
  },
  pressure: {
    name: 'pressure',
    si: 'Pa',
    stored: 'Pa',
    SI: u('Pa', 'Pa', 0),
    IP: u('psf', 'lbf / ft^2', 1),
    also: { kPa: u('kPa', 'kPa', 3), psi: u('psi', 'lbf / in^2', 2) },
  },
  vapourPermeance: {
    name: 'water vapour permeance',
    si: 'kg/(Pa·s·m²)',
    stored: 'kg / (Pa s m^2)',
    SI: u('ng/(Pa·s·m²)', 'ng / (Pa s m^2)', 1),
    IP: u('perm', 'perm23C', 2),
    also: { perm0C: u('perm (0 °C)', 'perm0C', 2) },
  },
  force: { name: 'force', si: 'N', stored: 'N', SI: u('N', 'N', 0), IP: u('lbf', 'lbf', 1) },
  forcePerLength: {
    name: 'force per length',
    si: 'N/m',
    stored: 'N / m',
    SI: u('N/m', 'N / m', 0),
    IP: u('lbf/ft', 'lbf / ft', 1),
  },
  massPerArea: {
    name: 'mass per area',
    si: 'kg/m²',
    stored: 'kg / m^2',
    SI: u('kg/m²', 'kg / m^2', 3),
    IP: u('lb/ft²', 'lbm / ft^2', 4),
    also: { gPerM2: u('g/m²', 'g / m^2', 0), ozPerFt2: u('oz/ft²', 'oz / ft^2', 2) },
  },
  speed: { name: 'speed', si: 'm/s', stored: 'm / s', SI: u('m/s', 'm / s', 1), IP: u('mph', 'mi / h', 0) },
  density: {
    name: 'density',
    si: 'kg/m³',
    stored: 'kg / m^3',
    SI: u('kg/m³', 'kg / m^3', 2),
    IP: u('lb/ft³', 'lbm / ft^3', 2),
  },
  /** Vent area of an air layer per length, stored in mm²/m as ISO 6946 §6.9.3 states it. */
  ventArea: {
    name: 'vent area per length',
    si: 'mm²/m',
    stored: 'mm^2 / m',
    SI: u('mm²/m', 'mm^2 / m', 0),
    IP: u('in²/ft', 'in^2 / ft', 3),
  },
} as const satisfies Record<string, QuantityDef>;

export type Quantity = keyof typeof DEFS;
