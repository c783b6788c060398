import type { WindSite } from '@shared/calc/wind/schema';
import fc from 'fast-check';

/** Wind sites across both editions, every exposure and enclosure, low- and high-rise (property tests only). */
export const windSite: fc.Arbitrary<WindSite> = fc
  .record({
    edition: fc.constantFrom('ASCE 7-16' as const, 'ASCE 7-22' as const),
    basicWindSpeed: fc.double({ min: 20, max: 80, noNaN: true }),
    riskCategory: fc.constantFrom('I' as const, 'II' as const, 'III' as const, 'IV' as const),
    exposure: fc.constantFrom('B' as const, 'C' as const, 'D' as const),
    Kzt: fc.double({ min: 1, max: 1.6, noNaN: true }),
    groundElevation: fc.double({ min: 0, max: 2000, noNaN: true }),
    keEqualsOne: fc.boolean(),
    enclosure: fc.constantFrom('enclosed' as const, 'partially_enclosed' as const),
    meanRoofHeight: fc.double({ min: 3, max: 150, noNaN: true }),
    planLength: fc.double({ min: 5, max: 300, noNaN: true }),
    planWidth: fc.double({ min: 5, max: 300, noNaN: true }),
    roofSlopeDeg: fc.double({ min: 0, max: 45, noNaN: true }),
    zShare: fc.double({ min: 0.05, max: 1, noNaN: true }),
  })
  .map(({ zShare, ...s }) => ({ ...s, heightOfComponent: zShare * s.meanRoofHeight }));
