import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

interface RadioGroupProps<T extends string> {
  legend: ReactNode;
  /** The radios' shared name (unique on the page); a registered field brings its own. */
  name?: string;
  options: readonly { value: T; label: ReactNode }[];
  /** The choice, for a group the page keeps in its state … */
  value?: T;
  onChange?: (value: T) => void;
  /** … or a form field's registration (react-hook-form), which keeps the choice itself. */
  field?: UseFormRegisterReturn;
  className?: string;
  /** What follows the radios inside the group (inputs the choice brings). */
  children?: ReactNode;
}

/** A few exclusive choices side by side under a legend. */
export function RadioGroup<T extends string>({
  legend,
  name,
  options,
  value,
  onChange,
  field,
  className = '',
  children,
}: RadioGroupProps<T>) {
  return (
    <fieldset className={`flex flex-col gap-1 ${className}`}>
      <legend className="mb-1 text-sm font-semibold">{legend}</legend>
      <div className="flex gap-4 text-sm">
        {options.map((o) => (
          <label key={o.value} className="flex items-center gap-1.5">
            <input
              type="radio"
              value={o.value}
              className="accent-ink"
              {...(field ?? { name, checked: value === o.value, onChange: () => onChange?.(o.value) })}
            />
            {o.label}
          </label>
        ))}
      </div>
      {children}
    </fieldset>
  );
}
