import { type ComponentProps, type FormEventHandler, type ReactNode, useState } from 'react';
import { type DefaultValues, type FieldValues, type Resolver, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { issueWords } from '../../../lib/issue-words';

/** How a library form words its fields: a range in the person's units, an empty text box by its own sentence. */
export interface EntryWords<Values> {
  /** The bound of a field in the person's units with the unit (undefined: a plain number). */
  show?: (field: string, values: Values) => ((si: number) => string) | undefined;
  /** What to say of an empty text box, by field (else the schema's own message). */
  empty?: Record<string, string>;
}

/**
 * Typed text (the person's units) → SI → the shared schema; its reasons land on the typed fields, the first
 * reason per field, worded by issue-words. A missing or unreadable number is worded here.
 */
export function libraryResolver<Values extends FieldValues, Output>(
  schema: z.ZodType<Output>,
  candidate: (values: Values) => unknown,
  words: EntryWords<Values>,
): Resolver<Values, unknown, Output> {
  return async (values) => {
    const parsed = schema.safeParse(candidate(values), { reportInput: true });
    if (parsed.success) return { values: parsed.data, errors: {} };
    const errors: Record<string, { type: string; message: string }> = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? 'name');
      if (errors[key]) continue;
      const message =
        issue.code === 'invalid_type'
          ? (issue as { input?: unknown }).input === undefined
            ? 'Enter a value.'
            : 'Enter a number (for example 0.035).'
          : issue.code === 'too_small' && issue.origin === 'string'
            ? (words.empty?.[key] ?? issue.message)
            : issueWords(issue, words.show?.(key, values));
      errors[key] = { type: issue.code, message };
    }
    return { values: {}, errors } as never;
  };
}

/**
 * The form state of an "add to the firm's library" form: on a valid submit it calls `add`, then names the
 * added entry and empties the form; a failed call leaves the typed values (the caller shows its error).
 */
export function useAddEntry<Values extends FieldValues, Output>({
  empty,
  resolver,
  add,
}: {
  empty: Values;
  resolver: Resolver<Values, unknown, Output>;
  add: (input: Output) => Promise<{ name: string }>;
}) {
  const [added, setAdded] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({ resolver, defaultValues: empty as DefaultValues<Values> });
  const submit = form.handleSubmit(async (input) => {
    setAdded(null);
    await add(input).then(
      (entry) => {
        setAdded(entry.name);
        form.reset(empty);
      },
      () => undefined,
    );
  });
  return { form, submit, added };
}

/** The frame of an add form: heading, the fields in a grid, the submit button with the "added" line, the error. */
export function AddEntryForm({
  label,
  title,
  submitLabel,
  submit,
  isSubmitting,
  added,
  error,
  children,
}: {
  /** The form's accessible name. */
  label: string;
  title: string;
  submitLabel: string;
  submit: FormEventHandler<HTMLFormElement>;
  isSubmitting: boolean;
  added: string | null;
  error: unknown;
  children: ReactNode;
}) {
  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex flex-col gap-3 bg-paper-sunk px-4 py-4"
      aria-label={label}
    >
      <h4 className="font-serif text-lg">{title}</h4>
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">{children}</div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" busy={isSubmitting} busyLabel="Adding…">
          {submitLabel}
        </Button>
        {added ? (
          <p role="status" className="text-sm">
            <span aria-hidden="true">✓ </span>“{added}” added.
          </p>
        ) : null}
      </div>
      {error ? <Notice tone="caution" title={errorMessage(error)} live /> : null}
    </form>
  );
}

/** A compact text box of the add forms. */
export function TextBox(props: ComponentProps<'input'>) {
  return <TextInput {...props} autoComplete="off" className="py-1.5 text-sm" />;
}

/** A compact number box of the add forms (typed in the person's units, read by the resolver). */
export function NumberBox(props: ComponentProps<'input'>) {
  return (
    <TextInput {...props} inputMode="decimal" autoComplete="off" className="num py-1.5 text-right text-sm" />
  );
}
