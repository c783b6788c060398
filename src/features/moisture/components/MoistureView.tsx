import { can } from '@shared/auth/permissions';
import { ENGINE_VERSION } from '@shared/calc/trace';
import type { Assembly } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { drawClass } from '@shared/sheets/layer-class';
import { type ReactNode, useState } from 'react';
import { Link } from 'react-router';
import { Cautions } from '../../../components/ui/Cautions';
import { PageSection } from '../../../components/ui/PageSection';
import { COMPUTED_AS_YOU_TYPE, ResultSection } from '../../../components/ui/ResultSection';
import { RevisionHeader } from '../../../components/ui/RevisionHeader';
import { RevisionSaveBar } from '../../../components/ui/RevisionSaveBar';
import { ShowTheWork } from '../../../components/ui/ShowTheWork';
import { useDeferredCalculation } from '../../../lib/deferred-calculation';
import { REVISION_SAVE_WORDS } from '../../../lib/revision-save-words';
import { useUnitSystem } from '../../../lib/unit-system';
import type { RevisionApi } from '../../../lib/use-revision-editing';
import { evaluateMoisture } from '../evaluate';
import { useVapourEditing, type VapourEditing } from '../use-vapour-editing';
import { draftOf, KIND_SYMBOLS, KIND_UNITS, layerThickness } from '../vapour-draft';
import { MOISTURE_CAUTIONS } from './MoistureCautions';
import { MoistureMethod } from './MoistureMethod';
import { MoistureResults } from './MoistureResults';
import { MoistureSummary } from './MoistureSummary';
import { NeedsList } from './NeedsList';
import type { ProfileLayer, ProfileMode } from './ProfileChart';
import { VapourTable } from './VapourTable';

type Props = RevisionApi & {
  project: Project;
  assembly: Assembly;
  /** The project's monthly climate, drawn by the climate feature (null while the project has none). */
  climateSummary: ReactNode;
};

/** The moisture (condensation) page of one assembly: inputs, conditions, method, result, cautions. */
export function MoistureView({ project, assembly, climateSummary, ...revisionApi }: Props) {
  const system = useUnitSystem();
  const archived = project.archivedAt !== null;
  const mayWrite = can(project.myRole, 'assembly.write') && !archived;
  const editing = useVapourEditing({ assembly, ...revisionApi });
  const [month, setMonth] = useState<number | null>(null);
  const [mode, setMode] = useState<ProfileMode>('temperature');

  const input = editing.base.current.input;
  // Every figure of the page comes from this one, possibly deferred, evaluation (`stale` while it lags).
  const { result: evaluation, stale } = useDeferredCalculation(
    { vapour: editing.vapour, rowErrors: editing.rowErrors },
    (v) => evaluateMoisture(input, v.vapour, v.rowErrors, project),
    [input, project],
  );
  const result = evaluation.status === 'ready' ? evaluation.result : null;
  const problems = evaluation.status === 'blocked' ? evaluation.problems : [];

  // The engine's reasons about a vapour row are shown on that row, beside its box.
  const rowErrors: Record<number, string> = { ...editing.rowErrors };
  for (const p of problems)
    if (p.where.kind === 'vapour' && rowErrors[p.where.layer] === undefined && p.code !== 'vapour_missing')
      rowErrors[p.where.layer] = p.text;

  const layers: ProfileLayer[] = input.thermal.layers.map((l) => ({
    name: l.name,
    thickness: layerThickness(l),
    hatch: drawClass(l),
  }));
  const base = `/projects/${project.id}`;
  const builderHref = `${base}/assemblies/${assembly.id}`;
  const climateHref = `${base}/climate`;
  const mayEditClimate = can(project.myRole, 'project.climate.update') && !archived;

  return (
    <div className="flex flex-col gap-10 pb-4">
      <RevisionHeader
        page="Moisture page"
        assembly={editing.base}
        readOnly={!mayWrite}
        title={editing.base.name}
      >
        <p className="text-sm text-ink-muted">
          Condensation inside the wall and mould risk at its inner face, month by month
          {mayWrite ? ' — recomputed in your browser as you type.' : '.'}
        </p>
      </RevisionHeader>

      <MoistureSummary
        result={result}
        layerNames={input.thermal.layers.map((l) => l.name)}
        problems={problems.length}
        stale={stale}
        system={system}
      />

      <PageSection n={1} title="Inputs — layers and their vapour data" id="moisture-inputs-heading">
        <VapourTable
          layers={input.thermal.layers}
          drafts={editing.drafts}
          onChange={mayWrite ? editing.setDraft : undefined}
          rowErrors={rowErrors}
          buildupProblems={problems}
          result={result}
          builderHref={builderHref}
          readOnly={!mayWrite}
        />
      </PageSection>

      <PageSection
        n={2}
        title="Conditions inside and outside"
        id="moisture-conditions-heading"
        aside={
          <Link to={mayEditClimate ? `${climateHref}?edit=1` : climateHref} className="text-sm">
            {mayEditClimate ? 'Edit the climate' : 'Open the climate page'}
          </Link>
        }
      >
        {climateSummary ?? <p className="text-ink-muted">The project has no monthly climate yet.</p>}
      </PageSection>

      <PageSection n={3} title="Method" id="moisture-method-heading">
        {evaluation.status === 'ready' ? (
          <MoistureMethod result={evaluation.result} input={evaluation.input} system={system} />
        ) : (
          <p className="text-ink-muted">
            ISO 13788:2012 monthly method (Glaser, tangent construction); the details follow once the page can
            be computed.
          </p>
        )}
      </PageSection>

      <ResultSection
        n={4}
        title="Result"
        id="moisture-result-heading"
        stale={stale}
        note={mayWrite ? COMPUTED_AS_YOU_TYPE : undefined}
        className="flex flex-col gap-4"
        work={result ? <ShowTheWork steps={result.trace} /> : null}
      >
        {result ? (
          <MoistureResults
            result={result}
            layers={layers}
            system={system}
            month={month}
            onMonth={setMonth}
            mode={mode}
            onMode={setMode}
          />
        ) : (
          <NeedsList
            problems={problems}
            links={{
              climate: climateHref,
              indoor: base,
              buildup: builderHref,
              mayEditClimate,
              mayEditIndoor: can(project.myRole, 'project.update') && !archived,
              mayEditVapour: mayWrite,
            }}
          />
        )}
      </ResultSection>

      <Cautions items={MOISTURE_CAUTIONS} engineVersion={ENGINE_VERSION} />

      {mayWrite ? (
        <RevisionSaveBar
          editing={editing}
          words={REVISION_SAVE_WORDS.vapour}
          undo
          conflictDetail={<VapourConflictDetail editing={editing} />}
          dirtyHint={
            result
              ? null
              : 'Saving is allowed while the result waits for other data (the climate, other layers).'
          }
        />
      ) : null}
      {archived ? (
        <p className="text-sm text-ink-muted">
          The project is archived, so its assemblies are shown read-only.
        </p>
      ) : !mayWrite ? (
        <p className="text-sm text-ink-muted">Your role on this project shows the vapour data read-only.</p>
      ) : null}
    </div>
  );
}

const vapourWords = (v: Parameters<typeof draftOf>[0]) => {
  const d = draftOf(v);
  if (d.kind === 'none') return 'not entered';
  const unit = KIND_UNITS[d.kind];
  return `${KIND_SYMBOLS[d.kind]} ${d.text}${unit === '–' ? '' : ` ${unit}`}`;
};

/** What carrying the vapour entries over does after a stale save, or why they cannot be, with the entries. */
function VapourConflictDetail({ editing: { conflict, layers } }: { editing: VapourEditing }) {
  if (!conflict) return null;
  return conflict.carry ? (
    <p>
      <strong>Carry my entries over</strong> starts from revision {conflict.theirs.revision} and puts back
      every vapour value you changed
      {conflict.carry.detail.bothChanged.length > 0
        ? ` — where you both changed a layer (${conflict.carry.detail.bothChanged.map((i) => layers[i]?.name ?? `layer ${i + 1}`).join(', ')}), yours is kept`
        : ''}
      . Nothing is saved until you save again.
    </p>
  ) : (
    <>
      <p>
        The layers themselves changed in revision {conflict.theirs.revision} (added, removed or moved), so
        your vapour entries cannot be matched to layers. Load their revision and enter them again; yours were:
      </p>
      <ul className="num list-disc pl-5">
        {layers
          .map((l, i) => ({
            name: l.name,
            key: `${i}:${l.name}`,
            words: vapourWords(conflict.mine.vapour?.[i]),
          }))
          .map((row) => (
            <li key={row.key}>
              <span className="font-sans">{row.name}</span>: {row.words}
            </li>
          ))}
      </ul>
    </>
  );
}
