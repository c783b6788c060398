import { demoJointSchedule } from '@shared/calc/joints/examples';
import { calculateJoint, marginText } from '@shared/calc/joints/joints';
import type { JointInput } from '@shared/calc/joints/schema';
import { INCH } from '@shared/units';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { useMemo, useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { fieldDomId } from '../../lib/field-problems';
import { UnitSystemProvider } from '../../lib/unit-system';
import { JointScheduleEditor } from './components/JointScheduleEditor';
import { ScheduleTable } from './components/ScheduleTable';
import { evaluateJoints } from './evaluate';
import { jointVerdict } from './verdict';

afterEach(cleanup);

// VJ-1 of the demo schedule: two 1.5 m aluminium 5005 sides, −25…80 °C surface, installed 5–25 °C, class 50,
// 3 mm tolerance → closing governs: W = 2 × 2 × 23.76e-6 × 1.5 × 75 + 3 mm = 13.692 mm (derived).
const vj1 = () => demoJointSchedule()[0]!;

describe('verdict words', () => {
  it('a joint that meets: "meets — margin N %", the engine\'s own words', () => {
    const r = calculateJoint(vj1());
    expect(r.requiredWidth).toBeCloseTo(0.013692, 6);
    const v = jointVerdict(r, 'SI');
    expect(v.verdict).toBe('pass');
    expect(v.glyph).toBe('✓');
    expect(v.text).toBe('meets — margin 46 %');
    expect(v.text).toBe(marginText(r.designWidth, r.requiredWidth));
  });

  it('a joint that is short: "short by …" in mm, or in inches for IP', () => {
    const r = calculateJoint({ ...vj1(), designWidth: 0.01 });
    const si = jointVerdict(r, 'SI');
    expect(si.verdict).toBe('fail');
    expect(si.glyph).toBe('✕');
    expect(si.text).toBe('short by 3.7 mm');
    expect(si.text).toBe(marginText(r.designWidth, r.requiredWidth));
    // One rule with the sheet: inches to 0.01 (shared/format's length), trailing zeros trimmed.
    expect(jointVerdict(r, 'IP').text).toBe(
      `short by ${Number(((r.requiredWidth - 0.01) / INCH).toFixed(2))} in`,
    );
  });

  it('exactly the required width meets with no margin', () => {
    expect(jointVerdict({ designWidth: 0.012, requiredWidth: 0.012 }, 'SI').text).toBe('meets — margin 0 %');
  });
});

function renderTable(joints: JointInput[], system: 'SI' | 'IP' = 'SI') {
  return render(
    <UnitSystemProvider value={system}>
      <ScheduleTable joints={joints} evaluation={evaluateJoints(joints)} />
    </UnitSystemProvider>,
  );
}

describe('schedule table', () => {
  it('shows every joint with glyph and words, never NaN', () => {
    const joints = demoJointSchedule();
    renderTable(joints);
    const rows = document.querySelectorAll('tr[data-joint]');
    expect(rows).toHaveLength(3);
    const first = within(rows[0] as HTMLElement);
    expect(first.getByText('meets — margin 46 %')).toBeTruthy();
    expect(first.getByText('13.7 mm')).toBeTruthy();
    expect(first.getByText(/Closed-cell rod, Ø 25–26\.6\smm/)).toBeTruthy();
    expect(document.querySelectorAll('[data-verdict="fail"]').length).toBeGreaterThan(0);
    for (const el of document.querySelectorAll('[data-verdict="fail"]'))
      expect(el.textContent).toMatch(/^✕short by \d+(\.\d)? mm$/);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('in IP the widths read in inches with the next sixteenth', () => {
    renderTable([vj1()], 'IP');
    expect(screen.getByText('0.54 in')).toBeTruthy();
    expect(screen.getByText('next 1/16: 9/16 in')).toBeTruthy();
  });

  it('a joint that cannot be sized says so in words instead of a figure', () => {
    renderTable([{ ...vj1(), designWidth: Number.NaN }, demoJointSchedule()[1]!]);
    expect(screen.getByText(/cannot be sized yet — one value needs attention/)).toBeTruthy();
    expect(document.body.textContent).not.toContain('NaN');
  });
});

function Harness({ initial, system = 'SI' }: { initial: JointInput[]; system?: 'SI' | 'IP' }) {
  const [joints, setJoints] = useState(initial);
  const [selected, setSelected] = useState(0);
  const evaluation = useMemo(() => evaluateJoints(joints), [joints]);
  return (
    <UnitSystemProvider value={system}>
      <JointScheduleEditor
        joints={joints}
        onChange={setJoints}
        evaluation={evaluation}
        selected={selected}
        onSelect={setSelected}
        air={{ min: -25, max: 35 }}
      />
    </UnitSystemProvider>
  );
}

const box = (path: string) => {
  const el = document.getElementById(fieldDomId(path));
  if (!el) throw new Error(`no #${fieldDomId(path)}`);
  return el as HTMLInputElement;
};

describe('joint editor', () => {
  it('narrowing the design width below the required width turns the verdict to "short by"', () => {
    render(<Harness initial={demoJointSchedule()} />);
    const live = screen.getByTestId('joint-live');
    expect(live.textContent).toContain('meets — margin 46 %');
    fireEvent.change(box('joints.0.designWidth'), { target: { value: '10' } });
    expect(live.textContent).toContain('short by 3.7 mm');
  });

  it('takes inch fractions in IP', () => {
    render(<Harness initial={[vj1()]} system="IP" />);
    fireEvent.change(box('joints.0.designWidth'), { target: { value: '3/8' } });
    expect(screen.getByTestId('joint-live').textContent).toMatch(/short by 0\.16 in/);
  });

  it("impossible input shows the engine's reason next to the field, never NaN", () => {
    render(<Harness initial={[vj1()]} />);
    fireEvent.change(box('joints.0.installationTemperature.max'), { target: { value: '90' } });
    const reason = box('joints.0.installationTemperature');
    expect(reason.textContent).toMatch(/installation \(5–90 °C\) must lie within the surface range/i);
    fireEvent.change(box('joints.0.designWidth'), { target: { value: 'wide' } });
    const width = box('joints.0.designWidth');
    expect(width.getAttribute('aria-invalid')).toBe('true');
    expect(document.body.textContent).toMatch(/“wide” is not one/);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it("a value outside the schema range is worded in the person's units", () => {
    render(<Harness initial={[vj1()]} system="IP" />);
    fireEvent.change(box('joints.0.designWidth'), { target: { value: '9' } });
    const width = box('joints.0.designWidth');
    const message = document.getElementById(width.getAttribute('aria-describedby')?.split(' ').pop() ?? '');
    expect(message?.textContent).toMatch(/Must be at most 7\.874\u202fin/);
  });
});

describe('adding a joint', () => {
  it('starts from the project air range with a trade-practice surface range and sizes at once', () => {
    render(<Harness initial={[vj1()]} />);
    fireEvent.click(screen.getByRole('button', { name: 'Add a joint' }));
    expect(screen.getByRole('button', { name: /J-2/, pressed: true })).toBeTruthy();
    // −25…35 °C air, medium finish in sun: −30…60 °C surface (trade-practice defaults).
    expect(box('joints.1.surfaceTemperatureRange.min').value).toBe('-30');
    expect(box('joints.1.surfaceTemperatureRange.max').value).toBe('60');
    expect(screen.getByTestId('joint-live').textContent).toMatch(/Required width \d+\.\d\smm/);
  });
});
