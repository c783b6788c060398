import { useState } from 'react';

/**
 * The state of a form that saves a versioned record (a stale version answers 409 with the current record,
 * D-015): the version the edit started from, the form's starting values and a key that starts it afresh, and
 * the conflict when someone saved first — both versions and what this person sent (`mine`).
 */
export function useConflictEdit<R extends { version: number }, F, M>(
  record: R,
  toForm: (record: R) => F,
  conflicting: (error: unknown) => R | null,
) {
  const [base, setBase] = useState<R>(record);
  const [values, setValues] = useState<F>(() => toForm(record));
  const [formKey, setFormKey] = useState(0);
  const [conflict, setConflict] = useState<{ base: R; theirs: R; mine: M } | null>(null);

  /** Sends `mine` with the starting version; another error than a conflict goes to the form. */
  async function save(mine: M, send: (version: number) => Promise<unknown>, onDone: () => void) {
    try {
      await send(base.version);
      onDone();
    } catch (e) {
      const theirs = conflicting(e);
      if (!theirs) throw e;
      setConflict({ base, theirs, mine });
    }
  }

  /** Starts the form again on `next` with `form` in it (the merged values, or the saved ones). */
  function restart(next: R, form: F) {
    setBase(next);
    setValues(form);
    setFormKey((k) => k + 1);
    setConflict(null);
  }

  return { base, values, formKey, conflict, save, restart };
}
