import { INCH, type UnitSystem } from '@shared/units';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { InputMeasure } from '../../lib/input-measure';
import { type Quantity, quantityInput } from '../../lib/quantities';
import { sheetInput } from '../../lib/sheet-units';
import { QuantityInput } from './QuantityInput';

afterEach(cleanup);

/** A form stand-in: holds the SI value the input hands up, and reports every change. */
function Harness({
  initial,
  quantity,
  measure = quantityInput(quantity ?? 'length'),
  system,
  required = true,
  error,
  onSi = () => {},
}: {
  initial: number | undefined;
  quantity?: Quantity;
  measure?: InputMeasure;
  system: UnitSystem;
  required?: boolean;
  error?: string;
  onSi?: (si: number | undefined, entry: string) => void;
}) {
  const [value, setValue] = useState<number | undefined>(initial);
  return (
    <QuantityInput
      label="Mean roof height"
      measure={measure}
      value={value}
      system={system}
      required={required}
      error={error}
      onChange={(si, entry) => {
        setValue(si);
        onSi(si, entry);
      }}
    />
  );
}

const box = () => screen.getByRole('textbox') as HTMLInputElement;
const label = () => document.querySelector('label') as HTMLLabelElement;

describe('QuantityInput with the form quantities (lib/quantities)', () => {
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
    expect(onSi).toHaveBeenLastCalledWith(10, 'ok');
    fireEvent.change(box(), { target: { value: '\u221240' } });
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(-40, 10);
  });

  it('shows relative humidity as a percentage and stores a fraction', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.35} quantity="relativeHumidity" system="IP" onSi={onSi} />);
    expect(box().value).toBe('35');
    fireEvent.change(box(), { target: { value: '40' } });
    expect(onSi).toHaveBeenLastCalledWith(0.4, 'ok');
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

    expect(onSi).toHaveBeenLastCalledWith(undefined, 'invalid');
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
    const onSi = vi.fn();
    render(<Harness initial={4} quantity="length" system="IP" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '' } });
    fireEvent.blur(box());
    expect(onSi).toHaveBeenLastCalledWith(undefined, 'empty');
    expect(screen.getByText('Enter a value in ft.')).toBeTruthy();
    expect(box().getAttribute('aria-invalid')).toBe('true');
    expect(box().getAttribute('aria-required')).toBe('true');
  });

  it('treats NaN from a form as "nothing entered" and never shows it', () => {
    render(
      <QuantityInput
        label="Plan width"
        measure={quantityInput('length')}
        value={Number.NaN}
        system="IP"
        onChange={() => {}}
      />,
    );
    expect(box().value).toBe('');
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('waits for the first blur before naming a typing problem, unless the form already has one', () => {
    const { rerender } = render(<Harness initial={4} quantity="length" system="SI" />);
    fireEvent.change(box(), { target: { value: 'x' } });
    expect(screen.queryByText(/Enter a number/)).toBeNull();
    expect(box().getAttribute('aria-invalid')).toBe('false');

    rerender(<Harness initial={4} quantity="length" system="SI" error="must be at least 0" />);
    // What was typed is kept, and the local reason takes precedence over the form's.
    expect(box().value).toBe('x');
    expect(screen.getByText(/Enter a number in m/)).toBeTruthy();
    expect(screen.queryByText('Must be at least 0')).toBeNull();
  });

  it('shows the form error (as a sentence, with its glyph) while the entry itself reads fine', () => {
    render(
      <QuantityInput
        label="Plan width"
        measure={quantityInput('length')}
        value={2}
        system="SI"
        error="must be at least 3 m"
        onChange={() => {}}
      />,
    );
    const message = screen.getByText('Must be at least 3 m');
    expect(message.previousElementSibling?.textContent).toBe('✕');
    expect(box().getAttribute('aria-invalid')).toBe('true');
  });

  it('marks a required box with an asterisk only when asked, and sizes the box for a form page', () => {
    const { rerender } = render(
      <QuantityInput
        label="Plan width"
        measure={quantityInput('length')}
        value={2}
        system="SI"
        onChange={() => {}}
      />,
    );
    expect(label().textContent).toBe('Plan width, in m(m)');
    expect(box().className).toContain('text-sm');

    rerender(
      <QuantityInput
        label="Plan width"
        measure={quantityInput('length')}
        value={2}
        system="SI"
        markRequired
        size="form"
        onChange={() => {}}
      />,
    );
    expect(label().textContent).toBe('Plan width, in m(m)*');
    expect(box().className).toContain('text-base');
  });
});

describe('QuantityInput with the sheet measures (lib/sheet-units)', () => {
  it('reads and writes inch fractions for joint dimensions in IP, with a keyboard that has them', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.75 * INCH} measure={sheetInput('joint')} system="IP" onSi={onSi} />);
    expect(box().value).toBe('3/4');
    expect(box().getAttribute('inputmode')).toBe('text');
    fireEvent.change(box(), { target: { value: '1 1/4' } });
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(1.25 * INCH, 12);

    fireEvent.change(box(), { target: { value: '3/4 in wide' } });
    fireEvent.blur(box());
    expect(
      screen.getByText('Enter a number in in (for example 3/4 or 0.75); “3/4 in wide” is not one.'),
    ).toBeTruthy();
  });

  it('keeps the decimal keyboard where no fractions are typed', () => {
    render(<Harness initial={20} measure={sheetInput('temperature')} system="SI" />);
    expect(box().getAttribute('inputmode')).toBe('decimal');
  });

  it('words a range problem in the box units and the person system', () => {
    const problem = { kind: 'bound', side: 'min', bound: 0.00635, inclusive: true } as const;
    const { rerender } = render(
      <QuantityInput
        label="Design width"
        measure={sheetInput('joint')}
        value={0.003}
        system="SI"
        problem={problem}
        onChange={() => {}}
      />,
    );
    expect(screen.getByText('Must be at least 6.35 mm.')).toBeTruthy();
    rerender(
      <QuantityInput
        label="Design width"
        measure={sheetInput('joint')}
        value={0.003}
        system="IP"
        problem={problem}
        onChange={() => {}}
      />,
    );
    expect(screen.getByText('Must be at least 0.25 in.')).toBeTruthy();
  });

  it('lets an optional box be emptied without complaint and says which kind of entry it got', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.01} measure={sheetInput('joint')} system="SI" required={false} onSi={onSi} />);
    expect(box().getAttribute('aria-required')).toBeNull();
    fireEvent.change(box(), { target: { value: '' } });
    fireEvent.blur(box());
    expect(onSi).toHaveBeenLastCalledWith(undefined, 'empty');
    expect(box().getAttribute('aria-invalid')).toBe('false');
    fireEvent.change(box(), { target: { value: 'abc' } });
    expect(onSi).toHaveBeenLastCalledWith(undefined, 'invalid');
    expect(screen.getByText(/Enter a number in mm/)).toBeTruthy();
  });
});
