import type { UnitSystem } from '@shared/units';
import { type ReactNode, useState } from 'react';
import { type FieldProblem, problemText } from '../../lib/field-problems';
import { parseSheetInput, type SheetMeasure, sheetInputText, sheetUnit } from '../../lib/sheet-units';
import { useUnitSystem } from '../../lib/unit-system';
import { Field } from './Field';

const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

interface QuantityInputProps {
  label: ReactNode;
  measure: SheetMeasure;
  /** Stored value, SI. undefined (blank) or NaN (unreadable) while nothing valid is entered. */
  value: number | null | undefined;
  /**
   * Receives SI. A required box hands up NaN while it is blank or unreadable (the calculation then names
   * the problem); an optional box hands up undefined while blank and NaN while unreadable.
   */
  onChange: (si: number | undefined) => void;
  required?: boolean;
  /** Why the value cannot be used (schema or engine); a local typing problem takes precedence. */
  problem?: FieldProblem;
  hint?: ReactNode;
  id?: string;
  className?: string;
  system?: UnitSystem;
  placeholder?: string;
}

interface InputState {
  text: string;
  value: number | null | undefined;
  system: UnitSystem;
  problem: 'empty' | 'invalid' | null;
}

/**
 * A number box for the joint schedule and the takeoff: stores SI, shows the person's units (mm ⇄ in with
 * fractions, m ⇄ ft, °C ⇄ °F, 10⁻⁶/K ⇄ 10⁻⁶/°F). It never shows NaN; an unreadable entry is named in words.
 */
export function QuantityInput({
  label,
  measure,
  value,
  onChange,
  required = true,
  problem,
  hint,
  id,
  className,
  system: override,
  placeholder,
}: QuantityInputProps) {
  const preferred = useUnitSystem();
  const system = override ?? preferred;
  const unit = sheetUnit(measure, system);
  const [touched, setTouched] = useState(false);
  const [state, setState] = useState<InputState>(() => ({
    text: sheetInputText(value, measure, system),
    value,
    system,
    problem: null,
  }));

  // Value changed from outside (a suggestion applied, "load their revision") or units switched: re-express
  // it, unless the box holds an unreadable entry that the parent also sees as blank.
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : sheetInputText(value, measure, system),
      value,
      system,
      problem: keepTyped ? state.problem : null,
    });
  }

  function handleChange(text: string) {
    const parsed = parseSheetInput(text, measure, system);
    const local =
      parsed.kind === 'invalid' ? 'invalid' : parsed.kind === 'empty' && required ? 'empty' : null;
    const si =
      parsed.kind === 'ok' ? parsed.si : parsed.kind === 'empty' && !required ? undefined : Number.NaN;
    setState({ text, value: si, system, problem: local });
    onChange(si);
  }

  const example = measure === 'joint' && system === 'IP' ? '3/4 or 0.75' : '12.5';
  const localMessage =
    state.problem === 'invalid'
      ? `Enter a number in ${unit} (for example ${example}); “${state.text.trim()}” is not one.`
      : state.problem === 'empty'
        ? `Enter a value in ${unit}.`
        : undefined;
  const shown =
    (touched || problem ? localMessage : undefined) ??
    (problem ? problemText(problem, measure, system) : undefined);

  return (
    <Field label={label} unit={unit} hint={hint} error={shown} id={id} className={className}>
      {(control) => (
        <div className="flex items-stretch">
          <input
            {...control}
            aria-required={required || undefined}
            type="text"
            inputMode={measure === 'joint' || measure === 'spacing' ? 'text' : 'decimal'}
            autoComplete="off"
            spellCheck={false}
            placeholder={placeholder}
            value={state.text}
            onChange={(e) => handleChange(e.target.value)}
            onBlur={() => setTouched(true)}
            className={
              'num block w-full min-w-0 rounded-l-sm border border-rule-strong bg-paper-raised px-2 py-1.5 ' +
              'text-right text-sm text-ink placeholder:text-ink-muted aria-[invalid=true]:border-2 ' +
              'aria-[invalid=true]:border-caution'
            }
          />
          <span
            aria-hidden="true"
            className="num flex min-w-10 items-center justify-center whitespace-nowrap rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk px-1.5 text-xs text-ink-muted"
          >
            {unit}
          </span>
        </div>
      )}
    </Field>
  );
}
