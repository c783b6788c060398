import { bridgeValueInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { type Resolver, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useUnitSystem } from '../../../lib/unit-system';
import { useAddBridgeValue } from '../api/add-bridge-value';
import { libraryNumber, libraryUnit, parseLibraryNumber } from '../units';

type BridgeValueOutput = z.output<typeof bridgeValueInputSchema>;

interface Values {
  name: string;
  kind: 'point' | 'linear';
  value: string;
  sourceType: 'test_report' | 'catalogue' | 'calculation';
  source: string;
  notes: string;
}

const EMPTY: Values = {
  name: '',
  kind: 'point',
  value: '',
  sourceType: 'test_report',
  source: '',
  notes: '',
};

export const SOURCE_TYPES = [
  { value: 'test_report', label: 'Test report' },
  { value: 'catalogue', label: 'Published catalogue' },
  { value: 'calculation', label: 'Calculation (e.g. 3-D model)' },
] as const;

function bridgeResolver(system: UnitSystem): Resolver<Values, unknown, BridgeValueOutput> {
  return async (values) => {
    const measure = values.kind === 'point' ? 'chi' : 'psi';
    const parsed = bridgeValueInputSchema.safeParse({
      ...values,
      value: parseLibraryNumber(values.value, measure, system),
    });
    if (parsed.success) return { values: parsed.data, errors: {} };
    const errors: Record<string, { type: string; message: string }> = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? 'name');
      if (errors[key]) continue;
      const i = issue as { code: string; origin?: string; maximum?: unknown };
      const message =
        i.code === 'invalid_type'
          ? (issue as { input?: unknown }).input === undefined
            ? 'Enter a value.'
            : 'Enter a number (for example 0.035).'
          : i.code === 'too_small' && i.origin === 'string' && key === 'name'
            ? 'Give the value a name (the product or detail it belongs to).'
            : i.code === 'too_small' && i.origin === 'number'
              ? 'Must be 0 or more.'
              : i.code === 'too_big' && i.origin === 'number'
                ? `Must be at most ${libraryNumber(Number(i.maximum), measure, system)} ${libraryUnit(measure, system)}.`
                : issue.message;
      errors[key] = { type: issue.code, message };
    }
    return { values: {}, errors } as never;
  };
}

/** Add a χ (clip, bracket) or ψ (girt, rail) value with where it came from. */
export function AddBridgeValueForm({ orgId }: { orgId: string }) {
  const system = useUnitSystem();
  const add = useAddBridgeValue();
  const [added, setAdded] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    control,
    formState: { errors, isSubmitting },
  } = useForm<Values, unknown, BridgeValueOutput>({ resolver: bridgeResolver(system), defaultValues: EMPTY });
  const kind = useWatch({ control, name: 'kind' });
  const measure = kind === 'point' ? 'chi' : 'psi';

  const submit = handleSubmit(async (input) => {
    setAdded(null);
    await add.mutateAsync({ orgId, input }).then(
      (v) => {
        setAdded(v.name);
        reset(EMPTY);
      },
      () => undefined,
    );
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex flex-col gap-3 bg-paper-sunk px-4 py-4"
      aria-label="Add a χ or ψ value"
    >
      <h4 className="font-serif text-lg">Add a χ or ψ value</h4>
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field
          label="Name"
          required
          hint="Product and size, e.g. “Thermally broken clip, 100 mm”"
          error={errors.name?.message}
          className="sm:col-span-2"
        >
          {(c) => <TextInput {...c} {...register('name')} autoComplete="off" className="py-1.5 text-sm" />}
        </Field>
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-semibold">Kind</legend>
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" value="point" className="accent-ink" {...register('kind')} />
            Point bridge χ (clip, bracket)
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" value="linear" className="accent-ink" {...register('kind')} />
            Linear bridge ψ (girt, rail)
          </label>
        </fieldset>
        <Field
          label={kind === 'point' ? 'χ' : 'ψ'}
          unit={libraryUnit(measure, system)}
          required
          error={errors.value?.message}
        >
          {(c) => (
            <TextInput
              {...c}
              {...register('value')}
              inputMode="decimal"
              autoComplete="off"
              className="num py-1.5 text-right text-sm"
            />
          )}
        </Field>
        <Field label="Kind of source" required error={errors.sourceType?.message}>
          {(c) => (
            <Select {...c} {...register('sourceType')} className="py-1.5 text-sm">
              {SOURCE_TYPES.map((s) => (
                <option key={s.value} value={s.value}>
                  {s.label}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field
          label="Source"
          required
          hint="Report number, catalogue page, or who calculated it and how."
          error={errors.source?.message}
          className="sm:col-span-2 lg:col-span-3"
        >
          {(c) => <TextInput {...c} {...register('source')} autoComplete="off" className="py-1.5 text-sm" />}
        </Field>
        <Field
          label="Notes"
          hint="Optional: test conditions, limits of use."
          error={errors.notes?.message}
          className="sm:col-span-2 lg:col-span-4"
        >
          {(c) => <TextArea {...c} {...register('notes')} rows={2} className="min-h-0 text-sm" />}
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" busy={isSubmitting} busyLabel="Adding…">
          Add value
        </Button>
        {added ? (
          <p role="status" className="text-sm">
            <span aria-hidden="true">✓ </span>“{added}” added.
          </p>
        ) : null}
      </div>
      {add.isError ? <Notice tone="caution" title={errorMessage(add.error)} live /> : null}
    </form>
  );
}
