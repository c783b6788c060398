import { U_IP_TO_SI } from '@shared/units';
import { describe, expect, it } from 'vitest';
import { blankDraft, fromDrafts, toDrafts } from './draft';

const rows = [
  {
    id: 'a',
    climateZone: '5A' as const,
    wallCategory: 'steel_framed' as const,
    criterion: 'max_u_factor' as const,
    value: 0.35,
    note: '',
  },
  {
    id: 'b',
    climateZone: '*' as const,
    wallCategory: 'steel_framed' as const,
    criterion: 'must_dry_within_year' as const,
    value: true,
    note: 'n',
  },
];

describe('grid drafts', () => {
  it('shows values in the person’s units and saves an untouched value as the exact stored SI number', () => {
    const drafts = toDrafts(rows, 'IP');
    expect(drafts[0]!.valueText).toBe('0.06164');
    expect(drafts[1]!.valueText).toBe('yes');
    expect(fromDrafts(drafts, 'IP')).toEqual({ ok: true, rows: rows.map(({ id: _id, ...r }) => r) });
  });

  it('converts what is typed from the grid’s units to SI', () => {
    const drafts = toDrafts(rows, 'IP');
    drafts[0] = { ...drafts[0]!, valueText: '0.064' };
    const saved = fromDrafts(drafts, 'IP');
    expect(saved.ok && saved.rows[0]!.value).toBeCloseTo(0.064 * U_IP_TO_SI, 12);
  });

  it('names every problem by row and field, and saves nothing', () => {
    const drafts = [
      ...toDrafts(rows, 'SI'),
      { ...blankDraft(), valueText: 'abc' },
      { ...blankDraft(), valueText: '0.3' },
    ];
    const r = fromDrafts(drafts, 'SI');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[drafts[2]!.key]).toEqual({ value: '“abc” is not a number' });
    expect(r.errors[drafts[3]!.key]!.row).toMatch(/repeats row 1/);
  });
});
