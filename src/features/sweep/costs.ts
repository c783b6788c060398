import { MOVEMENT_CLASSES, type MovementClass } from '@shared/calc/joints/schema';
import type { CostKind, SweepCost } from '@shared/schemas/sweeps';
import { PRICE_THICKNESS, type RankMeasure } from '@shared/sweep/rank';
import type { SweepCosts } from '@shared/sweep/schema';
import { FOOT, INCH, QUANTITIES, toShown, type UnitSystem } from '@shared/units';
import { formatNumber } from '../../lib/quantities';

/*
 * The sweep's costs as a person types them: in their unit system (IP: per ft² per inch, per ft), stored and
 * ranked in SI (per m² per 25 mm, per m), and prefilled from the firm library's entries.
 */

/** What a cost box prices: a library kind, the metres of sealant per m² of wall, or a cost per area of wall. */
export type CostMeasure = CostKind | 'sealantMetres' | 'wall';

/**
 * Shown IP value of one SI value (shown = SI × factor), the factors from shared/units:
 * per m² per 25 mm → per ft² per in: × ft²/m² × in/25 mm = FOOT² · INCH / 0.025;
 * per m → per ft: × FOOT; m per m² (1/m) → ft per ft² (1/ft): × FOOT; per m² of wall → per ft²: × FOOT².
 */
const IP_PER_SI: Record<CostMeasure, number> = {
  insulation: (FOOT * FOOT * INCH) / PRICE_THICKNESS,
  clip: 1,
  girt: FOOT,
  sealant: FOOT,
  sealantMetres: FOOT,
  wall: FOOT * FOOT,
};

/** Girts and sealant are priced per length. */
const PER_LENGTH = { SI: 'per m', IP: 'per ft' };

const UNIT: Record<CostMeasure, Record<UnitSystem, string>> = {
  insulation: { SI: 'per m² of wall per 25 mm', IP: 'per ft² of wall per inch' },
  clip: { SI: 'per clip', IP: 'per clip' },
  girt: PER_LENGTH,
  sealant: PER_LENGTH,
  sealantMetres: { SI: 'm per m² of wall', IP: 'ft per ft² of wall' },
  wall: { SI: 'per m² of wall', IP: 'per ft² of wall' },
};

/** "per ft² of wall per inch": what a cost is per, in the person's system. */
export const costUnit = (m: CostMeasure, system: UnitSystem) => UNIT[m][system];

/** An SI cost (or sealant m/m²) as shown in `system`. */
export const costToShown = (si: number, m: CostMeasure, system: UnitSystem) =>
  system === 'SI' ? si : si * IP_PER_SI[m];

/** A cost typed in `system`, as stored (SI). */
export const costToSI = (shown: number, m: CostMeasure, system: UnitSystem) =>
  system === 'SI' ? shown : shown / IP_PER_SI[m];

/** An SI cost as a box's text in `system`: six significant figures, no grouping (read back unchanged). */
export const costBoxText = (si: number, m: CostMeasure, system: UnitSystem) =>
  String(Number(costToShown(si, m, system).toPrecision(6)));

/** A box of the cost form: one priced kind, or a sealant class's price. */
export type CostSlot = 'insulation' | 'clip' | 'girt' | `sealant ${MovementClass}`;

export const slotKind = (slot: CostSlot): CostKind =>
  slot.startsWith('sealant') ? 'sealant' : (slot as CostKind);
/** A sealant slot's movement class. */
export const slotClass = (slot: CostSlot): MovementClass | undefined =>
  slot.startsWith('sealant ') ? (slot.slice('sealant '.length) as MovementClass) : undefined;

/** The library entries that price one slot (a sealant slot: entries of its movement class). */
export const entriesFor = (entries: readonly SweepCost[], slot: CostSlot) =>
  entries.filter((e) => e.kind === slotKind(slot) && e.movementClass === slotClass(slot));

/** A box priced per product: the insulation product parameter's value (its name). */
export type ProductSlot = `product ${string}`;

/** The costs as typed (text, in the person's units), so a box can be empty or wrong without losing it. */
export interface CostDraft {
  insulation: string;
  /** Each insulation product's price per area per 25 mm (per ft² per inch in IP), by product name. */
  products: Record<string, string>;
  clip: string;
  girt: string;
  sealantPerMetre: Partial<Record<MovementClass, string>>;
  sealantMetres: string;
  /** The library entry a box was filled from, by slot (kept when the box is cleared: it is not refilled). */
  from: Partial<Record<CostSlot | ProductSlot, string>>;
}
export const emptyCosts: CostDraft = {
  insulation: '',
  products: {},
  clip: '',
  girt: '',
  sealantPerMetre: {},
  sealantMetres: '',
  from: {},
};

/** A slot's text in the draft. */
export const slotText = (d: CostDraft, slot: CostSlot): string => {
  const cls = slotClass(slot);
  return cls ? (d.sealantPerMetre[cls] ?? '') : d[slot as 'insulation' | 'clip' | 'girt'];
};

/** A product box's text; undefined when never filled (a product may be named "toString"). */
export const productText = (d: CostDraft, name: string) =>
  Object.hasOwn(d.products, name) ? d.products[name] : undefined;

/** The draft with a slot's text (and where it came from) set. */
export function withSlot(d: CostDraft, slot: CostSlot, text: string, from?: string): CostDraft {
  const cls = slotClass(slot);
  const next = cls
    ? { ...d, sealantPerMetre: { ...d.sealantPerMetre, [cls]: text } }
    : { ...d, [slot]: text };
  return from === undefined ? next : { ...next, from: { ...d.from, [slot]: from } };
}

/** A typed amount: a plain non-negative decimal (undefined when empty or unreadable). */
export const amount = (t: string) => {
  const s = t.trim();
  return s === '' || !/^\d+(\.\d*)?$|^\.\d+$/.test(s) ? undefined : Number(s);
};

/** The SI cost a slot's box holds, or undefined. */
export const slotSI = (d: CostDraft, slot: CostSlot, system: UnitSystem) => {
  const v = amount(slotText(d, slot));
  return v === undefined ? undefined : costToSI(v, slotKind(slot), system);
};

/** The costs the ranking reads, SI (a box left empty or unreadable is left out: the ranking names it). */
export function costsOf(d: CostDraft, system: UnitSystem): SweepCosts {
  const perMetre = Object.fromEntries(
    MOVEMENT_CLASSES.flatMap((cls) => {
      const v = slotSI(d, `sealant ${cls}`, system);
      return v === undefined ? [] : [[cls, v]];
    }),
  );
  const metres = amount(d.sealantMetres);
  const products = Object.entries(d.products).flatMap(([name, t]) => {
    const v = amount(t);
    return v === undefined ? [] : [[name, costToSI(v, 'insulation', system)] as const];
  });
  return {
    insulation: slotSI(d, 'insulation', system),
    insulationProducts: products.length > 0 ? Object.fromEntries(products) : undefined,
    clip: slotSI(d, 'clip', system),
    girt: slotSI(d, 'girt', system),
    sealant:
      metres === undefined
        ? undefined
        : { perMetre, metresPerSquareMetre: costToSI(metres, 'sealantMetres', system) },
  };
}

/** A saved sweep's costs (SI) back in the form, in the person's units. */
export function draftOfCosts(c: SweepCosts | null, system: UnitSystem): CostDraft {
  if (!c) return emptyCosts;
  const box = (v: number | undefined, m: CostMeasure) => (v === undefined ? '' : costBoxText(v, m, system));
  return {
    insulation: box(c.insulation, 'insulation'),
    products: Object.fromEntries(
      Object.entries(c.insulationProducts ?? {}).map(([name, v]) => [name, box(v, 'insulation')]),
    ),
    clip: box(c.clip, 'clip'),
    girt: box(c.girt, 'girt'),
    sealantPerMetre: Object.fromEntries(
      Object.entries(c.sealant?.perMetre ?? {}).map(([cls, v]) => [cls, box(v, 'sealant')]),
    ),
    sealantMetres: box(c.sealant?.metresPerSquareMetre, 'sealantMetres'),
    from: {},
  };
}

/** The boxes' text from one unit system in another (the same SI costs; an unreadable box kept as typed). */
export function convertCosts(d: CostDraft, from: UnitSystem, to: UnitSystem): CostDraft {
  if (from === to) return d;
  const convert = (text: string, m: CostMeasure) => {
    const v = amount(text);
    return v === undefined ? text : costBoxText(costToSI(v, m, from), m, to);
  };
  return {
    ...d,
    insulation: convert(d.insulation, 'insulation'),
    products: Object.fromEntries(
      Object.entries(d.products).map(([name, t]) => [name, convert(t, 'insulation')]),
    ),
    clip: d.clip,
    girt: convert(d.girt, 'girt'),
    sealantPerMetre: Object.fromEntries(
      Object.entries(d.sealantPerMetre).map(([cls, t]) => [cls, convert(t ?? '', 'sealant')]),
    ),
    sealantMetres: convert(d.sealantMetres, 'sealantMetres'),
  };
}

const SLOTS: CostSlot[] = [
  'insulation',
  'clip',
  'girt',
  ...MOVEMENT_CLASSES.map((c) => `sealant ${c}` as const),
];

/**
 * Empty boxes filled from the firm library: the first entry of each slot, and each product's box from the first
 * insulation entry of the same name, unless the box was filled (or emptied) before. The same draft back when
 * nothing changes.
 */
export function prefillCosts(
  d: CostDraft,
  entries: readonly SweepCost[],
  system: UnitSystem,
  products: readonly string[] = [],
): CostDraft {
  let next = d;
  for (const name of products) {
    const entry = entries.find((e) => e.kind === 'insulation' && e.name === name);
    if (!entry || productText(next, name) !== undefined) continue;
    next = {
      ...next,
      products: { ...next.products, [name]: costBoxText(entry.cost, 'insulation', system) },
      from: { ...next.from, [`product ${name}`]: entry.id },
    };
  }
  for (const slot of SLOTS) {
    const entry = entriesFor(entries, slot)[0];
    if (!entry || slotText(next, slot) !== '' || next.from[slot] !== undefined) continue;
    next = withSlot(next, slot, costBoxText(entry.cost, slotKind(slot), system), entry.id);
  }
  return next;
}

/** A ranking measure's value as shown: wall thickness in mm or in, weight in kg/m² or lb/ft² (shared/units). */
export function measureText(si: number, measure: Exclude<RankMeasure, 'cost'>, system: UnitSystem): string {
  const q = measure === 'thickness' ? 'shortLength' : 'massPerArea';
  const unit = QUANTITIES[q][system];
  return `${formatNumber(toShown(si, q, system), Math.min(unit.decimals, 2))} ${unit.symbol}`;
}
