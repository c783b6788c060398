import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * One units registry (DEVELOPERS.md D-014): every SI ⇄ IP conversion factor is derived once in `shared/units`
 * from mathjs's unit system. A factor typed as a decimal anywhere else in the product — a second table that can
 * drift from the first — fails here. Comments may quote a factor (formula + source); code and text may not.
 * Test files are exempt: they check the factors against the published tables.
 */

/** The factors (and their leading digits) of the units the product converts, and the °F rules. */
const FACTORS: [string, RegExp][] = [
  ['foot 0.3048', /(?<![\d.])0?\.3048/],
  ['inch 0.0254', /(?<![\d.])0?\.0254(?!\d)/],
  ['25.4 mm per inch', /(?<![\d.])25\.4(?![\d])/],
  ['square foot 0.092 903', /(?<![\d.])0?\.0929/],
  ['ft² per m² 10.764', /(?<![\d.])10\.76/],
  ['ft per m 3.2808', /(?<![\d.])3\.2808/],
  ['in per m 39.37', /(?<![\d.])39\.37/],
  ['R 0.176 11', /(?<![\d.])0?\.17611/],
  ['R 5.678 26 (or U)', /(?<![\d.])5\.678/],
  ['λ 0.144 228', /(?<![\d.])0?\.14422/],
  ['λ 6.9335 (inverse)', /(?<![\d.])6\.933/],
  ['ψ 1.730 73', /(?<![\d.])1\.7307/],
  ['χ 0.527 53', /(?<![\d.])0?\.5275/],
  ['χ 1.8956 (inverse)', /(?<![\d.])1\.8956/],
  ['Btu 1055.06', /(?<![\d.])1055\.0/],
  ['lbf 4.448 22', /(?<![\d.])4\.4482/],
  ['lbf 0.224 81 (inverse)', /(?<![\d.])0?\.2248/],
  ['psf 47.880', /(?<![\d.])47\.88/],
  ['psf 0.020 885 (inverse)', /(?<![\d.])0?\.02088/],
  ['psi 6894.76', /(?<![\d.])6894\.7/],
  ['kPa per psi 0.145 04', /(?<![\d.])0?\.14503/],
  ['lbf/ft 14.5939', /(?<![\d.])14\.59[34]/],
  ['lb/ft² 4.882 43', /(?<![\d.])4\.882/],
  ['lb/ft³ 16.0185', /(?<![\d.])16\.018/],
  ['lb 0.453 592', /(?<![\d.])0?\.45359/],
  ['lb 2.204 62 (inverse)', /(?<![\d.])2\.2046/],
  ['oz/ft² 0.305 15', /(?<![\d.])0?\.30515/],
  ['US gallon 3.785 41', /(?<![\d.])3\.7854/],
  ['mph 0.447 04', /(?<![\d.])0?\.44704/],
  ['mph 2.236 94 (inverse)', /(?<![\d.])2\.2369/],
  ['perm (0 °C) 57.2135', /(?<![\d.])57\.21/],
  ['perm (23 °C) 57.4525', /(?<![\d.])57\.45/],
  ['inHg 3386.39', /(?<![\d.])3386\.3/],
  ['°F: 9/5', /(?<![\d.])9\s*\)?\s*\/\s*5(?![\d.])/],
  ['°F: 5/9', /(?<![\d.])5\s*\)?\s*\/\s*9(?![\d.])/],
  ['°F: × 1.8 or ÷ 1.8', /[*/]\s*1\.8(?![\d])|(?<![\d.])1\.8\s*\*|(?<![\d.])1\.8e[-+]?\d/],
  ['°F: 0.5556', /(?<![\d.])0?\.5555/],
  ['kelvin at 0 °C 273.15', /(?<![\d.])273\.15/],
];

const ROOTS = ['src', 'server', 'shared'];
const REGISTRY = path.join('shared', 'units') + path.sep;
const isTest = (f: string) => /\.(test|spec)\.(ts|tsx)$/.test(f) || f.split(path.sep).includes('tests');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
}

/** The code without its comments (block comments, and line comments not inside a URL or a string's quote). */
const withoutComments = (source: string) =>
  source.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:'"`\\])\/\/.*$/gm, '$1');

describe('conversion factors live only in shared/units', () => {
  const product = ROOTS.flatMap(files).filter((f) => !isTest(f) && !f.startsWith(REGISTRY));
  const code = new Map(product.map((f) => [f, withoutComments(readFileSync(f, 'utf8'))]));

  it('scans the product files', () => {
    expect(product.length).toBeGreaterThan(100);
  });

  it('strips comments but keeps code and URLs', () => {
    expect(withoutComments('const a = 1; // 0.3048 ft\n/* 5/9 */ const u = "http://x";')).toBe(
      'const a = 1; \n const u = "http://x";',
    );
  });

  it.each(FACTORS)('no %s outside shared/units', (_name, pattern) => {
    const hits = [...code].filter(([, text]) => pattern.test(text)).map(([f]) => f);
    expect(hits).toEqual([]);
  });

  it('catches a typed factor (the patterns are live)', () => {
    const sample = 'const m = ft * 0.3048; const c = ((f - 32) * 5) / 9; const k = w / 5.678263; x * 1.8';
    const caught = FACTORS.filter(([, p]) => p.test(sample)).map(([n]) => n);
    expect(caught).toEqual(['foot 0.3048', 'R 5.678 26 (or U)', '°F: 5/9', '°F: × 1.8 or ÷ 1.8']);
  });
});
