import type { ComponentProps, ReactNode } from 'react';
import { Field } from './Field';
import { Select } from './Select';

/**
 * A select box under its label: a `Field` (label, hint, error, id; `className` places it) around a `Select`
 * that takes the rest — value, onChange, the choices as children — styled by `selectClassName` (compact unless
 * told otherwise).
 */
export function LabelledSelect({
  label,
  hint,
  error,
  id,
  className,
  selectClassName = 'py-1.5 text-sm',
  children,
  ...select
}: {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  id?: string;
  className?: string;
  selectClassName?: string;
} & Omit<ComponentProps<'select'>, 'className' | 'id'>) {
  return (
    <Field label={label} hint={hint} error={error} id={id} className={className}>
      {(c) => (
        <Select {...c} {...select} className={selectClassName}>
          {children}
        </Select>
      )}
    </Field>
  );
}
