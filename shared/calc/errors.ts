/**
 * Thrown by every calculation when an input is physically impossible or outside the method's valid range.
 * `field` is a dotted path into the calculation's input (e.g. `layers.2.thickness`) so the API and the
 * forms can point at the offending value; `reason` says why in a practitioner's words.
 */
export class CalcInputError extends Error {
  readonly field: string;
  readonly reason: string;
  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.name = 'CalcInputError';
    this.field = field;
    this.reason = reason;
  }
}

/** Refuse anything but a finite number strictly greater than zero. */
export function requirePositive(value: number, field: string, what = 'value'): number {
  if (!Number.isFinite(value) || value <= 0)
    throw new CalcInputError(field, `${what} must be a finite number greater than 0 (got ${value})`);
  return value;
}

/** Refuse anything but a finite number ≥ 0. */
export function requireNonNegative(value: number, field: string, what = 'value'): number {
  if (!Number.isFinite(value) || value < 0)
    throw new CalcInputError(field, `${what} must be a finite number of 0 or more (got ${value})`);
  return value;
}

/** Refuse anything outside [min, max] (inclusive). */
export function requireInRange(
  value: number,
  min: number,
  max: number,
  field: string,
  what = 'value',
): number {
  if (!Number.isFinite(value) || value < min || value > max)
    throw new CalcInputError(field, `${what} must lie between ${min} and ${max} (got ${value})`);
  return value;
}
