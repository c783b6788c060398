import type { ItemQuantity, Tolerance } from '@shared/inspections/schema';
import { displayUnitOf, storedToShown, toStored, type UnitSystem } from '@shared/units';
import { trimmedFixed } from '@shared/units/rounding';
import type { InputMeasure, ParsedEntry } from '../../lib/input-measure';

/*
 * A checklist item's measured value as the box shows and reads it: the item's quantity from the units registry
 * (stored SI, shown in the person's SI/IP choice, one decimal finer in the box than in print), or a plain count.
 */

const MINUS = '\u2212';

const readNumber = (text: string): number | null => {
  const t = text.trim().replace(/\u2212/g, '-');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
};

/** The box of an item's measured value. */
export function itemMeasure(quantity: ItemQuantity): InputMeasure {
  if (quantity === 'count')
    return {
      unit: () => '',
      toText: (si) => (si == null || !Number.isFinite(si) ? '' : String(si)),
      parse: (text): ParsedEntry => {
        if (text.trim() === '') return { kind: 'empty' };
        const n = readNumber(text);
        return n === null ? { kind: 'invalid' } : { kind: 'ok', si: n };
      },
      example: () => '4',
    };
  return {
    unit: (system) => displayUnitOf(quantity, system).symbol,
    toText: (si, system) => {
      if (si == null || !Number.isFinite(si)) return '';
      const d = displayUnitOf(quantity, system);
      return trimmedFixed(storedToShown(si, d), d.decimals + 1);
    },
    parse: (text, system): ParsedEntry => {
      if (text.trim() === '') return { kind: 'empty' };
      const n = readNumber(text);
      return n === null ? { kind: 'invalid' } : { kind: 'ok', si: toStored(n, quantity, system) };
    },
  };
}

/** A stored value of an item in words: "1.2 m", "600 mm", "4"; "—" when there is none. */
export function itemValueText(quantity: ItemQuantity | null, si: number | null, system: UnitSystem): string {
  if (si === null || quantity === null || !Number.isFinite(si)) return '—';
  if (quantity === 'count') return String(si);
  const d = displayUnitOf(quantity, system);
  return `${trimmedFixed(storedToShown(si, d), d.decimals).replace(/^-/, MINUS)}\u202f${d.symbol}`;
}

/** The acceptance limits in words: "600 mm to 610 mm", "at least 12 mm", "at most 1.2 m"; null without limits. */
export function toleranceText(quantity: ItemQuantity | null, t: Tolerance | null, system: UnitSystem) {
  if (!t || (t.min === null && t.max === null)) return null;
  const v = (x: number) => itemValueText(quantity, x, system);
  if (t.min !== null && t.max !== null) return `${v(t.min)} to ${v(t.max)}`;
  return t.min !== null ? `at least ${v(t.min)}` : `at most ${v(t.max as number)}`;
}
