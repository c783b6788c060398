import type { ReactNode } from 'react';
import { Controller, type UseFormRegisterReturn, useFormContext } from 'react-hook-form';
import { Field, type FieldControlProps } from '../../../components/ui/Field';
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

/** A number box of a table: the field under the row's path, its measure, label, width and hint. */
export type MeasureBox = readonly [
  key: string,
  measure: Measure,
  label: string,
  className: string,
  hint?: string,
];

/** A table's number boxes, each at `base`.`key`. */
export function MeasureFields({ base, boxes }: { base: string; boxes: readonly MeasureBox[] }) {
  return boxes.map(([key, measure, label, className, hint]) => (
    <MeasureField
      key={key}
      path={`${base}.${key}`}
      measure={measure}
      label={label}
      className={className}
      hint={hint}
    />
  ));
}

interface WiredProps {
  path: string;
  label: ReactNode;
  hint?: ReactNode;
  required?: boolean;
  className?: string;
}

/** A `Field` at the form's `path`: its reason and its id (for the problem links) come from the path. */
function WiredField({
  path,
  children,
  ...field
}: WiredProps & { children: (control: FieldControlProps & UseFormRegisterReturn) => ReactNode }) {
  const { register } = useFormContext<AssemblyFormValues>();
  const error = useFieldError(path);
  return (
    <Field {...field} error={error} id={fieldDomId(path)}>
      {(c) => children({ ...c, ...register(p(path)) })}
    </Field>
  );
}

/** A text box wired to the form. */
export function TextField({ maxLength, ...wired }: WiredProps & { maxLength?: number }) {
  return (
    <WiredField {...wired}>
      {(c) => <TextInput {...c} autoComplete="off" maxLength={maxLength} className="py-1.5 text-sm" />}
    </WiredField>
  );
}

/** A select wired to the form. */
export function SelectField({
  options,
  placeholder,
  ...wired
}: WiredProps & {
  options: readonly { value: string; label: string }[];
  /** A first, empty choice ("Choose…") for a required choice with no default. */
  placeholder?: string;
}) {
  return (
    <WiredField {...wired}>
      {(c) => (
        <Select {...c} className="py-1.5 text-sm">
          {placeholder === undefined ? null : <option value="">{placeholder}</option>}
          <LabelledOptions options={options} />
        </Select>
      )}
    </WiredField>
  );
}

/** A small bordered button of the editors' rows (move, remove). */
export const iconButton =
  'inline-flex h-8 min-w-8 items-center justify-center rounded-sm border border-rule-strong bg-paper-raised px-2 ' +
  'text-sm hover:bg-paper-sunk disabled:cursor-not-allowed disabled:opacity-40';

interface CheckBoxProps {
  label: ReactNode;
  checked: boolean;
  onChange: (checked: boolean) => void;
}

/** A checkbox with its words, set beside the boxes of a row. */
export function CheckBox({ label, checked, onChange }: CheckBoxProps) {
  const box = (
    <input
      type="checkbox"
      className="accent-ink"
      checked={checked}
      onChange={(e) => onChange(e.target.checked)}
    />
  );
  return (
    <label className="flex items-center gap-2 pt-6 text-sm">
      {box}
      {label}
    </label>
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
