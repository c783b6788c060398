import type { TraceStep } from '@shared/calc/trace';
import type { ReactNode } from 'react';

const num = (v: number) => {
  if (!Number.isFinite(v)) return '—';
  if (v === 0) return '0';
  const a = Math.abs(v);
  const text = a >= 1e5 || a < 1e-4 ? v.toExponential(3) : Number(v.toPrecision(5)).toString();
  return text.replace(/^-/, '\u2212');
};

const withUnit = (v: number, unit: string) => (unit && unit !== '1' ? `${num(v)}\u202f${unit}` : num(v));

interface ShowTheWorkProps {
  /** The engine's trace, SI as computed. */
  steps: readonly TraceStep[];
  /** What the work is for, e.g. a joint mark; shown after "Show the work". */
  title?: ReactNode;
  className?: string;
}

/** Every step of a calculation: label, formula, inputs with units, value, source, note (SI, as computed). */
export function ShowTheWork({ steps, title, className = 'border-y border-ink' }: ShowTheWorkProps) {
  return (
    <details className={className}>
      <summary className="cursor-pointer py-3 font-serif text-lg font-semibold">
        Show the work{title ? <> — {title}</> : null}{' '}
        <span className="font-sans text-sm font-normal text-ink-muted">
          — {steps.length} steps, SI as computed
        </span>
      </summary>
      <ol className="flex flex-col pb-3">
        {steps.map((s, n) => (
          <li key={s.id} className="grid grid-cols-[2.5rem_1fr] gap-x-3 border-t border-rule py-2 text-sm">
            <span className="num text-right text-ink-muted">{n + 1}</span>
            <div className="flex flex-col gap-1">
              <div className="flex flex-wrap items-baseline justify-between gap-x-4">
                <span className="font-semibold">{s.label}</span>
                <span className="num text-base">= {withUnit(s.value, s.unit)}</span>
              </div>
              <code className="num block text-ink">{s.formula}</code>
              {Object.keys(s.inputs).length > 0 ? (
                <p className="num text-xs text-ink">
                  {Object.entries(s.inputs)
                    .map(([k, v]) => `${k} = ${withUnit(v.value, v.unit)}`)
                    .join(';  ')}
                </p>
              ) : null}
              <p className="text-xs text-ink-muted">Source: {s.source}</p>
              {s.note ? (
                <p className="text-xs">
                  <span aria-hidden="true">▲ </span>
                  <span className="font-semibold">Note:</span> {s.note}
                </p>
              ) : null}
            </div>
          </li>
        ))}
      </ol>
    </details>
  );
}
