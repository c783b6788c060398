import type { Vapour } from '@shared/calc/moisture/schema';
import { findMaterial, GENERIC_MATERIAL_NOTE, materials } from '@shared/calc/thermal/materials';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import { useState } from 'react';
import { type UseFieldArrayReturn, useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { LabelledOptions, Options } from '../../../components/ui/Options';
import { useUnitSystem } from '../../../lib/unit-system';
import { fieldDomId } from '../evaluate';
import {
  type AssemblyFormValues,
  LAYER_KIND_LABELS,
  type LayerKind,
  layerFromFirm,
  layerFromGeneric,
  layerOfKind,
  p,
  remapAfterInsert,
  remapAfterMove,
  remapAfterRemove,
  useBuilder,
  vapourFromFirm,
  vapourFromGeneric,
} from '../form';
import { CATEGORY_LABELS } from '../layer-class';
import { formatMeasure } from '../units';
import {
  BlockError,
  CheckBox,
  iconButton,
  type MeasureBox,
  MeasureField,
  MeasureFields,
  TextField,
  useFieldError,
} from './FormFields';

type LayersArray = UseFieldArrayReturn<AssemblyFormValues, 'thermal.layers', 'key'>;

/** The boxes of one layer kind: the layer at `index` of the list. */
type KindProps<K extends Layer['kind']> = {
  index: number;
  layer: Extract<Layer, { kind: K }>;
  array: LayersArray;
};

const VENTILATION = [
  { value: 'unventilated', label: 'Unventilated' },
  { value: 'slightly', label: 'Slightly ventilated (vent area 500–1500 mm² per m)' },
  { value: 'well', label: 'Well ventilated (layers outside it are disregarded)' },
] as const;

/** Each kind's number boxes (a layer's field, measure, label, width, hint). */
const BOXES: Record<string, readonly MeasureBox[]> = {
  homogeneous: [
    ['thickness', 'thickness', 'Thickness d', 'w-36'],
    ['conductivity', 'conductivity', 'λ', 'w-52'],
  ],
  resistance: [
    ['resistance', 'resistance', 'Declared R', 'w-48', "From the maker's declaration."],
    [
      'thickness',
      'thickness',
      'Thickness d',
      'w-36',
      'Needed with metal framing: the zone method measures through every layer.',
    ],
  ],
  airDepth: [['thickness', 'thickness', 'Depth in the heat-flow direction', 'w-48']],
  ventArea: [
    [
      'ventArea',
      'ventArea',
      'Vent area A_v',
      'w-56',
      'Openings per m of length (vertical layer) or per m² (horizontal); ISO 6946 §6.9.3 blends R between unventilated and well ventilated.',
    ],
  ],
  emittance: [
    ['emissivityFactor', 'emittance', 'Intersurface emittance E', 'w-52', 'E = 1/(1/ε₁ + 1/ε₂ − 1)'],
  ],
  framedDepth: [['thickness', 'thickness', 'Depth d', 'w-36']],
  metal: [
    ['flangeWidth', 'spacing', 'Flange width m', 'w-40'],
    ['spacing', 'spacing', 'Spacing s (on centre)', 'w-44'],
  ],
};

/** Layers outside → inside: add from a library or by hand, reorder with buttons, remove, edit by kind. */
export function LayersEditor() {
  const { control, getValues, setValue } = useFormContext<AssemblyFormValues>();
  const array = useFieldArray({ control, name: 'thermal.layers', keyName: 'key' });
  const { fields, move, remove, insert } = array;
  const { markRemoval } = useBuilder();
  const [announcement, setAnnouncement] = useState('');

  /** Fasteners name the layer they cross by index: keep them pointing at the same layer. */
  function remapFasteners(map: (index: number) => number) {
    const bridges = (getValues('thermal.bridges') ?? []) as Bridge[];
    bridges.forEach((b, j) => {
      if (b.kind === 'fastener')
        setValue(p(`thermal.bridges.${j}.layerIndex`), map(b.layerIndex), { shouldDirty: true });
    });
  }

  /** Vapour data (moisture check) is kept one entry per layer: move, drop or add its entry alongside. */
  /** Keep the vapour list one entry per layer; `count` starts one (all "not entered") where there is none. */
  function alignVapour(edit: (list: unknown[]) => void, count?: number) {
    const vapour = getValues('vapour');
    if (!Array.isArray(vapour) && count === undefined) return;
    const next = Array.isArray(vapour) ? [...vapour] : Array.from({ length: count! }, () => null);
    edit(next);
    setValue('vapour', next as AssemblyFormValues['vapour'], { shouldDirty: true });
  }

  const nameAt = (i: number) => (getValues(p(`thermal.layers.${i}.name`)) as string) || `layer ${i + 1}`;

  function moveLayer(from: number, to: number, key: string, direction: 'out' | 'in') {
    const name = nameAt(from);
    move(from, to);
    remapFasteners((k) => remapAfterMove(k, from, to));
    alignVapour((list) => list.splice(to, 0, ...list.splice(from, 1)));
    setAnnouncement(`${name} moved to position ${to + 1} of ${fields.length}.`);
    // Keep the keyboard where it was: on the same button of the moved layer (or its twin at the end).
    requestAnimationFrame(() => {
      const same = document.getElementById(`layer-${key}-${direction}`) as HTMLButtonElement | null;
      const other = document.getElementById(`layer-${key}-${direction === 'out' ? 'in' : 'out'}`);
      (same && !same.disabled ? same : other)?.focus();
    });
  }

  function removeLayer(i: number) {
    const name = nameAt(i);
    markRemoval(name);
    remove(i);
    remapFasteners((k) => remapAfterRemove(k, i));
    alignVapour((list) => list.splice(i, 1));
    setAnnouncement(`${name} removed.`);
  }

  function insertLayer(at: number, layer: Layer, vapour: Vapour | null) {
    const before = fields.length;
    insert(at, layer);
    remapFasteners((k) => remapAfterInsert(k, at));
    alignVapour((list) => list.splice(at, 0, vapour), vapour ? before : undefined);
    setAnnouncement(`${layer.name} added at position ${at + 1}.`);
  }

  return (
    <div className="flex flex-col gap-3">
      <div className="flex items-baseline justify-between gap-4 text-sm">
        <p className="label-caps">
          <span aria-hidden="true">◀ </span>Outside
        </p>
        <p className="text-ink-muted">Layers in order from the outside face to the inside face</p>
        <p className="label-caps">
          Inside<span aria-hidden="true"> ▶</span>
        </p>
      </div>
      <BlockError path="thermal.layers" />
      {fields.length === 0 ? (
        <p className="border-y border-rule py-4 text-ink-muted">No layers yet. Add the outside face first.</p>
      ) : (
        <ol className="flex flex-col border-b border-rule" aria-label="Layers, outside to inside">
          {fields.map((f, i) => (
            <LayerRow
              key={f.key}
              index={i}
              rowKey={f.key}
              count={fields.length}
              array={array}
              onMove={(to, dir) => moveLayer(i, to, f.key, dir)}
              onRemove={() => removeLayer(i)}
            />
          ))}
        </ol>
      )}
      <p role="status" className="sr-only">
        {announcement}
      </p>
      <AddLayer count={fields.length} names={fields.map((_, i) => nameAt(i))} onAdd={insertLayer} />
    </div>
  );
}

function LayerRow({
  index: i,
  rowKey,
  count,
  array,
  onMove,
  onRemove,
}: {
  index: number;
  rowKey: string;
  count: number;
  array: LayersArray;
  onMove: (to: number, direction: 'out' | 'in') => void;
  onRemove: () => void;
}) {
  const { control } = useFormContext<AssemblyFormValues>();
  const system = useUnitSystem();
  const { layerR, disregarded } = useBuilder();
  const layer = useWatch({ control, name: p(`thermal.layers.${i}`) }) as Layer | undefined;
  const vapour = useWatch({ control, name: 'vapour' }) as unknown[] | undefined;
  if (!layer) return null;
  const base = `thermal.layers.${i}`;
  // Said here at once, not found out as "not evaluated" at check time (the moisture page marks it too) —
  // also when the assembly has no vapour data at all.
  const vapourNeeded = !(Array.isArray(vapour) && vapour[i]);
  const R = layerR(i);
  const label = layer.name || `Layer ${i + 1}`;

  return (
    <li
      className="grid grid-cols-[2rem_1fr] gap-x-3 border-t border-rule py-3"
      aria-label={`Layer ${i + 1}: ${label}`}
    >
      <span className="num pt-6 text-right text-lg font-medium text-ink" aria-hidden="true">
        {i + 1}
      </span>
      <div className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
          <TextField path={`${base}.name`} label="Layer" className="min-w-56 flex-[2]" maxLength={120} />
          <LabelledSelect
            label="Kind"
            className="min-w-44 flex-1"
            value={layer.kind}
            onChange={(e) => array.update(i, layerOfKind(e.target.value as LayerKind, layer))}
          >
            <Options values={Object.keys(LAYER_KIND_LABELS) as LayerKind[]} labels={LAYER_KIND_LABELS} />
          </LabelledSelect>
          <p className="w-40 shrink-0 text-right text-sm">
            <span className="label-caps block">R of layer</span>
            <span className="num">
              {R !== undefined ? (
                R > 0 && R < 0.001 ? (
                  `< ${formatMeasure(0.001, 'resistance', system)}`
                ) : (
                  formatMeasure(R, 'resistance', system)
                )
              ) : disregarded(i) ? (
                <span
                  className="font-sans text-xs"
                  title="Outside a well-ventilated air layer: not counted (ISO 6946 §6.9)"
                >
                  not counted
                </span>
              ) : (
                '—'
              )}
            </span>
          </p>
          <fieldset className="flex gap-1">
            <legend className="sr-only">Move or remove {label}</legend>
            <button
              type="button"
              id={`layer-${rowKey}-out`}
              className={`${iconButton} text-ink`}
              disabled={i === 0}
              aria-label={`Move ${label} outward (up)`}
              title="Move outward"
              onClick={() => onMove(i - 1, 'out')}
            >
              <span aria-hidden="true">↑</span>
            </button>
            <button
              type="button"
              id={`layer-${rowKey}-in`}
              className={`${iconButton} text-ink`}
              disabled={i === count - 1}
              aria-label={`Move ${label} inward (down)`}
              title="Move inward"
              onClick={() => onMove(i + 1, 'in')}
            >
              <span aria-hidden="true">↓</span>
            </button>
            <button
              type="button"
              className={`${iconButton} text-ink text-caution`}
              aria-label={`Remove ${label}`}
              title="Remove"
              onClick={onRemove}
            >
              <span aria-hidden="true">✕</span>
            </button>
          </fieldset>
        </div>

        {layer.kind === 'homogeneous' ? (
          <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
            <MeasureFields base={base} boxes={BOXES.homogeneous} />
            <MaterialSource materialId={layer.materialId} conductivity={layer.conductivity} />
          </div>
        ) : null}

        {layer.kind === 'resistance' ? (
          <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
            <MeasureFields base={base} boxes={BOXES.resistance} />
          </div>
        ) : null}

        {vapourNeeded ? (
          <p
            className="flex items-start gap-1 text-xs font-medium text-warning"
            data-testid={`vapour-needed-${i}`}
          >
            <span aria-hidden="true">▲</span>
            <span>
              Vapour data needed for the moisture check — enter μ, s_d or permeance on the moisture page.
            </span>
          </p>
        ) : null}
        {layer.kind === 'air' ? <AirFields index={i} layer={layer} array={array} /> : null}
        {layer.kind === 'framed' ? <FramedFields index={i} layer={layer} array={array} /> : null}

        <BlockError path={base} />
        <BlockError path={`${base}.kind`} />
        <BlockError path={`${base}.metal`} />
        <BlockError path={`${base}.materialId`} />
      </div>
    </li>
  );
}

function MaterialSource({ materialId, conductivity }: { materialId?: string; conductivity: number }) {
  const system = useUnitSystem();
  const m = materialId ? findMaterial(materialId) : undefined;
  if (!m) return <p className="max-w-md self-center text-xs text-ink-muted">λ entered by hand.</p>;
  const changed = Number.isFinite(conductivity) && Math.abs(conductivity - m.conductivity) > 1e-9;
  return (
    <p className="max-w-md self-center text-xs text-ink-muted">
      Generic library: {m.name}. {m.source}. <span className="italic">{GENERIC_MATERIAL_NOTE}.</span>
      {changed ? (
        <span className="block font-semibold text-ink">
          λ changed from the library's {formatMeasure(m.conductivity, 'conductivity', system)}.
        </span>
      ) : null}
    </p>
  );
}

function AirFields({ index: i, layer, array }: KindProps<'air'>) {
  const base = `thermal.layers.${i}`;
  const lowE = layer.emissivityFactor !== undefined;
  return (
    <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
      <MeasureFields base={base} boxes={BOXES.airDepth} />
      <LabelledSelect
        label="Ventilation"
        className="min-w-64"
        value={layer.ventilation}
        onChange={(e) => {
          const ventilation = e.target.value as (typeof VENTILATION)[number]['value'];
          const { ventArea: _drop, ...rest } = layer;
          // ISO 6946 §6.9.3: a slightly ventilated layer is described by its vent area; the others need none.
          array.update(
            i,
            ventilation === 'slightly' ? { ...rest, ventilation, ventArea: 1000 } : { ...rest, ventilation },
          );
        }}
      >
        <LabelledOptions options={VENTILATION} />
      </LabelledSelect>
      {layer.ventilation === 'slightly' ? <MeasureFields base={base} boxes={BOXES.ventArea} /> : null}
      <div className="flex flex-col gap-2">
        <CheckBox
          label="Low-emissivity face (give E)"
          checked={lowE}
          onChange={(checked) => {
            const { emissivityFactor: _drop, ...rest } = layer;
            array.update(i, checked ? { ...rest, emissivityFactor: 0.05 } : rest);
          }}
        />
      </div>
      {lowE ? <MeasureFields base={base} boxes={BOXES.emittance} /> : null}
    </div>
  );
}

function FramedFields({ index: i, layer, array }: KindProps<'framed'>) {
  const base = `thermal.layers.${i}`;
  const { control, setValue } = useFormContext<AssemblyFormValues>();
  const sections = useFieldArray({
    control,
    name: p(`${base}.sections`) as 'thermal.layers.0.sections',
    keyName: 'key',
  });
  const sectionsErrorPath = `${base}.sections`;
  const sectionsError = useFieldError(sectionsErrorPath);
  const describedBy = sectionsError ? `${fieldDomId(sectionsErrorPath)}-error` : undefined;
  const sum = layer.sections.reduce((a, s) => a + (Number.isFinite(s.fraction) ? s.fraction : 0), 0);

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
        <MeasureFields base={base} boxes={BOXES.framedDepth} />
        <CheckBox
          label="Metal framing (zone method)"
          checked={layer.metal}
          onChange={(checked) => {
            const { flangeWidth, spacing, ...restOf } = layer;
            array.update(
              i,
              checked
                ? {
                    ...restOf,
                    metal: true,
                    flangeWidth: Number.isFinite(flangeWidth) ? flangeWidth : 0.041,
                    spacing: Number.isFinite(spacing) ? spacing : 0.406,
                  }
                : { ...restOf, metal: false },
            );
          }}
        />
        {layer.metal ? <MeasureFields base={base} boxes={BOXES.metal} /> : null}
      </div>

      <fieldset className="border-l-2 border-rule pl-3">
        <legend className="label-caps">Sections across the layer (area fractions sum to 100 %)</legend>
        <ul className="mt-2 flex flex-col gap-2">
          {sections.fields.map((s, q) => (
            <li key={s.key} className="flex flex-wrap items-start gap-x-3 gap-y-1">
              <TextField
                path={`${base}.sections.${q}.name`}
                label={`Section ${q + 1}`}
                className="min-w-48 flex-1"
              />
              <MeasureField
                path={`${base}.sections.${q}.conductivity`}
                measure="conductivity"
                label="λ"
                className="w-48"
              />
              <MeasureField
                path={`${base}.sections.${q}.fraction`}
                measure="fraction"
                label="Area fraction"
                className="w-36"
                invalid={Boolean(sectionsError)}
                describedBy={describedBy}
              />
              <button
                type="button"
                className={`${iconButton} mt-6 text-ink text-caution`}
                aria-label={`Remove section ${q + 1}`}
                disabled={sections.fields.length <= 1}
                onClick={() => sections.remove(q)}
              >
                <span aria-hidden="true">✕</span>
              </button>
            </li>
          ))}
        </ul>
        <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
          <Button
            variant="quiet"
            className="px-2 py-1"
            disabled={sections.fields.length >= 8}
            onClick={() =>
              sections.append({ name: 'Section', conductivity: 0.04, fraction: Math.max(0, 1 - sum) || 0.1 })
            }
          >
            + Add section
          </Button>
          {Math.abs(sum - 1) > 1e-9
            ? layer.sections.map((sec, q) => {
                const own = Number.isFinite(sec.fraction) ? sec.fraction : 0;
                const remainder = 1 - (sum - own);
                return remainder > 0 && remainder <= 1 ? (
                  <Button
                    // biome-ignore lint/suspicious/noArrayIndexKey: sections are positional
                    key={q}
                    variant="quiet"
                    className="px-2 py-1"
                    onClick={() =>
                      setValue(p(`${base}.sections.${q}.fraction`), remainder, { shouldDirty: true })
                    }
                  >
                    Give the rest to “{sec.name || `section ${q + 1}`}” (
                    {formatMeasure(remainder, 'fraction', 'SI', 4)})
                  </Button>
                ) : null;
              })
            : null}
          <span className="num ml-auto text-ink-muted">Σ = {formatMeasure(sum, 'fraction', 'SI', 4)}</span>
        </div>
        {sectionsError ? (
          <p
            id={`${fieldDomId(sectionsErrorPath)}-error`}
            className="mt-1 flex items-start gap-1 text-sm font-medium text-caution"
          >
            <span aria-hidden="true">✕</span>
            <span>{sectionsError}</span>
          </p>
        ) : null}
        <span id={fieldDomId(sectionsErrorPath)} />
      </fieldset>
      <BlockError path={`${base}.flangeWidth`} />
    </div>
  );
}

/** Pick what to add (a generic material, a firm material, or a layer by kind) and where to put it. */
function AddLayer({
  count,
  names,
  onAdd,
}: {
  count: number;
  names: string[];
  onAdd: (at: number, layer: Layer, vapour: Vapour | null) => void;
}) {
  const { firmName, firmMaterials } = useBuilder();
  const [choice, setChoice] = useState('generic:mineral-wool-board');
  const [position, setPosition] = useState('end');

  const byCategory = Object.entries(CATEGORY_LABELS).map(([cat, label]) => ({
    label,
    items: materials.filter((m) => m.category === cat),
  }));

  function add() {
    const [source, id] = choice.split(':') as [string, string];
    let layer: Layer | undefined;
    let vapour: Vapour | null = null;
    if (source === 'generic') {
      const m = findMaterial(id);
      if (m) [layer, vapour] = [layerFromGeneric(m), vapourFromGeneric(m)];
    } else if (source === 'firm') {
      const m = firmMaterials.find((x) => x.id === id);
      if (m) [layer, vapour] = [layerFromFirm(m), vapourFromFirm(m)];
    } else layer = layerOfKind(id as LayerKind, { name: LAYER_KIND_LABELS[id as LayerKind] });
    if (!layer) return;
    const at = position === 'end' ? count : position === 'start' ? 0 : Number(position) + 1;
    onAdd(at, layer, vapour);
  }

  return (
    <fieldset className="flex flex-wrap items-end gap-x-4 gap-y-2 bg-paper-sunk px-3 py-3">
      <legend className="sr-only">Add a layer</legend>
      <LabelledSelect
        label="Add a layer"
        className="min-w-72 flex-[2]"
        value={choice}
        onChange={(e) => setChoice(e.target.value)}
      >
        {byCategory.map((g) =>
          g.items.length ? (
            <optgroup key={g.label} label={`Generic library — ${g.label}`}>
              {g.items.map((m) => (
                <option key={m.id} value={`generic:${m.id}`}>
                  {m.name} (λ {m.conductivity})
                </option>
              ))}
            </optgroup>
          ) : null,
        )}
        <optgroup label={firmName ? `${firmName} — firm materials` : 'Firm materials'}>
          {firmMaterials.length === 0 ? (
            <option value="none:" disabled>
              None yet — add them on the Library page
            </option>
          ) : (
            firmMaterials.map((m) => (
              <option key={m.id} value={`firm:${m.id}`}>
                {m.name} (λ {m.conductivity}) — {m.source}
              </option>
            ))
          )}
        </optgroup>
        <optgroup label="By kind, values entered by hand">
          {(Object.keys(LAYER_KIND_LABELS) as LayerKind[]).map((k) => (
            <option key={k} value={`kind:${k}`}>
              {LAYER_KIND_LABELS[k]}
            </option>
          ))}
        </optgroup>
      </LabelledSelect>
      <LabelledSelect
        label="Where"
        className="min-w-56 flex-1"
        value={position}
        onChange={(e) => setPosition(e.target.value)}
      >
        <option value="end">At the inside face (last)</option>
        <option value="start">At the outside face (first)</option>
        {names.map((n, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: positions are indexes by nature
          <option key={i} value={String(i)}>
            After {i + 1} {n}
          </option>
        ))}
      </LabelledSelect>
      <Button variant="secondary" onClick={add} className="py-1.5">
        Add layer
      </Button>
    </fieldset>
  );
}
