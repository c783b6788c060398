import { orgMaterialInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { type FirmMaterialInput, useAddFirmMaterial } from '../api/firm-lists';
import { type LibraryMeasure, parseLibraryNumber } from '../units';
import { AddEntryForm, type EntryField, EntryFields, libraryResolver, shownIn } from './AddEntryForm';

/** The boxes as typed (empty to start). */
const EMPTY = { name: '', conductivity: '', density: '', vapourResistanceFactor: '', source: '' };
type Values = typeof EMPTY;

const FIELDS: EntryField<Values>[] = [
  { name: 'name', label: 'Name', required: true, className: 'sm:col-span-2' },
  { name: 'conductivity', label: 'λ', box: 'number', measure: 'conductivity', required: true },
  { name: 'density', label: 'Density ρ', box: 'number', measure: 'density', hint: 'Optional' },
  {
    name: 'vapourResistanceFactor',
    label: 'Vapour resistance factor μ',
    box: 'number',
    hint: 'Optional, dimensionless',
  },
  {
    name: 'source',
    label: 'Source',
    required: true,
    hint: 'Data sheet, test report or table the value comes from (with its date or revision).',
    className: 'sm:col-span-2 lg:col-span-3',
  },
];

const materialResolver = (system: UnitSystem) =>
  libraryResolver<Values, FirmMaterialInput>(
    orgMaterialInputSchema,
    (values) => {
      const num = (t: string, m: LibraryMeasure) => parseLibraryNumber(t, m, system);
      const mu = values.vapourResistanceFactor.trim();
      return {
        name: values.name,
        conductivity: num(values.conductivity, 'conductivity'),
        density: num(values.density, 'density'),
        vapourResistanceFactor: mu === '' ? undefined : Number(mu),
        source: values.source,
      };
    },
    {
      show: (key) => (key === 'conductivity' || key === 'density' ? shownIn(key, system) : undefined),
      empty: { name: 'Give the material a name.' },
    },
  );

/** Add a material to the firm's library; every value needs its source. */
export function AddFirmMaterialForm({ orgId }: { orgId: string }) {
  return (
    <AddEntryForm
      orgId={orgId}
      add={useAddFirmMaterial()}
      empty={EMPTY}
      resolver={materialResolver}
      label="Add a firm material"
      title="Add a material"
      submitLabel="Add material"
      fields={(form) => <EntryFields form={form} fields={FIELDS} />}
    />
  );
}
