import type { UnitSystem } from '@shared/units';
import { type ReactNode, type Ref, useState } from 'react';
import { parseInput, type Quantity, toInputText, unitOf } from '../../lib/quantities';
import { useUnitSystem } from '../../lib/unit-system';
import { Field } from './Field';

type Problem = 'empty' | 'invalid';

/** No usable number: nothing entered, or a form that marks an unreadable entry as NaN. */
const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

interface UnitNumberInputProps {
  label: ReactNode;
  quantity: Quantity;
  /** The stored value, always SI (m, °C, RH fraction 0–1). `undefined`/NaN when nothing valid is entered. */
  value: number | null | undefined;
  /** Receives SI, or `undefined` while the box is empty or does not hold a number. */
  onChange: (si: number | undefined) => void;
  onBlur?: () => void;
  name?: string;
  required?: boolean;
  /** An error from the form (range, cross-field rule, server). A local typing problem takes precedence. */
  error?: string;
  hint?: ReactNode;
  /** Override the signed-in person's preference (tests, side-by-side views). */
  system?: UnitSystem;
  disabled?: boolean;
  id?: string;
  inputRef?: Ref<HTMLInputElement>;
  className?: string;
}

interface InputState {
  text: string;
  value: number | null | undefined;
  system: UnitSystem;
  problem: Problem | null;
}

/**
 * A number box that stores SI and shows the person's unit system (m ↔ ft, °C ↔ °F, RH as %).
 * It never shows "NaN": an empty or unreadable entry shows an error in words and hands `undefined` up.
 */
export function UnitNumberInput({
  label,
  quantity,
  value,
  onChange,
  onBlur,
  name,
  required,
  error,
  hint,
  system: systemOverride,
  disabled,
  id,
  inputRef,
  className,
}: UnitNumberInputProps) {
  const preferred = useUnitSystem();
  const system = systemOverride ?? preferred;
  const unit = unitOf(quantity, system);
  const [touched, setTouched] = useState(false);
  const [state, setState] = useState<InputState>(() => ({
    text: toInputText(value, quantity, system),
    value,
    system,
    problem: null,
  }));

  // The value changed from outside (form reset, "load their version") or the unit system was switched:
  // re-express the stored SI value. While the box holds an unreadable entry, keep what was typed.
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : toInputText(value, quantity, system),
      value,
      system,
      problem: keepTyped ? state.problem : null,
    });
  }

  function handleChange(text: string) {
    const parsed = parseInput(text, quantity, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    const problem: Problem | null =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    setState({ text, value: si, system, problem });
    onChange(si);
  }

  const localMessage =
    state.problem === 'invalid'
      ? `Enter a number in ${unit} (for example 12.5); “${state.text.trim()}” is not one.`
      : state.problem === 'empty'
        ? `Enter a value in ${unit}.`
        : undefined;
  const shownError = (touched || error ? localMessage : undefined) ?? error;

  return (
    <Field
      label={label}
      unit={unit}
      hint={hint}
      error={shownError}
      required={required}
      id={id}
      className={className}
    >
      {(control) => (
        <div className="flex items-stretch">
          <input
            {...control}
            ref={inputRef}
            name={name}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            disabled={disabled}
            value={state.text}
            onChange={(e) => handleChange(e.target.value)}
            onBlur={() => {
              setTouched(true);
              onBlur?.();
            }}
            className={
              'num block w-full min-w-0 rounded-l-sm border border-rule-strong bg-paper-raised px-3 py-2 ' +
              'text-right text-base text-ink aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution ' +
              'disabled:bg-paper-sunk disabled:text-ink-muted'
            }
          />
          <span
            aria-hidden="true"
            className="num flex min-w-12 items-center justify-center rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk px-2 text-sm text-ink-muted"
          >
            {unit}
          </span>
        </div>
      )}
    </Field>
  );
}
