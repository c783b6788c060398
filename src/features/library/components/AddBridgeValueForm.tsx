import { bridgeValueInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { type UseFormReturn, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { useAddBridgeValue } from '../api/firm-lists';
import { parseLibraryNumber } from '../units';
import { AddEntryForm, type EntryField, EntryFields, libraryResolver, shownIn } from './AddEntryForm';

type BridgeValueInput = z.output<typeof bridgeValueInputSchema>;

/** The boxes as typed (empty to start). */
const EMPTY = {
  name: '',
  kind: 'point' as BridgeValueInput['kind'],
  value: '',
  sourceType: 'test_report' as BridgeValueInput['sourceType'],
  source: '',
  notes: '',
};
type Values = typeof EMPTY;

export const SOURCE_TYPES = [
  { value: 'test_report', label: 'Test report' },
  { value: 'catalogue', label: 'Published catalogue' },
  { value: 'calculation', label: 'Calculation (e.g. 3-D model)' },
] as const;

const measureOf = (kind: Values['kind']) => (kind === 'point' ? 'chi' : 'psi');

const NAME: EntryField<Values> = {
  name: 'name',
  label: 'Name',
  required: true,
  hint: 'Product and size, e.g. “Thermally broken clip, 100 mm”',
  className: 'sm:col-span-2',
};

/** The value (χ or ψ, by the chosen kind) and where it came from. */
const valueFields = (kind: Values['kind']): EntryField<Values>[] => [
  {
    name: 'value',
    label: kind === 'point' ? 'χ' : 'ψ',
    box: 'number',
    measure: measureOf(kind),
    required: true,
  },
  { name: 'sourceType', label: 'Kind of source', box: 'select', options: SOURCE_TYPES, required: true },
  {
    name: 'source',
    label: 'Source',
    required: true,
    hint: 'Report number, catalogue page, or who calculated it and how.',
    className: 'sm:col-span-2 lg:col-span-3',
  },
  {
    name: 'notes',
    label: 'Notes',
    box: 'notes',
    hint: 'Optional: test conditions, limits of use.',
    className: 'sm:col-span-2 lg:col-span-4',
  },
];

const bridgeResolver = (system: UnitSystem) =>
  libraryResolver<Values, BridgeValueInput>(
    bridgeValueInputSchema,
    (values) => ({ ...values, value: parseLibraryNumber(values.value, measureOf(values.kind), system) }),
    {
      show: (key, values) => (key === 'value' ? shownIn(measureOf(values.kind), system) : undefined),
      empty: { name: 'Give the value a name (the product or detail it belongs to).' },
    },
  );

/** Add a χ (clip, bracket) or ψ (girt, rail) value with where it came from. */
export function AddBridgeValueForm({ orgId }: { orgId: string }) {
  return (
    <AddEntryForm
      orgId={orgId}
      add={useAddBridgeValue()}
      empty={EMPTY}
      resolver={bridgeResolver}
      title="Add a χ or ψ value"
      submitLabel="Add value"
      fields={(form) => <BridgeValueFields form={form} />}
    />
  );
}

function BridgeValueFields<Output>({ form }: { form: UseFormReturn<Values, unknown, Output> }) {
  const kind = useWatch({ control: form.control, name: 'kind' });
  return (
    <>
      <EntryFields form={form} fields={[NAME]} />
      <fieldset className="flex flex-col gap-1">
        <legend className="text-sm font-semibold">Kind</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" value="point" className="accent-ink" {...form.register('kind')} />
          Point bridge χ (clip, bracket)
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" value="linear" className="accent-ink" {...form.register('kind')} />
          Linear bridge ψ (girt, rail)
        </label>
      </fieldset>
      <EntryFields form={form} fields={valueFields(kind)} />
    </>
  );
}
