import type { UnitSystem } from '@shared/units';
import { type ClipboardEvent, type Ref, useState } from 'react';
import { parseInput, type Quantity, toInputText, unitOf } from '../../../lib/quantities';

const isBlank = (v: number | null | undefined) => v == null || Number.isNaN(v);

interface ClimateCellProps {
  id: string;
  /** Read by screen readers: "January mean exterior temperature". */
  label: string;
  quantity: Quantity;
  value: number | undefined;
  system: UnitSystem;
  onChange: (si: number | undefined) => void;
  onBlur?: () => void;
  /** Text pasted with several values (a column from a spreadsheet): the form spreads it over the rows. */
  onPasteMany?: (text: string) => void;
  error?: string;
  inputRef?: Ref<HTMLInputElement>;
}

/**
 * A number box in the month table: stores SI, shows °C/°F or %, and never shows NaN. An unreadable entry
 * is kept as typed and named in words beneath the box.
 */
export function ClimateCell({
  id,
  label,
  quantity,
  value,
  system,
  onChange,
  onBlur,
  onPasteMany,
  error,
  inputRef,
}: ClimateCellProps) {
  const unit = unitOf(quantity, system);
  const [state, setState] = useState(() => ({
    text: toInputText(value, quantity, system),
    value,
    system,
    invalid: false,
  }));
  if (!Object.is(state.value, value) || state.system !== system) {
    const keepTyped = isBlank(value) && isBlank(state.value);
    setState({
      text: keepTyped ? state.text : toInputText(value, quantity, system),
      value,
      system,
      invalid: keepTyped ? state.invalid : false,
    });
  }

  function handleChange(text: string) {
    const parsed = parseInput(text, quantity, system);
    const si = parsed.kind === 'ok' ? parsed.si : undefined;
    setState({ text, value: si ?? Number.NaN, system, invalid: parsed.kind === 'invalid' });
    onChange(si);
  }

  function handlePaste(e: ClipboardEvent<HTMLInputElement>) {
    const text = e.clipboardData.getData('text');
    if (!onPasteMany || !/[\n\t]/.test(text.trim())) return;
    e.preventDefault();
    onPasteMany(text);
  }

  const message = state.invalid ? `Enter a number in ${unit}; “${state.text.trim()}” is not one.` : error;
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-0.5">
      <div className="flex items-stretch">
        <input
          id={id}
          ref={inputRef}
          aria-label={`${label}, ${unit}`}
          aria-invalid={Boolean(message)}
          aria-describedby={message ? errorId : undefined}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={state.text}
          onChange={(e) => handleChange(e.target.value)}
          onBlur={onBlur}
          onPaste={handlePaste}
          className={
            'num block w-24 min-w-0 rounded-l-sm border border-rule-strong bg-paper-raised px-2 py-1 text-right text-sm ' +
            'text-ink aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution'
          }
        />
        <span
          aria-hidden="true"
          className="num flex min-w-8 items-center justify-center rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk px-1 text-xs text-ink-muted"
        >
          {unit}
        </span>
      </div>
      {message ? (
        <p id={errorId} className="flex gap-1 text-xs font-medium text-caution">
          <span aria-hidden="true">✕</span>
          <span>{message}</span>
        </p>
      ) : null}
    </div>
  );
}
