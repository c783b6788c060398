import { bridgeValueInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Field } from '../../../components/ui/Field';
import { LabelledOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextArea } from '../../../components/ui/TextInput';
import { useUnitSystem } from '../../../lib/unit-system';
import { useAddBridgeValue } from '../api/add-bridge-value';
import { libraryNumber, libraryUnit, parseLibraryNumber } from '../units';
import { AddEntryForm, libraryResolver, NumberBox, TextBox, useAddEntry } from './AddEntryForm';

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

const measureOf = (kind: Values['kind']) => (kind === 'point' ? 'chi' : 'psi');

const bridgeResolver = (system: UnitSystem) =>
  libraryResolver<Values, z.output<typeof bridgeValueInputSchema>>(
    bridgeValueInputSchema,
    (values) => ({ ...values, value: parseLibraryNumber(values.value, measureOf(values.kind), system) }),
    {
      show: (key, values) => {
        const measure = measureOf(values.kind);
        return key === 'value'
          ? (si) => `${libraryNumber(si, measure, system)} ${libraryUnit(measure, system)}`
          : undefined;
      },
      empty: { name: 'Give the value a name (the product or detail it belongs to).' },
    },
  );

/** Add a χ (clip, bracket) or ψ (girt, rail) value with where it came from. */
export function AddBridgeValueForm({ orgId }: { orgId: string }) {
  const system = useUnitSystem();
  const add = useAddBridgeValue();
  const { form, submit, added } = useAddEntry({
    empty: EMPTY,
    resolver: bridgeResolver(system),
    add: (input) => add.mutateAsync({ orgId, input }),
  });
  const {
    register,
    control,
    formState: { errors, isSubmitting },
  } = form;
  const kind = useWatch({ control, name: 'kind' });
  const measure = measureOf(kind);

  return (
    <AddEntryForm
      label="Add a χ or ψ value"
      title="Add a χ or ψ value"
      submitLabel="Add value"
      submit={submit}
      isSubmitting={isSubmitting}
      added={added}
      error={add.error}
    >
      <Field
        label="Name"
        required
        hint="Product and size, e.g. “Thermally broken clip, 100 mm”"
        error={errors.name?.message}
        className="sm:col-span-2"
      >
        {(c) => <TextBox {...c} {...register('name')} />}
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
        {(c) => <NumberBox {...c} {...register('value')} />}
      </Field>
      <Field label="Kind of source" required error={errors.sourceType?.message}>
        {(c) => (
          <Select {...c} {...register('sourceType')} className="py-1.5 text-sm">
            <LabelledOptions options={SOURCE_TYPES} />
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
        {(c) => <TextBox {...c} {...register('source')} />}
      </Field>
      <Field
        label="Notes"
        hint="Optional: test conditions, limits of use."
        error={errors.notes?.message}
        className="sm:col-span-2 lg:col-span-4"
      >
        {(c) => <TextArea {...c} {...register('notes')} rows={2} className="min-h-0 text-sm" />}
      </Field>
    </AddEntryForm>
  );
}
