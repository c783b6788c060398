import { metalPanelWall } from '@shared/calc/thermal/examples';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { formatShare, shownPercent } from '../units';
import { type CompareColumn, CompareTable, difference } from './CompareTable';
import { shareBars } from './ShareChart';

afterEach(cleanup);

function column(key: string, title: string, clipSpacing: number): CompareColumn {
  const thermal = metalPanelWall();
  const clips = thermal.bridges[0];
  if (clips?.kind === 'point' && 'spacingHorizontal' in clips) clips.spacingHorizontal = clipSpacing;
  const input: AssemblyInput = {
    name: title,
    description: '',
    wallCategory: 'steel_framed',
    attachment: { girtOrientation: 'horizontal', clipType: '', fastenerType: '' },
    thermal,
  };
  return { key, title, subtitle: 'rev. 1 (current)', input, result: calculateThermal(thermal) };
}

describe('Compare table', () => {
  it('names a difference from the baseline in words and with a glyph, and marks equal figures as same', () => {
    render(
      <UnitSystemProvider value="SI">
        <CompareTable
          columns={[column('a', 'Clips at 406 mm', 0.406), column('b', 'Clips at 203 mm', 0.203)]}
        />
      </UnitSystemProvider>,
    );
    const reffRow = screen.getByRole('rowheader', { name: /Effective R_eff/ }).closest('tr') as HTMLElement;
    const cells = within(reffRow).getAllByRole('cell');
    // Column B: more clips, lower effective R — said in words, with ▼, and marked as worse.
    expect(cells[1]?.textContent).toMatch(/▼.*lower than A — worse/);
    expect(cells[1]?.className).toContain('border-l-4');

    const r0Row = screen.getByRole('rowheader', { name: /Clear-field R₀/ }).closest('tr') as HTMLElement;
    const r0Cells = within(r0Row).getAllByRole('cell');
    expect(r0Cells[1]?.textContent).toMatch(/=.*same as A/);
    expect(r0Cells[1]?.className).not.toContain('border-l-4');

    const ueffRow = screen.getByRole('rowheader', { name: /Effective U_eff/ }).closest('tr') as HTMLElement;
    expect(within(ueffRow).getAllByRole('cell')[1]?.textContent).toMatch(/▲.*higher than A — worse/);
  });

  it('takes a difference between the figures as shown: 3.3 % and 5.0 % are 1.7 points apart', () => {
    // Unrounded 3.34 % and 4.99 % differ by 1.65 points; the reader sees 3.3 and 5.0.
    const row = { show: formatShare, shown: shownPercent, better: null, points: true };
    expect(formatShare(0.0334)).toBe('3.3\u202f%');
    expect(formatShare(0.0499)).toBe('5.0\u202f%');
    expect(difference(0.0334, 0.0499, row, 'SI')?.text).toBe('1.7 points higher than A');
    // Two shares that print alike are "the same", whatever lies below the rounding.
    expect(difference(0.03341, 0.03349, row, 'SI')?.text).toBe('same as A');
  });

  it('labels each bar of the share chart with the table’s own text', () => {
    const rows = [
      { name: 'Clear field', share: 0.93349999 },
      { name: 'Clips', share: 0.03350001 },
      { name: 'Girts', share: 0.0329999 },
    ];
    for (const [i, bar] of shareBars(rows).entries()) expect(bar.label).toBe(formatShare(rows[i]!.share));
    expect(shareBars(rows)[1]!.label).toBe('3.4\u202f%');
  });
});
