import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { type Measure, measureInput } from '../units';

afterEach(cleanup);

const box = () => screen.getByRole('textbox') as HTMLInputElement;
const label = () => document.querySelector('label') as HTMLLabelElement;

describe('QuantityInput with the assembly measures (features/assemblies/units)', () => {
  it('leaves a long unit to the label and a unitless measure without one', () => {
    const show = (measure: Measure, value: number) =>
      render(
        <QuantityInput
          label="Layer value"
          measure={measureInput(measure)}
          value={value}
          system="IP"
          onChange={() => {}}
        />,
      );
    show('conductivity', 0.04);
    expect(screen.getByLabelText(/Layer value, in Btu·in\/\(h·ft²·°F\)/)).toBe(box());
    expect(box().nextElementSibling).toBeNull();

    cleanup();
    show('emittance', 0.9);
    expect(label().textContent).toBe('Layer value');
    expect(box().value).toBe('0.9');
    expect(box().nextElementSibling).toBeNull();
  });

  it('can be marked invalid by a message elsewhere and described by it', () => {
    render(
      <>
        <QuantityInput
          label="Stud share"
          measure={measureInput('fraction')}
          value={0.25}
          system="SI"
          invalid
          describedBy="fractions-sum"
          hint="Share of the wall area"
          onChange={() => {}}
        />
        <p id="fractions-sum">The shares must add up to 100 %.</p>
      </>,
    );
    expect(box().value).toBe('25');
    expect(box().getAttribute('aria-invalid')).toBe('true');
    const describedBy = box().getAttribute('aria-describedby')?.split(' ') ?? [];
    expect(describedBy).toContain('fractions-sum');
    expect(describedBy.some((id) => id.endsWith('-hint'))).toBe(true);
  });
});
