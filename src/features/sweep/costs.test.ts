import type { SweepCost } from '@shared/schemas/sweeps';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  type CostMeasure,
  convertCosts,
  costBoxText,
  costsOf,
  costToShown,
  costToSI,
  costUnit,
  draftOfCosts,
  emptyCosts,
  measureText,
  prefillCosts,
} from './costs';

/*
 * Cost units on the sweep page. Factors: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly (NIST SP 811 (2008),
 * Appendix B.9); the IP figures below are derived from them by hand.
 */

describe('sweep cost units (SI stored, IP shown)', () => {
  it('insulation per m² per 25 mm → per ft² per inch: × 0.3048² × 0.0254 / 0.025 = × 0.094 389 489 (derived)', () => {
    expect(costToShown(4.5, 'insulation', 'IP')).toBeCloseTo(4.5 * 0.0943894886, 6);
    expect(costUnit('insulation', 'IP')).toBe('per ft² of wall per inch');
    expect(costUnit('insulation', 'SI')).toBe('per m² of wall per 25 mm');
  });

  it('girt and sealant per m → per ft: 10 per m is 3.048 per ft (derived); a clip is a clip', () => {
    expect(costToShown(10, 'girt', 'IP')).toBeCloseTo(3.048, 9);
    expect(costToShown(10, 'sealant', 'IP')).toBeCloseTo(3.048, 9);
    expect(costToShown(6, 'clip', 'IP')).toBe(6);
    expect(costUnit('girt', 'IP')).toBe('per ft');
  });

  it('sealant 1 m per m² of wall is 0.3048 ft per ft² (derived); 17.67 per m² of wall is 1.6416 per ft² (derived)', () => {
    expect(costToShown(1, 'sealantMetres', 'IP')).toBeCloseTo(0.3048, 9);
    expect(costToShown(17.67, 'wall', 'IP')).toBeCloseTo(17.67 * 0.09290304, 9);
  });

  it('SI is shown as stored', () => {
    expect(costToShown(4.5, 'insulation', 'SI')).toBe(4.5);
    expect(costToSI(4.5, 'insulation', 'SI')).toBe(4.5);
  });

  it('shown → SI → shown is the identity in every measure (property)', () => {
    const measures: CostMeasure[] = ['insulation', 'clip', 'girt', 'sealant', 'sealantMetres', 'wall'];
    fc.assert(
      fc.property(fc.constantFrom(...measures), fc.double({ min: 0, max: 1e6, noNaN: true }), (m, v) => {
        expect(costToShown(costToSI(v, m, 'IP'), m, 'IP')).toBeCloseTo(v, 6);
      }),
    );
  });

  it('the form reads IP boxes into SI costs: 0.42 per ft² per in is 0.42 / 0.094 389 489 = 4.4496 per m² per 25 mm (derived)', () => {
    const c = costsOf(
      {
        ...emptyCosts,
        insulation: '0.42',
        girt: '3.048',
        sealantMetres: '0.3048',
        sealantPerMetre: { '25': '3.048' },
      },
      'IP',
    );
    expect(c.insulation).toBeCloseTo(0.42 / 0.0943894886, 6);
    expect(c.girt).toBeCloseTo(10, 9);
    expect(c.sealant?.metresPerSquareMetre).toBeCloseTo(1, 9);
    expect(c.sealant?.perMetre['25']).toBeCloseTo(10, 9);
    expect(c.clip).toBeUndefined();
  });

  it('an unreadable or negative box is left out (the ranking names it), never NaN', () => {
    const c = costsOf({ ...emptyCosts, insulation: '4,5', clip: '-2', girt: 'abc' }, 'SI');
    expect(c).toEqual({ insulation: undefined, clip: undefined, girt: undefined, sealant: undefined });
  });

  it('a saved sweep’s costs come back in the person’s units and read back to the same SI', () => {
    const saved = {
      insulation: 4.5,
      clip: 6,
      sealant: { perMetre: { '35': 10 }, metresPerSquareMetre: 0.5 },
    };
    const d = draftOfCosts(saved, 'IP');
    expect(d.clip).toBe('6');
    const back = costsOf(d, 'IP');
    expect(back.insulation).toBeCloseTo(4.5, 4);
    expect(back.sealant?.perMetre['35']).toBeCloseTo(10, 4);
    expect(back.sealant?.metresPerSquareMetre).toBeCloseTo(0.5, 4);
    expect(costBoxText(4.5, 'insulation', 'SI')).toBe('4.5');
  });
});

describe('a change of unit system keeps the costs', () => {
  it('the boxes are converted, not reread: 4.5 per m² per 25 mm → 0.424753 per ft² per in and back (derived)', () => {
    const si = { ...emptyCosts, insulation: '4.5', clip: '6', girt: '10', sealantMetres: 'x' };
    const ip = convertCosts(si, 'SI', 'IP');
    expect(ip).toMatchObject({ insulation: '0.424753', clip: '6', girt: '3.048', sealantMetres: 'x' });
    expect(costsOf(ip, 'IP').insulation).toBeCloseTo(4.5, 5);
    expect(convertCosts(ip, 'IP', 'SI').girt).toBe('10');
    expect(convertCosts(si, 'SI', 'SI')).toBe(si);
  });
});

/** A firm library cost entry (invented demo values), with what a test changes. */
const entry = (over: Partial<SweepCost>): SweepCost => ({
  id: crypto.randomUUID(),
  kind: 'insulation',
  name: 'Board (example)',
  cost: 4.5,
  currency: 'EUR',
  source: '',
  notes: '',
  version: 1,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  ...over,
});

describe('costs prefilled from the firm library', () => {
  it('fills empty boxes with the first entry of each kind (a sealant price by its class), in the person’s units', () => {
    const ins = entry({});
    const girt = entry({ kind: 'girt', cost: 10 });
    const seal = entry({ kind: 'sealant', movementClass: '50', cost: 10 });
    const d = prefillCosts(emptyCosts, [ins, entry({ cost: 9 }), girt, seal], 'IP');
    expect(Number(d.insulation)).toBeCloseTo(4.5 * 0.0943894886, 5);
    expect(d.girt).toBe('3.048');
    expect(d.sealantPerMetre['50']).toBe('3.048');
    expect(d.from).toEqual({ insulation: ins.id, girt: girt.id, 'sealant 50': seal.id });
  });

  it('never overwrites a typed box, nor refills one emptied after filling; nothing to fill is the same draft', () => {
    const ins = entry({});
    const typed = { ...emptyCosts, insulation: '7' };
    expect(prefillCosts(typed, [ins], 'SI').insulation).toBe('7');
    const emptied = { ...emptyCosts, from: { insulation: ins.id } };
    expect(prefillCosts(emptied, [ins], 'SI')).toBe(emptied);
  });
});

describe('each insulation product’s price', () => {
  const lib = (name: string, cost: number) => entry({ name, cost });

  it('reads each product’s box into SI by name, and a saved sweep’s prices back into the boxes', () => {
    // 0.42 per ft² per in is 0.42 / 0.094 389 489 = 4.4496 per m² per 25 mm (derived, as above).
    const d = { ...emptyCosts, products: { 'Demo PIR board': '0.42', 'Demo slab': '', 'Demo felt': 'x' } };
    const c = costsOf(d, 'IP');
    expect(Object.keys(c.insulationProducts!)).toEqual(['Demo PIR board']);
    expect(c.insulationProducts!['Demo PIR board']).toBeCloseTo(0.42 / 0.0943894886, 6);
    expect(costsOf(emptyCosts, 'SI').insulationProducts).toBeUndefined();
    expect(draftOfCosts({ insulationProducts: { 'Demo PIR board': 7 } }, 'SI').products).toEqual({
      'Demo PIR board': '7',
    });
    expect(convertCosts({ ...emptyCosts, products: { a: '7' } }, 'SI', 'IP').products.a).toBe(
      costBoxText(7, 'insulation', 'IP'),
    );
  });

  it('prefills a product’s box from the library entry of the same name, once', () => {
    const pir = lib('Demo PIR board', 7);
    const d = prefillCosts(emptyCosts, [lib('Other board', 3), pir], 'SI', ['Demo PIR board', 'Demo slab']);
    expect(d.products).toEqual({ 'Demo PIR board': '7' });
    expect(d.from['product Demo PIR board']).toBe(pir.id);
    const emptied = { ...d, products: { 'Demo PIR board': '' } };
    expect(prefillCosts(emptied, [pir], 'SI', ['Demo PIR board'])).toBe(emptied);
  });

  it('shows a ranking’s thickness and weight in the person’s units (1 in = 25.4 mm, 1 lb/ft² = 4.882 428 kg/m²)', () => {
    // NIST SP 811 (2008) Appendix B.9: 0.1916 m = 191.6 mm = 7.543 in; 26.27 kg/m² = 5.38 lb/ft² (derived).
    expect(measureText(0.1916, 'thickness', 'SI')).toBe('191.6 mm');
    expect(measureText(0.1916, 'thickness', 'IP')).toBe('7.54 in');
    expect(measureText(26.27, 'weight', 'SI')).toBe('26.27 kg/m²');
    expect(measureText(26.27, 'weight', 'IP')).toBe('5.38 lb/ft²');
  });
});
