import { findMaterial } from '@shared/calc/thermal/materials';
import { describe, expect, it } from 'vitest';
import { vapourFromFirm, vapourFromGeneric } from './form';

describe('vapour data of a new layer', () => {
  it('takes the generic library μ (dry cup), and none for a vapour-tight row', () => {
    const wool = findMaterial('mineral-wool-board')!;
    expect(vapourFromGeneric(wool)).toEqual({ kind: 'mu', mu: wool.mu.dry ?? wool.mu.wet });
    expect(vapourFromGeneric(findMaterial('steel')!)).toBeNull();
  });

  it('takes a firm material’s μ when the firm entered one', () => {
    const base = { id: 'x', name: 'Board', conductivity: 0.03, source: 'EPD 12' } as Parameters<
      typeof vapourFromFirm
    >[0];
    expect(vapourFromFirm({ ...base, vapourResistanceFactor: 60 })).toEqual({ kind: 'mu', mu: 60 });
    expect(vapourFromFirm(base)).toBeNull();
  });
});
