import type { FormEvent } from 'react';

/**
 * A form's submit handler that runs `act` in place of the browser's submit. A failure is not thrown on: the
 * mutation keeps its error, which the form shows beside its button.
 */
export const submitting =
  (act: () => Promise<unknown>) =>
  async (e: FormEvent): Promise<void> => {
    e.preventDefault();
    try {
      await act();
    } catch {
      // shown by the form, from the mutation's error
    }
  };
