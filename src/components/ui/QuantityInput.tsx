import type { UnitSystem } from '@shared/units';
import { parseTypedQuantity } from '@shared/units/parse';
import { type ClipboardEventHandler, type ReactNode, type Ref, useId, useState } from 'react';
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
  /** A calculation page (assembly, wind, joints, takeoff): compact, many boxes to a row. */
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
  /** Why a number typed with a unit cannot be used ("“3.5 kg” is a mass; …"), in the parser's words. */
  reason?: string;
  /** The entry was read through its unit: on blur or Enter the box shows the number in its own unit. */
  viaUnit?: { converted: boolean };
  /** The conversion last made ("3.5 in → 88.9 mm"), shown under the box until the next edit. */
  note?: string;
}

/**
 * What was typed: the measure's own reading (a plain number, inch fractions) or, failing that, a number with a
 * unit converted to the box's unit by the units layer and read by the measure from there (so the SI value comes
 * from the same adapter as a plain number's).
 */
function readEntry(text: string, measure: InputMeasure, system: UnitSystem) {
  const parsed = measure.parse(text, system);
  if (parsed.kind !== 'invalid') return { parsed };
  const typed = parseTypedQuantity(text, measure.unit(system));
  if (typed.kind === 'invalid')
    return { parsed, reason: typed.why === 'not_a_number' ? undefined : typed.reason };
  if (typed.kind === 'ok') {
    const inBox = measure.parse(String(typed.value), system);
    if (inBox.kind === 'ok') return { parsed: inBox, viaUnit: { converted: typed.converted } };
  }
  return { parsed };
}

/**
 * The one number box for a quantity with a unit: stores SI, shows the person's unit system through the
 * `measure` it is given (m ↔ ft, °C ↔ °F, mm ↔ in with fractions, kPa ↔ psf, W/(m·K) ↔ Btu·in/(h·ft²·°F), …).
 * It never shows "NaN": an empty or unreadable entry is named in words beside the box and `undefined` is handed up.
 * A number typed with a unit ("3.5 in" in a mm box, "1 5/8 in", "2' 6\"", "50 °F") is handed up as SI at once
 * and, on blur or Enter, rewritten in the box's unit with the conversion under the box ("3.5 in → 88.9 mm");
 * a unit of another kind is refused with the reason ("“3.5 kg” is a mass; this box takes a length (mm)").
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
  const noteId = `${useId()}-conversion`;
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
      // The reason, in this system's units, for an unreadable entry that is kept.
      reason: keepTyped ? readEntry(state.text, measure, system).reason : undefined,
    });
  }

  function handleChange(text: string) {
    const { parsed, reason, viaUnit } = readEntry(text, measure, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    const local =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    setState({ text, value: si ?? Number.NaN, system, problem: local, reason, viaUnit });
    onChange(si, parsed.kind);
  }

  /** Blur or Enter: an entry read through its unit is rewritten in the box's unit, the conversion shown. */
  function commit() {
    const { viaUnit, value: si } = state;
    if (!viaUnit || si == null || Number.isNaN(si)) return;
    const text = measure.toText(si, system);
    const note = viaUnit.converted
      ? `${state.text.trim()} → ${text}${unit ? `\u202f${unit}` : ''}`
      : undefined;
    setState({ ...state, text, viaUnit: undefined, note });
  }

  const inUnit = unit ? ` in ${unit}` : '';
  const example = measure.example?.(system) ?? '12.5';
  const localMessage =
    state.problem === 'invalid'
      ? (state.reason ??
        `Enter a number${inUnit} (for example ${example}); “${state.text.trim()}” is not one.`)
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
        <>
          <div className="flex items-stretch">
            <input
              {...control}
              aria-invalid={control['aria-invalid'] || invalid}
              aria-describedby={
                [control['aria-describedby'], describedBy, state.note ? noteId : undefined]
                  .filter(Boolean)
                  .join(' ') || undefined
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
              onKeyDown={(e) => {
                // Enter shows the conversion first; it submits the form only when nothing is left to convert.
                if (e.key === 'Enter' && state.viaUnit) {
                  e.preventDefault();
                  commit();
                }
              }}
              onBlur={() => {
                commit();
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
          {/* Always in the page, so that a screen reader announces the conversion when it appears. */}
          <p id={noteId} aria-live="polite" className={state.note ? 'num text-xs text-ink-muted' : 'sr-only'}>
            {state.note}
          </p>
        </>
      )}
    </Field>
  );
}
