import type { UnitSystem } from '@shared/units';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Quantity } from '../../lib/quantities';
import { UnitNumberInput } from './UnitNumberInput';

afterEach(cleanup);

/** A form stand-in: holds the SI value the input hands up, and reports every change. */
function Harness({
  initial,
  quantity,
  system,
  onSi = () => {},
}: {
  initial: number | undefined;
  quantity: Quantity;
  system: UnitSystem;
  onSi?: (si: number | undefined) => void;
}) {
  const [value, setValue] = useState<number | undefined>(initial);
  return (
    <UnitNumberInput
      label="Mean roof height"
      quantity={quantity}
      value={value}
      system={system}
      required
      onChange={(si) => {
        setValue(si);
        onSi(si);
      }}
    />
  );
}

const box = () => screen.getByRole('textbox') as HTMLInputElement;

describe('UnitNumberInput', () => {
  it('shows a stored SI length in feet for IP and in metres for SI', () => {
    const { rerender } = render(<Harness initial={3.048} quantity="length" system="IP" />);
    expect(box().value).toBe('10');
    expect(screen.getByLabelText(/Mean roof height.*ft/)).toBe(box());

    rerender(<Harness initial={3.048} quantity="length" system="SI" />);
    expect(box().value).toBe('3.048');
    expect(screen.getByLabelText(/Mean roof height.*m/)).toBe(box());
  });

  it('stores what is typed in IP as SI', () => {
    const onSi = vi.fn();
    render(<Harness initial={undefined} quantity="temperature" system="IP" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '50' } });
    expect(onSi).toHaveBeenLastCalledWith(10);
    fireEvent.change(box(), { target: { value: '\u221240' } });
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(-40, 10);
  });

  it('shows relative humidity as a percentage and stores a fraction', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.35} quantity="relativeHumidity" system="IP" onSi={onSi} />);
    expect(box().value).toBe('35');
    fireEvent.change(box(), { target: { value: '40' } });
    expect(onSi).toHaveBeenLastCalledWith(0.4);
  });

  it('re-expresses the value when the unit system changes, without NaN', () => {
    const { rerender } = render(<Harness initial={-17.7778} quantity="temperature" system="SI" />);
    expect(box().value).toBe('-17.8');
    rerender(<Harness initial={-17.7778} quantity="temperature" system="IP" />);
    expect(box().value).toBe('0');
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('shows an error in words, not a number, for input that is not a number', () => {
    const onSi = vi.fn();
    const { rerender } = render(<Harness initial={12} quantity="length" system="SI" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '12,5m' } });
    fireEvent.blur(box());

    expect(onSi).toHaveBeenLastCalledWith(undefined);
    expect(box().getAttribute('aria-invalid')).toBe('true');
    const message = screen.getByText(/Enter a number in m/);
    expect(box().getAttribute('aria-describedby')).toContain(message.parentElement?.id ?? 'missing');
    expect(box().value).toBe('12,5m');
    expect(document.body.textContent).not.toContain('NaN');

    // Switching units keeps what was typed rather than inventing a number.
    rerender(<Harness initial={12} quantity="length" system="IP" onSi={onSi} />);
    expect(box().value).toBe('12,5m');
    expect(screen.getByText(/Enter a number in ft/)).toBeTruthy();
  });

  it('asks for a value when a required box is emptied', () => {
    render(<Harness initial={4} quantity="length" system="IP" />);
    fireEvent.change(box(), { target: { value: '' } });
    fireEvent.blur(box());
    expect(screen.getByText('Enter a value in ft.')).toBeTruthy();
    expect(box().getAttribute('aria-invalid')).toBe('true');
  });

  it('treats NaN from a form as "nothing entered" and never shows it', () => {
    render(
      <UnitNumberInput
        label="Plan width"
        quantity="length"
        value={Number.NaN}
        system="IP"
        onChange={() => {}}
      />,
    );
    expect(box().value).toBe('');
    expect(document.body.textContent).not.toContain('NaN');
  });
});
