import { useDeferredValue, useMemo } from 'react';

/**
 * A page's calculation, run on its input as React defers it (`useDeferredValue`): while the person types
 * faster than the browser draws, the result stays that of the older input and `stale` is true, so the page
 * marks "updating…" and dims what it drew from that input — never an old chart beside a fresh verdict, because
 * every figure of the page comes from this one result. The input is compared by its JSON (form values are new
 * objects on every render); `deps` are whatever else the calculation reads (units, the saved revision).
 */
export function useDeferredCalculation<I, R>(
  input: I,
  calculate: (input: I) => R,
  deps: readonly unknown[],
): { result: R; stale: boolean } {
  const snapshot = JSON.stringify(input) ?? '';
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for the input (deep)
  const current = useMemo(() => ({ input }), [snapshot]);
  const deferred = useDeferredValue(current);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the calculation is new on every render; deps name what it reads
  const result = useMemo(() => calculate(deferred.input), [deferred, ...deps]);
  return { result, stale: deferred !== current };
}
