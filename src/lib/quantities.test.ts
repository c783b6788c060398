import { describe, expect, it } from 'vitest';
import { formatNumber, formatQuantity, parseInput, toInputText } from './quantities';
import { safeNext } from './safe-next';

describe('quantities', () => {
  it('round-trips lengths and temperatures through IP', () => {
    const ft = parseInput('100', 'length', 'IP');
    expect(ft).toEqual({ kind: 'ok', si: 30.48 });
    expect(toInputText(30.48, 'length', 'IP')).toBe('100');
    const f = parseInput('-40', 'temperature', 'IP');
    expect(f.kind === 'ok' && f.si).toBeCloseTo(-40, 12);
  });

  it('refuses what it cannot read instead of guessing', () => {
    for (const t of ['abc', '1,5', '1.2.3', '5 ft', '--1', 'NaN', 'Infinity']) {
      expect(parseInput(t, 'length', 'SI').kind).toBe('invalid');
    }
    expect(parseInput('  ', 'length', 'SI').kind).toBe('empty');
  });

  it('never formats NaN', () => {
    expect(formatNumber(Number.NaN, 2)).toBe('');
    expect(toInputText(undefined, 'length', 'SI')).toBe('');
    expect(formatQuantity(Number.NaN, 'temperature', 'IP')).toBe('—');
    expect(formatQuantity(-5, 'temperature', 'SI')).toBe('\u22125\u202f°C');
  });
});

describe('safeNext', () => {
  it('keeps same-site paths and drops everything else', () => {
    expect(safeNext('/projects/abc?x=1')).toBe('/projects/abc?x=1');
    expect(safeNext('//evil.example')).toBe('/projects');
    expect(safeNext('https://evil.example')).toBe('/projects');
    expect(safeNext(null)).toBe('/projects');
  });
});
