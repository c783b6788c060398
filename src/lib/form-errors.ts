import type { UnitSystem } from '@shared/units';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiRequestError } from './api';
import { issueErrorMap } from './issue-words';
import { formatQuantity, type Quantity } from './quantities';

/**
 * A zod error map for `zodResolver(schema, { error })` in the one wording of zod issues (`issue-words.ts`), with
 * the bound of a quantity field (by its top-level key) in the person's units ("must be at most 1968.5 ft").
 */
export function unitAwareErrorMap(quantities: Record<string, Quantity>, system: UnitSystem) {
  return issueErrorMap((issue) => {
    const q = quantities[String(issue.path?.[0] ?? '')];
    return q ? (si) => formatQuantity(si, q, system) : undefined;
  });
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
