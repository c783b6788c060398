import { type ReactNode, useId } from 'react';

/** Props that a Field hands to its control so that label, hint and error are wired for assistive tech. */
export interface FieldControlProps {
  id: string;
  'aria-invalid': boolean;
  'aria-describedby': string | undefined;
  'aria-required'?: boolean;
}

interface FieldProps {
  label: ReactNode;
  /** Unit symbol shown after the label, e.g. "ft" or "°C". */
  unit?: string;
  hint?: ReactNode;
  error?: string;
  required?: boolean;
  /** Pass an id when something outside needs it (e.g. a test or a skip link). */
  id?: string;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
}

/** Messages from shared schemas may start in lower case ("a project needs a name"); show them as sentences. */
const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

export const controlClass =
  'block w-full rounded-sm border border-rule-strong bg-paper-raised px-3 py-2 text-base text-ink ' +
  'placeholder:text-ink-muted aria-[invalid=true]:border-caution aria-[invalid=true]:border-2 ' +
  'disabled:bg-paper-sunk disabled:text-ink-muted';

/** Label + unit + hint + error, one column. The error is text with a glyph, not just a red border. */
export function Field({ label, unit, hint, error, required, id, className = '', children }: FieldProps) {
  const autoId = useId();
  const controlId = id ?? `f${autoId}`;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={controlId} className="text-sm font-semibold text-ink">
        {label}
        {unit ? (
          <span className="num ml-1 font-normal text-ink-muted">
            <span className="sr-only">, in {unit}</span>
            {/* A long unit (Btu·in/(h·ft²·°F)) wraps inside a narrow column rather than run under the next box. */}
            <span aria-hidden="true" className="[overflow-wrap:anywhere]">
              ({unit})
            </span>
          </span>
        ) : null}
        {/* The control carries aria-required; the asterisk is for the eye only. */}
        {required ? (
          <span aria-hidden="true" className="ml-1 font-normal text-ink-muted">
            *
          </span>
        ) : null}
      </label>
      {children({
        id: controlId,
        'aria-invalid': Boolean(error),
        'aria-describedby': describedBy,
        ...(required ? { 'aria-required': true } : {}),
      })}
      {hint ? (
        <p id={hintId} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="flex items-start gap-1 text-sm font-medium text-caution">
          <span aria-hidden="true">✕</span>
          <span>{sentence(error)}</span>
        </p>
      ) : null}
    </div>
  );
}
