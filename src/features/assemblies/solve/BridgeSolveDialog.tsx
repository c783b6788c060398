import type { ComputedBridge } from '@shared/calc/bridge/computed';
import { computedOf } from '@shared/calc/bridge/detail';
import { type TemplateLayer, templateWall } from '@shared/calc/bridge/templates';
import { CalcInputError } from '@shared/calc/errors';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import { ENGINE_VERSION } from '@shared/calc/trace';
import type { BridgeValueInput } from '@shared/schemas/assembly';
import { useEffect, useMemo, useState } from 'react';
import { ZodError } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { Field } from '../../../components/ui/Field';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { Notice } from '../../../components/ui/Notice';
import { LabelledOptions } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { TextInput } from '../../../components/ui/TextInput';
import { formatQuantity } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';
import { CheckBox } from '../components/FormFields';
import { formatMeasure, type Measure, measureInput } from '../units';
import {
  annexFChi,
  CLIP_METALS,
  type ClipInputs,
  computedSourceText,
  crossedDepth,
  detailOf,
  type FastenerInputs,
  GENERIC,
  type GirtInputs,
  initialInputs,
  LINEAR_DETAILS,
  type LinearDetail,
  linearInputs,
  type OpeningInputs,
  type SlabInputs,
  type SolveInputs,
  solveModel,
  solvesFor,
} from './bridge-solve';
import { DetailSection } from './DetailSection';
import type { Solved } from './run-bridge';
import { type BridgeRunner, type RunningSolve, workerRunner } from './runners';
import { TemperatureMap } from './TemperatureMap';

type Phase =
  | { at: 'form'; problem?: string }
  | { at: 'solving'; started: number; run: RunningSolve }
  | {
      at: 'done';
      solved: Solved;
      metal: { min: number[]; max: number[] }[];
      warm: number;
      cold: number;
      source: SolvedSource;
    };

/** The source a computed value is stored with: its words, the solve, and the library entry once saved. */
export type SolvedSource = { text: string; computed?: ComputedBridge; libraryEntryId?: string };

/** What each detail is, and what the map shows of it. */
const DETAIL_WORDS: Record<SolveInputs['kind'], { intro: string; map: string; orientation: string }> = {
  girt: {
    intro:
      'A continuous girt through the layers below, solved in two dimensions per metre of its length (ISO 10211).',
    map: 'Section through the girt',
    orientation: 'Outside at the top, inside at the bottom',
  },
  clip: {
    intro:
      'One clip in its share of wall, solved in three dimensions (ISO 10211); the map shows its mid-plane.',
    map: 'Mid-plane of the clip',
    orientation: 'Outside at the top, inside at the bottom',
  },
  fastener: {
    intro:
      'One fastener in its share of wall, solved in three dimensions (ISO 10211); the round shank is a square of the same area, and the map shows its mid-plane.',
    map: 'Mid-plane of the fastener',
    orientation: 'Outside at the top, inside at the bottom',
  },
  slab: {
    intro:
      'A floor slab meeting the wall, solved in two dimensions per metre of the edge, with external dimensions (ISO 14683); the wall runs 1 m above and below.',
    map: 'Section through the slab edge',
    orientation: 'Outside at the left, inside at the right',
  },
  corner: {
    intro:
      'An outside corner of the wall, solved in two dimensions per metre of its height, with external dimensions (ISO 14683); each wall runs 1 m from the corner.',
    map: 'Plan of the corner',
    orientation: 'Outside at the top and left',
  },
  opening: {
    intro:
      'A window or door frame at the edge of its opening, solved in two dimensions per metre of perimeter (ISO 10211); the wall runs 1 m from the reveal and the frame is cut at the glazing.',
    map: 'Section through the reveal',
    orientation: 'Outside at the top, inside at the bottom',
  },
};

/**
 * "Solve" for one clip or fastener (χ, 3-D), girt or edge (ψ, 2-D): the template's inputs from the assembly's
 * layers, the solve off the page's thread (cancellable), the result with a temperature map, and "Use this value".
 */
export function BridgeSolveDialog({
  bridge,
  layers,
  onUse,
  onClose,
  save,
  runner = workerRunner,
}: {
  bridge: Bridge;
  layers: Layer[];
  onUse: (value: number, source: SolvedSource) => void;
  onClose: () => void;
  /** Save to the firm library (absent unless the person may write it). */
  save?: { firmName: string; add: (entry: BridgeValueInput) => Promise<{ id: string }> };
  runner?: BridgeRunner;
}) {
  const system = useUnitSystem();
  const [inputs, setInputs] = useState<SolveInputs>(() => initialInputs(bridge, layers));
  const [phase, setPhase] = useState<Phase>({ at: 'form' });
  const { layers: wall, indices } = useMemo(() => templateWall(layers), [layers]);
  /** A changed input makes the shown result stale: back to the inputs. */
  const edit = (next: SolveInputs) => {
    setInputs(next);
    setPhase((now) => (now.at === 'done' ? { at: 'form' } : now));
  };
  const measure = solvesFor(inputs);
  const symbol = measure === 'psi' ? 'ψ' : 'χ';
  const words = DETAIL_WORDS[inputs.kind];
  const annexF = useMemo(
    () => (bridge.kind === 'fastener' ? annexFChi(bridge, layers) : null),
    [bridge, layers],
  );
  /** The detail as drawn: what the solver gets (null while the inputs cannot make one). */
  const drawn = useMemo(() => {
    try {
      return detailOf(inputs, layers);
    } catch {
      return null;
    }
  }, [inputs, layers]);
  const running = phase.at === 'solving' ? phase.run : null;
  useEffect(() => () => running?.cancel(), [running]);

  function solve() {
    let model: ReturnType<typeof solveModel>;
    try {
      model = solveModel(inputs, layers);
    } catch (e) {
      setPhase({ at: 'form', problem: problemOf(e) });
      return;
    }
    const run = runner(model);
    setPhase({ at: 'solving', started: Date.now(), run });
    const detail = detailOf(inputs, layers);
    run.outcome.then((o) => {
      setPhase((now) => {
        if (now.at !== 'solving' || now.run !== run) return now;
        if (!o.ok) return { at: 'form', problem: `${o.field}: ${o.reason}` };
        const temps = model.boundaries.map((b) => b.temperature);
        const [warm, cold] = [Math.max(...temps), Math.min(...temps)];
        const date = new Date();
        const computed = computedOf(
          detail,
          o.solved.result,
          o.solved.section,
          o.solved.surface,
          { inside: warm, outside: cold },
          ENGINE_VERSION,
          date,
        );
        return {
          at: 'done',
          solved: o.solved,
          metal: model.boxes.filter((b) => b.lambda >= 1),
          warm,
          cold,
          source: {
            text: computedSourceText(ENGINE_VERSION, o.solved.result.cells, date),
            ...(computed ? { computed } : {}),
          },
        };
      });
    });
  }

  function cancel() {
    running?.cancel();
    setPhase({ at: 'form' });
  }

  const value = phase.at === 'done' ? (phase.solved.result.psi ?? phase.solved.result.chi) : null;

  return (
    <Dialog
      open
      wide
      title={`Solve ${symbol} — ${bridge.name || words.map}`}
      onClose={() => {
        running?.cancel();
        onClose();
      }}
    >
      <div className="flex max-h-[75vh] flex-col gap-4 overflow-y-auto">
        <p className="text-sm text-ink-muted">
          {words.intro} The starting sizes are generic design values: replace them with the product's.
        </p>
        <fieldset disabled={phase.at === 'solving'} className="flex flex-col gap-3">
          <legend className="sr-only">Inputs</legend>
          {bridge.kind === 'linear' ? (
            <LabelledSelect
              label="Detail"
              className="w-64"
              value={inputs.kind}
              onChange={(e) => edit(linearInputs(e.target.value as LinearDetail, bridge, layers))}
            >
              <LabelledOptions options={LINEAR_DETAILS.map((d) => ({ value: d.kind, label: d.label }))} />
            </LabelledSelect>
          ) : null}
          {'from' in inputs && inputs.kind !== 'slab' ? (
            <CrossedLayers inputs={inputs} wall={wall} indices={indices} onChange={edit} />
          ) : null}
          <DetailFields inputs={inputs} wall={wall} indices={indices} onChange={edit} />
        </fieldset>
        <DetailSection detail={drawn} label={words.map} />
        {phase.at === 'form' && phase.problem ? (
          <Notice tone="caution" title="Cannot solve this" live>
            {phase.problem}
          </Notice>
        ) : null}
        {phase.at === 'solving' ? (
          <Progress started={phase.started} onCancel={cancel} />
        ) : (
          <div className="flex flex-wrap gap-3">
            <Button variant={phase.at === 'done' ? 'secondary' : 'primary'} onClick={solve}>
              {phase.at === 'done' ? 'Solve again' : 'Solve'}
            </Button>
            <Button variant="quiet" onClick={onClose}>
              Close
            </Button>
          </div>
        )}
        {phase.at === 'done' && value !== null ? (
          <section aria-label="Result" className="flex flex-col gap-3 border-t border-rule pt-3">
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
              <dt className="font-semibold">{symbol}</dt>
              <dd className="num" data-testid="solved-value">
                {formatMeasure(value, measure, system)}
              </dd>
              {annexF !== null ? (
                <>
                  <dt>ISO 6946 Annex F</dt>
                  <dd className="num">
                    {formatMeasure(annexF, 'chi', system)} per fastener, as the build-up page applies it now
                  </dd>
                </>
              ) : null}
              <dt>Mesh</dt>
              <dd className="num">{phase.solved.result.cells.toLocaleString('en-GB')} cells</dd>
              <dt>Iterations</dt>
              <dd className="num">{phase.solved.result.solver.iterations}</dd>
              <dt>Energy balance</dt>
              <dd className="num">
                {(phase.solved.result.solver.energyBalance * 100).toPrecision(2)} % of the heat flow
              </dd>
              <dt>Coldest inside surface</dt>
              <dd className="num">
                {formatQuantity(phase.solved.result.minInsideSurface?.temperature, 'temperature', system)}{' '}
                (outside {formatQuantity(phase.cold, 'temperature', system)}, inside{' '}
                {formatQuantity(phase.warm, 'temperature', system)})
              </dd>
              <dt>f_Rsi</dt>
              <dd className="num">{phase.solved.result.fRsi?.toFixed(3) ?? '—'}</dd>
              {phase.solved.surface ? (
                <>
                  <dt>f_Rsi, surface check</dt>
                  <dd className="num" data-testid="surface-frsi">
                    {phase.solved.surface.fRsi.toFixed(3)} with the inside surface resistance of ISO 13788,
                    read by the moisture page
                  </dd>
                </>
              ) : null}
            </dl>
            {phase.solved.section ? (
              <TemperatureMap
                section={phase.solved.section}
                warm={phase.warm}
                cold={phase.cold}
                metal={phase.metal}
                coldest={phase.solved.result.minInsideSurface}
                system={system}
                title={words.map}
                orientation={words.orientation}
                flipY={inputs.kind === 'slab'}
              />
            ) : null}
            <Notice tone="warning" title="An aid, not a tested value">
              A computed {symbol} is an aid to design: the maker's tested values or a specialist's model of
              the actual product govern.
            </Notice>
            <div className="flex flex-wrap items-end gap-3">
              <Button variant="primary" onClick={() => onUse(value, phase.source)}>
                Use this value
              </Button>
              {save && phase.source.computed ? (
                <SaveToLibrary
                  save={save}
                  defaultName={bridge.name || words.map}
                  entry={{
                    kind: measure === 'chi' ? 'point' : 'linear',
                    value,
                    sourceType: 'calculation',
                    source: phase.source.text,
                    computed: phase.source.computed,
                  }}
                  onSaved={(libraryEntryId) =>
                    setPhase((now) =>
                      now.at === 'done' ? { ...now, source: { ...now.source, libraryEntryId } } : now,
                    )
                  }
                />
              ) : null}
            </div>
          </section>
        ) : null}
      </div>
    </Dialog>
  );
}

/** "Save to the library": the computed value with its detail and map, under a name, for other projects. */
function SaveToLibrary({
  save,
  defaultName,
  entry,
  onSaved,
}: {
  save: { firmName: string; add: (entry: BridgeValueInput) => Promise<{ id: string }> };
  defaultName: string;
  entry: Omit<BridgeValueInput, 'name'>;
  onSaved: (id: string) => void;
}) {
  const [name, setName] = useState(defaultName);
  const [state, setState] = useState<'idle' | 'saving' | 'saved' | { problem: string }>('idle');
  async function submit() {
    setState('saving');
    try {
      const saved = await save.add({ ...entry, name: name.trim() });
      setState('saved');
      onSaved(saved.id);
    } catch (e) {
      setState({ problem: e instanceof Error ? e.message : String(e) });
    }
  }
  return (
    <div className="flex flex-wrap items-end gap-3">
      <Field label="Name in the library" className="min-w-56 flex-1">
        {(c) => (
          <TextInput
            {...c}
            className="py-1.5 text-sm"
            value={name}
            maxLength={200}
            disabled={state === 'saved'}
            onChange={(e) => setName(e.target.value)}
          />
        )}
      </Field>
      {state === 'saved' ? (
        <p role="status" className="pb-2 text-sm text-meets">
          ✓ Saved to {save.firmName}'s library
        </p>
      ) : (
        <Button variant="secondary" onClick={submit} disabled={state === 'saving' || name.trim() === ''}>
          {state === 'saving' ? 'Saving…' : `Save to ${save.firmName}'s library`}
        </Button>
      )}
      {typeof state === 'object' ? (
        <p role="alert" className="basis-full text-sm text-caution">
          Not saved: {state.problem}
        </p>
      ) : null}
    </div>
  );
}

/** Why a template refused the inputs, in its words (the field named as the template names it). */
function problemOf(e: unknown): string {
  if (e instanceof CalcInputError) return `${e.field}: ${e.reason}`;
  if (e instanceof ZodError) {
    const issue = e.issues[0];
    return issue ? `${issue.path.join('.')}: ${issue.message}` : 'the inputs are not complete';
  }
  return e instanceof Error ? e.message : String(e);
}

/** An indeterminate bar and the time so far (the solver reports no progress of its own), and Cancel. */
function Progress({ started, onCancel }: { started: number; onCancel: () => void }) {
  const [now, setNow] = useState(started);
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 250);
    return () => clearInterval(timer);
  }, []);
  return (
    <div className="flex flex-wrap items-center gap-3">
      <div role="status" className="flex min-w-48 flex-1 flex-col gap-1 text-sm">
        <span>Solving… {((now - started) / 1000).toFixed(1)} s</span>
        <progress className="h-2 w-full accent-ink" aria-label="Solving, no estimate of the time left" />
      </div>
      <Button onClick={onCancel}>Cancel</Button>
    </div>
  );
}

/** Which layers the metal crosses; its depth (girt) or length (clip) follows from them. */
type Crossing = GirtInputs | ClipInputs | FastenerInputs;

function CrossedLayers({
  inputs,
  wall,
  indices,
  onChange,
}: {
  inputs: Crossing;
  wall: TemplateLayer[];
  /** The assembly's number of each (the build-up page's numbering). */
  indices: number[];
  onChange: (next: SolveInputs) => void;
}) {
  const system = useUnitSystem();
  const options = layerOptions(wall, indices);
  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
      {(['from', 'to'] as const).map((end) => (
        <LabelledSelect
          key={end}
          label={end === 'from' ? 'Crosses from layer' : 'to layer'}
          className="min-w-48 flex-1"
          value={inputs[end]}
          onChange={(e) => onChange(crossedTo(inputs, end, Number(e.target.value)))}
        >
          {options}
        </LabelledSelect>
      ))}
      <p className="pb-2 text-sm">
        {inputs.kind === 'girt' ? 'Girt depth' : inputs.kind === 'clip' ? 'Clip length' : 'Fastener length'}{' '}
        <span className="num font-semibold" data-testid="crossed-depth">
          {formatMeasure(crossedDepth(wall, inputs.from, inputs.to), 'thickness', system)}
        </span>
      </p>
    </div>
  );
}

/** The crossing with one end moved to layer `k`; the other end follows so that from ≤ to. */
const crossedTo = (inputs: Crossing, end: 'from' | 'to', k: number): Crossing =>
  end === 'from'
    ? { ...inputs, from: k, to: Math.max(k, inputs.to) }
    : { ...inputs, to: k, from: Math.min(k, inputs.from) };

/** The template wall's layers as options, numbered as on the build-up page. */
const layerOptions = (wall: TemplateLayer[], indices: number[]) =>
  wall.map((l, k) => (
    // biome-ignore lint/suspicious/noArrayIndexKey: the index is the value
    <option key={k} value={k}>
      {(indices[k] ?? k) + 1} {l.name}
    </option>
  ));

/** A number box of the dialog: the input it sets, its label, its measure (a length unless said), its width. */
interface Box<T> {
  key: { [K in keyof T]: T[K] extends number ? K : never }[keyof T];
  label: string;
  measure?: Measure;
  className?: string;
}

const GIRT_BOXES: Box<GirtInputs>[] = [
  { key: 'thickness', label: 'Steel thickness' },
  { key: 'outerFlange', label: 'Outer flange', measure: 'spacing' },
  { key: 'innerFlange', label: 'Inner flange', measure: 'spacing' },
  { key: 'spacing', label: 'Girt spacing', measure: 'spacing' },
];
const CLIP_SIZE: Box<ClipInputs>[] = [
  { key: 'width', label: 'Clip width (footprint)', measure: 'spacing' },
  { key: 'thickness', label: 'Web thickness' },
];
const CLIP_SPACING: Box<ClipInputs>[] = [
  { key: 'spacingX', label: 'Spacing along the girt', measure: 'spacing' },
  { key: 'spacingZ', label: 'Spacing across', measure: 'spacing' },
];
const PAD_BOXES: Box<NonNullable<ClipInputs['pad']>>[] = [
  { key: 'thickness', label: 'Pad thickness' },
  { key: 'lambda', label: 'Pad λ', measure: 'conductivity' },
];
const FASTENER_BOXES: Box<FastenerInputs>[] = [
  { key: 'diameter', label: 'Shank diameter', measure: 'diameter' },
  { key: 'metalLambda', label: 'λ of the fastener', measure: 'conductivity' },
  { key: 'recess', label: 'Head recess' },
  { key: 'spacingX', label: 'Spacing along x', measure: 'spacing' },
  { key: 'spacingZ', label: 'Spacing along z', measure: 'spacing' },
];
const SLAB_BOXES: Box<SlabInputs>[] = [
  { key: 'thickness', label: 'Slab thickness', measure: 'spacing' },
  { key: 'lambda', label: 'λ of the slab', measure: 'conductivity' },
];
const OPENING_BOXES: Box<OpeningInputs>[] = [
  { key: 'width', label: 'Frame width' },
  { key: 'depth', label: 'Frame depth' },
  { key: 'offset', label: 'Frame set back from the outside face', className: 'w-56' },
  { key: 'lambda', label: 'λ of the frame', measure: 'conductivity' },
];

/** The boxes of a table over one set of inputs (SI stored, shown in the person's units). */
function Boxes<T>({ boxes, inputs, onChange }: { boxes: Box<T>[]; inputs: T; onChange: (next: T) => void }) {
  return boxes.map((b) => (
    <QuantityInput
      key={String(b.key)}
      label={b.label}
      measure={measureInput(b.measure ?? 'thickness')}
      value={inputs[b.key] as number}
      onChange={(si) => onChange({ ...inputs, [b.key]: si ?? Number.NaN })}
      size="sheet"
      className={b.className ?? (b.measure === 'conductivity' ? 'w-48' : 'w-40')}
    />
  ));
}

const row = 'flex flex-wrap items-start gap-x-4 gap-y-2';

/** The boxes of the detail being solved. */
function DetailFields({
  inputs,
  wall,
  indices,
  onChange,
}: {
  inputs: SolveInputs;
  wall: TemplateLayer[];
  indices: number[];
  onChange: (next: SolveInputs) => void;
}) {
  if (inputs.kind === 'girt')
    return (
      <div className={row}>
        <LabelledSelect
          label="Section"
          className="w-40"
          value={inputs.profile}
          onChange={(e) => onChange({ ...inputs, profile: e.target.value as 'z' | 'c' })}
        >
          <option value="z">Z girt</option>
          <option value="c">C girt</option>
        </LabelledSelect>
        <Boxes boxes={GIRT_BOXES} inputs={inputs} onChange={onChange} />
      </div>
    );
  if (inputs.kind === 'clip') return <ClipFields inputs={inputs} onChange={onChange} />;
  if (inputs.kind === 'fastener')
    return (
      <div className={row}>
        <Boxes boxes={FASTENER_BOXES} inputs={inputs} onChange={onChange} />
      </div>
    );
  if (inputs.kind === 'slab')
    return (
      <div className={row}>
        <LabelledSelect
          label="Slab edge at the outside face of layer"
          className="min-w-56 flex-1"
          value={inputs.from}
          onChange={(e) => onChange({ ...inputs, from: Number(e.target.value) })}
        >
          {layerOptions(wall, indices)}
        </LabelledSelect>
        <Boxes boxes={SLAB_BOXES} inputs={inputs} onChange={onChange} />
      </div>
    );
  if (inputs.kind === 'opening')
    return (
      <div className={row}>
        <Boxes boxes={OPENING_BOXES} inputs={inputs} onChange={onChange} />
      </div>
    );
  return <p className="text-sm">Both walls are this assembly's layers; the corner needs no other input.</p>;
}

function ClipFields({ inputs, onChange }: { inputs: ClipInputs; onChange: (next: ClipInputs) => void }) {
  const set = (patch: Partial<ClipInputs>) => onChange({ ...inputs, ...patch });
  return (
    <div className="flex flex-col gap-2">
      <div className={row}>
        <Boxes boxes={CLIP_SIZE} inputs={inputs} onChange={onChange} />
        <LabelledSelect
          label="Material"
          className="w-48"
          value={String(inputs.metalLambda)}
          onChange={(e) => set({ metalLambda: Number(e.target.value) })}
        >
          {CLIP_METALS.map((m) => (
            <option key={m.id} value={String(m.conductivity)}>
              {m.name} (λ {m.conductivity})
            </option>
          ))}
        </LabelledSelect>
        <Boxes boxes={CLIP_SPACING} inputs={inputs} onChange={onChange} />
      </div>
      <div className={row}>
        <CheckBox
          label="Thermal break pad"
          checked={inputs.pad !== null}
          onChange={(checked) => set({ pad: checked ? { ...GENERIC.pad } : null })}
        />
        {inputs.pad ? <Boxes boxes={PAD_BOXES} inputs={inputs.pad} onChange={(pad) => set({ pad })} /> : null}
      </div>
    </div>
  );
}

export default BridgeSolveDialog;
