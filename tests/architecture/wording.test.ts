import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * Product wording (DEVELOPERS.md "Sources worded as a practitioner expects"): nothing the product shows or
 * serves — screens, the sheet, the reference data, the OpenAPI document — names a maker or a brand, or
 * carries an internal verification tag. Those tags and the public sources they point to live in the tests and
 * the docs (`*.md`, including each reference table's `.source.md`). Makers' tested values come only from the
 * library entries a firm adds.
 */

/** Verification tags and their wording: for tests and docs only. */
const TAGS = ['[memory]', '[third-party]', 'as recalled', 'recalled', 'verify against', 'not re-read'];
/**
 * Makers and brands that appeared in the sources, and the web sites of public reproductions (sources are cited
 * by standard, handbook or book, never by the site that reproduced them).
 */
const NAMES = [
  'pecora',
  'nedzink',
  'ancon',
  'kingspan',
  'rockwool',
  'owens corning',
  'certainteed',
  'tremco',
  'tyvek',
  'dupont',
  'struware',
  'ekobord',
  'issuhub',
  'pdfslide',
  'tubingchina',
  'makeitfrom',
  'azom',
  'ratnamsteels',
  'pdfcoffee',
  'nempal',
  'northernarchitecture',
  'fliphtml5',
  'wikipedia',
  'up.codes',
  'unmet hours',
  'scribd',
  'studylib',
];

const ROOTS = ['src', 'server', 'shared', 'data'];
const isTest = (f: string) =>
  /\.(test|spec)\.(ts|tsx)$/.test(f) || /test-fixtures\.ts$/.test(f) || f.split(path.sep).includes('tests');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|tsx|json|css|html)$/.test(name) ? [p] : [];
  });
}

/** Whole words (so "spanCondition" is not "ancon"), case-insensitive. */
const wordPattern = (w: string) =>
  new RegExp(`(^|[^a-z0-9])${w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}($|[^a-z0-9])`, 'i');

describe('product wording', () => {
  const product = ROOTS.flatMap(files).filter((f) => !isTest(f));

  it('scans the product files', () => {
    expect(product.length).toBeGreaterThan(100);
  });

  it.each([...TAGS, ...NAMES])('no “%s” outside tests and docs', (word) => {
    const pattern = wordPattern(word);
    const hits = product.filter((f) => pattern.test(readFileSync(f, 'utf8')));
    expect(hits).toEqual([]);
  });

  it('every generic reference row keeps its provenance in its .source.md', () => {
    for (const table of ['materials', 'thermal-expansion']) {
      const json = JSON.parse(readFileSync(`data/reference/${table}.json`, 'utf8')) as {
        materials: { id: string }[];
      };
      const doc = readFileSync(`data/reference/${table}.source.md`, 'utf8');
      for (const { id } of json.materials)
        expect(doc, `${table}: ${id}`).toMatch(new RegExp(`\\| \`${id}\` \\| (seen|third-party|memory)\\b`));
    }
  });
});
