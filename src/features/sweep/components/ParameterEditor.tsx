import { MOVEMENT_CLASSES } from '@shared/calc/joints/schema';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { productOf } from '@shared/sweep/library';
import type { SweepClipEntry, SweepParameterKind } from '@shared/sweep/schema';
import type { UnitSystem } from '@shared/units';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { formatMeasure } from '../../assemblies/units';
import {
  clipOptions,
  type FieldProblem,
  KIND_LABELS,
  measureOf,
  NO_LIBRARY,
  type ParameterDraft,
  problemBox,
  type SweepLibrary,
  targetsFor,
} from '../draft';
import { valueText } from '../present';
import { LibraryPicks, type Pick } from './LibraryPicks';

const KINDS = Object.keys(KIND_LABELS) as SweepParameterKind[];
const TARGET_WORDS: Record<SweepParameterKind, string> = {
  insulationThickness: 'Layer',
  insulationProduct: 'Layer',
  studSpacing: 'Layer',
  clipChi: 'Bridge',
  sealantClass: 'Joint',
  girtSpacing: 'Of',
  clipSpacing: 'Of',
  panelModule: 'Of',
};

/** A problem's words in a box: the engine's reason, first letter raised. */
const words = (p: FieldProblem | undefined) =>
  p ? p.reason.charAt(0).toUpperCase() + p.reason.slice(1) : undefined;

const MODE_WORDS = { range: 'A range', list: 'A list of values', entries: 'Library or solved values' };

/** The firm's materials as picks, and the chosen ones it no longer has. */
function productPicks(draft: ParameterDraft, library: SweepLibrary, system: UnitSystem): Pick[] {
  const offered = (library.materials ?? []).map(productOf);
  const chosen = new Set(draft.products.map((p) => p.libraryEntryId));
  const gone = draft.products.filter((p) => !offered.some((o) => o.libraryEntryId === p.libraryEntryId));
  return [...offered, ...gone].map((p) => ({
    key: p.libraryEntryId ?? p.name,
    label: p.name,
    detail: `λ ${formatMeasure(p.conductivity, 'conductivity', system)} · μ ${p.vapourResistanceFactor ?? 'not given (moisture not evaluated)'} · ${p.source}`,
    checked: chosen.has(p.libraryEntryId),
    gone: library.materials !== undefined && gone.includes(p),
  }));
}

/** A clip type's identity among the picks: its library entry, else (a solved clip) its name. */
const clipKey = (e: SweepClipEntry) => e.source?.libraryEntryId ?? e.name;

/** The clip types offered as picks, and the chosen ones no longer offered. */
function clipPicks(draft: ParameterDraft, offered: SweepClipEntry[], system: UnitSystem): Pick[] {
  const gone = draft.entries.filter((e) => !offered.some((o) => clipKey(o) === clipKey(e)));
  return [...offered, ...gone].map((e) => ({
    key: clipKey(e),
    label: e.name,
    detail: `χ ${formatMeasure(e.chi, 'chi', system)} · ${e.source?.computed ? 'solved here' : e.source?.libraryEntryId ? 'firm library' : 'typed'}${e.source ? ` · ${e.source.text}` : ''}`,
    checked: draft.entries.some((x) => clipKey(x) === clipKey(e)),
    gone: gone.includes(e),
  }));
}

/**
 * One parameter of the sweep: what it varies (a kind the assembly has, and which layer, bridge or joint), and its
 * values as a range (start, stop, step in the person's units) or a list; the problems of its boxes under them.
 */
export function ParameterEditor({
  n,
  draft,
  assembly,
  system,
  problems,
  library = NO_LIBRARY,
  onChange,
  onKind,
  onRemove,
}: {
  n: number;
  draft: ParameterDraft;
  assembly: AssemblyInput;
  system: UnitSystem;
  problems: FieldProblem[];
  library?: SweepLibrary;
  onChange: (d: ParameterDraft) => void;
  onKind: (kind: SweepParameterKind) => void;
  onRemove?: () => void;
}) {
  const at = (box: string) => problems.find((p) => problemBox(p.field).box === box);
  const whole = problems.find((p) => problemBox(p.field).box === '');
  const targets = targetsFor(assembly, draft.kind);
  const measure = measureOf(draft.kind);
  const offered = draft.kind === 'clipChi' ? clipOptions(assembly, library.bridgeValues) : [];
  const targetProblem = at('layer') ?? at('bridge') ?? at('joint');
  return (
    <fieldset className="flex flex-col gap-3 border-t border-rule pt-3">
      <legend className="flex w-full flex-wrap items-baseline justify-between gap-2 pr-1 font-semibold">
        Parameter {n}
      </legend>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="What varies">
          {(c) => (
            <Select {...c} value={draft.kind} onChange={(e) => onKind(e.target.value as SweepParameterKind)}>
              {KINDS.map((k) => (
                <option key={k} value={k} disabled={targetsFor(assembly, k).length === 0}>
                  {KIND_LABELS[k]}
                  {targetsFor(assembly, k).length === 0 ? ' — not on this assembly' : ''}
                </option>
              ))}
            </Select>
          )}
        </Field>
        {targets.length > 1 || targets[0]?.index !== null ? (
          <Field label={TARGET_WORDS[draft.kind]} error={words(targetProblem)}>
            {(c) => (
              <Select
                {...c}
                value={draft.target === null ? '' : String(draft.target)}
                onChange={(e) =>
                  onChange({ ...draft, target: e.target.value === '' ? null : Number(e.target.value) })
                }
              >
                {targets.length === 0 ? <option value="">— none on this assembly —</option> : null}
                {targets.map((t) => (
                  <option key={t.label} value={t.index === null ? '' : String(t.index)}>
                    {t.label}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        ) : null}
      </div>
      {draft.kind === 'insulationProduct' ? (
        <LibraryPicks
          legend={`Products from ${library.firmName ?? 'the firm'}'s library`}
          empty="No materials in the firm library yet — add them on the Library page."
          picks={productPicks(draft, library, system)}
          error={words(at('products'))}
          onToggle={(key, checked) => {
            const all = [...(library.materials ?? []).map(productOf), ...draft.products];
            const p = all.find((x) => (x.libraryEntryId ?? x.name) === key);
            const rest = draft.products.filter((x) => (x.libraryEntryId ?? x.name) !== key);
            onChange({ ...draft, products: checked && p ? [...rest, p] : rest });
          }}
        />
      ) : draft.kind === 'sealantClass' ? (
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-semibold">Movement classes (ASTM C920)</legend>
          <div className="flex flex-wrap gap-x-4 gap-y-1">
            {MOVEMENT_CLASSES.map((cls) => (
              <label key={cls} className="flex items-center gap-1 text-sm">
                <input
                  type="checkbox"
                  checked={draft.classes.includes(cls)}
                  onChange={(e) =>
                    onChange({
                      ...draft,
                      classes: e.target.checked
                        ? MOVEMENT_CLASSES.filter((x) => x === cls || draft.classes.includes(x))
                        : draft.classes.filter((x) => x !== cls),
                    })
                  }
                />
                {valueText('sealantClass', cls, system)}
              </label>
            ))}
          </div>
          {at('list') ? <p className="text-sm font-medium text-caution">✕ {words(at('list'))}</p> : null}
        </fieldset>
      ) : (
        <>
          <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
            <legend className="sr-only">Values of parameter {n}</legend>
            {(draft.kind === 'clipChi'
              ? (['range', 'list', 'entries'] as const)
              : (['range', 'list'] as const)
            ).map((mode) => (
              <label key={mode} className="flex items-center gap-1">
                <input
                  type="radio"
                  name={`mode-${n}`}
                  checked={draft.mode === mode}
                  onChange={() => onChange({ ...draft, mode })}
                />
                {MODE_WORDS[mode]}
              </label>
            ))}
          </fieldset>
          {draft.mode === 'entries' ? (
            <LibraryPicks
              legend={`Clip types: ${library.firmName ?? 'the firm'}'s χ values and this assembly's solved clips`}
              empty="No clip χ in the firm library and no solved clip on this assembly — type the values instead."
              picks={clipPicks(draft, offered, system)}
              error={words(at('entries'))}
              onToggle={(key, checked) => {
                const e = offered.find((x) => clipKey(x) === key);
                const rest = draft.entries.filter((x) => clipKey(x) !== key);
                onChange({ ...draft, entries: checked && e ? [...rest, e] : rest });
              }}
            />
          ) : draft.mode === 'range' ? (
            <div className="grid grid-cols-3 gap-2">
              {(['start', 'stop', 'step'] as const).map((key) => (
                <QuantityInput
                  key={key}
                  label={key === 'start' ? 'From' : key === 'stop' ? 'To' : 'Step'}
                  measure={measure}
                  value={draft[key]}
                  onChange={(si) => onChange({ ...draft, [key]: si })}
                  error={words(at(key))}
                  size="sheet"
                  system={system}
                />
              ))}
            </div>
          ) : (
            <Field
              label="Values"
              unit={measure.unit(system)}
              hint="Separated by spaces or semicolons"
              error={words(at('list'))}
            >
              {(c) => (
                <TextInput
                  {...c}
                  value={draft.list}
                  inputMode="decimal"
                  onChange={(e) => onChange({ ...draft, list: e.target.value })}
                />
              )}
            </Field>
          )}
        </>
      )}
      {whole ? <p className="text-sm font-medium text-caution">✕ {words(whole)}</p> : null}
      {onRemove ? (
        <Button variant="quiet" className="self-start" onClick={onRemove}>
          Remove parameter {n}
        </Button>
      ) : null}
    </fieldset>
  );
}
