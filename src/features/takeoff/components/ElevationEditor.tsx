import {
  type BeadProfile,
  TAKEOFF_JOINT_TYPES,
  type TakeoffInput,
  type TakeoffJointType,
  type Wall,
} from '@shared/calc/takeoff/schema';
import { type ReactNode, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { type FieldProblem, type FieldProblems, fieldDomId, problemText } from '../../../lib/field-problems';
import { sheetInput } from '../../../lib/sheet-units';
import { useUnitSystem } from '../../../lib/unit-system';
import { newOpening, newTrim, newWall, removeAt, replaceAt } from '../draft';
import { BEAD_SHAPE_LABELS, TAKEOFF_TYPE_LABELS } from '../labels';

const small = 'py-1.5 text-sm';

function Problem({ path, problem }: { path: string; problem: FieldProblem | undefined }) {
  const system = useUnitSystem();
  if (!problem) return null;
  return (
    <p
      id={fieldDomId(path)}
      tabIndex={-1}
      className="flex items-start gap-1 text-sm font-medium text-caution"
    >
      <span aria-hidden="true">✕</span>
      <span>{problemText(problem, undefined, system)}</span>
    </p>
  );
}

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

function Part({ title, children, note }: { title: string; children: ReactNode; note?: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-3 border-t border-rule pt-3">
      <legend className="label-caps pr-2">{title}</legend>
      {note ? <p className="-mt-1 text-xs text-ink-muted">{note}</p> : null}
      {children}
    </fieldset>
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
      <Part
        title="Walls (elevations)"
        note="Count each building corner on one wall only; an abutment is a wall end that butts other construction."
      >
        <Problem path="takeoff.walls" problem={pr('walls')} />
        {input.walls.map((w, i) => (
          <fieldset
            // biome-ignore lint/suspicious/noArrayIndexKey: walls are addressed by position
            key={i}
            className="flex flex-col gap-3 border-l-2 border-rule pl-3"
            aria-label={`Wall ${i + 1}`}
          >
            <div className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto]">
              <Field
                label="Wall"
                id={id(`walls.${i}.name`)}
                error={pr(`walls.${i}.name`) && problemText(pr(`walls.${i}.name`)!, undefined, 'SI')}
              >
                {(c) => (
                  <TextInput
                    {...c}
                    className={small}
                    maxLength={120}
                    value={w.name}
                    onChange={(e) => setWall(i, { ...w, name: e.target.value })}
                  />
                )}
              </Field>
              <QuantityInput
                id={id(`walls.${i}.length`)}
                label="Length"
                measure={sheetInput('length')}
                value={w.length}
                onChange={(v) => setWall(i, { ...w, length: v ?? Number.NaN })}
                problem={pr(`walls.${i}.length`)}
              />
              <QuantityInput
                id={id(`walls.${i}.height`)}
                label="Height"
                measure={sheetInput('length')}
                value={w.height}
                onChange={(v) => setWall(i, { ...w, height: v ?? Number.NaN })}
                problem={pr(`walls.${i}.height`)}
              />
              {(['corners', 'abutments'] as const).map((k) => (
                <Field
                  key={k}
                  label={k === 'corners' ? 'Corners' : 'Abutments'}
                  id={id(`walls.${i}.${k}`)}
                  error={pr(`walls.${i}.${k}`) && problemText(pr(`walls.${i}.${k}`)!, undefined, 'SI')}
                >
                  {(c) => (
                    <Select
                      {...c}
                      className={small}
                      value={w[k] ?? 0}
                      onChange={(e) => setWall(i, { ...w, [k]: Number(e.target.value) })}
                    >
                      {[0, 1, 2].map((n) => (
                        <option key={n} value={n}>
                          {n}
                        </option>
                      ))}
                    </Select>
                  )}
                </Field>
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
            <Problem path={`takeoff.walls.${i}.openings`} problem={pr(`walls.${i}.openings`)} />
            {w.openings.map((o, j) => {
              const op = (k: string) => pr(`walls.${i}.openings.${j}.${k}`);
              const setO = (changes: Partial<typeof o>) =>
                setWall(i, { ...w, openings: replaceAt(w.openings, j, { ...o, ...changes }) });
              return (
                <fieldset
                  // biome-ignore lint/suspicious/noArrayIndexKey: openings are addressed by position
                  key={j}
                  className="ml-4 grid gap-x-4 gap-y-2 sm:grid-cols-3 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto]"
                  aria-label={`${w.name || `Wall ${i + 1}`}, opening ${j + 1}`}
                >
                  <Field label="Opening" id={id(`walls.${i}.openings.${j}.name`)}>
                    {(c) => (
                      <TextInput
                        {...c}
                        className={small}
                        maxLength={120}
                        value={o.name ?? ''}
                        onChange={(e) => setO({ name: e.target.value || undefined })}
                      />
                    )}
                  </Field>
                  <Field label="Kind" id={id(`walls.${i}.openings.${j}.kind`)}>
                    {(c) => (
                      <Select
                        {...c}
                        className={small}
                        value={o.kind ?? 'window'}
                        onChange={(e) => setO({ kind: e.target.value as 'window' | 'door' })}
                      >
                        <option value="window">Window</option>
                        <option value="door">Door (no sill)</option>
                      </Select>
                    )}
                  </Field>
                  <QuantityInput
                    id={id(`walls.${i}.openings.${j}.width`)}
                    label="Width"
                    measure={sheetInput('length')}
                    value={o.width}
                    onChange={(v) => setO({ width: v ?? Number.NaN })}
                    problem={op('width')}
                  />
                  <QuantityInput
                    id={id(`walls.${i}.openings.${j}.height`)}
                    label="Height"
                    measure={sheetInput('length')}
                    value={o.height}
                    onChange={(v) => setO({ height: v ?? Number.NaN })}
                    problem={op('height')}
                  />
                  <CountInput
                    id={id(`walls.${i}.openings.${j}.count`)}
                    label="How many"
                    value={o.count}
                    onChange={(n) => setO({ count: n })}
                    problem={op('count')}
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
      </Part>

      <Part title="Panel module">
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-3">
          <QuantityInput
            id={id('module.width')}
            label="Module width"
            measure={sheetInput('length')}
            value={input.module.width}
            onChange={(v) => set({ module: { ...input.module, width: v ?? Number.NaN } })}
            problem={pr('module.width')}
            hint="Joint spacing across the panels."
          />
          <QuantityInput
            id={id('module.length')}
            label="Longest panel"
            measure={sheetInput('length')}
            value={input.module.length}
            onChange={(v) => set({ module: { ...input.module, length: v ?? Number.NaN } })}
            problem={pr('module.length')}
            hint="End joints occur where a run is longer."
          />
          <Field label="Panels span" id={id('module.orientation')}>
            {(c) => (
              <Select
                {...c}
                className={small}
                value={input.module.orientation}
                onChange={(e) =>
                  set({
                    module: { ...input.module, orientation: e.target.value as 'vertical' | 'horizontal' },
                  })
                }
              >
                <option value="vertical">Vertically (width runs along the wall)</option>
                <option value="horizontal">Horizontally (width runs up the wall)</option>
              </Select>
            )}
          </Field>
        </div>
      </Part>

      <Part
        title="Sealant beads"
        note="The bead cross-section per joint line; a line with no bead takes no sealant."
      >
        <div className="flex flex-col gap-2">
          {TAKEOFF_JOINT_TYPES.map((t) => {
            const bead = input.beads[t];
            const bp = (k: string) => pr(`beads.${t}.${k}`);
            const setB = (b: BeadProfile) => setBead(t, b);
            return (
              <fieldset
                key={t}
                className="grid items-start gap-x-4 gap-y-2 sm:grid-cols-[2fr_2fr_1fr_1fr]"
                aria-label={`Bead, ${TAKEOFF_TYPE_LABELS[t]}`}
              >
                <p className="pt-7 text-sm font-semibold">{TAKEOFF_TYPE_LABELS[t]}</p>
                <Field label="Profile" id={id(`beads.${t}.shape`)}>
                  {(c) => (
                    <Select
                      {...c}
                      className={small}
                      value={bead?.shape ?? 'none'}
                      onChange={(e) => changeShape(t, e.target.value)}
                    >
                      <option value="none">No sealant</option>
                      {(['rectangular', 'round', 'fillet'] as const).map((s) => (
                        <option key={s} value={s}>
                          {BEAD_SHAPE_LABELS[s]}
                        </option>
                      ))}
                    </Select>
                  )}
                </Field>
                {bead?.shape === 'rectangular' ? (
                  <>
                    <QuantityInput
                      id={id(`beads.${t}.width`)}
                      label="Width W"
                      measure={sheetInput('joint')}
                      value={bead.width}
                      onChange={(v) => setB({ ...bead, width: v ?? Number.NaN })}
                      problem={bp('width')}
                    />
                    <QuantityInput
                      id={id(`beads.${t}.depth`)}
                      label="Depth D"
                      measure={sheetInput('joint')}
                      value={bead.depth}
                      onChange={(v) => setB({ ...bead, depth: v ?? Number.NaN })}
                      problem={bp('depth')}
                    />
                  </>
                ) : bead?.shape === 'round' ? (
                  <QuantityInput
                    id={id(`beads.${t}.diameter`)}
                    label="Diameter d"
                    measure={sheetInput('joint')}
                    value={bead.diameter}
                    onChange={(v) => setB({ ...bead, diameter: v ?? Number.NaN })}
                    problem={bp('diameter')}
                  />
                ) : bead?.shape === 'fillet' ? (
                  <QuantityInput
                    id={id(`beads.${t}.leg`)}
                    label="Leg"
                    measure={sheetInput('joint')}
                    value={bead.leg}
                    onChange={(v) => setB({ ...bead, leg: v ?? Number.NaN })}
                    problem={bp('leg')}
                  />
                ) : null}
                <div className="sm:col-span-4">
                  <Problem path={`takeoff.beads.${t}`} problem={pr(`beads.${t}`)} />
                </div>
              </fieldset>
            );
          })}
        </div>
        <div className="max-w-48">
          <QuantityInput
            id={id('wasteFactor')}
            label="Waste on sealant and tape"
            measure={sheetInput('percent')}
            value={input.wasteFactor}
            onChange={(v) => set({ wasteFactor: v ?? Number.NaN })}
            problem={pr('wasteFactor')}
          />
        </div>
      </Part>

      <Part title="Trims" note="Stock lengths lapped along each continuous run of a joint line.">
        {input.trims.map((t, k) => (
          <fieldset
            // biome-ignore lint/suspicious/noArrayIndexKey: trims are addressed by position
            key={k}
            className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-[2fr_2fr_1fr_1fr_auto]"
            aria-label={`Trim ${k + 1}`}
          >
            <Field
              label="Trim"
              id={id(`trims.${k}.name`)}
              error={pr(`trims.${k}.name`) && problemText(pr(`trims.${k}.name`)!, undefined, 'SI')}
            >
              {(c) => (
                <TextInput
                  {...c}
                  className={small}
                  maxLength={120}
                  value={t.name}
                  onChange={(e) => set({ trims: replaceAt(input.trims, k, { ...t, name: e.target.value }) })}
                />
              )}
            </Field>
            <Field label="Along" id={id(`trims.${k}.appliesTo`)}>
              {(c) => (
                <Select
                  {...c}
                  className={small}
                  value={t.appliesTo}
                  onChange={(e) =>
                    set({
                      trims: replaceAt(input.trims, k, {
                        ...t,
                        appliesTo: e.target.value as TakeoffJointType,
                      }),
                    })
                  }
                >
                  {TAKEOFF_JOINT_TYPES.map((j) => (
                    <option key={j} value={j}>
                      {TAKEOFF_TYPE_LABELS[j]}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <QuantityInput
              id={id(`trims.${k}.stockLength`)}
              label="Stock length"
              measure={sheetInput('length')}
              value={t.stockLength}
              onChange={(v) =>
                set({ trims: replaceAt(input.trims, k, { ...t, stockLength: v ?? Number.NaN }) })
              }
              problem={pr(`trims.${k}.stockLength`)}
            />
            <QuantityInput
              id={id(`trims.${k}.lapAllowance`)}
              label="Lap"
              measure={sheetInput('spacing')}
              value={t.lapAllowance}
              onChange={(v) =>
                set({ trims: replaceAt(input.trims, k, { ...t, lapAllowance: v ?? Number.NaN }) })
              }
              problem={pr(`trims.${k}.lapAllowance`)}
            />
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
      </Part>

      <Part title="Fasteners">
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
            <QuantityInput
              id={id('fasteners.spacingAlongGirt')}
              label="Spacing along each girt"
              measure={sheetInput('spacing')}
              value={input.fasteners.spacingAlongGirt}
              onChange={(v) =>
                input.fasteners &&
                set({ fasteners: { ...input.fasteners, spacingAlongGirt: v ?? Number.NaN } })
              }
              problem={pr('fasteners.spacingAlongGirt')}
            />
            <QuantityInput
              id={id('fasteners.girtSpacing')}
              label="Girt spacing up the wall"
              measure={sheetInput('length')}
              value={input.fasteners.girtSpacing}
              onChange={(v) =>
                input.fasteners && set({ fasteners: { ...input.fasteners, girtSpacing: v ?? Number.NaN } })
              }
              problem={pr('fasteners.girtSpacing')}
            />
          </div>
        ) : null}
      </Part>

      <Part title="Tape">
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
            <QuantityInput
              id={id('tape.width')}
              label="Tape width"
              measure={sheetInput('joint')}
              value={input.tape.width}
              onChange={(v) => input.tape && set({ tape: { ...input.tape, width: v ?? Number.NaN } })}
              problem={pr('tape.width')}
            />
            <QuantityInput
              id={id('tape.rollLength')}
              label="Roll length"
              measure={sheetInput('length')}
              required={false}
              value={input.tape.rollLength}
              onChange={(v, entry) => {
                if (!input.tape) return;
                const { rollLength: _, ...rest } = input.tape;
                set({ tape: entry === 'empty' ? rest : { ...rest, rollLength: v ?? Number.NaN } });
              }}
              problem={pr('tape.rollLength')}
              hint="Optional: counts rolls."
            />
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
              <Problem path="takeoff.tape.appliesTo.problem" problem={pr('tape.appliesTo')} />
            </fieldset>
          </div>
        ) : null}
      </Part>
    </div>
  );
}
