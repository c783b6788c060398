/*
 * Inches as the trade writes and types them: fractions (3/4, 1 1/4, 13/16), read and written here once for
 * every page and the sheet (the length formatter's `inchFractions` option, the joints and takeoff boxes).
 */

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** Inches as a trade fraction: 0.75 → "3/4", 1.25 → "1 1/4", 2 → "2". `denominator` sets the step. */
export function inchFraction(inches: number, denominator = 16, mode: 'nearest' | 'up' = 'nearest'): string {
  if (!Number.isFinite(inches)) return '';
  const sign = inches < 0 ? '-' : '';
  const a = Math.abs(inches);
  const n = mode === 'up' ? Math.ceil(a * denominator - 1e-9) : Math.round(a * denominator);
  const whole = Math.floor(n / denominator);
  const rest = n % denominator;
  if (rest === 0) return `${sign}${whole}`;
  const g = gcd(rest, denominator);
  const frac = `${rest / g}/${denominator / g}`;
  return `${sign}${whole > 0 ? `${whole} ` : ''}${frac}`;
}

/** The fraction when `inches` is a whole number of 64ths (to 1e-6 in), else null. */
export function exactFraction(inches: number): string | null {
  const n = inches * 64;
  return Math.abs(n - Math.round(n)) < 64e-6 ? inchFraction(inches, 64) : null;
}

const VULGAR: Record<string, string> = {
  '¼': '1/4',
  '½': '1/2',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
  '⅙': '1/6',
  '⅓': '1/3',
  '⅔': '2/3',
};

/** Read "3/4", "1 1/4", "1-1/4", "1¼", ".75", "0.75" (an optional trailing ″, " or in); null otherwise. */
export function parseInches(text: string): number | null {
  let t = text.trim().replace(/\u2212/g, '-');
  t = t.replace(/(in\.?|["″])$/i, '').trim();
  t = t.replace(/(\d)?\s*([¼½¾⅛⅜⅝⅞⅙⅓⅔])/g, (_, d: string | undefined, v: string) =>
    d ? `${d} ${VULGAR[v]}` : (VULGAR[v] ?? v),
  );
  const sign = t.startsWith('-') ? -1 : 1;
  t = t.replace(/^[-+]/, '').trim();
  if (/^(\d+\.?\d*|\.\d+)$/.test(t)) return sign * Number(t);
  const m = /^(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)$/.exec(t);
  if (!m) return null;
  const whole = m[1] ? Number(m[1]) : 0;
  const num = Number(m[2]);
  const den = Number(m[3]);
  if (den === 0) return null;
  return sign * (whole + num / den);
}
