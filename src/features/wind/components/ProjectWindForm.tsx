import { zodResolver } from '@hookform/resolvers/zod';
import { CalcInputError } from '@shared/calc/errors';
import { analyseSite, type SiteAnalysis } from '@shared/calc/wind/pressure';
import { formatterFor } from '@shared/format';
import type { Project, ProjectWind } from '@shared/schemas/project';
import { projectWindSchema } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { type ReactNode, useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FormSaveBar } from '../../../components/ui/FormSaveBar';
import { Notice } from '../../../components/ui/Notice';
import { LabelledOptions } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { conflictingProjectWind, useUpdateProjectWind } from '../api/update-project-wind';
import { issueText } from '../evaluate';
import { EDITIONS, ENCLOSURE_LABELS, EXPOSURE_LABELS, RISK_CATEGORIES } from '../labels';
import { formatWind, type WindMeasure, windInput } from '../units';
import { BuildingDimensions } from './ProjectWindSummary';
import { Sym } from './Sym';

type WindFormValues = z.input<typeof projectWindSchema>;
type Key = keyof ProjectWind;

const MEASURES: Partial<Record<Key, WindMeasure>> = {
  basicWindSpeed: 'speed',
  Kzt: 'ratio',
  roofSlopeDeg: 'angle',
};

const LABELS: Record<Key, string> = {
  edition: 'ASCE 7 edition',
  basicWindSpeed: 'Basic wind speed V',
  riskCategory: 'Risk category',
  exposure: 'Exposure category',
  Kzt: 'Topographic factor K_zt',
  keEqualsOne: 'Take K_e = 1.0',
  enclosure: 'Enclosure classification',
  roofSlopeDeg: 'Roof slope θ',
};
const KEYS = Object.keys(LABELS) as Key[];

/** The labels as the standard prints their symbols. */
const LABEL_NODES: Partial<Record<Key, ReactNode>> = {
  basicWindSpeed: (
    <>
      Basic wind speed <Sym s="V" />
    </>
  ),
  Kzt: (
    <>
      Topographic factor <Sym s="K_zt" />
    </>
  ),
  roofSlopeDeg: (
    <>
      Roof slope <Sym s="θ" />
    </>
  ),
};
const labelOf = (k: Key): ReactNode => LABEL_NODES[k] ?? LABELS[k];

/** The form's starting values: the saved wind data, or blanks. */
function startValues(p: Project): WindFormValues {
  if (p.wind) return { ...p.wind, keEqualsOne: p.wind.keEqualsOne ?? false };
  return {
    edition: '' as WindFormValues['edition'],
    basicWindSpeed: Number.NaN,
    riskCategory: '' as WindFormValues['riskCategory'],
    exposure: '' as WindFormValues['exposure'],
    Kzt: 1,
    keEqualsOne: false,
    enclosure: '' as WindFormValues['enclosure'],
    roofSlopeDeg: Number.NaN,
  };
}

function showValue(k: Key, v: unknown, system: UnitSystem): string {
  if (v === undefined || v === null || v === '') return '—';
  const m = MEASURES[k];
  if (m && typeof v === 'number')
    return formatWind(v, m, system, { decimals: m === 'ratio' ? 2 : undefined });
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}

/** A value as compared between two versions ("K_e = 1.0" not set and unticked are the same). */
const comparable = (k: Key, v: unknown) => String(k === 'keEqualsOne' ? (v ?? false) : (v ?? ''));

/** What the entered data gives before it is saved: K_h, K_e, q_h and the end-zone width a. */
function Preview({ analysis, system }: { analysis: SiteAnalysis; system: UnitSystem }) {
  const v = analysis.velocity;
  return (
    <div aria-live="polite" className="flex flex-col gap-2 border-t border-rule pt-3">
      <p className="label-caps">With these values (computed in your browser)</p>
      <dl className="num grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="font-sans text-ink-muted">K_h</dt>
          <dd>{v.Kh.toFixed(3)}</dd>
        </div>
        <div>
          <dt className="font-sans text-ink-muted">K_e</dt>
          <dd>{v.Ke.toFixed(3)}</dd>
        </div>
        <div>
          <dt className="font-sans text-ink-muted">q_h</dt>
          <dd>
            {formatterFor(system).pressure(v.qh)} ·{' '}
            {formatterFor(system === 'SI' ? 'IP' : 'SI').pressure(v.qh)}
          </dd>
        </div>
        <div>
          <dt className="font-sans text-ink-muted">End-zone width a</dt>
          <dd>{formatterFor(system).length(analysis.edgeWidth)}</dd>
        </div>
      </dl>
      <p className="text-xs text-ink-muted">{analysis.figure}.</p>
    </div>
  );
}

interface Conflict {
  theirs: Project;
  mine: ProjectWind;
}

/**
 * The project's ASCE 7 wind data: edition, V, risk category, exposure, K_zt, K_e = 1.0 or the site elevation,
 * enclosure and roof slope. Height and plan come from the site data. A save names the project version it
 * started from; when someone saved the wind data in between, nothing is overwritten — the person chooses.
 */
export function ProjectWindForm({ project, onDone }: { project: Project; onDone: () => void }) {
  const system = useUnitSystem();
  const update = useUpdateProjectWind();
  const [baseVersion, setBaseVersion] = useState(project.version);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const measureOf = (path: PropertyKey[] | undefined) => MEASURES[String(path?.[0] ?? '') as Key];
  const form = useForm<WindFormValues, unknown, ProjectWind>({
    resolver: zodResolver(projectWindSchema, {
      error: (issue) => issueText(issue as Parameters<typeof issueText>[0], measureOf(issue.path), system),
    }),
    defaultValues: startValues(project),
    mode: 'onTouched',
  });
  const { control, register, handleSubmit, reset, formState } = form;
  const values = useWatch({ control }) as WindFormValues;

  const snapshot = JSON.stringify(values);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for the values (deep)
  const preview = useMemo(() => {
    const parsed = projectWindSchema.safeParse(values);
    if (!parsed.success) return null;
    try {
      return analyseSite({
        ...parsed.data,
        groundElevation: project.elevationM,
        meanRoofHeight: project.buildingHeightM,
        planLength: project.planLengthM,
        planWidth: project.planWidthM,
      });
    } catch (e) {
      if (e instanceof CalcInputError) return e;
      throw e;
    }
  }, [snapshot, project.buildingHeightM, project.planLengthM, project.planWidthM]);

  const save = handleSubmit(async (wind) => {
    setProblem(null);
    try {
      await update.mutateAsync({ id: project.id, version: baseVersion, wind });
      onDone();
    } catch (e) {
      const theirs = conflictingProjectWind(e);
      if (theirs) {
        setConflict({ theirs, mine: wind });
        return;
      }
      if (isApiRequestError(e) && e.fields) {
        setProblem(
          `The server did not accept: ${Object.entries(e.fields)
            .map(([k, v]) => `${LABELS[k.replace(/^wind\./, '') as Key] ?? k} — ${v}`)
            .join('; ')}`,
        );
        return;
      }
      setProblem(errorMessage(e));
    }
  });

  const numberField = (name: 'basicWindSpeed' | 'Kzt' | 'roofSlopeDeg', hint: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <QuantityInput
          label={labelOf(name)}
          measure={windInput(MEASURES[name]!)}
          name={field.name}
          value={typeof field.value === 'number' ? field.value : undefined}
          onChange={(si) => field.onChange(si ?? Number.NaN)}
          onBlur={field.onBlur}
          inputRef={field.ref}
          error={fieldState.error?.message}
          hint={hint}
          markRequired
        />
      )}
    />
  );

  const selectField = (
    name: 'edition' | 'riskCategory' | 'exposure' | 'enclosure',
    options: [string, string][],
    hint?: string,
  ) => (
    <Field label={LABELS[name]} hint={hint} error={formState.errors[name]?.message} required>
      {(c) => (
        <Select {...c} {...register(name)}>
          <option value="" disabled>
            Choose…
          </option>
          <LabelledOptions options={options.map(([value, label]) => ({ value, label }))} />
        </Select>
      )}
    </Field>
  );

  const fieldset = 'border-t border-ink pt-3';
  const legend = 'pr-3 font-serif text-lg font-semibold';
  const grid = 'mt-3 grid gap-x-6 gap-y-5 sm:grid-cols-2';

  const differing = conflict
    ? KEYS.filter((k) => comparable(k, conflict.mine[k]) !== comparable(k, conflict.theirs.wind?.[k]))
    : [];

  return (
    <form onSubmit={save} noValidate aria-label="Project wind data" className="flex flex-col gap-8">
      <fieldset className={fieldset}>
        <legend className={legend}>Standard and wind speed</legend>
        <div className={grid}>
          {selectField(
            'edition',
            EDITIONS.map((e) => [e, e]),
            'Chapters 26 and 30 of this edition are applied.',
          )}
          {selectField(
            'riskCategory',
            RISK_CATEGORIES.map((r) => [r, `Risk category ${r}`]),
            'Table 1.5-1. V below is read from this category’s map.',
          )}
          {numberField(
            'basicWindSpeed',
            'From the risk-category map: 3-second gust at 33 ft (10 m) in exposure C.',
          )}
        </div>
      </fieldset>

      <fieldset className={fieldset}>
        <legend className={legend}>Terrain</legend>
        <div className={grid}>
          {selectField(
            'exposure',
            (['B', 'C', 'D'] as const).map((x) => [x, EXPOSURE_LABELS[x]]),
            'Surface roughness upwind (§26.7).',
          )}
          {numberField('Kzt', '1.0 on flat terrain; hills, ridges and escarpments raise it (§26.8).')}
          <div className="flex flex-col gap-2">
            <p className="text-sm" data-testid="wind-site-elevation">
              Ground elevation <Sym s="z_e" />:{' '}
              <span className="num font-semibold">{formatWind(project.elevationM, 'length', system)}</span>{' '}
              from the site data — it sets <Sym s="K_e" /> (§26.9); change it with the site data.
            </p>
            <label className="flex items-start gap-2 text-sm">
              <input type="checkbox" {...register('keEqualsOne')} className="mt-1" />
              <span>
                Take <Sym s="K_e" /> = 1.0 (always permitted by §26.9; conservative above sea level)
              </span>
            </label>
          </div>
        </div>
      </fieldset>

      <fieldset className={fieldset}>
        <legend className={legend}>Building</legend>
        <div className={grid}>
          {selectField(
            'enclosure',
            (['enclosed', 'partially_enclosed', 'open'] as const).map((x) => [x, ENCLOSURE_LABELS[x]]),
            'Sets the internal pressure (GC_pi) (§26.12, Table 26.13-1).',
          )}
          {numberField(
            'roofSlopeDeg',
            'θ ≤ 10° reduces the wall coefficients by 10 % and h is the eave height.',
          )}
        </div>
        <div className="mt-4">
          <BuildingDimensions project={project} editable />
        </div>
      </fieldset>

      {preview instanceof CalcInputError ? (
        <Notice tone="caution" title="These values cannot be used for the wall pressures:">
          <p>{preview.reason.charAt(0).toUpperCase() + preview.reason.slice(1)}.</p>
        </Notice>
      ) : preview ? (
        <Preview analysis={preview} system={system} />
      ) : null}

      {conflict ? (
        <Notice tone="warning" title="Someone else saved the wind data first." live>
          <p>
            The wind data was saved at{' '}
            <span className="num">{formatDateTime(conflict.theirs.updatedAt)}</span> (now revision{' '}
            <span className="num">{conflict.theirs.version}</span>) while you were editing revision{' '}
            <span className="num">{baseVersion}</span>. Nothing of yours has been saved, and your values are
            still in the form.
          </p>
          {differing.length > 0 ? (
            <Table
              caption="Where your wind data and the saved wind data differ"
              head={['Value', 'Yours, not saved', <>Saved (rev. {conflict.theirs.version})</>]}
            >
              <tbody>
                {differing.map((k) => (
                  <tr key={k}>
                    <Th scope="row" className="border-b border-rule font-normal">
                      {labelOf(k)}
                    </Th>
                    <Td className="num">{showValue(k, conflict.mine[k], system)}</Td>
                    <Td className="num">{showValue(k, conflict.theirs.wind?.[k], system)}</Td>
                  </tr>
                ))}
              </tbody>
            </Table>
          ) : (
            <p>Their save changed other project data; the wind data is the same as yours.</p>
          )}
          <div className="flex flex-wrap gap-3 pt-1">
            <Button
              variant="secondary"
              onClick={() => {
                setBaseVersion(conflict.theirs.version);
                setConflict(null);
              }}
            >
              Keep mine, then save again
            </Button>
            <Button
              variant="secondary"
              onClick={() => {
                setBaseVersion(conflict.theirs.version);
                reset(startValues(conflict.theirs));
                setConflict(null);
              }}
            >
              Load the saved wind data (discard mine)
            </Button>
          </div>
        </Notice>
      ) : null}

      {problem ? (
        <Notice tone="caution" title="Not saved." live>
          <p>{problem}</p>
        </Notice>
      ) : null}

      <FormSaveBar
        busy={update.isPending}
        disabled={conflict !== null}
        onCancel={onDone}
        errorCount={Object.keys(formState.errors).length}
      >
        Save wind data
      </FormSaveBar>
    </form>
  );
}
