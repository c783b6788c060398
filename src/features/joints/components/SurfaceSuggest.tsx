import type { TemperatureRange } from '@shared/calc/joints/schema';
import {
  defaultSurfaceTemperatureRange,
  EXPOSURES,
  type Exposure,
  NIGHT_SKY_DROP,
  SURFACE_FINISHES,
  SURFACE_RISE_ABOVE_AIR,
  type SurfaceFinish,
} from '@shared/calc/joints/surface-temperature';
import { formatPageRange } from '@shared/format/page-measures';
import { toShown } from '@shared/units';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Options } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { calcProblem, type FieldProblem } from '../../../lib/field-problems';
import { pageInput } from '../../../lib/input-measure';
import { useUnitSystem } from '../../../lib/unit-system';
import type { AirDesign } from '../draft';
import { EXPOSURE_LABELS, FINISH_LABELS } from '../labels';

/** A temperature difference: "40 K" in SI, "72 °F" in IP. */
const delta = (k: number, system: 'SI' | 'IP') =>
  system === 'IP' ? `${Math.round(toShown(k, 'temperatureDifference', 'IP'))} °F` : `${k} K`;

/**
 * "Suggest from finish & exposure": the surface range from the air design range by the trade-practice
 * allowances in shared/calc/joints/surface-temperature.ts. Offered, never applied without a click.
 */
export function SurfaceSuggest({
  air,
  onUse,
}: {
  air: AirDesign | null;
  onUse: (range: TemperatureRange) => void;
}) {
  const system = useUnitSystem();
  const id = useId();
  const [airMin, setAirMin] = useState<number>(air?.min ?? -20);
  const [airMax, setAirMax] = useState<number>(air?.max ?? 35);
  const [finish, setFinish] = useState<SurfaceFinish>('medium');
  const [exposure, setExposure] = useState<Exposure>('sun');

  let suggestion: TemperatureRange | null = null;
  let problem: FieldProblem | undefined;
  try {
    suggestion = defaultSurfaceTemperatureRange({ min: airMin, max: airMax }, finish, exposure);
  } catch (e) {
    problem = calcProblem(e)[1];
  }
  const rise = SURFACE_RISE_ABOVE_AIR[exposure][finish];
  /** An air temperature of the design range; the hint names the project's figure it started from. */
  const airInput = (
    label: string,
    value: number,
    set: (v: number) => void,
    projectHint: string,
    fieldProblem?: FieldProblem,
  ) => (
    <QuantityInput
      label={label}
      measure={pageInput('temperature')}
      value={value}
      onChange={(v) => set(v ?? Number.NaN)}
      hint={air ? projectHint : undefined}
      problem={fieldProblem}
    />
  );
  const choice = <T extends string>(
    label: string,
    value: T,
    set: (v: T) => void,
    values: readonly T[],
    labels: { readonly [K in T]: string },
  ) => (
    <Field label={label}>
      {(c) => (
        <Select {...c} value={value} onChange={(e) => set(e.target.value as T)}>
          <Options values={values} labels={labels} />
        </Select>
      )}
    </Field>
  );

  return (
    <details className="border border-rule bg-paper-raised px-3 py-2 text-sm">
      <summary className="cursor-pointer font-semibold">
        Suggest from finish &amp; exposure{' '}
        <span className="font-normal text-ink-muted">— trade-practice default, not a project analysis</span>
      </summary>
      <div className="mt-3 flex flex-col gap-3">
        <div className="grid gap-3 sm:grid-cols-4">
          {airInput('Coldest air', airMin, setAirMin, 'Project winter design temperature.', problem)}
          {airInput('Hottest air', airMax, setAirMax, 'Project summer design temperature.')}
          {choice('Finish', finish, setFinish, SURFACE_FINISHES, FINISH_LABELS)}
          {choice('Exposure', exposure, setExposure, EXPOSURES, EXPOSURE_LABELS)}
        </div>
        <p id={`${id}-basis`} className="text-xs text-ink-muted">
          Hottest surface = hottest air + {delta(rise, system)} ({finish} finish,{' '}
          {EXPOSURE_LABELS[exposure].toLowerCase()}
          ); coldest surface = coldest air − {delta(NIGHT_SKY_DROP, system)} (radiation to a clear night sky).
          Common trade practice for lightweight insulated cladding — a project surface-temperature analysis
          replaces it.
        </p>
        {suggestion ? (
          <div className="flex flex-wrap items-center gap-3">
            <p>
              Suggested surface range:{' '}
              <span className="num font-semibold">
                {formatPageRange(suggestion.min, suggestion.max, 'temperature', system)}
              </span>
            </p>
            <Button
              variant="secondary"
              aria-describedby={`${id}-basis`}
              onClick={() => suggestion && onUse(suggestion)}
            >
              Use this range for the joint
            </Button>
          </div>
        ) : null}
      </div>
    </details>
  );
}
