import type { ReactNode } from 'react';
import { Controller, useFormContext } from 'react-hook-form';
import { Field } from '../../../components/ui/Field';
import { LabelledOptions } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { fieldDomId } from '../evaluate';
import { type AssemblyFormValues, p, useBuilder } from '../form';
import { type Measure, measureInput } from '../units';

/** The reason to show for a path: the form's own (on submit, from the server) or the live check's. */
export function useFieldError(path: string): string | undefined {
  const { errors } = useBuilder();
  const { getFieldState, formState } = useFormContext<AssemblyFormValues>();
  return getFieldState(p(path), formState).error?.message ?? errors[path];
}

interface MeasureFieldProps {
  path: string;
  measure: Measure;
  label: ReactNode;
  hint?: ReactNode;
  required?: boolean;
  invalid?: boolean;
  describedBy?: string;
  className?: string;
}

/** A unit-aware number box wired to the form at `path`, with its error beside it. */
export function MeasureField({
  path,
  measure,
  label,
  hint,
  required,
  invalid,
  describedBy,
  className,
}: MeasureFieldProps) {
  const { control } = useFormContext<AssemblyFormValues>();
  const error = useFieldError(path);
  return (
    <Controller
      control={control}
      name={p(path)}
      render={({ field }) => (
        <QuantityInput
          id={fieldDomId(path)}
          label={label}
          measure={measureInput(measure)}
          name={field.name}
          value={typeof field.value === 'number' ? field.value : undefined}
          // react-hook-form restores the default value when a field is set to undefined; NaN keeps
          // "nothing valid here" so the live check names the problem instead.
          onChange={(si) => field.onChange(si ?? Number.NaN)}
          onBlur={field.onBlur}
          error={error}
          invalid={invalid}
          describedBy={describedBy}
          hint={hint}
          required={required}
          className={className}
        />
      )}
    />
  );
}

/** A text box wired to the form. */
export function TextField({
  path,
  label,
  hint,
  required,
  className,
  maxLength,
}: {
  path: string;
  label: ReactNode;
  hint?: ReactNode;
  required?: boolean;
  className?: string;
  maxLength?: number;
}) {
  const { register } = useFormContext<AssemblyFormValues>();
  const error = useFieldError(path);
  return (
    <Field
      label={label}
      hint={hint}
      error={error}
      required={required}
      id={fieldDomId(path)}
      className={className}
    >
      {(c) => (
        <TextInput
          {...c}
          {...register(p(path))}
          autoComplete="off"
          maxLength={maxLength}
          className="py-1.5 text-sm"
        />
      )}
    </Field>
  );
}

/** A select wired to the form. */
export function SelectField({
  path,
  label,
  options,
  hint,
  className,
  placeholder,
  required,
}: {
  path: string;
  label: ReactNode;
  options: readonly { value: string; label: string }[];
  hint?: ReactNode;
  className?: string;
  /** A first, empty choice ("Choose…") for a required choice with no default. */
  placeholder?: string;
  required?: boolean;
}) {
  const { register } = useFormContext<AssemblyFormValues>();
  const error = useFieldError(path);
  return (
    <Field
      label={label}
      hint={hint}
      error={error}
      required={required}
      id={fieldDomId(path)}
      className={className}
    >
      {(c) => (
        <Select {...c} {...register(p(path))} className="py-1.5 text-sm">
          {placeholder === undefined ? null : <option value="">{placeholder}</option>}
          <LabelledOptions options={options} />
        </Select>
      )}
    </Field>
  );
}

/** An error that belongs to a block (a layer, a list of sections) rather than to one box. */
export function BlockError({ path, className = '' }: { path: string; className?: string }) {
  const { errors } = useBuilder();
  const message = errors[path];
  if (!message) return null;
  return (
    <p
      id={`${fieldDomId(path)}-error`}
      className={`flex items-start gap-1 text-sm font-medium text-caution ${className}`}
    >
      <span aria-hidden="true">✕</span>
      <span>{message}</span>
    </p>
  );
}
