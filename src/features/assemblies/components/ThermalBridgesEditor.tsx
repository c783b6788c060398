import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import type { BridgeValue } from '@shared/schemas/assembly';
import { isInsulation } from '@shared/sheets/layer-class';
import { Fragment, lazy, Suspense, useState } from 'react';
import { type UseFieldArrayReturn, useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { Loading } from '../../../components/ui/Loading';
import { LabelledOptions } from '../../../components/ui/Options';
import { RadioGroup } from '../../../components/ui/RadioGroup';
import { useUnitSystem } from '../../../lib/unit-system';
import { fieldDomId } from '../evaluate';
import { type AssemblyFormValues, type BridgeRole, newBridge, p, useBuilder } from '../form';
import type { SolvedSource } from '../solve/BridgeSolveDialog';
import { formatMeasure } from '../units';
import {
  BlockError,
  CheckBox,
  iconButton,
  type MeasureBox,
  MeasureFields,
  TextField,
  useFieldError,
} from './FormFields';

type BridgesArray = UseFieldArrayReturn<AssemblyFormValues, 'thermal.bridges', 'key'>;

/** The solver, its worker and the map load only when a Solve dialog opens. */
const BridgeSolveDialog = lazy(() => import('../solve/BridgeSolveDialog'));

export const SOURCE_TYPE_LABELS: Record<BridgeValue['sourceType'], string> = {
  test_report: 'test report',
  catalogue: 'published catalogue',
  calculation: 'calculation',
};

const ROLE_TITLES: Record<Bridge['kind'], string> = {
  point: 'Clips or brackets — point bridges χ',
  linear: 'Girts or rails — linear bridges ψ',
  fastener: 'Fasteners through the insulation — ISO 6946 Annex F',
};

/** How the cladding is held, and the bridges it makes through the insulation. */
export function ThermalBridgesEditor() {
  const { control, register, getValues } = useFormContext<AssemblyFormValues>();
  const array = useFieldArray({ control, name: 'thermal.bridges', keyName: 'key' });

  function add(role: BridgeRole) {
    const layers = (getValues('thermal.layers') ?? []) as Layer[];
    const ins = layers.findIndex((l) => isInsulation(l));
    array.append(newBridge(role, Math.max(ins, 0)));
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        <RadioGroup
          legend="Girts run"
          options={[
            { value: 'horizontal', label: 'horizontally (panels span vertically)' },
            { value: 'vertical', label: 'vertically' },
          ]}
          field={register('attachment.girtOrientation')}
        />
        <TextField
          path="attachment.clipType"
          label="Clip or bracket"
          hint="Product or description"
          className="min-w-56 flex-1"
        />
        <TextField
          path="attachment.fastenerType"
          label="Fastener"
          hint="e.g. #14 self-drilling screw"
          className="min-w-56 flex-1"
        />
      </div>

      {array.fields.length === 0 ? (
        <p className="border-y border-rule py-3 text-ink-muted">
          No bridges: the result is the clear-field value only. Add the clips, girts and fasteners that cross
          the insulation.
        </p>
      ) : (
        <ol className="flex flex-col border-b border-rule" aria-label="Bridges through the insulation">
          {array.fields.map((f, j) => (
            <BridgeRow key={f.key} index={j} array={array} />
          ))}
        </ol>
      )}
      <BlockError path="thermal.bridges" />

      <div className="flex flex-wrap gap-3">
        <Button variant="secondary" className="py-1.5" onClick={() => add('clip')}>
          + Clips (χ)
        </Button>
        <Button variant="secondary" className="py-1.5" onClick={() => add('girt')}>
          + Girts or rails (ψ)
        </Button>
        <Button variant="secondary" className="py-1.5" onClick={() => add('fastener')}>
          + Fasteners
        </Button>
      </div>
    </div>
  );
}

function BridgeRow({ index: j, array }: { index: number; array: BridgesArray }) {
  const { control } = useFormContext<AssemblyFormValues>();
  const { markRemoval } = useBuilder();
  const bridge = useWatch({ control, name: p(`thermal.bridges.${j}`) }) as Bridge | undefined;
  if (!bridge) return null;
  const base = `thermal.bridges.${j}`;
  const label = bridge.name || `Bridge ${j + 1}`;

  return (
    <li
      className="grid grid-cols-[2rem_1fr] gap-x-3 border-t border-rule py-3"
      aria-label={`Bridge ${j + 1}: ${label}`}
    >
      <span className="num pt-6 text-right text-lg font-medium" aria-hidden="true">
        {String.fromCharCode(65 + (j % 26))}
      </span>
      <div className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
          <TextField
            path={`${base}.name`}
            label={ROLE_TITLES[bridge.kind]}
            className="min-w-64 flex-[2]"
            maxLength={120}
          />
          <button
            type="button"
            className={`${iconButton} text-caution`}
            aria-label={`Remove ${label}`}
            title="Remove"
            onClick={() => {
              markRemoval(label);
              array.remove(j);
            }}
          >
            <span aria-hidden="true">✕</span>
          </button>
        </div>
        {bridge.kind === 'fastener' ? null : <RatedFields index={j} bridge={bridge} array={array} />}
        {bridge.kind === 'fastener' ? <FastenerFields index={j} bridge={bridge} array={array} /> : null}
        <BlockError path={base} />
      </div>
    </li>
  );
}

type PointBridge = Extract<Bridge, { kind: 'point' }>;
type LinearBridge = Extract<Bridge, { kind: 'linear' }>;
type FastenerBridge = Extract<Bridge, { kind: 'fastener' }>;

/**
 * How a point or linear bridge is given: its χ or ψ, then either of two ways of saying how many there are (the
 * first box of each way is the field that tells which way a bridge is given; `make` switches a bridge to it).
 */
const RATES: Record<
  'point' | 'linear',
  {
    rate: MeasureBox;
    by: { value: string; label: string; boxes: MeasureBox[]; make: (b: RatedBridge) => Bridge }[];
  }
> = {
  point: {
    rate: ['chi', 'chi', 'χ per clip', 'w-44'],
    by: [
      {
        value: 'spacing',
        label: 'Spacing, horizontal × vertical',
        boxes: [
          ['spacingHorizontal', 'spacing', 'Horizontal spacing', 'w-40'],
          ['spacingVertical', 'spacing', 'Vertical spacing', 'w-40'],
        ],
        make: (b) => ({ ...rated(b), spacingHorizontal: 0.406, spacingVertical: 0.6 }) as Bridge,
      },
      {
        value: 'count',
        label: 'Count per area',
        boxes: [['countPerArea', 'countPerArea', 'Clips', 'w-40']],
        make: (b) => ({ ...rated(b), countPerArea: 4 }) as Bridge,
      },
    ],
  },
  linear: {
    rate: ['psi', 'psi', 'ψ per length', 'w-44'],
    by: [
      {
        value: 'spacing',
        label: 'Spacing on centre',
        boxes: [['spacing', 'spacing', 'Spacing on centre', 'w-44']],
        make: (b) => ({ ...rated(b), spacing: 1.2 }) as Bridge,
      },
      {
        value: 'length',
        label: 'Length per area',
        boxes: [['lengthPerArea', 'lengthPerArea', 'Length per area', 'w-44']],
        make: (b) => ({ ...rated(b), lengthPerArea: 0.8 }) as Bridge,
      },
    ],
  },
};

type RatedBridge = PointBridge | LinearBridge;

/** The bridge's kind, name and χ or ψ, without how many there are. */
const rated = (b: RatedBridge) =>
  b.kind === 'point'
    ? { kind: b.kind, name: b.name, chi: b.chi }
    : { kind: b.kind, name: b.name, psi: b.psi };

/** A point (clip) or linear (girt) bridge: χ or ψ, how many, and the firm library's values. */
function RatedFields({
  index: j,
  bridge,
  array,
}: {
  index: number;
  bridge: RatedBridge;
  array: BridgesArray;
}) {
  const base = `thermal.bridges.${j}`;
  const { rate, by } = RATES[bridge.kind];
  const way = by.find((w) => w.boxes[0]![0] in bridge) ?? by[1]!;
  const box = (b: MeasureBox) => <MeasureFields key={b[0]} base={base} boxes={[b]} />;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        {box(rate)}
        <SolveButton index={j} bridge={bridge} array={array} />
        <LabelledSelect
          label="Given by"
          className="w-48"
          value={way.value}
          onChange={(e) => array.update(j, by.find((w) => w.value === e.target.value)!.make(bridge))}
        >
          <LabelledOptions options={by} />
        </LabelledSelect>
        {way.boxes.map((b, k) =>
          k === 0 ? (
            box(b)
          ) : (
            <Fragment key={b[0]}>
              <span aria-hidden="true" className="pt-7 text-ink-muted">
                ×
              </span>
              {box(b)}
            </Fragment>
          ),
        )}
      </div>
      <LibraryPick
        index={j}
        kind={bridge.kind}
        value={bridge.kind === 'point' ? bridge.chi : bridge.psi}
        name={bridge.name}
        array={array}
        bridge={bridge}
      />
    </div>
  );
}

/**
 * "Solve χ/ψ…": the bridge solver on this assembly's layers; "Use this value" stores χ or ψ with its source. A
 * fastener row becomes a point bridge of the computed χ at the same count (the Annex F correction is replaced).
 */
function SolveButton({ index: j, bridge, array }: { index: number; bridge: Bridge; array: BridgesArray }) {
  const { control } = useFormContext<AssemblyFormValues>();
  const layers = (useWatch({ control, name: 'thermal.layers' }) ?? []) as Layer[];
  const [open, setOpen] = useState(false);
  const { saveBridgeValue } = useBuilder();
  const symbol = bridge.kind === 'linear' ? 'ψ' : 'χ';
  return (
    <>
      <Button
        variant="secondary"
        className="mt-6 px-3 py-1.5"
        aria-label={`Solve ${symbol} for ${bridge.name || `bridge ${j + 1}`}`}
        onClick={() => setOpen(true)}
      >
        Solve {symbol}…
      </Button>
      {open ? (
        <Suspense fallback={<Loading what="Loading the solver" />}>
          <BridgeSolveDialog
            bridge={bridge}
            layers={layers}
            onClose={() => setOpen(false)}
            save={saveBridgeValue}
            onUse={(value, source) => {
              array.update(j, withSolvedValue(bridge, value, source));
              setOpen(false);
            }}
          />
        </Suspense>
      ) : null}
    </>
  );
}

/** The bridge with a computed χ or ψ and its source (a fastener as a point bridge at its count). */
export function withSolvedValue(bridge: Bridge, value: number, source: SolvedSource): Bridge {
  if (bridge.kind === 'point') return { ...bridge, chi: value as PointBridge['chi'], source };
  if (bridge.kind === 'linear') return { ...bridge, psi: value as LinearBridge['psi'], source };
  return {
    kind: 'point',
    name: bridge.name,
    chi: value as PointBridge['chi'],
    countPerArea: bridge.countPerArea,
    source,
  };
}

/** A library value's source in words, as stored with the bridge and printed on the sheet. */
const bridgeSourceText = (b: BridgeValue) => `${SOURCE_TYPE_LABELS[b.sourceType]} — ${b.source}`;

/** Take χ or ψ from the firm's library (its source is stored with the bridge); show where the value in use came from. */
function LibraryPick({
  index: j,
  kind,
  value,
  name,
  bridge,
  array,
}: {
  index: number;
  kind: 'point' | 'linear';
  value: number;
  name: string;
  bridge: PointBridge | LinearBridge;
  array: BridgesArray;
}) {
  const system = useUnitSystem();
  const { bridgeValues, firmName } = useBuilder();
  const offered = bridgeValues.filter((b) => b.kind === kind);
  const source = bridge.source;
  // The entry the stored source names; for revisions saved before sources were stored, the entry of the same name and value.
  const matched = source
    ? offered.find((b) => b.id === source.libraryEntryId)
    : offered.find((b) => b.name.slice(0, 120) === name && Math.abs(b.value - value) < 1e-12);
  const changedSince = matched !== undefined && Math.abs(matched.value - value) >= 1e-12;
  const measure = kind === 'point' ? 'chi' : 'psi';
  const symbol = kind === 'point' ? 'χ' : 'ψ';

  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
      <LabelledSelect
        label={`Take ${symbol} from ${firmName ?? 'the firm'}'s library`}
        className="min-w-72 flex-1"
        value={matched?.id ?? ''}
        disabled={offered.length === 0}
        onChange={(e) => {
          const pick = offered.find((b) => b.id === e.target.value);
          if (!pick) return;
          const n = pick.name.slice(0, 120);
          // A computed entry brings its detail, solve and map (the sheet draws it, the moisture check reads f_Rsi).
          const from = {
            text: bridgeSourceText(pick),
            libraryEntryId: pick.id,
            ...(pick.computed ? { computed: pick.computed } : {}),
          };
          array.update(
            j,
            kind === 'point'
              ? { ...(bridge as PointBridge), name: n, chi: pick.value, source: from }
              : { ...(bridge as LinearBridge), name: n, psi: pick.value, source: from },
          );
        }}
      >
        <option value="">
          {offered.length === 0
            ? `No ${symbol} values in the library yet`
            : 'Entered by hand — choose a library value…'}
        </option>
        {offered.map((b) => (
          <option key={b.id} value={b.id}>
            {b.name} — {symbol} {formatMeasure(b.value, measure, system)} — {SOURCE_TYPE_LABELS[b.sourceType]}
            : {b.source}
          </option>
        ))}
      </LabelledSelect>
      <p className="max-w-md pb-1 text-xs text-ink-muted">
        {source || matched ? (
          <>
            <span className="font-semibold text-ink">Source:</span>{' '}
            {source?.text ?? bridgeSourceText(matched!)}
            {matched?.notes ? ` (${matched.notes})` : ''}
            {source?.libraryEntryId && !matched ? ' — since removed from the library' : ''}
            {changedSince ? (
              <span className="block font-semibold text-caution">
                ▲ {symbol} was changed after it was taken from the library (
                {formatMeasure(matched.value, measure, system)}
                there): the source may no longer apply.
              </span>
            ) : null}
          </>
        ) : (
          <>
            {symbol} entered by hand. The manufacturer's tested {symbol} value governs; record where this one
            came from in the revision note.
          </>
        )}
      </p>
    </div>
  );
}

/** A fastener's number boxes; the recess depth only for a recessed head. */
const FASTENER_BOXES: readonly MeasureBox[] = [
  ['conductivity', 'conductivity', 'λ_f of the fastener', 'w-48'],
  ['diameter', 'diameter', 'Shank diameter', 'w-36'],
  ['countPerArea', 'countPerArea', 'Fasteners', 'w-36'],
];
const RECESS: readonly MeasureBox[] = [['recessDepth', 'thickness', 'Recess depth', 'w-36']];

function FastenerFields({
  index: j,
  bridge,
  array,
}: {
  index: number;
  bridge: FastenerBridge;
  array: BridgesArray;
}) {
  const base = `thermal.bridges.${j}`;
  const { control } = useFormContext<AssemblyFormValues>();
  const layers = (useWatch({ control, name: 'thermal.layers' }) ?? []) as Layer[];
  const layerError = useFieldError(`${base}.layerIndex`);
  return (
    <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
      <MeasureFields base={base} boxes={FASTENER_BOXES} />
      <LabelledSelect
        label="Layer crossed"
        error={layerError}
        className="min-w-56 flex-1"
        id={fieldDomId(`${base}.layerIndex`)}
        value={String(bridge.layerIndex)}
        onChange={(e) => array.update(j, { ...bridge, layerIndex: Number(e.target.value) })}
      >
        <option value="-1" disabled>
          Choose the insulation layer…
        </option>
        {layers.map((l, i) =>
          l.kind === 'homogeneous' ? (
            // biome-ignore lint/suspicious/noArrayIndexKey: the index is the value
            <option key={i} value={String(i)}>
              {i + 1} {l.name}
            </option>
          ) : null,
        )}
      </LabelledSelect>
      <LabelledSelect
        label="Penetration"
        className="w-56"
        value={bridge.penetration}
        onChange={(e) => {
          const { recessDepth, ...rest } = bridge;
          array.update(
            j,
            e.target.value === 'recessed'
              ? {
                  ...rest,
                  penetration: 'recessed',
                  recessDepth: Number.isFinite(recessDepth) ? recessDepth : 0.01,
                }
              : { ...rest, penetration: 'full' },
          );
        }}
      >
        <option value="full">Through the whole layer</option>
        <option value="recessed">Recessed head</option>
      </LabelledSelect>
      {bridge.penetration === 'recessed' ? <MeasureFields base={base} boxes={RECESS} /> : null}
      <CheckBox
        label="Both ends touch metal sheets"
        checked={bridge.bothEndsMetal === true}
        onChange={(checked) => {
          const { bothEndsMetal: _was, ...rest } = bridge;
          array.update(j, checked ? { ...rest, bothEndsMetal: true } : rest);
        }}
      />
      <SolveButton index={j} bridge={bridge} array={array} />
      <BlockError path={`${base}.bothEndsMetal`} className="basis-full" />
    </div>
  );
}
