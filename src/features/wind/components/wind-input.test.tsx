import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { windInput } from '../units';

afterEach(cleanup);

const box = () => screen.getByRole('textbox') as HTMLInputElement;
const label = () => document.querySelector('label') as HTMLLabelElement;

describe('QuantityInput with the wind measures (features/wind/units)', () => {
  it('keeps the label for screen readers only in a table cell, unit included, without the asterisk', () => {
    render(
      <QuantityInput
        label="Allowable inward"
        measure={windInput('pressure')}
        value={1000}
        system="IP"
        labelHidden
        markRequired
        onChange={() => {}}
      />,
    );
    expect(screen.getByLabelText('Allowable inward, in psf')).toBe(box());
    expect(label().querySelector('.sr-only')?.textContent).toBe('Allowable inward, in psf');
    expect(label().textContent).not.toContain('*');
    // The unit still stands beside the box for the eye.
    expect(box().nextElementSibling?.textContent).toBe('psf');
  });

  it('words the problem without a unit for a pure number and shows no unit box', () => {
    // The form holds nothing valid (undefined) while the box keeps what was typed.
    render(
      <QuantityInput
        label="Kzt"
        measure={windInput('ratio')}
        value={undefined}
        system="SI"
        onChange={() => {}}
      />,
    );
    expect(box().nextElementSibling).toBeNull();
    fireEvent.change(box(), { target: { value: 'half' } });
    fireEvent.blur(box());
    expect(box().value).toBe('half');
    expect(screen.getByText('Enter a number (for example 12.5); “half” is not one.')).toBeTruthy();
  });
});
