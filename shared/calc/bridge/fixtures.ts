import { CalcInputError } from '../errors';

/** For tests: the field a calculation's refusal names, or 'accepted' when it runs. */
export function refusedField(run: () => unknown): string {
  try {
    run();
  } catch (e) {
    if (e instanceof CalcInputError) return e.field;
    throw e;
  }
  return 'accepted';
}
