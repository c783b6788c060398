import { describe, expect, it } from 'vitest';
import { draftOf, readDraft, switchKind } from './vapour-draft';

describe('vapour rows as typed', () => {
  it('reads a typed value into the shared vapour data, or says why not', () => {
    expect(readDraft({ kind: 'mu', text: '100000', reference: '23C' })).toEqual({
      vapour: { kind: 'mu', mu: 100000 },
    });
    expect(readDraft({ kind: 'usPerm', text: '\u22120.5', reference: '0C' }).error).toBe(
      'Must be at least 0.00004\u202fperm.',
    );
    expect(readDraft({ kind: 'sd', text: '1,5', reference: '23C' }).error).toMatch(/“1,5” is not one/);
    expect(readDraft({ kind: 'sd', text: '', reference: '23C' }).error).toBe(
      'Enter s_d, or choose “Not entered”.',
    );
    expect(readDraft({ kind: 'none', text: '', reference: '23C' })).toEqual({ vapour: null });
  });

  it('keeps the layer’s s_d when another kind of vapour data is chosen', () => {
    const film = draftOf({ kind: 'mu', mu: 100000 });
    // 0.15 mm of μ 100 000 → s_d 15 m → W = δ₀/s_d = 13.33 ng/(Pa·s·m²) → 0.2321 perm (23 °C).
    expect(switchKind(film, 'sd', 0.00015).text).toBe('15');
    expect(switchKind(film, 'permeance', 0.00015).text).toBe('13.33');
    expect(switchKind(film, 'usPerm', 0.00015).text).toBe('0.2321');
    expect(switchKind(switchKind(film, 'sd', 0.00015), 'mu', 0.00015).text).toBe('100000');
    // No thickness (a declared-R layer): μ cannot be derived, so the box is cleared.
    expect(switchKind(draftOf({ kind: 'sd', sd: 0.07 }), 'mu', undefined).text).toBe('');
    expect(switchKind(film, 'none', 0.00015)).toEqual({ kind: 'none', text: '', reference: '23C' });
  });
});
