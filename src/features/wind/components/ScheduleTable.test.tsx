import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { checkDesignSpacing } from '@shared/calc/wind/design';
import { windDesignInputFor } from '@shared/checks/inputs';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { demoAssembly, demoProject } from '../test-fixtures';
import { DesignChecksTable, ScheduleTable } from './ScheduleTable';

afterEach(cleanup);

function renderSchedule(assembly: AssemblyInput) {
  const ready = windDesignInputFor(assembly, demoProject());
  if (ready.status !== 'ready') throw new Error('demo input is incomplete');
  const result = calculateWindSchedule(ready.input);
  const { zones } = checkDesignSpacing(ready.input, result);
  render(
    <>
      <ScheduleTable result={result} zones={zones} deflectionLimit="L/180" />
      <DesignChecksTable zones={zones} deflectionLimit="L/180" deflectionFactor={0.6} />
    </>,
  );
  return result;
}

const row = (zone: 4 | 5) => screen.getByTestId(`schedule-zone-${zone}`);
const status = (zone: 4 | 5) => screen.getByTestId(`status-zone-${zone}`).textContent ?? '';

describe('the spacing schedule', () => {
  it('shows a zone 4 and a zone 5 row with the maximum girt spacing, and "meets" in words', () => {
    renderSchedule(demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 }));
    expect(within(row(4)).getByText(/Zone 4/)).toBeTruthy();
    expect(within(row(5)).getByText(/Zone 5/)).toBeTruthy();
    expect(screen.getByTestId('max-girt-4').textContent).toMatch(/^\d\.\d{3}\u202fm/);
    expect(screen.getByTestId('max-girt-5').textContent).toMatch(/^\d\.\d{3}\u202fm/);
    expect(status(4)).toMatch(/✓\s*meets/);
    expect(status(5)).toMatch(/✓\s*meets/);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('says a design girt spacing beyond the maximum exceeds it, in words, with the spacing allowed', () => {
    const result = renderSchedule(demoAssembly({ girtSpacing: 2.0, clipSpacing: 0.6 }));
    const allowed = Math.trunc(result.zones[0]!.girtSpacing! * 1000) / 1000;
    expect(allowed).toBeLessThan(2);
    expect(status(4)).toMatch(/✕\s*exceeds/);
    expect(status(4)).toContain(
      `girt spacing 2.000\u202fm is more than the ${allowed.toFixed(3)}\u202fm allowed`,
    );
    expect(status(5)).toMatch(/exceeds/);
    expect(screen.getByTestId('check-4-deflection').textContent).toMatch(/fails — over by/);
  });

  it('writes "outside the table" where no spacing exists — never a number', () => {
    const a = demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 });
    a.windPanel = {
      ...a.windPanel!,
      loadSpanTable: {
        spanCondition: 'double',
        deflectionLimit: 'L/180',
        rows: [
          { span: 0.9, allowableInward: 4690, allowableOutward: 1100 },
          { span: 1.2, allowableInward: 2640, allowableOutward: 900 },
          { span: 1.5, allowableInward: 1690, allowableOutward: 700 },
        ],
      },
    };
    const result = renderSchedule(a);
    expect(result.zones.find((z) => z.zone === 5)!.status).toBe('outside-table');
    const maxGirt5 = screen.getByTestId('max-girt-5').textContent ?? '';
    expect(maxGirt5).toBe('outside the table');
    expect(maxGirt5).not.toMatch(/\d/);
    expect(status(5)).toMatch(/✕\s*outside the table/);
    expect(status(5)).toMatch(/outward .*pressure/i);
    expect(status(4)).not.toMatch(/outside the table/);
  });

  it('asks for a design spacing when none is entered and still gives the maximums', () => {
    renderSchedule(demoAssembly());
    expect(status(4)).toMatch(/\?\s*no design spacing/);
    expect(screen.getByTestId('max-girt-4').textContent).toMatch(/\d\.\d{3}\u202fm/);
    expect(screen.getByTestId('check-4-clip').textContent).toMatch(/not checked/);
  });
});
