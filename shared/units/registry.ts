import { create, createUnitDependencies, unitDependencies } from 'mathjs';

/*
 * The one registry of quantities: for each, the SI unit its values are stored in, the unit shown in each unit
 * system (symbol, mathjs expression, display precision) and the conversion. Every factor is derived once, here,
 * at module load, from mathjs's unit system — never typed as a decimal anywhere else (tests/architecture/
 * conversion-factors.test.ts). After load they are plain numbers, so hot loops multiply numbers.
 *
 * mathjs's `BTU` is the International Table Btu, 1055.055 852 62 J exactly (NIST SP 811 (2008) B.8 "British
 * thermal unit_IT"), the Btu of ASHRAE's IP units; °F intervals are written `degR` (1 °R = 1 °F = 5/9 K), so no
 * Fahrenheit offset leaks into a compound unit. What mathjs lacks is defined below on a private instance (the
 * shared default instance is left untouched): the conventional inch of mercury, 13 595.1 kg/m³ × g_n
 * (9.806 65 m/s²) × 1 in (NIST SP 811 B.8 "inch of mercury, conventional"; mathjs's mmHg is rounded); the perm
 * (0 °C), 1 grain/(h·ft²·inHg) (ASTM E96 §3); the perm (23 °C), which has no closed definition, at the value
 * NIST SP 811 B.8 tabulates, 5.745 25 × 10⁻¹¹ kg/(Pa·s·m²).
 */
const math = create({ unitDependencies, createUnitDependencies });
/** Value of one `from` in `to` (both mathjs unit expressions of the same dimension). */
const ratio = (from: string, to: string): number => math.unit(1, from).toNumber(to);

const STANDARD_GRAVITY = 9.80665; // m/s², exact by definition (CGPM 1901; NIST SP 811 B.8)
const MERCURY_CONVENTIONAL_DENSITY = 13595.1; // kg/m³, the conventional mercury of mmHg/inHg (NIST SP 811 B.8)
math.createUnit(
  'inHgConv',
  math.unit(MERCURY_CONVENTIONAL_DENSITY * STANDARD_GRAVITY * ratio('in', 'm'), 'Pa'),
);
math.createUnit('perm0C', math.unit(1, 'grain / (h ft^2 inHgConv)'));
math.createUnit('perm23C', math.unit(5.74525e-11, 'kg / (Pa s m^2)'));

export type UnitSystem = 'SI' | 'IP';

/** 0 °C in kelvins: 273.15 exactly (the SI definition of the Celsius scale). */
export const ICE_POINT_K = math.unit(0, 'degC').toNumber('K');

/**
 * One unit as shown: stored = (shown − origin) × scale, shown = stored / scale + origin. `origin` (the shown
 * reading of a stored zero) is 0 but for temperatures: 32 for °F against °C.
 */
export interface DisplayUnit {
  /** The printed symbol ('' for a pure number). */
  readonly symbol: string;
  /** The unit as mathjs writes it (what typed text with a unit is parsed against). */
  readonly math: string;
  readonly scale: number;
  readonly origin: number;
  /** Decimals a figure of this unit shows by default (a table may show fewer). */
  readonly decimals: number;
}

export interface QuantitySpec {
  /** What it is, in words ("thermal resistance R"). */
  readonly name: string;
  /** Symbol of the stored SI unit (the engine's, the API's and the database's). */
  readonly si: string;
  readonly SI: DisplayUnit;
  readonly IP: DisplayUnit;
  /** Further units of the same quantity, by id (CSV spellings, a second IP unit), same rule. */
  readonly also: Readonly<Record<string, DisplayUnit>>;
}

interface UnitDef {
  symbol: string;
  math: string;
  decimals: number;
  /** A temperature scale's degree as a difference (degC → K, degF → degR), for its scale. */
  interval?: string;
}
interface QuantityDef {
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

const DEFS = {
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

/** Scale and origin of a shown unit against the stored one (a temperature's scale from its degree alone). */
function displayUnit(def: UnitDef, stored: string, storedInterval: string): DisplayUnit {
  const scale = def.interval ? ratio(def.interval, storedInterval) : ratio(def.math, stored);
  const origin = math.unit(0, stored).toNumber(def.math);
  return { symbol: def.symbol, math: def.math, scale, origin, decimals: def.decimals };
}

function quantitySpec(def: QuantityDef): QuantitySpec {
  const storedInterval = def.SI.interval ?? def.stored;
  const shown = (unitDef: UnitDef) => displayUnit(unitDef, def.stored, storedInterval);
  const also: Record<string, DisplayUnit> = {};
  for (const [id, unitDef] of Object.entries(def.also ?? {})) also[id] = shown(unitDef);
  return { name: def.name, si: def.si, SI: shown(def.SI), IP: shown(def.IP), also };
}

/** The registry: every quantity, its stored SI unit and its shown units, factors derived from mathjs at load. */
export const QUANTITIES: Readonly<Record<Quantity, QuantitySpec>> = Object.freeze(
  Object.fromEntries(Object.entries(DEFS).map(([q, def]) => [q, quantitySpec(def)])) as Record<
    Quantity,
    QuantitySpec
  >,
);

/** The unit a quantity is shown in, in a unit system. */
export const displayUnitOf = (q: Quantity, system: UnitSystem): DisplayUnit => QUANTITIES[q][system];

/** A shown value → the stored SI value. */
export const shownToStored = (shown: number, d: DisplayUnit): number => (shown - d.origin) * d.scale;
/** A stored SI value → the value shown in unit `d`. */
export const storedToShown = (stored: number, d: DisplayUnit): number => stored / d.scale + d.origin;

/** A shown value in a unit system → the stored SI value. */
export const toStored = (shown: number, q: Quantity, system: UnitSystem): number =>
  shownToStored(shown, QUANTITIES[q][system]);
/** A stored SI value → the value shown in a unit system. */
export const toShown = (stored: number, q: Quantity, system: UnitSystem): number =>
  storedToShown(stored, QUANTITIES[q][system]);
