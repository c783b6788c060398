import { canInFirm, FIRM_ROLE_LABELS } from '@shared/auth/permissions';
import { CalcInputError } from '@shared/calc/errors';
import { MOVEMENT_CLASSES } from '@shared/calc/joints/schema';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { measureOf, type RankMeasure, rankBy } from '@shared/sweep/rank';
import type { SweepVariantResult } from '@shared/sweep/schema';
import type { SweepPlan } from '@shared/sweep/sweep';
import type { UnitSystem } from '@shared/units';
import { useEffect, useMemo, useRef, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { formatNumber } from '../../../lib/quantities';
import {
  type CostDraft,
  type CostSlot,
  convertCosts,
  costsOf,
  costToShown,
  costUnit,
  measureText,
  prefillCosts,
  productText,
  slotText,
  withSlot,
} from '../costs';
import { valueText } from '../present';
import { type FirmLibrary, LibraryCost } from './LibraryCost';

const money = (v: number) => formatNumber(v, 2);

/** Each ranking measure: its name in the choice, the least of it, and what the ranking counts. */
const MEASURES: Record<RankMeasure, { label: string; least: string; what: string }> = {
  cost: {
    label: 'Cost',
    least: 'cheapest',
    what: 'Costs of what varies only; the rest of the wall is the same in every variant.',
  },
  thickness: {
    label: 'Wall thickness',
    least: 'thinnest',
    what: 'Thickness of the whole wall, every layer.',
  },
  weight: {
    label: 'Weight',
    least: 'lightest',
    what: 'Mass of the whole wall per area: each layer’s thickness × its material’s density.',
  },
};

/** What the person may do with the firm's library, in words (shown once above the boxes). */
function libraryNote(l: FirmLibrary): string {
  if (l.role === null)
    return `You are not a member of ${l.firmName}, so its cost library is not shown: the costs typed here are for this visit.`;
  if (!canInFirm(l.role, 'firm.write'))
    return `Costs come from the library of ${l.firmName} where it has them. Only its editors and administrators save costs to it (your firm role: ${FIRM_ROLE_LABELS[l.role]}).`;
  return `Costs come from the library of ${l.firmName} where it has them; a changed or new cost can be saved to it.`;
}

/**
 * The cost of what the sweep varies — prefilled from the firm library, typed in the person's units (any one
 * currency), saved to the library by its editors; each insulation product its own price — and the passing
 * variants least first by cost, wall thickness or weight: what governs each, and how far the runner-up is.
 */
export function CostRanking({
  plan,
  assembly,
  variants,
  draft,
  onDraft,
  system,
  chosen,
  onChoose,
  library,
}: {
  plan: SweepPlan;
  assembly: AssemblyInput;
  variants: SweepVariantResult[];
  draft: CostDraft;
  onDraft: (d: CostDraft) => void;
  system: UnitSystem;
  chosen: number | null;
  onChoose: (index: number) => void;
  library: FirmLibrary;
}) {
  const kinds = plan.axes.map((x) => x.kind);
  const [measure, setMeasure] = useState<RankMeasure>('cost');
  const productAxes = plan.axes.filter((x) => x.kind === 'insulationProduct');
  const products = useMemo(
    () => plan.axes.flatMap((x) => (x.kind === 'insulationProduct' ? (x.values as string[]) : [])),
    [plan],
  );
  const needs = {
    // A thickness of a layer whose product varies is priced with the product.
    insulation: plan.axes.some(
      (x) => x.kind === 'insulationThickness' && !productAxes.some((p) => p.layer === x.layer),
    ),
    clip: kinds.includes('girtSpacing') || kinds.includes('clipSpacing'),
    girt: kinds.includes('girtSpacing'),
    sealant: kinds.includes('sealantClass'),
  };
  // A change of unit system converts what the boxes hold: the same costs, never reread in the other units.
  const typedIn = useRef(system);
  useEffect(() => {
    if (typedIn.current === system) return;
    onDraft(convertCosts(draft, typedIn.current, system));
    typedIn.current = system;
  }, [system, draft, onDraft]);
  // Empty boxes take the library's price once it has loaded (a box typed or emptied before keeps its text).
  useEffect(() => {
    if (!library.entries) return;
    const next = prefillCosts(draft, library.entries, system, products);
    if (next !== draft) onDraft(next);
  }, [library.entries, draft, system, onDraft, products]);
  const ranking = useMemo(() => {
    try {
      const value = rankBy(variants, measureOf(measure, plan, assembly, costsOf(draft, system)));
      return { ok: true as const, value };
    } catch (e) {
      if (e instanceof CalcInputError) return { ok: false as const, reason: e.reason };
      throw e;
    }
  }, [plan, assembly, variants, draft, system, measure]);
  // The currency of the library entries the boxes came from: one is named; several cannot be added up.
  const currencies = [
    ...new Set(
      Object.values(draft.from).flatMap((id) => library.entries?.find((e) => e.id === id)?.currency ?? []),
    ),
  ];
  const currency = currencies.length === 1 ? ` ${currencies[0]}` : '';
  const perWall = (v: number, more = '') =>
    `${money(costToShown(v, 'wall', system))}${currency}${more} ${costUnit('wall', system)}`;
  const shown = (v: number, more = '') =>
    measure === 'cost' ? perWall(v, more) : `${measureText(v, measure, system)}${more}`;
  const { least } = MEASURES[measure];
  const box = (slot: CostSlot, label: string) => (
    <div key={slot} className="flex w-full flex-col gap-1 sm:w-60">
      <Field label={label}>
        {(c) => (
          <TextInput
            {...c}
            inputMode="decimal"
            value={slotText(draft, slot)}
            onChange={(e) => onDraft(withSlot(draft, slot, e.target.value))}
          />
        )}
      </Field>
      <LibraryCost
        slot={slot}
        label={label}
        library={library}
        draft={draft}
        onDraft={onDraft}
        system={system}
      />
    </div>
  );
  const top = ranking.ok ? ranking.value.ranked.slice(0, 5) : [];
  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose text-sm text-ink-muted">{libraryNote(library)}</p>
      <div className="flex flex-wrap items-start gap-4">
        {needs.insulation ? box('insulation', `Insulation, ${costUnit('insulation', system)}`) : null}
        {products.map((name) => (
          <Field key={name} label={`${name}, ${costUnit('insulation', system)}`} className="w-full sm:w-60">
            {(c) => (
              <TextInput
                {...c}
                inputMode="decimal"
                value={productText(draft, name) ?? ''}
                onChange={(e) =>
                  onDraft({ ...draft, products: { ...draft.products, [name]: e.target.value } })
                }
              />
            )}
          </Field>
        ))}
        {needs.clip ? box('clip', 'Per clip') : null}
        {needs.girt ? box('girt', `Girt, ${costUnit('girt', system)}`) : null}
        {needs.sealant ? (
          <>
            <Field label={`Sealant, ${costUnit('sealantMetres', system)}`} className="w-full sm:w-60">
              {(c) => (
                <TextInput
                  {...c}
                  inputMode="decimal"
                  value={draft.sealantMetres}
                  onChange={(e) => onDraft({ ...draft, sealantMetres: e.target.value })}
                />
              )}
            </Field>
            {MOVEMENT_CLASSES.filter((cls) => plan.axes.some((x) => x.values.includes(cls))).map((cls) =>
              box(
                `sealant ${cls}`,
                `Sealant ${valueText('sealantClass', cls, system)}, ${costUnit('sealant', system)}`,
              ),
            )}
          </>
        ) : null}
      </div>
      {currencies.length > 1 ? (
        <Notice
          tone="warning"
          title={`The library costs chosen are in different currencies (${currencies.join(', ')}): type them in one currency before comparing.`}
        />
      ) : null}
      <Field label="Rank the passing variants by" className="w-full sm:w-60">
        {(c) => (
          <Select {...c} value={measure} onChange={(e) => setMeasure(e.target.value as RankMeasure)}>
            {(Object.keys(MEASURES) as RankMeasure[]).map((m) => (
              <option key={m} value={m}>
                {MEASURES[m].label}
              </option>
            ))}
          </Select>
        )}
      </Field>
      {!ranking.ok ? (
        <p className="text-sm text-ink-muted">
          {ranking.reason.charAt(0).toUpperCase() + ranking.reason.slice(1)}.
        </p>
      ) : ranking.value.ranked.length === 0 ? (
        <p className="text-sm">
          No variant passes every check{variants.length === 0 ? ' yet' : ''}: nothing to rank.
        </p>
      ) : (
        <>
          <ol
            className="flex flex-col gap-2"
            aria-label={`${least.charAt(0).toUpperCase()}${least.slice(1)} passing variants`}
            data-testid="cheapest"
          >
            {top.map((r, i) => (
              <li
                key={r.index}
                className="flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b border-rule pb-2"
              >
                <span className="num font-semibold">{i + 1}.</span>
                <span>
                  Variant {r.index + 1}: {r.values.map((v, j) => valueText(kinds[j]!, v, system)).join(' · ')}
                </span>
                <span className="num">{shown(r.value)}</span>
                {r.governing ? (
                  <span className="text-sm text-ink-muted">
                    governed by {r.governing.label}
                    {r.governing.marginRatio === null
                      ? ''
                      : ` (margin ${formatNumber(r.governing.marginRatio * 100, 0)} %)`}
                  </span>
                ) : null}
                {r.index === chosen ? (
                  <span className="text-sm font-semibold">Chosen</span>
                ) : (
                  <Button
                    variant={i === 0 ? 'primary' : 'quiet'}
                    className="px-2 py-1"
                    onClick={() => onChoose(r.index)}
                  >
                    Choose{i === 0 ? ` the ${least}` : ''}
                    <span className="sr-only"> — variant {r.index + 1}</span>
                  </Button>
                )}
              </li>
            ))}
          </ol>
          <p className="text-sm text-ink-muted">
            {ranking.value.ranked.length} variants pass every check; {ranking.value.notPassing} fail or are
            incomplete.
            {ranking.value.runnerUp
              ? ` The runner-up ${measure === 'cost' ? 'costs' : measure === 'thickness' ? 'is' : 'weighs'} ${shown(
                  ranking.value.runnerUp.difference,
                  measure === 'thickness' ? ' thicker' : ' more',
                )}${
                  ranking.value.runnerUp.ratio === null
                    ? ''
                    : ` (${formatNumber(ranking.value.runnerUp.ratio * 100, 1)} %)`
                }.`
              : ''}{' '}
            {MEASURES[measure].what}
          </p>
        </>
      )}
    </div>
  );
}
