/*
 * The one rounding rule of every printed figure (screens and the sheet): half away from zero on the decimal
 * value as written, so 0.15 at one place is 0.2 and 3.35 is 3.4 — never the 0.1 and 3.3 that binary
 * `toFixed` gives for values stored a hair below the half.
 */

/** `x` rounded half away from zero at `decimals` places (0–10). */
export function roundDecimal(x: number, decimals: number): number {
  if (!Number.isFinite(x)) return x;
  // Rounding the shortest decimal string of x, shifted by an exponent, works on the decimal as written.
  const [mantissa, exponent = '0'] = String(Math.abs(x)).split('e');
  const shifted = Number(`${mantissa}e${Number(exponent) + decimals}`);
  const rounded = Number(`${Math.round(shifted)}e-${decimals}`);
  return Math.sign(x) * rounded;
}

/** Like `toFixed`, by the rule above: `fixed(0.15, 1)` = "0.2"; a negative zero prints as "0". */
export function fixed(x: number, decimals: number): string {
  const r = roundDecimal(x, decimals);
  return (Object.is(r, -0) ? 0 : r).toFixed(decimals);
}

/** `fixed` with trailing zeros trimmed ("0.150" → "0.15", "2.00" → "2"); "" (never "NaN") for a non-number. */
export function trimmedFixed(x: number, decimals: number): string {
  if (!Number.isFinite(x)) return '';
  const f = fixed(x, decimals);
  return f.includes('.') ? f.replace(/0+$/, '').replace(/\.$/, '') : f;
}
