import { INCH, type UnitSystem } from '@shared/units';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { measureInput } from '../../features/assemblies/units';
import type { InputMeasure } from '../../lib/input-measure';
import { pageInput } from '../../lib/input-measure';
import { type Quantity, quantityInput } from '../../lib/quantities';
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
    fireEvent.change(box(), { target: { value: 'about 12' } });
    fireEvent.blur(box());

    expect(onSi).toHaveBeenLastCalledWith(undefined, 'invalid');
    expect(box().getAttribute('aria-invalid')).toBe('true');
    const message = screen.getByText(/Enter a number in m/);
    expect(box().getAttribute('aria-describedby')).toContain(message.parentElement?.id ?? 'missing');
    expect(box().value).toBe('about 12');
    expect(document.body.textContent).not.toContain('NaN');

    // Switching units keeps what was typed rather than inventing a number.
    rerender(<Harness initial={12} quantity="length" system="IP" onSi={onSi} />);
    expect(box().value).toBe('about 12');
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
    render(<Harness initial={0.75 * INCH} measure={pageInput('joint')} system="IP" onSi={onSi} />);
    expect(box().value).toBe('3/4');
    expect(box().getAttribute('inputmode')).toBe('text');
    fireEvent.change(box(), { target: { value: '1 1/4' } });
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(1.25 * INCH, 12);

    fireEvent.change(box(), { target: { value: 'wide' } });
    fireEvent.blur(box());
    expect(
      screen.getByText('Enter a number in in (for example 3/4 or 0.75); “wide” is not one.'),
    ).toBeTruthy();
  });

  it('keeps the decimal keyboard where no fractions are typed', () => {
    render(<Harness initial={20} measure={pageInput('temperature')} system="SI" />);
    expect(box().getAttribute('inputmode')).toBe('decimal');
  });

  it('words a range problem in the box units and the person system', () => {
    const problem = { kind: 'bound', side: 'min', bound: 0.00635, inclusive: true } as const;
    const { rerender } = render(
      <QuantityInput
        label="Design width"
        measure={pageInput('joint')}
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
        measure={pageInput('joint')}
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
    render(<Harness initial={0.01} measure={pageInput('joint')} system="SI" required={false} onSi={onSi} />);
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

describe('QuantityInput reads a number typed with its unit (factors: NIST SP 811 (2008) B.8, 1 in = 25.4 mm exactly)', () => {
  const note = () =>
    document.getElementById(
      box()
        .getAttribute('aria-describedby')
        ?.split(' ')
        .find((id) => id.endsWith('-conversion')) ?? 'none',
    );

  it('3.5 in in a mm box: SI at once, 88.9 mm in the box on blur, the conversion announced under it', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.1} measure={measureInput('thickness')} system="SI" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '3.5 in' } });
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(0.0889, 12);
    expect(onSi.mock.lastCall?.[1]).toBe('ok');
    expect(box().value).toBe('3.5 in');
    fireEvent.blur(box());
    expect(box().value).toBe('88.9');
    expect(box().getAttribute('aria-invalid')).toBe('false');
    expect(note()?.textContent).toBe('3.5 in → 88.9\u202fmm');
    expect(note()?.getAttribute('aria-live')).toBe('polite');
    // The next edit clears the note.
    fireEvent.change(box(), { target: { value: '90' } });
    expect(onSi).toHaveBeenLastCalledWith(0.09, 'ok');
    expect(note()).toBeNull();
    expect(document.body.textContent).not.toContain('→');
  });

  it('1 5/8 in converts on Enter to 41.28 mm (41.275 mm kept inside)', () => {
    const onSi = vi.fn();
    render(<Harness initial={undefined} measure={measureInput('thickness')} system="SI" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '1 5/8 in' } });
    // Enter converts and is kept from submitting the form, so the conversion is seen before anything is saved.
    expect(fireEvent.keyDown(box(), { key: 'Enter' })).toBe(false);
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(0.041275, 12);
    expect(box().value).toBe('41.28');
    expect(screen.getByText('1 5/8 in → 41.28 mm')).toBeTruthy();
  });

  it('89 mm in an inch box (IP) reads 3.504 in; a joint box takes 1-5/8" as typed', () => {
    const onSi = vi.fn();
    render(<Harness initial={undefined} measure={measureInput('thickness')} system="IP" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '89 mm' } });
    fireEvent.blur(box());
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(0.089, 12);
    expect(box().value).toBe('3.504');
    expect(screen.getByText('89 mm → 3.504 in')).toBeTruthy();
    cleanup();

    render(<Harness initial={undefined} measure={pageInput('joint')} system="IP" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '1-5/8"' } });
    fireEvent.blur(box());
    expect(onSi.mock.lastCall?.[0]).toBeCloseTo(1.625 * INCH, 12);
    // The joint box reads trade fractions itself, so the entry stays as typed.
    expect(box().value).toBe('1-5/8"');
  });

  it('a plain number keeps today’s behaviour: no conversion, no note, the text as typed', () => {
    const onSi = vi.fn();
    render(<Harness initial={undefined} measure={measureInput('thickness')} system="SI" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '89' } });
    fireEvent.blur(box());
    expect(onSi).toHaveBeenLastCalledWith(0.089, 'ok');
    expect(box().value).toBe('89');
    expect(document.body.textContent).not.toContain('→');
  });

  it('a quantity of another kind is the field error in words, nothing is handed up, never NaN', () => {
    const onSi = vi.fn();
    render(<Harness initial={0.1} measure={measureInput('thickness')} system="SI" onSi={onSi} />);
    fireEvent.change(box(), { target: { value: '3.5 kg' } });
    fireEvent.blur(box());
    expect(onSi).toHaveBeenLastCalledWith(undefined, 'invalid');
    expect(box().value).toBe('3.5 kg');
    expect(box().getAttribute('aria-invalid')).toBe('true');
    const message = screen.getByText('“3.5 kg” is a mass; this box takes a length (mm)');
    expect(box().getAttribute('aria-describedby')).toContain(message.parentElement?.id ?? 'missing');
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('a decimal comma is refused with the reason rather than guessed', () => {
    render(<Harness initial={12} quantity="length" system="SI" />);
    fireEvent.change(box(), { target: { value: '12,5m' } });
    fireEvent.blur(box());
    expect(screen.getByText(/write decimals with a point and no thousands separators/)).toBeTruthy();
  });
});
