import { orgMaterialInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { type Resolver, useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useUnitSystem } from '../../../lib/unit-system';
import { type FirmMaterialInput, useAddFirmMaterial } from '../api/add-firm-material';
import { type LibraryMeasure, libraryNumber, libraryUnit, parseLibraryNumber } from '../units';

interface Values {
  name: string;
  conductivity: string;
  density: string;
  vapourResistanceFactor: string;
  source: string;
}

const EMPTY: Values = { name: '', conductivity: '', density: '', vapourResistanceFactor: '', source: '' };

/** Typed text (the person's units) → SI → the shared schema; its reasons land on the typed fields. */
function materialResolver(system: UnitSystem): Resolver<Values, unknown, FirmMaterialInput> {
  return async (values) => {
    const num = (t: string, m: LibraryMeasure) => parseLibraryNumber(t, m, system);
    const mu =
      values.vapourResistanceFactor.trim() === '' ? undefined : Number(values.vapourResistanceFactor.trim());
    const candidate = {
      name: values.name,
      conductivity: num(values.conductivity, 'conductivity'),
      density: num(values.density, 'density'),
      vapourResistanceFactor: mu,
      source: values.source,
    };
    const parsed = orgMaterialInputSchema.safeParse(candidate);
    if (parsed.success) return { values: parsed.data, errors: {} };
    const errors: Record<string, { type: string; message: string }> = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? 'name');
      if (errors[key]) continue;
      const measure: LibraryMeasure | undefined =
        key === 'conductivity' ? 'conductivity' : key === 'density' ? 'density' : undefined;
      const bound = (b: unknown) =>
        measure ? `${libraryNumber(Number(b), measure, system)} ${libraryUnit(measure, system)}` : String(b);
      const i = issue as {
        code: string;
        origin?: string;
        minimum?: unknown;
        maximum?: unknown;
        inclusive?: boolean;
      };
      const message =
        i.code === 'invalid_type'
          ? (issue as { input?: unknown }).input === undefined
            ? 'Enter a value.'
            : 'Enter a number (for example 0.035).'
          : i.code === 'too_small' && i.origin === 'string'
            ? key === 'name'
              ? 'Give the material a name.'
              : issue.message
            : i.code === 'too_small'
              ? i.inclusive
                ? `Must be at least ${bound(i.minimum)}.`
                : `Must be more than ${bound(i.minimum)}.`
              : i.code === 'too_big'
                ? `Must be at most ${bound(i.maximum)}.`
                : issue.message;
      errors[key] = { type: issue.code, message };
    }
    return { values: {}, errors } as never;
  };
}

/** Add a material to the firm's library; every value needs its source. */
export function AddFirmMaterialForm({ orgId }: { orgId: string }) {
  const system = useUnitSystem();
  const add = useAddFirmMaterial();
  const [added, setAdded] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<Values, unknown, FirmMaterialInput>({
    resolver: materialResolver(system),
    defaultValues: EMPTY,
  });

  const submit = handleSubmit(async (input) => {
    setAdded(null);
    await add.mutateAsync({ orgId, input }).then(
      (m) => {
        setAdded(m.name);
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
      aria-label="Add a firm material"
    >
      <h4 className="font-serif text-lg">Add a material</h4>
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Name" required error={errors.name?.message} className="sm:col-span-2">
          {(c) => <TextInput {...c} {...register('name')} autoComplete="off" className="py-1.5 text-sm" />}
        </Field>
        <Field
          label="λ"
          unit={libraryUnit('conductivity', system)}
          required
          error={errors.conductivity?.message}
        >
          {(c) => (
            <TextInput
              {...c}
              {...register('conductivity')}
              inputMode="decimal"
              autoComplete="off"
              className="num py-1.5 text-right text-sm"
            />
          )}
        </Field>
        <Field
          label="Density ρ"
          unit={libraryUnit('density', system)}
          hint="Optional"
          error={errors.density?.message}
        >
          {(c) => (
            <TextInput
              {...c}
              {...register('density')}
              inputMode="decimal"
              autoComplete="off"
              className="num py-1.5 text-right text-sm"
            />
          )}
        </Field>
        <Field
          label="Vapour resistance factor μ"
          hint="Optional, dimensionless"
          error={errors.vapourResistanceFactor?.message}
        >
          {(c) => (
            <TextInput
              {...c}
              {...register('vapourResistanceFactor')}
              inputMode="decimal"
              autoComplete="off"
              className="num py-1.5 text-right text-sm"
            />
          )}
        </Field>
        <Field
          label="Source"
          required
          hint="Data sheet, test report or table the value comes from (with its date or revision)."
          error={errors.source?.message}
          className="sm:col-span-2 lg:col-span-3"
        >
          {(c) => <TextInput {...c} {...register('source')} autoComplete="off" className="py-1.5 text-sm" />}
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" busy={isSubmitting} busyLabel="Adding…">
          Add material
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
