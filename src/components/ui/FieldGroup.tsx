import type { ReactNode } from 'react';
import { type FieldProblem, fieldDomId, problemText } from '../../lib/field-problems';
import { useUnitSystem } from '../../lib/unit-system';

/** A problem on a group of boxes (a range, a union, a list) rather than on one box. */
export function GroupProblem({ path, problem }: { path: string; problem: FieldProblem | undefined }) {
  const system = useUnitSystem();
  if (!problem) return null;
  return (
    <p
      id={fieldDomId(path)}
      tabIndex={-1}
      className="flex items-start gap-1 text-sm font-medium text-caution"
    >
      <span aria-hidden="true">✕</span>
      <span>{problemText(problem, undefined, system)}</span>
    </p>
  );
}

/** One ruled group of boxes in an editor (joints, takeoff), with an optional note under its legend. */
export function FieldGroup({
  legend,
  children,
  note,
}: {
  legend: string;
  children: ReactNode;
  note?: ReactNode;
}) {
  return (
    <fieldset className="flex flex-col gap-3 border-t border-rule pt-3">
      <legend className="label-caps pr-2">{legend}</legend>
      {note ? <p className="-mt-1 text-xs text-ink-muted">{note}</p> : null}
      {children}
    </fieldset>
  );
}
