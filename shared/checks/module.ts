import type { TraceStep } from '../calc/trace';
import type { StoredMessage } from '../format/message-schema';
import type { AssemblyInput } from '../schemas/assembly';
import type { MetricKey } from './criteria';
import type { CheckInput, ProjectForChecks } from './inputs';
import type { Check, MetricOutcome } from './report';

/*
 * The contract between the compliance runner and a calculation module (see runner.ts and modules.ts).
 */

/** A module's own verdict before the runner stamps the module id on it. */
export type ModuleCheck = Omit<Check, 'module' | 'source'>;

/**
 * A calculation module as the runner sees it. A module that lands later (e.g. a fire or acoustic check)
 * plugs in by adding one of these to the registry; the runner does not change.
 * Methods (not function properties) so that a module of any input/result type fits the registry.
 */
export interface CheckModule<I = unknown, R = unknown> {
  id: string;
  label: string;
  /** The metrics this module reports (a criterion reading one of them waits for this module). */
  provides: readonly MetricKey[];
  build(assembly: AssemblyInput, project: ProjectForChecks): CheckInput<I>;
  run(input: I): R;
  metrics(result: R, assembly: AssemblyInput): Partial<Record<MetricKey, MetricOutcome>>;
  verdicts(result: R, assembly: AssemblyInput): ModuleCheck[];
  /** Every trace step of the result, for "show the work" lookups by id. */
  trace(result: R): TraceStep[];
  /** Warnings (messages) and cautions (the calculation's fixed words) the module attaches to its result. */
  cautions(result: R): StoredMessage[];
}

/** Identity helper that keeps a module's input and result types while registering it. */
export const defineCheckModule = <I, R>(m: CheckModule<I, R>): CheckModule<I, R> => m;

/** Signed margin in the criterion's direction: ≥ 0 meets. */
export function marginOf(direction: 'max' | 'min', required: number, provided: number): number {
  return direction === 'max' ? required - provided : provided - required;
}

/** A numeric comparison as a check: status from the sign of the margin (equal meets). */
export function compare(
  direction: 'max' | 'min',
  required: number,
  provided: number,
): Pick<Check, 'margin' | 'marginRatio' | 'status'> {
  const margin = marginOf(direction, required, provided);
  return {
    margin,
    marginRatio: required !== 0 ? margin / Math.abs(required) : null,
    status: margin >= 0 ? 'pass' : 'fail',
  };
}
