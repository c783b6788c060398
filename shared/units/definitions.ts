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

const u = <const S extends string>(symbol: S, mathExpr: string, decimals: number, interval?: string) => ({
  symbol,
  math: mathExpr,
  decimals,
  ...(interval ? { interval } : {}),
});

/** A quantity stored in its SI unit as shown: the stored symbol and mathjs unit are the shown SI unit's. */
const storedAsShown = <const S extends string>(
  name: string,
  SI: UnitDef & { symbol: S },
  IP: UnitDef,
  also?: Record<string, UnitDef>,
) => ({ name, si: SI.symbol, stored: SI.math, SI, IP, ...(also ? { also } : {}) });

export const DEFS = {
  length: storedAsShown('length', u('m', 'm', 3), u('ft', 'ft', 2)),
  /** Thicknesses, spacings, joint widths: stored in m, shown in mm / in. */
  shortLength: {
    name: 'short length',
    si: 'm',
    stored: 'm',
    SI: u('mm', 'mm', 1),
    IP: u('in', 'in', 3),
    also: { m: u('m', 'm', 3), ft: u('ft', 'ft', 2) },
  },
  area: storedAsShown('area', u('m²', 'm^2', 2), u('ft²', 'ft^2', 1)),
  volume: { name: 'volume', si: 'm³', stored: 'm^3', SI: u('L', 'L', 2), IP: u('US gal', 'gallon', 2) },
  temperature: storedAsShown('temperature', u('°C', 'degC', 1, 'K'), u('°F', 'degF', 1, 'degR')),
  temperatureDifference: storedAsShown('temperature difference', u('K', 'K', 1), u('°F', 'degR', 1)),
  /** Linear expansion α, per kelvin (tables print it in units of 10⁻⁶). */
  expansion: storedAsShown('coefficient of linear expansion α', u('1/K', 'K^-1', 8), u('1/°F', 'degR^-1', 8)),
  resistance: storedAsShown(
    'thermal resistance R',
    u('m²·K/W', 'm^2 K / W', 2),
    u('h·ft²·°F/Btu', 'h ft^2 degR / BTU', 1),
  ),
  transmittance: storedAsShown(
    'thermal transmittance U',
    u('W/(m²·K)', 'W / (m^2 K)', 3),
    u('Btu/(h·ft²·°F)', 'BTU / (h ft^2 degR)', 3),
  ),
  conductivity: storedAsShown(
    'thermal conductivity λ',
    u('W/(m·K)', 'W / (m K)', 4),
    u('Btu·in/(h·ft²·°F)', 'BTU in / (h ft^2 degR)', 4),
  ),
  psi: storedAsShown(
    'linear thermal transmittance ψ',
    u('W/(m·K)', 'W / (m K)', 4),
    u('Btu/(h·ft·°F)', 'BTU / (h ft degR)', 4),
  ),
  chi: storedAsShown(
    'point thermal transmittance χ',
    u('W/K', 'W / K', 4),
    u('Btu/(h·°F)', 'BTU / (h degR)', 4),
  ),
  pressure: storedAsShown('pressure', u('Pa', 'Pa', 0), u('psf', 'lbf / ft^2', 1), {
    kPa: u('kPa', 'kPa', 3),
    psi: u('psi', 'lbf / in^2', 2),
  }),
  vapourPermeance: {
    name: 'water vapour permeance',
    si: 'kg/(Pa·s·m²)',
    stored: 'kg / (Pa s m^2)',
    SI: u('ng/(Pa·s·m²)', 'ng / (Pa s m^2)', 1),
    IP: u('perm', 'perm23C', 2),
    also: { perm0C: u('perm (0 °C)', 'perm0C', 2) },
  },
  force: storedAsShown('force', u('N', 'N', 0), u('lbf', 'lbf', 1)),
  forcePerLength: storedAsShown('force per length', u('N/m', 'N / m', 0), u('lbf/ft', 'lbf / ft', 1)),
  massPerArea: storedAsShown('mass per area', u('kg/m²', 'kg / m^2', 3), u('lb/ft²', 'lbm / ft^2', 4), {
    gPerM2: u('g/m²', 'g / m^2', 0),
    ozPerFt2: u('oz/ft²', 'oz / ft^2', 2),
  }),
  speed: storedAsShown('speed', u('m/s', 'm / s', 1), u('mph', 'mi / h', 0)),
  density: storedAsShown('density', u('kg/m³', 'kg / m^3', 2), u('lb/ft³', 'lbm / ft^3', 2)),
  /** Vent area of an air layer per length, stored in mm²/m as ISO 6946 §6.9.3 states it. */
  ventArea: storedAsShown('vent area per length', u('mm²/m', 'mm^2 / m', 0), u('in²/ft', 'in^2 / ft', 3)),
} as const satisfies Record<string, QuantityDef>;

export type Quantity = keyof typeof DEFS;
