import type { Unit } from 'mathjs';
import { unitMath as math } from './derive';

/*
 * Reading a number typed with its unit into a box that holds another ("3.5 in" in a mm box, "1 5/8 in",
 * "2' 6\"", "89 mm" in an inch box, "R-13" in an m²·K/W box). The units and their factors are mathjs's
 * (exact inch, foot, pound-force and Btu_IT as NIST SP 811 (2008) Appendix B defines them); the few trade
 * units it lacks are defined on the units layer's mathjs instance (`derive.ts`). Pure: no I/O, no DOM.
 *
 * A decimal comma is refused with a reason rather than guessed: "1,250" is 1250 to some and 1.25 to others.
 */

/** What was typed, read against the box's unit: `value` is in the box's unit, `converted` when typed in another. */
export type TypedQuantity =
  | { kind: 'empty' }
  | { kind: 'ok'; value: number; converted: boolean }
  | { kind: 'invalid'; why: Refusal; reason: string };

/** Why an entry was refused: no number at its start, or a number with something wrong after or in it. */
export type Refusal = 'not_a_number' | 'bad_number' | 'unknown_unit' | 'wrong_kind' | 'no_unit_here';

/** Named dimensions for the reasons, each by one unit of it (first match wins). */
const DIMENSIONS: [string, string][] = [
  ['a length', 'm'],
  ['an area', 'm^2'],
  ['a volume', 'm^3'],
  ['a mass', 'kg'],
  ['a time', 's'],
  ['a temperature', 'K'],
  ['an angle', 'rad'],
  ['a pressure', 'Pa'],
  ['a force', 'N'],
  ['an energy', 'J'],
  ['a power', 'W'],
  ['a speed', 'm/s'],
  ['a density', 'kg/m^3'],
  ['a thermal resistance', 'm^2 K/W'],
  ['a thermal transmittance (U)', 'W/(m^2 K)'],
  ['a conductivity (λ or ψ)', 'W/(m K)'],
  ['a point transmittance (χ)', 'W/K'],
  ['a vapour permeance', 'kg/(Pa s m^2)'],
];

function dimensionName(u: Unit): string {
  return DIMENSIONS.find(([, ref]) => u.equalBase(math.unit(1, ref)))?.[0] ?? 'another kind of quantity';
}

/**
 * A unit as people write it → mathjs's spelling: "h·ft²·°F/Btu" → "h ft^2 degF/BTU", "W/mK" → "W/(m K)",
 * ″ → in, ′ → ft, °F/℉/F → degF, "US gal" → gal. Boxes' own symbols go through the same door.
 */
function unitSpelling(text: string): string {
  let t = text
    .trim()
    .replace(/[·⋅*×]/g, ' ')
    .replace(/[µμ]/g, 'u')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/⁻¹/g, '^-1')
    .replace(/^(?:″|"|''|inch(?:es)?\.?|in\.)$/i, 'in')
    .replace(/^(?:′|'|ft\.)$/i, 'ft')
    .replace(/(?<![A-Za-z])(?:°\s*F|℉|deg\s*F|F)(?![A-Za-z])/g, 'degF')
    .replace(/(?<![A-Za-z])(?:°\s*C|℃|deg\s*C|C)(?![A-Za-z])/g, 'degC')
    .replace(/\bhr\b/g, 'h')
    .replace(/\bUS\s+gal(?:lons?)?\b/i, 'gal')
    // A power written without a caret after a unit: m2 → m^2 ("W/m2K").
    .replace(/([A-Za-z])([23])(?![\d.])/g, '$1^$2')
    // "mK" is millikelvin to mathjs but metre-kelvin to anyone typing W/mK.
    .replace(/\bm(\^[23])?K\b/g, 'm$1 K')
    .replace(/\s+/g, ' ');
  // "W/m K" means W/(m·K): what follows a single slash is the whole denominator.
  const slash = /^([^/()]+)\/\s*([^/()]+\s[^/()]+)$/.exec(t);
  if (slash) t = `${slash[1]!.trim()}/(${slash[2]!.trim()})`;
  return t.replace(/\s*\/\s*/g, '/');
}

/** The box's unit as mathjs reads it; null when it is not a unit mathjs knows ("10⁻⁶/K", "per m²", "%"). */
function boxUnit(symbol: string): { unit: Unit; spelled: string } | null {
  if (symbol.trim() === '') return null;
  const spelled = unitSpelling(symbol);
  try {
    return { unit: math.unit(1, spelled), spelled };
  } catch {
    return null;
  }
}

const DECIMAL = String.raw`(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?`;
/** A whole and a fraction ("1 5/8", "1-5/8"), a fraction ("5/8") or a decimal ("3.5", "1e-3"). */
const NUMBER = String.raw`(?:\d+(?:\s+|\s*-\s*)\d+\s*/\s*\d+|\d+\s*/\s*\d+|${DECIMAL})`;
const LEADING = new RegExp(String.raw`^([-+]?)\s*(${NUMBER})\s*(.*)$`, 'i');
const FEET_INCHES = new RegExp(
  String.raw`^([-+]?)\s*(${DECIMAL})\s*(?:'|′|ft\.?|feet|foot)\s*-?\s*(${NUMBER})\s*(?:"|″|''|in\.?|inch(?:es)?)?$`,
  'i',
);

/** The number a NUMBER match stands for; null for a zero denominator. */
function numberValue(text: string): number | null {
  const mixed = /^(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)$/.exec(text);
  if (!mixed) return Number(text);
  const den = Number(mixed[3]);
  return den === 0 ? null : Number(mixed[1] ?? 0) + Number(mixed[2]) / den;
}

/** ⅝ → 5/8, "1⅝" → "1 5/8" (Unicode's compatibility form of each vulgar fraction). */
const vulgarFractions = (t: string) =>
  t.replace(/(\d)?\s*([\u00BC-\u00BE\u2150-\u215E])/g, (_, whole: string | undefined, v: string) => {
    const f = v.normalize('NFKC').replace('\u2044', '/');
    return whole ? `${whole} ${f}` : f;
  });

const quoted = (text: string) => `“${text}”`;

/** The IP thermal-resistance unit that "R-13" stands for. */
const R_IP = 'h·ft²·°F/Btu';
const R_VALUE = /^R\s*-?\s*(\d+\.?\d*|\.\d+)$/i;

/**
 * Read `text` for a box whose unit is `symbol` (as the box shows it: "mm", "h·ft²·°F/Btu", "°C", "kPa", …).
 * A plain number is in the box's unit; a number with a unit is converted to it; a feet-and-inches length
 * ("2' 6\"", "2 ft 6 1/2 in") is added up; "R-13" in a thermal-resistance box is h·ft²·°F/Btu. Anything else
 * is refused with the reason in words.
 */
export function parseTypedQuantity(text: string, symbol: string): TypedQuantity {
  const typedText = text.trim();
  const t = vulgarFractions(typedText.replace(/\u2212/g, '-').replace(/[\u00A0\u2009\u202F]/g, ' '));
  if (t === '') return { kind: 'empty' };
  const box = boxUnit(symbol);
  const takes = box
    ? `${dimensionName(box.unit)} (${symbol})`
    : symbol.trim()
      ? `a number in ${symbol}`
      : 'a plain number';
  const example = `for example 12.5${box ? ` ${symbol}` : ''}`;
  const refuse = (why: Refusal, words: string): TypedQuantity => ({
    kind: 'invalid',
    why,
    reason: `${quoted(typedText)}${words}`,
  });
  const inBox = (u: Unit): TypedQuantity => {
    // Twelve significant figures: far past any measurement, and 3.5 in reads 88.9 mm, not 88.899999999999.
    const value = box ? Number(u.toNumber(box.spelled).toPrecision(12)) : Number.NaN;
    return Number.isFinite(value)
      ? { kind: 'ok', value, converted: true }
      : refuse('bad_number', ' is too large a number');
  };
  const wrongKind = (typed: Unit) =>
    refuse('wrong_kind', ` is ${dimensionName(typed)}; this box takes ${takes}`);

  if (/\d,\d/.test(t))
    return refuse('bad_number', `: write decimals with a point and no thousands separators (${example})`);

  const feet = FEET_INCHES.exec(t);
  if (feet && box) {
    const inches = numberValue(feet[3]!);
    if (inches === null) return refuse('bad_number', ' divides by zero');
    const sign = feet[1] === '-' ? -1 : 1;
    const u = math.unit(sign * (Number(feet[2]) * 12 + inches), 'in');
    return u.equalBase(box.unit) ? inBox(u) : wrongKind(u);
  }
  const rValue = box?.unit.equalBase(math.unit(1, 'm^2 K/W')) ? R_VALUE.exec(t) : null;
  if (rValue) return inBox(math.unit(Number(rValue[1]), unitSpelling(R_IP)));

  const lead = LEADING.exec(t);
  if (!lead) return refuse('not_a_number', ` is not a number (${example})`);
  const magnitude = numberValue(lead[2]!);
  if (magnitude === null) return refuse('bad_number', ' divides by zero');
  const value = (lead[1] === '-' ? -1 : 1) * magnitude;
  if (!Number.isFinite(value)) return refuse('bad_number', ' is too large a number');
  const typedUnit = lead[3]!.trim();
  // No unit, or the box's own symbol as shown ("35 %", "12 mm"): the number is in the box's unit.
  if (typedUnit === '' || typedUnit === symbol.trim()) return { kind: 'ok', value, converted: false };
  if (!box) return refuse('no_unit_here', `: this box takes ${takes}; type the number without a unit`);
  let typed: Unit;
  try {
    typed = math.unit(value, unitSpelling(typedUnit));
  } catch {
    return refuse(
      'unknown_unit',
      `: ${quoted(typedUnit)} is not a unit this box reads; type ${dimensionName(box.unit)} such as 12.5 ${symbol}`,
    );
  }
  if (!typed.equalBase(box.unit)) return wrongKind(typed);
  return unitSpelling(typedUnit) === box.spelled ? { kind: 'ok', value, converted: false } : inBox(typed);
}
