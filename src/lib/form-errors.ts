import type { UnitSystem } from '@shared/units';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiRequestError } from './api';
import { formatQuantity, type Quantity } from './quantities';

type RawIssue = {
  code?: string;
  origin?: string;
  path?: PropertyKey[];
  input?: unknown;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
};

/**
 * A zod error map for `zodResolver(schema, { error })` that words range errors in the person's units
 * ("must be at most 1968.5 ft") and asks for missing numbers in plain words. Messages written into the
 * shared schema itself (refinements) take precedence over this map, as zod intends.
 */
export function unitAwareErrorMap(quantities: Record<string, Quantity>, system: UnitSystem) {
  return (issue: RawIssue): string | undefined => {
    const key = String(issue.path?.[0] ?? '');
    const q = quantities[key];
    if (issue.code === 'invalid_type' && (issue.input === undefined || issue.input === null)) {
      return q ? 'Enter a value.' : 'Required.';
    }
    if (issue.code === 'invalid_type' && q) return 'Enter a number.';
    if (issue.code === 'invalid_value') return 'Choose one of the listed options.';
    if (issue.origin === 'string' && issue.code === 'too_big')
      return `Use at most ${String(issue.maximum)} characters.`;
    if (q && (issue.code === 'too_small' || issue.code === 'too_big')) {
      const bound = Number(issue.code === 'too_small' ? issue.minimum : issue.maximum);
      const shown = formatQuantity(bound, q, system);
      if (issue.code === 'too_small')
        return issue.inclusive ? `Must be at least ${shown}.` : `Must be more than ${shown}.`;
      return issue.inclusive ? `Must be at most ${shown}.` : `Must be less than ${shown}.`;
    }
    return undefined;
  };
}

/**
 * Put the server's per-field reasons (`error.fields`, dotted paths) onto the form's fields.
 * `prefix` strips a wrapper such as `changes.` from update bodies. Returns the reasons that matched no
 * field so the caller can show them in a notice instead of losing them.
 */
export function applyServerFieldErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  knownFields: readonly string[],
  prefix = '',
): string[] {
  if (!isApiRequestError(error) || !error.fields) return [];
  const unmatched: string[] = [];
  for (const [rawPath, message] of Object.entries(error.fields)) {
    const path = prefix && rawPath.startsWith(prefix) ? rawPath.slice(prefix.length) : rawPath;
    const top = path.split('.')[0] ?? '';
    if (knownFields.includes(top)) setError(path as Path<T>, { type: 'server', message });
    else unmatched.push(`${rawPath}: ${message}`);
  }
  return unmatched;
}
