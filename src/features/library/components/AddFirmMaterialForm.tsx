import { orgMaterialInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { Field } from '../../../components/ui/Field';
import { useUnitSystem } from '../../../lib/unit-system';
import { type FirmMaterialInput, useAddFirmMaterial } from '../api/add-firm-material';
import { type LibraryMeasure, libraryNumber, libraryUnit, parseLibraryNumber } from '../units';
import { AddEntryForm, libraryResolver, NumberBox, TextBox, useAddEntry } from './AddEntryForm';

interface Values {
  name: string;
  conductivity: string;
  density: string;
  vapourResistanceFactor: string;
  source: string;
}

const EMPTY: Values = { name: '', conductivity: '', density: '', vapourResistanceFactor: '', source: '' };

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
      show: (key) => {
        const measure: LibraryMeasure | undefined =
          key === 'conductivity' ? 'conductivity' : key === 'density' ? 'density' : undefined;
        return measure
          ? (si) => `${libraryNumber(si, measure, system)} ${libraryUnit(measure, system)}`
          : undefined;
      },
      empty: { name: 'Give the material a name.' },
    },
  );

/** Add a material to the firm's library; every value needs its source. */
export function AddFirmMaterialForm({ orgId }: { orgId: string }) {
  const system = useUnitSystem();
  const add = useAddFirmMaterial();
  const { form, submit, added } = useAddEntry({
    empty: EMPTY,
    resolver: materialResolver(system),
    add: (input) => add.mutateAsync({ orgId, input }),
  });
  const {
    register,
    formState: { errors, isSubmitting },
  } = form;

  return (
    <AddEntryForm
      label="Add a firm material"
      title="Add a material"
      submitLabel="Add material"
      submit={submit}
      isSubmitting={isSubmitting}
      added={added}
      error={add.error}
    >
      <Field label="Name" required error={errors.name?.message} className="sm:col-span-2">
        {(c) => <TextBox {...c} {...register('name')} />}
      </Field>
      <Field
        label="λ"
        unit={libraryUnit('conductivity', system)}
        required
        error={errors.conductivity?.message}
      >
        {(c) => <NumberBox {...c} {...register('conductivity')} />}
      </Field>
      <Field
        label="Density ρ"
        unit={libraryUnit('density', system)}
        hint="Optional"
        error={errors.density?.message}
      >
        {(c) => <NumberBox {...c} {...register('density')} />}
      </Field>
      <Field
        label="Vapour resistance factor μ"
        hint="Optional, dimensionless"
        error={errors.vapourResistanceFactor?.message}
      >
        {(c) => <NumberBox {...c} {...register('vapourResistanceFactor')} />}
      </Field>
      <Field
        label="Source"
        required
        hint="Data sheet, test report or table the value comes from (with its date or revision)."
        error={errors.source?.message}
        className="sm:col-span-2 lg:col-span-3"
      >
        {(c) => <TextBox {...c} {...register('source')} />}
      </Field>
    </AddEntryForm>
  );
}
