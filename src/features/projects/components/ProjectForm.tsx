import { zodResolver } from '@hookform/resolvers/zod';
import { CLIMATE_ZONES, type ProjectInput, projectInputSchema } from '@shared/schemas/project';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { EditFormFoot, type EditFormProps } from '../../../components/ui/EditForm';
import { Field } from '../../../components/ui/Field';
import { NotSaved } from '../../../components/ui/NotSaved';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { applyServerFieldErrors, unitAwareErrorMap } from '../../../lib/form-errors';
import {
  PROJECT_FIELD_LABELS as L,
  PROJECT_FIELD_QUANTITIES,
  PROJECT_INPUT_FIELDS,
  type ProjectQuantityField,
} from '../../../lib/project-fields';
import { quantityInput as quantityMeasure } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';

export type ProjectFormValues = z.input<typeof projectInputSchema>;

const HINTS: Partial<Record<ProjectQuantityField, string>> = {
  buildingHeightM: 'h, as used for wind pressure on the walls.',
  winterDesignTempC: 'Heating design dry-bulb for the site, e.g. the 99.6 % value.',
  summerDesignTempC: 'Cooling design dry-bulb for the site, e.g. the 0.4 % value.',
  indoorRh: 'Relative humidity held indoors in the heating season.',
};

const GROUPS: { legend: string; fields: ProjectQuantityField[] }[] = [
  { legend: 'Building', fields: ['buildingHeightM', 'planLengthM', 'planWidthM'] },
  {
    legend: 'Design conditions',
    fields: ['indoorTempC', 'indoorRh', 'winterDesignTempC', 'summerDesignTempC'],
  },
];

interface ProjectFormProps extends EditFormProps<Partial<ProjectFormValues>, ProjectInput> {
  submitLabel: string;
  busyLabel?: string;
}

const fieldset = 'border-t border-ink pt-3';
const legend = 'pr-3 font-serif text-lg font-semibold';
const grid = 'mt-3 grid gap-x-6 gap-y-5 sm:grid-cols-2';

export function ProjectForm({ submitLabel, busyLabel, ...edit }: ProjectFormProps) {
  const { defaultValues, onSubmit } = edit;
  const system = useUnitSystem();
  const [formError, setFormError] = useState<string[] | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ProjectFormValues, unknown, ProjectInput>({
    resolver: zodResolver(projectInputSchema, { error: unitAwareErrorMap(PROJECT_FIELD_QUANTITIES, system) }),
    defaultValues,
    mode: 'onTouched',
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (e) {
      const unmatched = applyServerFieldErrors(e, setError, PROJECT_INPUT_FIELDS, 'changes.');
      const hasFieldErrors =
        isApiRequestError(e) && e.fields && Object.keys(e.fields).length > unmatched.length;
      if (hasFieldErrors && unmatched.length === 0)
        setFormError(['Some values were not accepted — see the fields marked ✕.']);
      else setFormError([errorMessage(e), ...unmatched]);
    }
  });

  const errorCount = Object.keys(errors).length;

  const quantityInput = (name: ProjectQuantityField) => (
    <Controller
      key={name}
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <QuantityInput
          label={L[name]}
          measure={quantityMeasure(PROJECT_FIELD_QUANTITIES[name])}
          name={field.name}
          value={field.value}
          // react-hook-form falls back to the default value when a field is set to `undefined`, which would
          // silently restore the old number; NaN keeps "nothing valid here" and the schema refuses it.
          onChange={(si) => field.onChange(si ?? Number.NaN)}
          onBlur={field.onBlur}
          inputRef={field.ref}
          error={fieldState.error?.message}
          hint={HINTS[name]}
          required
          markRequired
          size="form"
        />
      )}
    />
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-8" aria-label="Project and site data">
      <NotSaved reasons={formError} />

      <fieldset className={fieldset}>
        <legend className={legend}>Project</legend>
        <div className={grid}>
          <Field label={L.name} error={errors.name?.message} required className="sm:col-span-2">
            {(c) => <TextInput {...c} {...register('name')} autoComplete="off" />}
          </Field>
          <Field label={L.number} hint="Your office's job number, if any." error={errors.number?.message}>
            {(c) => <TextInput {...c} {...register('number')} autoComplete="off" className="num" />}
          </Field>
          <Field label={L.description} error={errors.description?.message} className="sm:col-span-2">
            {(c) => <TextArea {...c} {...register('description')} rows={3} />}
          </Field>
        </div>
      </fieldset>

      <fieldset className={fieldset}>
        <legend className={legend}>Site</legend>
        <div className={grid}>
          <Field label={L.siteAddress} error={errors.siteAddress?.message} className="sm:col-span-2">
            {(c) => <TextArea {...c} {...register('siteAddress')} rows={2} autoComplete="street-address" />}
          </Field>
          <Field
            label={L.climateZone}
            hint="Moisture regime: A moist, B dry, C marine."
            error={errors.climateZone?.message}
            required
          >
            {(c) => (
              <Select {...c} {...register('climateZone')} defaultValue={defaultValues.climateZone ?? ''}>
                <option value="" disabled>
                  Choose a zone…
                </option>
                {CLIMATE_ZONES.map((z) => (
                  <option key={z} value={z}>
                    {z}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          {quantityInput('elevationM')}
        </div>
      </fieldset>

      {GROUPS.map((g) => (
        <fieldset key={g.legend} className={fieldset}>
          <legend className={legend}>{g.legend}</legend>
          <div className={grid}>{g.fields.map(quantityInput)}</div>
        </fieldset>
      ))}

      <EditFormFoot edit={edit} busy={isSubmitting} busyLabel={busyLabel} errorCount={errorCount}>
        {submitLabel}
      </EditFormFoot>
    </form>
  );
}

/** The form's starting values for an existing project. */
export function projectToFormValues(p: ProjectInput): ProjectFormValues {
  return {
    name: p.name,
    number: p.number,
    description: p.description,
    siteAddress: p.siteAddress,
    climateZone: p.climateZone,
    elevationM: p.elevationM,
    buildingHeightM: p.buildingHeightM,
    planLengthM: p.planLengthM,
    planWidthM: p.planWidthM,
    indoorTempC: p.indoorTempC,
    indoorRh: p.indoorRh,
    winterDesignTempC: p.winterDesignTempC,
    summerDesignTempC: p.summerDesignTempC,
  };
}
