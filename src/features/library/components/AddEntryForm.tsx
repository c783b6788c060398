import type { UnitSystem } from '@shared/units';
import type { UseMutationResult } from '@tanstack/react-query';
import { type ComponentProps, type ReactNode, useState } from 'react';
import {
  type DefaultValues,
  type FieldValues,
  type Path,
  type Resolver,
  type UseFormReturn,
  useForm,
} from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { LabelledOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { issueWords } from '../../../lib/issue-words';
import { useUnitSystem } from '../../../lib/unit-system';
import { type LibraryMeasure, libraryNumber, libraryUnit } from '../units';

/** How a library form words its fields: a range in the person's units, an empty text box by its own sentence. */
export interface EntryWords<Values> {
  /** The bound of a field in the person's units with the unit (undefined: a plain number). */
  show?: (field: string, values: Values) => ((si: number) => string) | undefined;
  /** What to say of an empty text box, by field (else the schema's own message). */
  empty?: Record<string, string>;
}

/** A bound worded in the person's units with the unit ("0.0069 Btu·in/(h·ft²·°F)"). */
export const shownIn = (measure: LibraryMeasure, system: UnitSystem) => (si: number) =>
  `${libraryNumber(si, measure, system)} ${libraryUnit(measure, system)}`;

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
 * An "add to the firm's library" form: heading, the boxes `fields` draws in a grid, the submit button with the
 * "added" line, the error. Typed values (the person's units) go through `resolver` to `add`; the added entry is
 * named and the form emptied; a failed call leaves the typed values and shows the server's reason.
 */
export function AddEntryForm<Values extends FieldValues, Output>({
  orgId,
  add,
  empty,
  resolver,
  title,
  label = title,
  submitLabel,
  fields,
}: {
  orgId: string;
  add: UseMutationResult<{ name: string }, unknown, { orgId: string; input: Output }>;
  empty: Values;
  resolver: (system: UnitSystem) => Resolver<Values, unknown, Output>;
  title: string;
  /** The form's accessible name (else its title). */
  label?: string;
  submitLabel: string;
  fields: (form: UseFormReturn<Values, unknown, Output>) => ReactNode;
}) {
  const system = useUnitSystem();
  const [added, setAdded] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({
    resolver: resolver(system),
    defaultValues: empty as DefaultValues<Values>,
  });
  const submit = form.handleSubmit(async (input) => {
    setAdded(null);
    await add.mutateAsync({ orgId, input }).then(
      (entry) => {
        setAdded(entry.name);
        form.reset(empty);
      },
      () => undefined,
    );
  });
  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex flex-col gap-3 bg-paper-sunk px-4 py-4"
      aria-label={label}
    >
      <h4 className="font-serif text-lg">{title}</h4>
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">{fields(form)}</div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" busy={form.formState.isSubmitting} busyLabel="Adding…">
          {submitLabel}
        </Button>
        {added ? (
          <p role="status" className="text-sm">
            <span aria-hidden="true">✓ </span>“{added}” added.
          </p>
        ) : null}
      </div>
      {add.error ? <Notice tone="caution" title={errorMessage(add.error)} live /> : null}
    </form>
  );
}

/**
 * One box of an add form: a compact text box (the default), a number box (typed in the person's units of
 * `measure`, read by the resolver), a select of `options`, or a two-line notes box; `className` places it in
 * the form's grid.
 */
export interface EntryField<Values extends FieldValues> {
  name: Path<Values>;
  label: ReactNode;
  box?: 'number' | 'select' | 'notes';
  measure?: LibraryMeasure;
  hint?: string;
  required?: boolean;
  options?: readonly { value: string; label: string }[];
  className?: string;
}

type BoxProps = ComponentProps<'input'> & ComponentProps<'select'> & ComponentProps<'textarea'>;

function Box({ box, options, ...props }: BoxProps & Pick<EntryField<FieldValues>, 'box' | 'options'>) {
  if (box === 'number')
    return (
      <TextInput
        {...props}
        inputMode="decimal"
        autoComplete="off"
        className="num py-1.5 text-right text-sm"
      />
    );
  if (box === 'select')
    return (
      <Select {...props} className="py-1.5 text-sm">
        <LabelledOptions options={options ?? []} />
      </Select>
    );
  if (box === 'notes') return <TextArea {...props} rows={2} className="min-h-0 text-sm" />;
  return <TextInput {...props} autoComplete="off" className="py-1.5 text-sm" />;
}

/** The boxes of an add form, in order, each registered with the form and showing its reason. */
export function EntryFields<Values extends FieldValues, Output>({
  form,
  fields,
}: {
  form: UseFormReturn<Values, unknown, Output>;
  fields: readonly EntryField<Values>[];
}) {
  const system = useUnitSystem();
  const errors = form.formState.errors as Record<string, { message?: string } | undefined>;
  return fields.map(({ name, box, measure, options, ...field }) => (
    <Field
      key={name}
      {...field}
      unit={measure ? libraryUnit(measure, system) : undefined}
      error={errors[name]?.message}
    >
      {(c) => <Box {...c} {...form.register(name)} box={box} options={options} />}
    </Field>
  ));
}
