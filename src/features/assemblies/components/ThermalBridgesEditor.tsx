import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import type { BridgeValue } from '@shared/schemas/assembly';
import { isInsulation } from '@shared/sheets/layer-class';
import { lazy, Suspense, useState } from 'react';
import { type UseFieldArrayReturn, useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { Loading } from '../../../components/ui/Loading';
import { RadioGroup } from '../../../components/ui/RadioGroup';
import { useUnitSystem } from '../../../lib/unit-system';
import { fieldDomId } from '../evaluate';
import { type AssemblyFormValues, type BridgeRole, newBridge, p, useBuilder } from '../form';
import type { SolvedSource } from '../solve/BridgeSolveDialog';
import { formatMeasure } from '../units';
import { BlockError, MeasureField, TextField, useFieldError } from './FormFields';

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

const iconButton =
  'inline-flex h-8 min-w-8 items-center justify-center rounded-sm border border-rule-strong bg-paper-raised px-2 ' +
  'text-sm hover:bg-paper-sunk';

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
        {bridge.kind === 'point' ? <PointFields index={j} bridge={bridge} array={array} /> : null}
        {bridge.kind === 'linear' ? <LinearFields index={j} bridge={bridge} array={array} /> : null}
        {bridge.kind === 'fastener' ? <FastenerFields index={j} bridge={bridge} array={array} /> : null}
        <BlockError path={base} />
      </div>
    </li>
  );
}

type PointBridge = Extract<Bridge, { kind: 'point' }>;
type LinearBridge = Extract<Bridge, { kind: 'linear' }>;
type FastenerBridge = Extract<Bridge, { kind: 'fastener' }>;

function PointFields({
  index: j,
  bridge,
  array,
}: {
  index: number;
  bridge: PointBridge;
  array: BridgesArray;
}) {
  const base = `thermal.bridges.${j}`;
  const bySpacing = 'spacingHorizontal' in bridge;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        <MeasureField path={`${base}.chi`} measure="chi" label="χ per clip" className="w-44" />
        <SolveButton index={j} bridge={bridge} array={array} />
        <LabelledSelect
          label="Given by"
          className="w-48"
          value={bySpacing ? 'spacing' : 'count'}
          onChange={(e) =>
            array.update(
              j,
              e.target.value === 'spacing'
                ? {
                    kind: 'point',
                    name: bridge.name,
                    chi: bridge.chi,
                    spacingHorizontal: 0.406,
                    spacingVertical: 0.6,
                  }
                : { kind: 'point', name: bridge.name, chi: bridge.chi, countPerArea: 4 },
            )
          }
        >
          <option value="spacing">Spacing, horizontal × vertical</option>
          <option value="count">Count per area</option>
        </LabelledSelect>
        {bySpacing ? (
          <>
            <MeasureField
              path={`${base}.spacingHorizontal`}
              measure="spacing"
              label="Horizontal spacing"
              className="w-40"
            />
            <span aria-hidden="true" className="pt-7 text-ink-muted">
              ×
            </span>
            <MeasureField
              path={`${base}.spacingVertical`}
              measure="spacing"
              label="Vertical spacing"
              className="w-40"
            />
          </>
        ) : (
          <MeasureField path={`${base}.countPerArea`} measure="countPerArea" label="Clips" className="w-40" />
        )}
      </div>
      <LibraryPick
        index={j}
        kind="point"
        value={bridge.chi}
        name={bridge.name}
        array={array}
        bridge={bridge}
      />
    </div>
  );
}

function LinearFields({
  index: j,
  bridge,
  array,
}: {
  index: number;
  bridge: LinearBridge;
  array: BridgesArray;
}) {
  const base = `thermal.bridges.${j}`;
  const bySpacing = 'spacing' in bridge;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        <MeasureField path={`${base}.psi`} measure="psi" label="ψ per length" className="w-44" />
        <SolveButton index={j} bridge={bridge} array={array} />
        <LabelledSelect
          label="Given by"
          className="w-48"
          value={bySpacing ? 'spacing' : 'length'}
          onChange={(e) =>
            array.update(
              j,
              e.target.value === 'spacing'
                ? { kind: 'linear', name: bridge.name, psi: bridge.psi, spacing: 1.2 }
                : { kind: 'linear', name: bridge.name, psi: bridge.psi, lengthPerArea: 0.8 },
            )
          }
        >
          <option value="spacing">Spacing on centre</option>
          <option value="length">Length per area</option>
        </LabelledSelect>
        {bySpacing ? (
          <MeasureField
            path={`${base}.spacing`}
            measure="spacing"
            label="Spacing on centre"
            className="w-44"
          />
        ) : (
          <MeasureField
            path={`${base}.lengthPerArea`}
            measure="lengthPerArea"
            label="Length per area"
            className="w-44"
          />
        )}
      </div>
      <LibraryPick
        index={j}
        kind="linear"
        value={bridge.psi}
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
      <MeasureField
        path={`${base}.conductivity`}
        measure="conductivity"
        label="λ_f of the fastener"
        className="w-48"
      />
      <MeasureField path={`${base}.diameter`} measure="diameter" label="Shank diameter" className="w-36" />
      <MeasureField path={`${base}.countPerArea`} measure="countPerArea" label="Fasteners" className="w-36" />
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
      {bridge.penetration === 'recessed' ? (
        <MeasureField
          path={`${base}.recessDepth`}
          measure="thickness"
          label="Recess depth"
          className="w-36"
        />
      ) : null}
      <label className="flex items-center gap-2 pt-6 text-sm">
        <input
          type="checkbox"
          className="accent-ink"
          checked={bridge.bothEndsMetal === true}
          onChange={(e) => {
            const { bothEndsMetal: _was, ...rest } = bridge;
            array.update(j, e.target.checked ? { ...rest, bothEndsMetal: true } : rest);
          }}
        />
        Both ends touch metal sheets
      </label>
      <SolveButton index={j} bridge={bridge} array={array} />
      <BlockError path={`${base}.bothEndsMetal`} className="basis-full" />
    </div>
  );
}
