import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalJson } from './canonical';

describe('canonical JSON', () => {
  it('sorts keys at every depth and drops undefined members', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { z: true, y: null }], c: 'x' }, u: undefined })).toBe(
      '{"a":{"c":"x","d":[1,{"y":null,"z":true}]},"b":1}',
    );
  });

  it('gives the same text for the same JSON whatever the key order, and parses back to it', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const text = canonicalJson(v);
        const reordered = JSON.parse(JSON.stringify(v), (_k, x) =>
          x && typeof x === 'object' && !Array.isArray(x)
            ? Object.fromEntries(Object.entries(x).reverse())
            : x,
        );
        expect(canonicalJson(reordered)).toBe(text);
        expect(canonicalJson(JSON.parse(text))).toBe(text);
      }),
    );
  });

  it('refuses numbers JSON cannot hold', () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow();
    expect(() => canonicalJson([Number.POSITIVE_INFINITY])).toThrow();
  });
});
