import { CalcInputError } from '@shared/calc/errors';
import { MOVEMENT_CLASSES } from '@shared/calc/joints/schema';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { rankVariants } from '@shared/sweep/rank';
import type { SweepCosts, SweepVariantResult } from '@shared/sweep/schema';
import type { SweepPlan } from '@shared/sweep/sweep';
import type { UnitSystem } from '@shared/units';
import { useMemo } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { TextInput } from '../../../components/ui/TextInput';
import { formatNumber } from '../../../lib/quantities';
import { valueText } from '../present';

/** The costs as typed (text), so a box can be empty or wrong without losing what was typed. */
export interface CostDraft {
  insulation: string;
  clip: string;
  girt: string;
  sealantPerMetre: Partial<Record<(typeof MOVEMENT_CLASSES)[number], string>>;
  sealantMetres: string;
}
export const emptyCosts: CostDraft = {
  insulation: '',
  clip: '',
  girt: '',
  sealantPerMetre: {},
  sealantMetres: '',
};

const amount = (t: string) => {
  const s = t.trim();
  return s === '' || !/^\d+(\.\d*)?$|^\.\d+$/.test(s) ? undefined : Number(s);
};

/** The costs the ranking reads (a box left empty or unreadable is left out: the ranking names it). */
export function costsOf(d: CostDraft): SweepCosts {
  const perMetre = Object.fromEntries(
    Object.entries(d.sealantPerMetre).flatMap(([k, v]) =>
      amount(v ?? '') === undefined ? [] : [[k, amount(v ?? '')]],
    ),
  );
  const metres = amount(d.sealantMetres);
  return {
    insulation: amount(d.insulation),
    clip: amount(d.clip),
    girt: amount(d.girt),
    sealant: metres === undefined ? undefined : { perMetre, metresPerSquareMetre: metres },
  };
}

const money = (v: number) => formatNumber(v, 2);

/**
 * The cost of what the sweep varies, typed here (any one currency), and the passing variants cheapest first —
 * what governs each, and how far the runner-up is from the cheapest.
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
}: {
  plan: SweepPlan;
  assembly: AssemblyInput;
  variants: SweepVariantResult[];
  draft: CostDraft;
  onDraft: (d: CostDraft) => void;
  system: UnitSystem;
  chosen: number | null;
  onChoose: (index: number) => void;
}) {
  const kinds = plan.axes.map((x) => x.kind);
  const needs = {
    insulation: kinds.includes('insulationThickness'),
    clip: kinds.includes('girtSpacing') || kinds.includes('clipSpacing'),
    girt: kinds.includes('girtSpacing'),
    sealant: kinds.includes('sealantClass'),
  };
  const ranking = useMemo(() => {
    try {
      return { ok: true as const, value: rankVariants(plan, assembly, variants, costsOf(draft)) };
    } catch (e) {
      if (e instanceof CalcInputError) return { ok: false as const, reason: e.reason };
      throw e;
    }
  }, [plan, assembly, variants, draft]);
  const box = (key: 'insulation' | 'clip' | 'girt', label: string) => (
    <Field label={label} className="w-56">
      {(c) => (
        <TextInput
          {...c}
          inputMode="decimal"
          value={draft[key]}
          onChange={(e) => onDraft({ ...draft, [key]: e.target.value })}
        />
      )}
    </Field>
  );
  const top = ranking.ok ? ranking.value.ranked.slice(0, 5) : [];
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap gap-4">
        {needs.insulation ? box('insulation', 'Insulation, per m² of wall per 25 mm') : null}
        {needs.clip ? box('clip', 'Per clip') : null}
        {needs.girt ? box('girt', 'Girt, per m') : null}
        {needs.sealant ? (
          <>
            <Field label="Sealant, m per m² of wall" className="w-56">
              {(c) => (
                <TextInput
                  {...c}
                  inputMode="decimal"
                  value={draft.sealantMetres}
                  onChange={(e) => onDraft({ ...draft, sealantMetres: e.target.value })}
                />
              )}
            </Field>
            {MOVEMENT_CLASSES.filter((cls) => plan.axes.some((x) => x.values.includes(cls))).map((cls) => (
              <Field
                key={cls}
                label={`Sealant ${valueText('sealantClass', cls, system)}, per m`}
                className="w-44"
              >
                {(c) => (
                  <TextInput
                    {...c}
                    inputMode="decimal"
                    value={draft.sealantPerMetre[cls] ?? ''}
                    onChange={(e) =>
                      onDraft({
                        ...draft,
                        sealantPerMetre: { ...draft.sealantPerMetre, [cls]: e.target.value },
                      })
                    }
                  />
                )}
              </Field>
            ))}
          </>
        ) : null}
      </div>
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
          <ol className="flex flex-col gap-2" aria-label="Cheapest passing variants" data-testid="cheapest">
            {top.map((r, i) => (
              <li
                key={r.index}
                className="flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b border-rule pb-2"
              >
                <span className="num font-semibold">{i + 1}.</span>
                <span>
                  Variant {r.index + 1}: {r.values.map((v, j) => valueText(kinds[j]!, v, system)).join(' · ')}
                </span>
                <span className="num">{money(r.cost)} per m² of wall</span>
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
                    Choose{i === 0 ? ' the cheapest' : ''}
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
              ? ` The runner-up costs ${money(ranking.value.runnerUp.costDifference)} more per m² of wall${
                  ranking.value.runnerUp.costRatio === null
                    ? ''
                    : ` (${formatNumber(ranking.value.runnerUp.costRatio * 100, 1)} %)`
                }.`
              : ''}{' '}
            Costs of what varies only; the rest of the wall is the same in every variant.
          </p>
        </>
      )}
    </div>
  );
}
