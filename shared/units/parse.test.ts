import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseTypedQuantity, type TypedQuantity } from './parse';

const readValue = (r: TypedQuantity) => {
  if (r.kind !== 'ok') throw new Error(`expected a number, got ${JSON.stringify(r)}`);
  return r.value;
};
const reasonOf = (r: TypedQuantity) =>
  r.kind === 'invalid' ? r.reason : `not refused: ${JSON.stringify(r)}`;
const mm = (text: string) => readValue(parseTypedQuantity(text, 'mm'));

describe('lengths as the trade types them (NIST SP 811 (2008) B.8: 1 in = 2.54 E−02 m, 1 ft = 3.048 E−01 m, both exact)', () => {
  it.each([
    ['3.5 in', 88.9],
    ['3.5in', 88.9],
    ['3.5"', 88.9],
    ['3.5 ″', 88.9],
    ['3.5 inches', 88.9],
    ['1 5/8 in', 41.275],
    ['1-5/8"', 41.275],
    ['1⅝ in', 41.275],
    ['5/8"', 15.875],
    ['2\' 6"', 762],
    ['2\'-6 1/2"', 774.7],
    ['2 ft 6 in', 762],
    ['0.5 ft', 152.4],
    ["1'", 304.8],
    ['8.9 cm', 89],
    ['0.089 m', 89],
    ['40 mil', 1.016],
    ['−2 in', -50.8],
  ])('%s in a mm box is %f mm (derived)', (text, expected) => {
    expect(mm(text)).toBeCloseTo(expected, 9);
    expect(parseTypedQuantity(text, 'mm')).toMatchObject({ kind: 'ok', converted: true });
  });

  it('89 mm in an inch box is 3.503 937 in (89 / 25.4, derived)', () => {
    expect(readValue(parseTypedQuantity('89 mm', 'in'))).toBeCloseTo(89 / 25.4, 10);
  });

  it('a plain number, or the box’s own unit, is in the box’s unit and is not a conversion', () => {
    expect(parseTypedQuantity('89', 'mm')).toEqual({ kind: 'ok', value: 89, converted: false });
    expect(parseTypedQuantity('89 mm', 'mm')).toEqual({ kind: 'ok', value: 89, converted: false });
    expect(parseTypedQuantity('1 5/8', 'in')).toEqual({ kind: 'ok', value: 1.625, converted: false });
    expect(parseTypedQuantity('35 %', '%')).toEqual({ kind: 'ok', value: 35, converted: false });
    expect(parseTypedQuantity('  ', 'mm')).toEqual({ kind: 'empty' });
  });
});

describe('thermal and other quantities (factors: NIST SP 811 (2008) Appendix B.8/B.9, Btu_IT)', () => {
  it('R-13 in an SI resistance box: 13 × 0.176 110 2 = 2.289 43 m²·K/W (B.9: 1 h·ft²·°F/Btu = 1.761 102 E−01 m²·K/W)', () => {
    expect(readValue(parseTypedQuantity('R-13', 'm²·K/W'))).toBeCloseTo(13 * 0.1761102, 6);
    expect(readValue(parseTypedQuantity('13 h·ft²·°F/Btu', 'm²·K/W'))).toBeCloseTo(13 * 0.1761102, 6);
  });

  it('2.3 m²K/W in an IP box: 2.3 / 0.176 110 2 = 13.06 h·ft²·°F/Btu', () => {
    expect(readValue(parseTypedQuantity('2.3 m²K/W', 'h·ft²·°F/Btu'))).toBeCloseTo(2.3 / 0.1761102, 4);
  });

  it('λ as Europe writes it, 0.035 W/mK, in Btu·in/(h·ft²·°F): 0.035 / 0.144 227 9 (B.9)', () => {
    expect(readValue(parseTypedQuantity('0.035 W/mK', 'Btu·in/(h·ft²·°F)'))).toBeCloseTo(
      0.035 / 0.1442279,
      6,
    );
    expect(readValue(parseTypedQuantity('0.24 Btu·in/(h·ft²·°F)', 'W/(m·K)'))).toBeCloseTo(
      0.24 * 0.1442279,
      7,
    );
  });

  it('U: 0.5 W/m²K is 0.5 / 5.678 263 Btu/(h·ft²·°F) (B.9)', () => {
    expect(readValue(parseTypedQuantity('0.5 W/m2K', 'Btu/(h·ft²·°F)'))).toBeCloseTo(0.5 / 5.678263, 7);
  });

  it('pressure: 20 psf is 0.957 6 kPa (B.9: 1 lbf/ft² = 4.788 026 E+01 Pa); 1.5 kPa in psf', () => {
    expect(readValue(parseTypedQuantity('20 psf', 'kPa'))).toBeCloseTo(0.02 * 47.88026, 6);
    expect(readValue(parseTypedQuantity('1.5 kPa', 'psf'))).toBeCloseTo(1500 / 47.88026, 4);
    expect(readValue(parseTypedQuantity('1 psi', 'kPa'))).toBeCloseTo(6.894757, 6);
  });

  it('temperature: 50 °F is 10 °C, −40 F is −40 °C, 283.15 K is 10 °C (B.9: t/°C = (t/°F − 32)/1.8)', () => {
    expect(readValue(parseTypedQuantity('50 °F', '°C'))).toBeCloseTo(10, 10);
    expect(readValue(parseTypedQuantity('-40 F', '°C'))).toBeCloseTo(-40, 10);
    expect(readValue(parseTypedQuantity('283.15 K', '°C'))).toBeCloseTo(10, 10);
    expect(readValue(parseTypedQuantity('20 C', '°F'))).toBeCloseTo(68, 10);
  });

  it('speed, force, volume, permeance: 1 mph = 0.447 04 m/s exactly; 1 lbf = 4.448 222 N; 1 gal = 3.785 412 L; 1 perm (23 °C) = 57.452 5 ng/(Pa·s·m²) (B.8/B.9)', () => {
    expect(readValue(parseTypedQuantity('100 mph', 'm/s'))).toBeCloseTo(44.704, 10);
    expect(readValue(parseTypedQuantity('100 lbf', 'N'))).toBeCloseTo(444.8222, 3);
    expect(readValue(parseTypedQuantity('1 US gal', 'L'))).toBeCloseTo(3.785412, 6);
    expect(readValue(parseTypedQuantity('1 perm', 'ng/(Pa·s·m²)'))).toBeCloseTo(57.4525, 4);
  });
});

describe('refusals name the reason', () => {
  it('a quantity of another kind', () => {
    expect(reasonOf(parseTypedQuantity('3.5 kg', 'mm'))).toBe(
      '“3.5 kg” is a mass; this box takes a length (mm)',
    );
    expect(reasonOf(parseTypedQuantity('20 psf', 'mm'))).toMatch(
      /is a pressure; this box takes a length \(mm\)/,
    );
    expect(reasonOf(parseTypedQuantity('3 in', 'h·ft²·°F/Btu'))).toMatch(
      /length; this box takes a thermal resistance/,
    );
  });

  it('a decimal comma (refused, not guessed: "1,250" reads 1250 or 1.25)', () => {
    expect(reasonOf(parseTypedQuantity('3,5 mm', 'mm'))).toMatch(/write decimals with a point/);
    expect(reasonOf(parseTypedQuantity('1,250', 'mm'))).toMatch(/no thousands separators/);
  });

  it('an unknown unit, text, a zero denominator, an overflow', () => {
    expect(reasonOf(parseTypedQuantity('3 inchs', 'mm'))).toMatch(
      '“3 inchs”: “inchs” is not a unit this box reads; type a length such as 12.5 mm',
    );
    expect(reasonOf(parseTypedQuantity('abc', 'mm'))).toMatch(/is not a number/);
    expect(reasonOf(parseTypedQuantity('5/0 in', 'mm'))).toMatch(/divides by zero/);
    expect(reasonOf(parseTypedQuantity('1e400 mm', 'in'))).toMatch(/too large/);
  });

  it('a unit in a box without a unit mathjs reads takes the number alone', () => {
    expect(reasonOf(parseTypedQuantity('3 in', ''))).toMatch(
      /takes a plain number; type the number without a unit/,
    );
    expect(reasonOf(parseTypedQuantity('3 in', '10⁻⁶/K'))).toMatch(/takes a number in 10⁻⁶\/K/);
  });
});

describe('properties', () => {
  const decimal = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });
  const close = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));

  it('x in a mm box is 25.4·x mm, and back again', () => {
    fc.assert(
      fc.property(decimal, (x) => {
        const inMm = mm(`${x} in`);
        return close(inMm, x * 25.4) && close(readValue(parseTypedQuantity(`${inMm} mm`, 'in')), x);
      }),
    );
  });

  it('a mixed fraction reads the same with a space, a hyphen or as a decimal', () => {
    fc.assert(
      fc.property(
        fc.nat(1000),
        fc.integer({ min: 1, max: 64 }),
        fc.integer({ min: 1, max: 64 }),
        (w, n, d) => {
          const spaced = mm(`${w} ${n}/${d} in`);
          return close(spaced, mm(`${w}-${n}/${d}"`)) && close(spaced, (w + n / d) * 25.4);
        },
      ),
    );
  });

  it('feet and inches add up: f\' i" = 12 f + i inches', () => {
    fc.assert(
      fc.property(fc.nat(500), fc.nat(11), (f, i) =>
        close(readValue(parseTypedQuantity(`${f}' ${i}"`, 'in')), 12 * f + i),
      ),
    );
  });

  it('a sign turns a length round', () => {
    fc.assert(fc.property(decimal, (x) => close(mm(`-${Math.abs(x)} ft`), -mm(`${Math.abs(x)} ft`))));
  });

  it('anything typed is a finite number, nothing or a reason — never NaN, never a throw', () => {
    const symbols = fc.constantFrom(
      'mm',
      'in',
      '°C',
      '°F',
      'kPa',
      'psf',
      'h·ft²·°F/Btu',
      'W/(m·K)',
      '',
      '%',
      '10⁻⁶/K',
    );
    const typed = fc.oneof(
      fc.string(),
      fc
        .tuple(
          decimal,
          fc.constantFrom('in', '"', "'", 'ft', 'mm', 'kg', 'W/mK', '°F', 'psf', 'R', '1/0', 'm^2'),
        )
        .map(([x, u]) => `${x} ${u}`),
    );
    fc.assert(
      fc.property(typed, symbols, (text, symbol) => {
        const r = parseTypedQuantity(text, symbol);
        if (r.kind === 'ok') return Number.isFinite(r.value);
        if (r.kind === 'invalid') return r.reason.length > 0 && !r.reason.includes('NaN');
        return text.trim() === '';
      }),
    );
  });
});
