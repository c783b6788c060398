import { zodResolver } from '@hookform/resolvers/zod';
import { CalcInputError } from '@shared/calc/errors';
import { monthlyClimateFromEpw, weatherFileSource } from '@shared/calc/moisture/epw';
import { saturationPressureIso13788 } from '@shared/calc/moisture/psychrometrics';
import { TEXT_MAX } from '@shared/schemas/common';
import type { Project, ProjectClimate } from '@shared/schemas/project';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Link } from 'react-router';
import { EditFormFoot, type EditFormProps } from '../../../components/ui/EditForm';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { NotSaved } from '../../../components/ui/NotSaved';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TableScroller } from '../../../components/ui/Table';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { formatQuantity, parseInput, type Quantity, quantityInput, unitOf } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';
import { type ClimateFormValues, climateErrorMap, climateFormSchema, MONTH_NAMES } from '../climate-form';
import { HUMIDITY_CLASSES, isInventedClimate } from '../humidity-classes';

type Column = 'exteriorTemperature' | 'exteriorRelativeHumidity';
const COLUMNS: { field: Column; quantity: Quantity; words: string }[] = [
  { field: 'exteriorTemperature', quantity: 'temperature', words: 'mean exterior temperature' },
  {
    field: 'exteriorRelativeHumidity',
    quantity: 'relativeHumidity',
    words: 'mean exterior relative humidity',
  },
];

/** A year of hourly EPW records is about 1.6 MB; anything far larger is not one. */
const MAX_WEATHER_FILE_BYTES = 20 * 1024 * 1024;

export const cellId = (month: number, field: Column) => `climate-${month}-${field}`;

interface ClimateFormProps extends EditFormProps<ClimateFormValues, ProjectClimate> {
  project: Project;
  /** Where the project's indoor design conditions are edited, when this person may. */
  indoorHref?: string;
}

/**
 * The project's monthly climate for the moisture check: a 12-row table (January first) of mean exterior
 * temperature and RH in the person's units, where the values come from, and the interior — an ISO 13788
 * humidity class or the project's fixed indoor design conditions. A column pasted from a spreadsheet fills
 * the rows below the box it is pasted into.
 */
export function ClimateForm({ project, indoorHref, ...edit }: ClimateFormProps) {
  const { defaultValues, onSubmit } = edit;
  const system = useUnitSystem();
  const [formError, setFormError] = useState<string[] | null>(null);
  const [pasted, setPasted] = useState<string | null>(null);
  const [imported, setImported] = useState<{ ok: boolean; text: string } | null>(null);
  const {
    control,
    register,
    handleSubmit,
    setValue,
    formState: { errors, isSubmitting, isSubmitted },
  } = useForm<ClimateFormValues, unknown, ProjectClimate>({
    resolver: zodResolver(climateFormSchema, { error: climateErrorMap(system) }),
    defaultValues,
    mode: 'onTouched',
  });
  const values = useWatch({ control }) as ClimateFormValues;

  const submit = handleSubmit(async (climate) => {
    setFormError(null);
    try {
      await onSubmit(climate);
    } catch (e) {
      const fields =
        isApiRequestError(e) && e.fields ? Object.entries(e.fields).map(([k, v]) => `${k}: ${v}`) : [];
      setFormError([errorMessage(e), ...fields]);
    }
  });

  /** Spread pasted rows (values per line, tab between columns) from this box downwards. */
  function pasteFrom(month: number, column: number, text: string) {
    const lines = text
      .replace(/\r/g, '')
      .split('\n')
      .filter((l) => l.trim() !== '');
    let count = 0;
    let unreadable = 0;
    lines.forEach((line, r) => {
      const row = month + r;
      if (row > 11) return;
      line.split('\t').forEach((cell, j) => {
        const col = COLUMNS[column + j];
        if (!col) return;
        const t = cell.trim().replace(/\s*(%|°\s*[CF])$/i, '');
        const parsed = parseInput(t, col.quantity, system);
        if (parsed.kind !== 'ok') unreadable++;
        setValue(`months.${row}.${col.field}`, parsed.kind === 'ok' ? parsed.si : Number.NaN, {
          shouldDirty: true,
          shouldValidate: isSubmitted,
        });
        count++;
      });
    });
    setPasted(
      `Pasted ${count} value${count === 1 ? '' : 's'} from ${MONTH_NAMES[month]} down${unreadable > 0 ? `; ${unreadable} could not be read and are marked ✕` : ''}.`,
    );
  }

  /** Fill the months and the source from an EnergyPlus weather file read in the browser. */
  async function importWeatherFile(file: File) {
    if (file.size > MAX_WEATHER_FILE_BYTES) {
      setImported({ ok: false, text: `${file.name} is larger than a year of hourly weather (over 20 MB).` });
      return;
    }
    try {
      const r = monthlyClimateFromEpw(await file.text());
      r.months.forEach((m, k) => {
        for (const field of ['exteriorTemperature', 'exteriorRelativeHumidity'] as const)
          setValue(`months.${k}.${field}`, m[field], { shouldDirty: true, shouldValidate: isSubmitted });
      });
      setValue('source', weatherFileSource(r, file.name).slice(0, TEXT_MAX.line), {
        shouldDirty: true,
        shouldValidate: isSubmitted,
      });
      setImported({
        ok: true,
        text: `Read ${r.hours} hours of ${r.station.city || 'the station'}${r.skipped ? ` (${r.skipped} with a missing value left out)` : ''}: the 12 monthly means and the source are filled in. Check them, then save.`,
      });
    } catch (e) {
      setImported({
        ok: false,
        text: `${file.name} could not be read: ${e instanceof CalcInputError ? e.reason : 'it is not a text file in the EnergyPlus weather format'}. Nothing was changed.`,
      });
    }
  }

  const monthErrors = errors.months;
  const errorCount =
    (Array.isArray(monthErrors)
      ? monthErrors.filter(Boolean).reduce((n, m) => n + Object.keys(m ?? {}).length, 0)
      : 0) +
    (errors.source ? 1 : 0) +
    (errors.humidityClass ? 1 : 0);

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-8" aria-label="Monthly climate">
      <NotSaved reasons={formError} />

      <fieldset className="border-t border-ink pt-3">
        <legend className="pr-3 font-serif text-lg font-semibold">Where the values come from</legend>
        <Field
          label="Source"
          required
          error={errors.source?.message}
          hint="The weather file, station and period, or the published table the monthly means come from."
          className="mt-3"
        >
          {(c) => <TextInput {...c} {...register('source')} maxLength={500} autoComplete="off" />}
        </Field>
        <div className="mt-4">
          <label htmlFor="climate-weather-file" className="font-semibold">
            Or fill the months from a weather file (.epw)
          </label>
          <p id="climate-weather-file-hint" className="text-sm text-ink-muted">
            An EnergyPlus weather file of the site or the nearest station: the monthly mean temperature and
            the humidity of the mean vapour pressure are computed from its hours, and the station is named as
            the source.
          </p>
          <input
            id="climate-weather-file"
            type="file"
            accept=".epw,text/plain"
            aria-describedby="climate-weather-file-hint"
            className="mt-2 block max-w-full text-sm"
            onChange={(e) => {
              const file = e.currentTarget.files?.[0];
              e.currentTarget.value = '';
              if (file) void importWeatherFile(file);
            }}
          />
          {imported ? (
            <p role="status" className={`mt-2 text-sm ${imported.ok ? '' : 'text-caution'}`}>
              <span aria-hidden="true">{imported.ok ? '✓ ' : '✕ '}</span>
              {imported.text}
            </p>
          ) : null}
        </div>
        {isInventedClimate(values.source ?? '') ? (
          <Notice tone="warning" title="These are invented demo values, not a real place." className="mt-3">
            <p>Replace them with the project’s own monthly means before relying on the result.</p>
          </Notice>
        ) : null}
      </fieldset>

      <fieldset className="border-t border-ink pt-3">
        <legend className="pr-3 font-serif text-lg font-semibold">Monthly means outside</legend>
        <p className="mt-2 text-sm text-ink-muted">
          Mean air temperature and relative humidity of each month. To fill a column, paste the 12 values from
          a spreadsheet into its January box (two columns side by side fill both).
        </p>
        <TableScroller className="mt-3">
          <table className="border-collapse text-left text-sm">
            <caption className="sr-only">Monthly mean exterior temperature and relative humidity</caption>
            <thead>
              <tr>
                <th scope="col" className="border-b-2 border-ink px-2 py-2 font-semibold">
                  Month
                </th>
                <th scope="col" className="border-b-2 border-ink px-2 py-2 font-semibold">
                  θ_e, mean temperature ({unitOf('temperature', system)})
                </th>
                <th scope="col" className="border-b-2 border-ink px-2 py-2 font-semibold">
                  φ_e, mean RH (%)
                </th>
                <th scope="col" className="border-b-2 border-ink px-2 py-2 text-right font-semibold">
                  p_e (Pa)
                </th>
              </tr>
            </thead>
            <tbody>
              {MONTH_NAMES.map((name, k) => {
                const m = values.months?.[k];
                const pe =
                  m && Number.isFinite(m.exteriorTemperature) && Number.isFinite(m.exteriorRelativeHumidity)
                    ? (m.exteriorRelativeHumidity ?? 0) *
                      saturationPressureIso13788(m.exteriorTemperature ?? 0)
                    : null;
                return (
                  <tr key={name} className="align-top">
                    <th scope="row" className="border-b border-rule px-2 py-1.5 text-left font-normal">
                      {name}
                    </th>
                    {COLUMNS.map((col, j) => (
                      <td key={col.field} className="border-b border-rule px-2 py-1.5">
                        <Controller
                          control={control}
                          name={`months.${k}.${col.field}`}
                          render={({ field, fieldState }) => (
                            <QuantityInput
                              id={cellId(k, col.field)}
                              label={`${name} ${col.words}`}
                              labelHidden
                              measure={quantityInput(col.quantity)}
                              value={typeof field.value === 'number' ? field.value : undefined}
                              system={system}
                              onChange={(si) => field.onChange(si ?? Number.NaN)}
                              onBlur={field.onBlur}
                              inputRef={field.ref}
                              error={fieldState.error?.message}
                              onPaste={(e) => {
                                // A column pasted from a spreadsheet: spread it over the rows below.
                                const text = e.clipboardData.getData('text');
                                if (!/[\n\t]/.test(text.trim())) return;
                                e.preventDefault();
                                pasteFrom(k, j, text);
                              }}
                              className="w-28"
                            />
                          )}
                        />
                      </td>
                    ))}
                    <td className="num border-b border-rule px-2 py-1.5 text-right text-ink-muted">
                      {pe === null || !Number.isFinite(pe) ? '—' : pe.toFixed(0)}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </TableScroller>
        {pasted ? (
          <p role="status" className="mt-2 text-sm">
            {pasted}
          </p>
        ) : null}
      </fieldset>

      <fieldset className="border-t border-ink pt-3">
        <legend className="pr-3 font-serif text-lg font-semibold">Inside</legend>
        <div className="mt-3 flex flex-col gap-4">
          <label className="flex items-start gap-2">
            <input type="radio" value="class" {...register('interior')} className="mt-1" />
            <span>
              <span className="font-semibold">An ISO 13788 humidity class</span> (Annex A): the indoor vapour
              pressure follows the outside plus an excess set by the use of the building, largest in cold
              months. The indoor temperature is the project’s,{' '}
              {formatQuantity(project.indoorTempC, 'temperature', system)}.
            </span>
          </label>
          {values.interior === 'class' ? (
            <Field label="Humidity class" error={errors.humidityClass?.message} className="ml-6 max-w-xl">
              {(c) => (
                <Select {...c} {...register('humidityClass', { valueAsNumber: true })}>
                  {HUMIDITY_CLASSES.map((h) => (
                    <option key={h.value} value={h.value}>
                      {`Class ${h.value} — ${h.words} (Δp ${h.excess} Pa at θ_e ≤ 0 °C)`}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
          ) : null}
          <label className="flex items-start gap-2">
            <input type="radio" value="fixed" {...register('interior')} className="mt-1" />
            <span>
              <span className="font-semibold">The project’s fixed indoor design conditions</span>:{' '}
              <span className="num">
                {formatQuantity(project.indoorTempC, 'temperature', system)},{' '}
                {formatQuantity(project.indoorRh, 'relativeHumidity', system)} RH
              </span>{' '}
              in every month (from the site data
              {indoorHref ? (
                <>
                  {' — '}
                  <Link to={indoorHref}>edit them there</Link>
                </>
              ) : null}
              ).
            </span>
          </label>
        </div>
      </fieldset>

      <EditFormFoot edit={edit} busy={isSubmitting} errorCount={errorCount}>
        Save the climate
      </EditFormFoot>
    </form>
  );
}
