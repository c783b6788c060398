import { DEFS, type Quantity, type QuantityDef, type UnitDef } from './definitions';
import type { Derivation } from './derive';
import { DERIVED } from './derived';

export type { Quantity } from './definitions';

/*
 * The one registry of quantities: for each, the SI unit its values are stored in, the unit shown in each unit
 * system (symbol, mathjs expression, display precision) and the conversion. Every factor is derived from
 * mathjs's unit system by `derive.ts` — never typed as a decimal anywhere else (tests/architecture/
 * conversion-factors.test.ts). The derived numbers are kept in `derived.ts` (`npm run units:derive` writes it;
 * registry.test.ts fails when it differs from what mathjs derives now), so a page needs no unit library to
 * start and hot loops multiply plain numbers.
 */

export type UnitSystem = 'SI' | 'IP';

/** 0 °C in kelvins: 273.15 exactly (the SI definition of the Celsius scale). */
export const ICE_POINT_K = DERIVED.icePointK;

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

function quantitySpec(q: Quantity, def: QuantityDef): QuantitySpec {
  const derived = DERIVED.quantities[q];
  const shown = (unitDef: UnitDef, d: Derivation): DisplayUnit => ({
    symbol: unitDef.symbol,
    math: unitDef.math,
    scale: d.scale,
    origin: d.origin,
    decimals: unitDef.decimals,
  });
  const also: Record<string, DisplayUnit> = {};
  for (const [id, unitDef] of Object.entries(def.also ?? {}))
    also[id] = shown(unitDef, (derived.also as Record<string, Derivation>)[id]!);
  return { name: def.name, si: def.si, SI: shown(def.SI, derived.SI), IP: shown(def.IP, derived.IP), also };
}

/** The registry: every quantity, its stored SI unit and its shown units, factors derived from mathjs. */
export const QUANTITIES: Readonly<Record<Quantity, QuantitySpec>> = Object.freeze(
  Object.fromEntries(Object.entries(DEFS).map(([q, def]) => [q, quantitySpec(q as Quantity, def)])) as Record<
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
