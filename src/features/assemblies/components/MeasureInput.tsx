import type { UnitSystem } from '@shared/units';
import { type ReactNode, useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { useUnitSystem } from '../../../lib/unit-system';
import { type Measure, measureInputText, measureUnit, parseMeasure } from '../units';

const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

interface MeasureInputProps {
  label: ReactNode;
  measure: Measure;
  /** Stored value, SI. undefined/NaN while nothing valid is entered. */
  value: number | null | undefined;
  /** Receives SI, or undefined while the box is empty or unreadable. */
  onChange: (si: number | undefined) => void;
  onBlur?: () => void;
  name?: string;
  required?: boolean;
  /** The reason from the form or the engine; a local typing problem takes precedence. */
  error?: string;
  /** Mark invalid without a message of its own (the message sits on the enclosing block). */
  invalid?: boolean;
  /** Id of a message elsewhere that describes this box (e.g. "fractions must sum to 1"). */
  describedBy?: string;
  hint?: ReactNode;
  system?: UnitSystem;
  disabled?: boolean;
  id?: string;
  className?: string;
}

interface InputState {
  text: string;
  value: number | null | undefined;
  system: UnitSystem;
  problem: 'empty' | 'invalid' | null;
}

/**
 * A number box for one of the assembly's quantities: stores SI, shows the person's units (mm ↔ in,
 * W/(m·K) ↔ Btu·in/(h·ft²·°F), …). It never shows NaN; an unreadable entry is named in words.
 */
export function MeasureInput({
  label,
  measure,
  value,
  onChange,
  onBlur,
  name,
  required = true,
  error,
  invalid = false,
  describedBy,
  hint,
  system: override,
  disabled,
  id,
  className,
}: MeasureInputProps) {
  const preferred = useUnitSystem();
  const system = override ?? preferred;
  const unit = measureUnit(measure, system);
  const [touched, setTouched] = useState(false);
  const [state, setState] = useState<InputState>(() => ({
    text: measureInputText(value, measure, system),
    value,
    system,
    problem: null,
  }));

  // Value changed from outside (library pick, "load their revision") or units switched: re-express it,
  // unless the box holds an unreadable entry that the form also sees as blank.
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : measureInputText(value, measure, system),
      value,
      system,
      problem: keepTyped ? state.problem : null,
    });
  }

  function handleChange(text: string) {
    const parsed = parseMeasure(text, measure, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    const problem =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    setState({ text, value: si ?? Number.NaN, system, problem });
    onChange(si);
  }

  const local =
    state.problem === 'invalid'
      ? `Enter a number in ${unit} (for example 12.5); “${state.text.trim()}” is not one.`
      : state.problem === 'empty'
        ? `Enter a value in ${unit}.`
        : undefined;
  const shown = (touched || error ? local : undefined) ?? error;
  // Long units (Btu·in/(h·ft²·°F)) do not fit beside a narrow box: the label carries them alone.
  const suffix = unit.length <= 8 && unit !== '–';

  return (
    <Field
      label={label}
      unit={unit === '–' ? undefined : unit}
      hint={hint}
      error={shown}
      id={id}
      className={className}
    >
      {(control) => (
        <div className="flex items-stretch">
          <input
            {...control}
            aria-invalid={control['aria-invalid'] || invalid}
            aria-describedby={
              [control['aria-describedby'], describedBy].filter(Boolean).join(' ') || undefined
            }
            aria-required={required || undefined}
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
              `num block w-full min-w-0 ${suffix ? 'rounded-l-sm' : 'rounded-sm'} border border-rule-strong bg-paper-raised px-2 py-1.5 ` +
              'text-right text-sm text-ink aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution ' +
              'disabled:bg-paper-sunk disabled:text-ink-muted'
            }
          />
          {suffix ? (
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
