import {
  CONTINUITY_FACTOR,
  clipCapacity,
  DEFAULT_DEFLECTION_WIND_FACTOR,
} from '@shared/calc/wind/attachment';
import type { SpanCondition } from '@shared/calc/wind/schema';
import type { ReactNode } from 'react';
import { Controller, type FieldPath, type UseFormReturn, useFieldArray } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Options } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TableScroller, Th } from '../../../components/ui/Table';
import { TextInput } from '../../../components/ui/TextInput';
import { useUnitSystem } from '../../../lib/unit-system';
import { type AttachmentFormValues, blankRow, windFieldId } from '../form';
import { SPAN_CONDITION_LABELS } from '../labels';
import { formatWind, type WindMeasure, windInput, windUnit } from '../units';
import { type AttachmentLibrary, LibraryPick } from './LibraryPick';

type Path = FieldPath<AttachmentFormValues>;

interface Props {
  form: UseFormReturn<AttachmentFormValues>;
  values: AttachmentFormValues;
  errors: Record<string, string>;
  disabled: boolean;
}

/** A unit-aware number box bound to the form at `path`, with its error (schema or engine) beside it. */
export function WindField({
  form,
  path,
  measure,
  label,
  hint,
  errors,
  disabled,
  optional = false,
  labelHidden,
  placeholder,
  className,
}: {
  form: UseFormReturn<AttachmentFormValues>;
  path: Path;
  measure: WindMeasure;
  label: ReactNode;
  hint?: ReactNode;
  errors: Record<string, string>;
  disabled: boolean;
  /** Empty means "take the default" (null), not "missing" (NaN). */
  optional?: boolean;
  labelHidden?: boolean;
  placeholder?: string;
  className?: string;
}) {
  return (
    <Controller
      control={form.control}
      name={path}
      render={({ field }) => (
        <QuantityInput
          id={windFieldId(path)}
          label={label}
          measure={windInput(measure)}
          name={field.name}
          value={typeof field.value === 'number' ? field.value : null}
          // react-hook-form restores the default when a field is set to undefined: NaN keeps "nothing valid here"
          // so the live check names the problem; null is an optional box left empty on purpose.
          onChange={(si, entry) => field.onChange(si ?? (optional && entry === 'empty' ? null : Number.NaN))}
          onBlur={field.onBlur}
          error={errors[path]}
          hint={hint}
          required={!optional}
          markRequired
          disabled={disabled}
          labelHidden={labelHidden}
          placeholder={placeholder}
          className={className}
        />
      )}
    />
  );
}

/** The design spacings the designer chose (m/ft for girts, mm/in for clips). */
export function DesignSpacingInputs({ form, errors, disabled }: Omit<Props, 'values'>) {
  return (
    <div className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
      <WindField
        form={form}
        path="girtSpacing"
        measure="span"
        label="Design girt spacing"
        hint="The panel span. Leave empty to see the maximum spacings only."
        errors={errors}
        disabled={disabled}
        optional
      />
      <WindField
        form={form}
        path="clipSpacing"
        measure="spacing"
        label="Design clip spacing along a girt"
        hint="Usually one clip per panel module, or a multiple of it."
        errors={errors}
        disabled={disabled}
        optional
      />
    </div>
  );
}

/**
 * The maker's data of the panel: its load–span table (rows added and removed; span, allowable inward and outward,
 * the optional deflection column), span condition and deflection limit, the clip capacity (a rated load, or a
 * fastener capacity × fasteners per clip), the module width and the optional factors.
 */
export function PanelInputs({
  form,
  values,
  errors,
  disabled,
  library,
}: Props & { library: AttachmentLibrary | null }) {
  const pick = { form, values, errors, disabled, library };
  const system = useUnitSystem();
  const rows = useFieldArray({ control: form.control, name: 'rows' });
  const pressureUnit = windUnit('pressure', system);
  const spanUnit = windUnit('span', system);
  const condition = values.spanCondition;
  const defaultC = condition ? CONTINUITY_FACTOR[condition as SpanCondition] : null;
  const capacity = (() => {
    try {
      const clip =
        values.clipKind === 'rating'
          ? { allowableLoad: values.allowableLoad }
          : { fastenerCapacity: values.fastenerCapacity, fastenersPerClip: values.fastenersPerClip };
      return clipCapacity(clip);
    } catch {
      return null;
    }
  })();

  return (
    <div className="flex flex-col gap-6">
      <div className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
        <Field
          label="Span condition of the table"
          error={errors.spanCondition}
          id={windFieldId('spanCondition')}
          required
        >
          {(c) => (
            <Select {...c} {...form.register('spanCondition')} disabled={disabled} className="py-1.5 text-sm">
              <option value="" disabled>
                Choose…
              </option>
              <Options
                values={Object.keys(SPAN_CONDITION_LABELS) as SpanCondition[]}
                labels={SPAN_CONDITION_LABELS}
              />
            </Select>
          )}
        </Field>
        <WindField
          form={form}
          path="panelModuleWidth"
          measure="spacing"
          label="Panel module width"
          hint="Tributary width along the girt."
          errors={errors}
          disabled={disabled}
        />
        <WindField
          form={form}
          path="continuityFactor"
          measure="ratio"
          label="Continuity factor C"
          hint={
            defaultC !== null
              ? `Empty: ${defaultC.toFixed(2)} for this span condition (reaction at the interior support).`
              : 'Empty: the default of the span condition.'
          }
          placeholder={defaultC !== null ? defaultC.toFixed(2) : undefined}
          errors={errors}
          disabled={disabled}
          optional
        />
        <WindField
          form={form}
          path="deflectionWindFactor"
          measure="ratio"
          label="Deflection wind factor"
          hint={`Factor on W for the deflection check. Empty: ${DEFAULT_DEFLECTION_WIND_FACTOR} (= ASD).`}
          placeholder={String(DEFAULT_DEFLECTION_WIND_FACTOR)}
          errors={errors}
          disabled={disabled}
          optional
        />
      </div>

      <fieldset className="flex min-w-0 flex-col gap-3">
        <legend className="font-serif text-lg font-semibold">Load–span table (ASD allowables)</legend>
        <LibraryPick kind="panel" {...pick} />
        <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" {...form.register('hasDeflection')} disabled={disabled} />
            The table has a deflection column
          </label>
          <Field
            label="Deflection limit of that column"
            error={errors.deflectionLimit}
            id={windFieldId('deflectionLimit')}
            className="w-48"
          >
            {(c) => (
              <TextInput
                {...c}
                {...form.register('deflectionLimit')}
                disabled={disabled || !values.hasDeflection}
                autoComplete="off"
                className="num py-1.5 text-sm"
              />
            )}
          </Field>
        </div>
        {errors.rows ? (
          <p
            id={`${windFieldId('rows')}-error`}
            className="flex items-start gap-1 text-sm font-medium text-caution"
          >
            <span aria-hidden="true">✕</span>
            <span>{errors.rows}</span>
          </p>
        ) : null}
        <TableScroller labelledBy={`${windFieldId('rows')}-caption`}>
          <table className="w-full min-w-[40rem] border-collapse text-left text-sm" id={windFieldId('rows')}>
            <caption id={`${windFieldId('rows')}-caption`} className="sr-only">
              Load–span table of the panel, one row per span, spans increasing
            </caption>
            <thead>
              <tr>
                <Th className="w-10">Row</Th>
                <Th numeric>Span ({spanUnit})</Th>
                <Th numeric>Allowable inward ({pressureUnit})</Th>
                <Th numeric>Allowable outward ({pressureUnit})</Th>
                {values.hasDeflection ? (
                  <Th numeric>
                    Pressure at {values.deflectionLimit || 'the limit'} ({pressureUnit})
                  </Th>
                ) : null}
                {disabled ? null : (
                  <Th>
                    <span className="sr-only">Remove</span>
                  </Th>
                )}
              </tr>
            </thead>
            <tbody>
              {rows.fields.map((row, i) => (
                <tr key={row.id} className="align-top">
                  <td className="num border-b border-rule px-3 py-2 text-ink-muted">{i + 1}</td>
                  {(
                    [
                      ['span', 'span', 'span'],
                      ['allowableInward', 'pressure', 'allowable inward pressure'],
                      ['allowableOutward', 'pressure', 'allowable outward pressure'],
                      ...(values.hasDeflection
                        ? [['allowableDeflectionPressure', 'pressure', 'deflection pressure'] as const]
                        : []),
                    ] as const
                  ).map(([key, measure, words]) => (
                    <td key={key} className="border-b border-rule px-2 py-1.5">
                      <WindField
                        form={form}
                        path={`rows.${i}.${key}` as Path}
                        measure={measure}
                        label={`Row ${i + 1} ${words}`}
                        labelHidden
                        errors={errors}
                        disabled={disabled}
                      />
                    </td>
                  ))}
                  {disabled ? null : (
                    <td className="border-b border-rule px-2 py-1.5">
                      <Button
                        variant="quiet"
                        className="px-2 py-1"
                        disabled={rows.fields.length <= 2}
                        onClick={() => rows.remove(i)}
                        aria-label={`Remove row ${i + 1}`}
                      >
                        Remove
                      </Button>
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </TableScroller>
        {disabled ? null : (
          <div className="flex flex-wrap items-center gap-3">
            <Button
              variant="secondary"
              onClick={() => rows.append(blankRow())}
              disabled={rows.fields.length >= 100}
            >
              Add a row
            </Button>
            <p className="text-xs text-ink-muted">
              Spans increasing; allowables as the maker publishes them (ASD). At least two rows; the table is
              never extrapolated.
            </p>
          </div>
        )}
      </fieldset>

      <fieldset className="flex min-w-0 flex-col gap-3">
        <legend className="font-serif text-lg font-semibold">Clip capacity (ASD)</legend>
        <LibraryPick kind="clip" {...pick} />
        <div className="flex flex-wrap gap-6 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" value="rating" {...form.register('clipKind')} disabled={disabled} />
            Rated load per clip
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="fasteners" {...form.register('clipKind')} disabled={disabled} />
            Fastener capacity × fasteners per clip
          </label>
        </div>
        <div className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
          {values.clipKind === 'rating' ? (
            <WindField
              form={form}
              path="allowableLoad"
              measure="force"
              label="Allowable load per clip"
              hint="Tested or published, ASD."
              errors={errors}
              disabled={disabled}
            />
          ) : (
            <>
              <WindField
                form={form}
                path="fastenerCapacity"
                measure="force"
                label="Allowable load per fastener"
                hint="Lesser of pull-out and pull-over, ASD."
                errors={errors}
                disabled={disabled}
              />
              <WindField
                form={form}
                path="fastenersPerClip"
                measure="count"
                label="Fasteners per clip"
                errors={errors}
                disabled={disabled}
              />
            </>
          )}
          <div className="flex flex-col justify-end pb-2 text-sm">
            <span className="label-caps">Capacity per clip P</span>
            <span className="num text-base">
              {capacity !== null ? formatWind(capacity, 'force', system) : '—'}
            </span>
          </div>
        </div>
      </fieldset>
    </div>
  );
}
