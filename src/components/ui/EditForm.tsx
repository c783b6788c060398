import type { ReactNode } from 'react';
import { FormSaveBar } from './FormSaveBar';

/** What an editor hands the form it shows (site data, climate); a new project's page hands the same. */
export interface EditFormProps<V, Out> {
  defaultValues: V;
  /** Throw to report a failure; field reasons from the server are put onto the fields. */
  onSubmit: (values: Out) => Promise<void>;
  onCancel?: () => void;
  /** Rendered above the buttons (e.g. the "someone else saved first" notice). */
  banner?: ReactNode;
  /** Disable saving while the parent resolves something (e.g. a version conflict). */
  submitDisabled?: boolean;
}

/** A versioned editor's form: its starting values and save, back to the page, and saving held while a conflict is open. */
export const editFormProps = <V, Out>(
  defaultValues: V,
  onSubmit: (values: Out) => Promise<void>,
  onCancel: () => void,
  banner: ReactNode,
  conflicted: boolean,
): EditFormProps<V, Out> => ({ defaultValues, onSubmit, onCancel, banner, submitDisabled: conflicted });

/** The foot of such a form: the editor's banner, then save (its words the children), cancel, values to fix. */
export function EditFormFoot({
  edit,
  busy,
  busyLabel,
  errorCount,
  children,
}: {
  edit: EditFormProps<unknown, never>;
  busy: boolean;
  busyLabel?: string;
  errorCount: number;
  children: ReactNode;
}) {
  return (
    <>
      {edit.banner}
      <FormSaveBar
        busy={busy}
        busyLabel={busyLabel}
        disabled={edit.submitDisabled}
        onCancel={edit.onCancel}
        errorCount={errorCount}
      >
        {children}
      </FormSaveBar>
    </>
  );
}
