import type { FormEvent } from 'react';

/**
 * A form's submit handler that sends through a mutation whose failure the form shows from the mutation's own
 * `error`: the rejection is caught here, so it is neither lost nor reported twice.
 */
export const submitShowingError = (send: () => Promise<unknown>) => async (e: FormEvent) => {
  e.preventDefault();
  try {
    await send();
  } catch {
    // shown by the form from the mutation's error
  }
};
