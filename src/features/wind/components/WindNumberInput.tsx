import type { UnitSystem } from '@shared/units';
import { type ReactNode, type Ref, useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { useUnitSystem } from '../../../lib/unit-system';
import { parseWind, type WindMeasure, windInputText, windUnit } from '../units';

const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

interface WindNumberInputProps {
  label: ReactNode;
  measure: WindMeasure;
  /** Stored value, SI; undefined/NaN while nothing valid is entered. */
  value: number | null | undefined;
  /**
   * Receives SI, or undefined while the box is empty or unreadable; `entry` says which, so an optional box can
   * tell "left empty" (take the default) from "not a number" (ask again).
   */
  onChange: (si: number | undefined, entry: 'ok' | 'empty' | 'invalid') => void;
  onBlur?: () => void;
  name?: string;
  required?: boolean;
  /** The reason from the schema or the engine; a local typing problem takes precedence. */
  error?: string;
  hint?: ReactNode;
  /** Keep the label for screen readers only (table cells whose column head names the quantity). */
  labelHidden?: boolean;
  system?: UnitSystem;
  disabled?: boolean;
  id?: string;
  inputRef?: Ref<HTMLInputElement>;
  className?: string;
  placeholder?: string;
}

interface InputState {
  text: string;
  value: number | null | undefined;
  system: UnitSystem;
  problem: 'empty' | 'invalid' | null;
}

/**
 * A number box for one of the wind sheet's quantities: stores SI, shows the person's units (m/s ↔ mph, m ↔ ft,
 * mm ↔ in, kPa ↔ psf, N ↔ lbf). It never shows NaN; an unreadable entry is named in words beside the box.
 */
export function WindNumberInput({
  label,
  measure,
  value,
  onChange,
  onBlur,
  name,
  required = true,
  error,
  hint,
  labelHidden = false,
  system: override,
  disabled,
  id,
  inputRef,
  className,
  placeholder,
}: WindNumberInputProps) {
  const preferred = useUnitSystem();
  const system = override ?? preferred;
  const unit = windUnit(measure, system);
  const [touched, setTouched] = useState(false);
  const [state, setState] = useState<InputState>(() => ({
    text: windInputText(value, measure, system),
    value,
    system,
    problem: null,
  }));

  // The value changed from outside (reset, "load theirs") or the units were switched: re-express it, unless
  // the box holds an unreadable entry that the form also sees as blank.
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : windInputText(value, measure, system),
      value,
      system,
      problem: keepTyped ? state.problem : null,
    });
  }

  function handleChange(text: string) {
    const parsed = parseWind(text, measure, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    const problem =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    setState({ text, value: si ?? Number.NaN, system, problem });
    onChange(si, parsed.kind);
  }

  const inUnit = unit ? ` in ${unit}` : '';
  const local =
    state.problem === 'invalid'
      ? `Enter a number${inUnit} (for example 12.5); “${state.text.trim()}” is not one.`
      : state.problem === 'empty'
        ? `Enter a value${inUnit}.`
        : undefined;
  const shown = (touched || error ? local : undefined) ?? error;

  return (
    <Field
      label={
        labelHidden ? (
          <span className="sr-only">
            {label}
            {unit ? `, in ${unit}` : ''}
          </span>
        ) : (
          label
        )
      }
      unit={unit && !labelHidden ? unit : undefined}
      hint={hint}
      error={shown}
      required={required && !labelHidden}
      id={id}
      className={className}
    >
      {(control) => (
        <div className="flex items-stretch">
          <input
            {...control}
            aria-required={required || undefined}
            ref={inputRef}
            name={name}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            disabled={disabled}
            placeholder={placeholder}
            value={state.text}
            onChange={(e) => handleChange(e.target.value)}
            onBlur={() => {
              setTouched(true);
              onBlur?.();
            }}
            className={
              `num block w-full min-w-0 ${unit ? 'rounded-l-sm' : 'rounded-sm'} border border-rule-strong bg-paper-raised px-2 py-1.5 ` +
              'text-right text-sm text-ink aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution ' +
              'disabled:bg-paper-sunk disabled:text-ink-muted'
            }
          />
          {unit ? (
            <span
              aria-hidden="true"
              className="num flex min-w-10 items-center justify-center whitespace-nowrap rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk px-1.5 text-xs text-ink-muted"
            >
              {unit}
            </span>
          ) : null}
        </div>
      )}
    </Field>
  );
}
