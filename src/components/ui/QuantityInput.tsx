import type { UnitSystem } from '@shared/units';
import { type ClipboardEventHandler, type ReactNode, type Ref, useState } from 'react';
import { type FieldProblem, problemText } from '../../lib/field-problems';
import type { InputMeasure, ParsedEntry } from '../../lib/input-measure';
import { useUnitSystem } from '../../lib/unit-system';
import { Field } from './Field';

/** No usable number: nothing entered, or a form that marks an unreadable entry as NaN. */
const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

/** Units longer than this (Btu·in/(h·ft²·°F)) do not fit beside a narrow box: the label carries them alone. */
const SUFFIX_MAX = 8;

const SIZES = {
  /** A form page (project and site data): the size of the other form controls. */
  form: { box: 'px-3 py-2 text-base', unit: 'min-w-12 px-2 text-sm' },
  /** A calculation sheet (assembly, wind, joints, takeoff): compact, many boxes to a row. */
  sheet: { box: 'px-2 py-1.5 text-sm', unit: 'min-w-10 whitespace-nowrap px-1.5 text-xs' },
} as const;

interface QuantityInputProps {
  label: ReactNode;
  /** How the value crosses the SI/IP edge: `quantityInput`, `sheetInput`, `windInput`, `measureInput`. */
  measure: InputMeasure;
  /** The stored value, always SI. `undefined`/`null`/NaN while nothing valid is entered. */
  value: number | null | undefined;
  /**
   * Receives SI, or `undefined` while the box is empty or does not hold a number; `entry` says which, so an
   * optional box can tell "left empty" (take the default) from "not a number" (ask again).
   */
  onChange: (si: number | undefined, entry: ParsedEntry['kind']) => void;
  onBlur?: () => void;
  name?: string;
  /** An empty box is a problem (default). The control carries aria-required. */
  required?: boolean;
  /** Also show the required asterisk after the label. */
  markRequired?: boolean;
  /** An error from the form, the schema or the engine. A local typing problem takes precedence. */
  error?: string;
  /** Why the value cannot be used, as a structured problem: a range bound is worded in the box's units. */
  problem?: FieldProblem;
  /** Mark invalid without a message of its own (the message sits on the enclosing block). */
  invalid?: boolean;
  /** Id of a message elsewhere that also describes this box (e.g. "fractions must sum to 1"). */
  describedBy?: string;
  hint?: ReactNode;
  /** Keep the label for screen readers only (table cells whose column head names the quantity). */
  labelHidden?: boolean;
  /** Override the signed-in person's preference (tests, side-by-side views). */
  system?: UnitSystem;
  size?: keyof typeof SIZES;
  disabled?: boolean;
  id?: string;
  inputRef?: Ref<HTMLInputElement>;
  className?: string;
  placeholder?: string;
  /** E.g. spreading a column pasted from a spreadsheet over several boxes (the month table). */
  onPaste?: ClipboardEventHandler<HTMLInputElement>;
}

interface InputState {
  text: string;
  value: number | null | undefined;
  system: UnitSystem;
  problem: 'empty' | 'invalid' | null;
}

/**
 * The one number box for a quantity with a unit: stores SI, shows the person's unit system through the
 * `measure` it is given (m ↔ ft, °C ↔ °F, mm ↔ in with fractions, kPa ↔ psf, W/(m·K) ↔ Btu·in/(h·ft²·°F), …).
 * It never shows "NaN": an empty or unreadable entry is named in words beside the box and `undefined` is handed up.
 */
export function QuantityInput({
  label,
  measure,
  value,
  onChange,
  onBlur,
  name,
  required = true,
  markRequired = false,
  error,
  problem,
  invalid = false,
  describedBy,
  hint,
  labelHidden = false,
  system: override,
  size = 'sheet',
  disabled,
  id,
  inputRef,
  className,
  placeholder,
  onPaste,
}: QuantityInputProps) {
  const preferred = useUnitSystem();
  const system = override ?? preferred;
  const unit = measure.unit(system);
  const [touched, setTouched] = useState(false);
  const [state, setState] = useState<InputState>(() => ({
    text: measure.toText(value, system),
    value,
    system,
    problem: null,
  }));

  // The value changed from outside (form reset, a suggestion applied, "load their revision") or the unit
  // system was switched: re-express the stored SI value. While the box holds an unreadable entry that the
  // parent also sees as blank, keep what was typed.
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : measure.toText(value, system),
      value,
      system,
      problem: keepTyped ? state.problem : null,
    });
  }

  function handleChange(text: string) {
    const parsed = measure.parse(text, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    const local =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    setState({ text, value: si ?? Number.NaN, system, problem: local });
    onChange(si, parsed.kind);
  }

  const inUnit = unit ? ` in ${unit}` : '';
  const example = measure.example?.(system) ?? '12.5';
  const localMessage =
    state.problem === 'invalid'
      ? `Enter a number${inUnit} (for example ${example}); “${state.text.trim()}” is not one.`
      : state.problem === 'empty'
        ? `Enter a value${inUnit}.`
        : undefined;
  const outside = error ?? (problem ? problemText(problem, measure, system) : undefined);
  const shown = (touched || outside ? localMessage : undefined) ?? outside;
  const suffix = unit !== '' && unit.length <= SUFFIX_MAX;
  const sized = SIZES[size];

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
      required={required && markRequired && !labelHidden}
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
            ref={inputRef}
            name={name}
            type="text"
            inputMode={measure.inputMode ?? 'decimal'}
            autoComplete="off"
            spellCheck={false}
            disabled={disabled}
            placeholder={placeholder}
            value={state.text}
            onChange={(e) => handleChange(e.target.value)}
            onPaste={onPaste}
            onBlur={() => {
              setTouched(true);
              onBlur?.();
            }}
            className={
              `num block w-full min-w-0 ${suffix ? 'rounded-l-sm' : 'rounded-sm'} border border-rule-strong ` +
              `bg-paper-raised ${sized.box} text-right text-ink placeholder:text-ink-muted ` +
              'aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution ' +
              'disabled:bg-paper-sunk disabled:text-ink-muted'
            }
          />
          {suffix ? (
            <span
              aria-hidden="true"
              className={`num flex ${sized.unit} items-center justify-center rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk text-ink-muted print:border-0`}
            >
              {unit}
            </span>
          ) : null}
        </div>
      )}
    </Field>
  );
}
