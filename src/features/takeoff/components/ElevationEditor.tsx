import {
  type BeadProfile,
  TAKEOFF_JOINT_TYPES,
  type TakeoffInput,
  type TakeoffJointType,
  type Trim,
  type Wall,
} from '@shared/calc/takeoff/schema';
import type { PageMeasure } from '@shared/format/page-measures';
import { type ComponentProps, type ReactNode, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FieldGroup, GroupProblem } from '../../../components/ui/FieldGroup';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { Options } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { TextInput } from '../../../components/ui/TextInput';
import { type FieldProblem, type FieldProblems, fieldDomId, problemText } from '../../../lib/field-problems';
import type { ParsedEntry } from '../../../lib/input-measure';
import { pageInput } from '../../../lib/input-measure';
import { useUnitSystem } from '../../../lib/unit-system';
import { newOpening, newTrim, newWall, removeAt, replaceAt } from '../draft';
import { BEAD_SHAPE_LABELS, TAKEOFF_TYPE_LABELS } from '../labels';

const small = 'py-1.5 text-sm';

/** A whole-number box: hands up NaN while it does not hold a whole number (the schema then names it). */
function CountInput({
  label,
  value,
  onChange,
  problem,
  id,
}: {
  label: ReactNode;
  value: number;
  onChange: (n: number) => void;
  problem?: FieldProblem;
  id: string;
}) {
  const system = useUnitSystem();
  const [text, setText] = useState(Number.isFinite(value) ? String(value) : '');
  const [seen, setSeen] = useState(value);
  if (!Object.is(seen, value)) {
    setSeen(value);
    if (Number.isFinite(value) && Number(text) !== value) setText(String(value));
  }
  return (
    <Field label={label} id={id} error={problem ? problemText(problem, undefined, system) : undefined}>
      {(c) => (
        <TextInput
          {...c}
          inputMode="numeric"
          autoComplete="off"
          value={text}
          onChange={(e) => {
            setText(e.target.value);
            const t = e.target.value.trim();
            const n = /^\d+$/.test(t) ? Number(t) : Number.NaN;
            setSeen(n);
            onChange(n);
          }}
          className={`num text-right ${small}`}
        />
      )}
    </Field>
  );
}

interface ElevationEditorProps {
  input: TakeoffInput;
  onChange: (input: TakeoffInput) => void;
  problems: FieldProblems;
}

/** The elevation list and the takeoff's allowances, every box with its unit and its problem beside it. */
export function ElevationEditor({ input, onChange, problems }: ElevationEditorProps) {
  const pr = (k: string) => problems[`takeoff.${k}`];
  const id = (k: string) => fieldDomId(`takeoff.${k}`);
  const set = (changes: Partial<TakeoffInput>) => onChange({ ...input, ...changes });
  const setWall = (i: number, w: Wall) => set({ walls: replaceAt(input.walls, i, w) });
  const setTrim = (k: number, t: Trim) => set({ trims: replaceAt(input.trims, k, t) });

  /** The sheet box for the quantity at `path`: its id, its problem, NaN handed on while it holds no number. */
  const quantity = (
    path: string,
    label: string,
    kind: PageMeasure,
    value: number | undefined,
    apply: (v: number, entry: ParsedEntry['kind']) => void,
    extra?: Pick<ComponentProps<typeof QuantityInput>, 'hint' | 'required'>,
  ) => (
    <QuantityInput
      id={id(path)}
      label={label}
      measure={pageInput(kind)}
      value={value}
      onChange={(v, entry) => apply(v ?? Number.NaN, entry)}
      problem={pr(path)}
      {...extra}
    />
  );

  /** The name box of a wall, an opening or a trim, with the name's problem under it. */
  const nameField = (path: string, label: string, value: string, apply: (text: string) => void) => {
    const problem = pr(path);
    return (
      <Field label={label} id={id(path)} error={problem && problemText(problem, undefined, 'SI')}>
        {(c) => (
          <TextInput
            {...c}
            className={small}
            maxLength={120}
            value={value}
            onChange={(e) => apply(e.target.value)}
          />
        )}
      </Field>
    );
  };

  function setBead(t: TakeoffJointType, bead: BeadProfile | undefined) {
    const beads = { ...input.beads };
    if (bead) beads[t] = bead;
    else delete beads[t];
    set({ beads });
  }

  function changeShape(t: TakeoffJointType, shape: string) {
    const old = input.beads[t];
    const size =
      old?.shape === 'round'
        ? old.diameter
        : old?.shape === 'fillet'
          ? old.leg
          : old?.shape === 'rectangular'
            ? old.width
            : 0.012;
    if (shape === 'round') setBead(t, { shape, diameter: size });
    else if (shape === 'fillet') setBead(t, { shape, leg: size });
    else if (shape === 'rectangular') setBead(t, { shape, width: size, depth: Math.min(size, 0.0127) });
    else setBead(t, undefined);
  }

  return (
    <div className="flex flex-col gap-5">
      <FieldGroup
        legend="Walls (elevations)"
        note="Count each building corner on one wall only; an abutment is a wall end that butts other construction."
      >
        <GroupProblem path="takeoff.walls" problem={pr('walls')} />
        {input.walls.map((w, i) => (
          <fieldset
            // biome-ignore lint/suspicious/noArrayIndexKey: walls are addressed by position
            key={i}
            className="flex flex-col gap-3 border-l-2 border-rule pl-3"
            aria-label={`Wall ${i + 1}`}
          >
            <div className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto]">
              {nameField(`walls.${i}.name`, 'Wall', w.name, (name) => setWall(i, { ...w, name }))}
              {quantity(`walls.${i}.length`, 'Length', 'length', w.length, (length) =>
                setWall(i, { ...w, length }),
              )}
              {quantity(`walls.${i}.height`, 'Height', 'length', w.height, (height) =>
                setWall(i, { ...w, height }),
              )}
              {(['corners', 'abutments'] as const).map((k) => (
                <LabelledSelect
                  key={k}
                  label={k === 'corners' ? 'Corners' : 'Abutments'}
                  id={id(`walls.${i}.${k}`)}
                  error={pr(`walls.${i}.${k}`) && problemText(pr(`walls.${i}.${k}`)!, undefined, 'SI')}
                  selectClassName={small}
                  value={w[k] ?? 0}
                  onChange={(e) => setWall(i, { ...w, [k]: Number(e.target.value) })}
                >
                  {[0, 1, 2].map((n) => (
                    <option key={n} value={n}>
                      {n}
                    </option>
                  ))}
                </LabelledSelect>
              ))}
              <div className="flex items-start pt-6">
                {input.walls.length > 1 ? (
                  <Button
                    variant="quiet"
                    aria-label={`Remove wall ${w.name || i + 1}`}
                    onClick={() => set({ walls: removeAt(input.walls, i) })}
                  >
                    Remove
                  </Button>
                ) : null}
              </div>
            </div>
            <GroupProblem path={`takeoff.walls.${i}.openings`} problem={pr(`walls.${i}.openings`)} />
            {w.openings.map((o, j) => {
              const at = `walls.${i}.openings.${j}`;
              const setO = (changes: Partial<typeof o>) =>
                setWall(i, { ...w, openings: replaceAt(w.openings, j, { ...o, ...changes }) });
              return (
                <fieldset
                  // biome-ignore lint/suspicious/noArrayIndexKey: openings are addressed by position
                  key={j}
                  className="ml-4 grid gap-x-4 gap-y-2 sm:grid-cols-3 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto]"
                  aria-label={`${w.name || `Wall ${i + 1}`}, opening ${j + 1}`}
                >
                  {nameField(`${at}.name`, 'Opening', o.name ?? '', (name) =>
                    setO({ name: name || undefined }),
                  )}
                  <LabelledSelect
                    label="Kind"
                    id={id(`${at}.kind`)}
                    selectClassName={small}
                    value={o.kind ?? 'window'}
                    onChange={(e) => setO({ kind: e.target.value as 'window' | 'door' })}
                  >
                    <option value="window">Window</option>
                    <option value="door">Door (no sill)</option>
                  </LabelledSelect>
                  {quantity(`${at}.width`, 'Width', 'length', o.width, (width) => setO({ width }))}
                  {quantity(`${at}.height`, 'Height', 'length', o.height, (height) => setO({ height }))}
                  <CountInput
                    id={id(`${at}.count`)}
                    label="How many"
                    value={o.count}
                    onChange={(n) => setO({ count: n })}
                    problem={pr(`${at}.count`)}
                  />
                  <div className="flex items-start pt-6">
                    <Button
                      variant="quiet"
                      aria-label={`Remove opening ${o.name || j + 1} from ${w.name || `wall ${i + 1}`}`}
                      onClick={() => setWall(i, { ...w, openings: removeAt(w.openings, j) })}
                    >
                      Remove
                    </Button>
                  </div>
                </fieldset>
              );
            })}
            <div className="ml-4">
              <Button
                variant="quiet"
                onClick={() => setWall(i, { ...w, openings: [...w.openings, newOpening(w.openings.length)] })}
              >
                Add an opening to {w.name || `wall ${i + 1}`}
              </Button>
            </div>
          </fieldset>
        ))}
        <div>
          <Button
            variant="secondary"
            disabled={input.walls.length >= 200}
            onClick={() => set({ walls: [...input.walls, newWall(input.walls.length)] })}
          >
            Add a wall
          </Button>
        </div>
      </FieldGroup>

      <FieldGroup legend="Panel module">
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-3">
          {quantity(
            'module.width',
            'Module width',
            'length',
            input.module.width,
            (width) => set({ module: { ...input.module, width } }),
            { hint: 'Joint spacing across the panels.' },
          )}
          {quantity(
            'module.length',
            'Longest panel',
            'length',
            input.module.length,
            (length) => set({ module: { ...input.module, length } }),
            { hint: 'End joints occur where a run is longer.' },
          )}
          <LabelledSelect
            label="Panels span"
            id={id('module.orientation')}
            selectClassName={small}
            value={input.module.orientation}
            onChange={(e) =>
              set({
                module: { ...input.module, orientation: e.target.value as 'vertical' | 'horizontal' },
              })
            }
          >
            <option value="vertical">Vertically (width runs along the wall)</option>
            <option value="horizontal">Horizontally (width runs up the wall)</option>
          </LabelledSelect>
        </div>
      </FieldGroup>

      <FieldGroup
        legend="Sealant beads"
        note="The bead cross-section per joint line; a line with no bead takes no sealant."
      >
        <div className="flex flex-col gap-2">
          {TAKEOFF_JOINT_TYPES.map((t) => {
            const bead = input.beads[t];
            const setB = (b: BeadProfile) => setBead(t, b);
            return (
              <fieldset
                key={t}
                className="grid items-start gap-x-4 gap-y-2 sm:grid-cols-[2fr_2fr_1fr_1fr]"
                aria-label={`Bead, ${TAKEOFF_TYPE_LABELS[t]}`}
              >
                <p className="pt-7 text-sm font-semibold">{TAKEOFF_TYPE_LABELS[t]}</p>
                <LabelledSelect
                  label="Profile"
                  id={id(`beads.${t}.shape`)}
                  selectClassName={small}
                  value={bead?.shape ?? 'none'}
                  onChange={(e) => changeShape(t, e.target.value)}
                >
                  <option value="none">No sealant</option>
                  <Options values={['rectangular', 'round', 'fillet'] as const} labels={BEAD_SHAPE_LABELS} />
                </LabelledSelect>
                {bead?.shape === 'rectangular' ? (
                  <>
                    {quantity(`beads.${t}.width`, 'Width W', 'joint', bead.width, (width) =>
                      setB({ ...bead, width }),
                    )}
                    {quantity(`beads.${t}.depth`, 'Depth D', 'joint', bead.depth, (depth) =>
                      setB({ ...bead, depth }),
                    )}
                  </>
                ) : bead?.shape === 'round' ? (
                  quantity(`beads.${t}.diameter`, 'Diameter d', 'joint', bead.diameter, (diameter) =>
                    setB({ ...bead, diameter }),
                  )
                ) : bead?.shape === 'fillet' ? (
                  quantity(`beads.${t}.leg`, 'Leg', 'joint', bead.leg, (leg) => setB({ ...bead, leg }))
                ) : null}
                <div className="sm:col-span-4">
                  <GroupProblem path={`takeoff.beads.${t}`} problem={pr(`beads.${t}`)} />
                </div>
              </fieldset>
            );
          })}
        </div>
        <div className="max-w-48">
          {quantity('wasteFactor', 'Waste on sealant and tape', 'percent', input.wasteFactor, (wasteFactor) =>
            set({ wasteFactor }),
          )}
        </div>
      </FieldGroup>

      <FieldGroup legend="Trims" note="Stock lengths lapped along each continuous run of a joint line.">
        {input.trims.map((t, k) => (
          <fieldset
            // biome-ignore lint/suspicious/noArrayIndexKey: trims are addressed by position
            key={k}
            className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-[2fr_2fr_1fr_1fr_auto]"
            aria-label={`Trim ${k + 1}`}
          >
            {nameField(`trims.${k}.name`, 'Trim', t.name, (name) => setTrim(k, { ...t, name }))}
            <LabelledSelect
              label="Along"
              id={id(`trims.${k}.appliesTo`)}
              selectClassName={small}
              value={t.appliesTo}
              onChange={(e) => setTrim(k, { ...t, appliesTo: e.target.value as TakeoffJointType })}
            >
              <Options values={TAKEOFF_JOINT_TYPES} labels={TAKEOFF_TYPE_LABELS} />
            </LabelledSelect>
            {quantity(`trims.${k}.stockLength`, 'Stock length', 'length', t.stockLength, (stockLength) =>
              setTrim(k, { ...t, stockLength }),
            )}
            {quantity(`trims.${k}.lapAllowance`, 'Lap', 'spacing', t.lapAllowance, (lapAllowance) =>
              setTrim(k, { ...t, lapAllowance }),
            )}
            <div className="flex items-start pt-6">
              <Button
                variant="quiet"
                aria-label={`Remove trim ${t.name || k + 1}`}
                onClick={() => set({ trims: removeAt(input.trims, k) })}
              >
                Remove
              </Button>
            </div>
          </fieldset>
        ))}
        <div>
          <Button
            variant="secondary"
            disabled={input.trims.length >= 40}
            onClick={() => set({ trims: [...input.trims, newTrim()] })}
          >
            Add a trim
          </Button>
        </div>
      </FieldGroup>

      <FieldGroup legend="Fasteners">
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={input.fasteners !== undefined}
            onChange={(e) => {
              if (e.target.checked) set({ fasteners: { spacingAlongGirt: 0.3, girtSpacing: 1.2 } });
              else {
                const { fasteners: _, ...rest } = input;
                onChange(rest);
              }
            }}
          />
          Count fasteners on a girt grid
        </label>
        {input.fasteners ? (
          <div className="grid gap-x-4 gap-y-3 sm:grid-cols-3">
            {quantity(
              'fasteners.spacingAlongGirt',
              'Spacing along each girt',
              'spacing',
              input.fasteners.spacingAlongGirt,
              (spacingAlongGirt) =>
                input.fasteners && set({ fasteners: { ...input.fasteners, spacingAlongGirt } }),
            )}
            {quantity(
              'fasteners.girtSpacing',
              'Girt spacing up the wall',
              'length',
              input.fasteners.girtSpacing,
              (girtSpacing) => input.fasteners && set({ fasteners: { ...input.fasteners, girtSpacing } }),
            )}
          </div>
        ) : null}
      </FieldGroup>

      <FieldGroup legend="Tape">
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={input.tape !== undefined}
            onChange={(e) => {
              if (e.target.checked) set({ tape: { width: 0.025, appliesTo: ['opening', 'perimeter'] } });
              else {
                const { tape: _, ...rest } = input;
                onChange(rest);
              }
            }}
          />
          Take off tape along some joint lines
        </label>
        {input.tape ? (
          <div className="grid gap-x-4 gap-y-3 sm:grid-cols-[1fr_1fr_2fr]">
            {quantity(
              'tape.width',
              'Tape width',
              'joint',
              input.tape.width,
              (width) => input.tape && set({ tape: { ...input.tape, width } }),
            )}
            {quantity(
              'tape.rollLength',
              'Roll length',
              'length',
              input.tape.rollLength,
              (rollLength, entry) => {
                if (!input.tape) return;
                const { rollLength: _, ...rest } = input.tape;
                set({ tape: entry === 'empty' ? rest : { ...rest, rollLength } });
              },
              { required: false, hint: 'Optional: counts rolls.' },
            )}
            <fieldset id={id('tape.appliesTo')} className="flex flex-col gap-1">
              <legend className="text-sm font-semibold">Along</legend>
              <div className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
                {TAKEOFF_JOINT_TYPES.map((j) => (
                  <label key={j} className="flex items-center gap-1">
                    <input
                      type="checkbox"
                      checked={input.tape?.appliesTo.includes(j) ?? false}
                      onChange={(e) => {
                        if (!input.tape) return;
                        const list = e.target.checked
                          ? [...input.tape.appliesTo, j]
                          : input.tape.appliesTo.filter((x) => x !== j);
                        set({
                          tape: {
                            ...input.tape,
                            appliesTo: TAKEOFF_JOINT_TYPES.filter((x) => list.includes(x)),
                          },
                        });
                      }}
                    />
                    {TAKEOFF_TYPE_LABELS[j]}
                  </label>
                ))}
              </div>
              <GroupProblem path="takeoff.tape.appliesTo.problem" problem={pr('tape.appliesTo')} />
            </fieldset>
          </div>
        ) : null}
      </FieldGroup>
    </div>
  );
}
