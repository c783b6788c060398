import { layerSd } from '@shared/calc/moisture/assembly';
import type { MoistureResult } from '@shared/calc/moisture/schema';
import { GENERIC_MATERIAL_NOTE } from '@shared/calc/thermal/materials';
import type { Layer } from '@shared/calc/thermal/schema';
import { firstKeptLayer } from '@shared/calc/thermal/thermal';
import { Link } from 'react-router';
import { Options } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TableScroller } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import type { Problem } from '../evaluate';
import { formatPerm, formatSd, formatThickness, PERM_IN_NG } from '../units';
import {
  type DraftKind,
  KIND_LABELS,
  KIND_UNITS,
  layerThickness,
  libraryMu,
  readDraft,
  switchKind,
  type VapourDraft,
  valueLabel,
} from '../vapour-draft';

/** DOM ids of a row's controls, for the "needs" list to jump to. */
export const vapourKindId = (i: number) => `vapour-${i}-kind`;
export const vapourValueId = (i: number) => `vapour-${i}-value`;

const KINDS: DraftKind[] = ['none', 'mu', 'sd', 'permeance', 'usPerm'];

const LAYER_KIND_WORDS: Record<Layer['kind'], string> = {
  homogeneous: 'layer',
  resistance: 'declared R, no thickness',
  air: 'air layer',
  framed: 'framed layer (taken through the cavity)',
};

interface VapourTableProps {
  layers: readonly Layer[];
  drafts: readonly VapourDraft[];
  onChange?: (i: number, next: VapourDraft) => void;
  /** Row reasons: unreadable entries and the engine's field errors. */
  rowErrors: Readonly<Record<number, string>>;
  /** Problems from the engine that concern the build-up (thickness, λ) of a layer. */
  buildupProblems: readonly Problem[];
  result: MoistureResult | null;
  builderHref: string;
  readOnly: boolean;
}

function storedText(d: VapourDraft): string {
  switch (d.kind) {
    case 'none':
      return 'not entered';
    case 'mu':
      return `μ ${d.text}`;
    case 'sd':
      return `s_d ${d.text}\u202fm`;
    case 'permeance':
      return `W ${d.text}\u202fng/(Pa·s·m²)`;
    case 'usPerm':
      return `${d.text}\u202fperm (${d.reference === '23C' ? '23 °C' : '0 °C'})`;
  }
}

/**
 * Inputs of the moisture page: every layer outside → inside with its thickness, its vapour data (μ, s_d,
 * SI permeance or US perms with the reference temperature) and the s_d it amounts to; μ from the generic
 * library for a layer that names a library material.
 */
export function VapourTable({
  layers,
  drafts,
  onChange,
  rowErrors,
  buildupProblems,
  result,
  builderHref,
  readOnly,
}: VapourTableProps) {
  const system = useUnitSystem();
  const first = firstKeptLayer(layers);

  return (
    <TableScroller>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="label-caps pb-2 text-left">
          Layers outside → inside, with their vapour data
        </caption>
        <thead>
          <tr>
            <th scope="col" className="border-b-2 border-ink px-2 py-2 text-right font-semibold">
              #
            </th>
            <th scope="col" className="border-b-2 border-ink px-2 py-2 font-semibold">
              Layer
            </th>
            <th scope="col" className="border-b-2 border-ink px-2 py-2 text-right font-semibold">
              Thickness
            </th>
            <th scope="col" className="border-b-2 border-ink px-2 py-2 font-semibold">
              Vapour data
            </th>
            <th scope="col" className="border-b-2 border-ink px-2 py-2 text-right font-semibold">
              s_d{system === 'IP' ? ' (≈ perm)' : ''}
            </th>
          </tr>
        </thead>
        <tbody>
          {layers
            .map((layer, i) => ({ layer, i, key: `${i}:${layer.name}` }))
            .map(({ layer, i, key }) => {
              const d = drafts[i] ?? { kind: 'none', text: '', reference: '23C' };
              const reading = readDraft(d);
              const thickness = layerThickness(layer);
              let sd: number | null = result?.layers[i]?.sd ?? null;
              if (sd === null && reading.vapour) {
                try {
                  sd = layerSd(reading.vapour, thickness, `layers.${i}.vapour`);
                } catch {
                  sd = null;
                }
              }
              const error = rowErrors[i];
              const errorId = `vapour-${i}-error`;
              const lib = libraryMu(layer);
              const disregarded = i < first;
              const buildup = buildupProblems.filter(
                (p) => p.where.kind === 'buildup' && p.where.layer === i,
              );
              const label = `layer ${i + 1} (${layer.name})`;
              return (
                <tr
                  key={key}
                  id={`vapour-row-${i}`}
                  className={`align-top ${disregarded ? 'text-ink-muted' : ''}`}
                >
                  <td className="num border-b border-rule px-2 py-2 text-right">{i + 1}</td>
                  <th scope="row" className="border-b border-rule px-2 py-2 text-left font-normal">
                    <span className="font-semibold text-ink">{layer.name}</span>
                    <span className="block text-xs text-ink-muted">
                      {LAYER_KIND_WORDS[layer.kind]}
                      {disregarded ? ' · outside the ventilated cavity: disregarded' : ''}
                    </span>
                    {d.kind === 'none' ? (
                      <p
                        className="mt-1 flex gap-1 text-xs font-medium text-warning"
                        data-testid={`vapour-needed-${i}`}
                      >
                        <span aria-hidden="true">▲</span>
                        <span>Vapour data needed</span>
                      </p>
                    ) : null}
                    {buildup.map((p) => (
                      <p key={p.text} className="mt-1 flex gap-1 text-xs font-medium text-caution">
                        <span aria-hidden="true">✕</span>
                        <span>
                          {p.text} <Link to={builderHref}>Put it right in the build-up</Link>.
                        </span>
                      </p>
                    ))}
                  </th>
                  <td className="num border-b border-rule px-2 py-2 text-right whitespace-nowrap">
                    {formatThickness(thickness, system)}
                  </td>
                  <td className="border-b border-rule px-2 py-2">
                    {readOnly ? (
                      <span className="num">{storedText(d)}</span>
                    ) : (
                      <div className="flex flex-wrap items-start gap-2">
                        <label className="sr-only" htmlFor={vapourKindId(i)}>
                          Kind of vapour data of {label}
                        </label>
                        <Select
                          id={vapourKindId(i)}
                          value={d.kind}
                          onChange={(e) => {
                            onChange?.(i, switchKind(d, e.target.value as DraftKind, thickness));
                          }}
                          className="w-56! py-1.5 text-sm"
                        >
                          <Options values={KINDS} labels={KIND_LABELS} />
                        </Select>
                        {d.kind !== 'none' ? (
                          <div className="flex items-stretch">
                            <label className="sr-only" htmlFor={vapourValueId(i)}>
                              {valueLabel(d.kind, label)}
                            </label>
                            <input
                              id={vapourValueId(i)}
                              type="text"
                              inputMode="decimal"
                              autoComplete="off"
                              spellCheck={false}
                              value={d.text}
                              aria-invalid={Boolean(error)}
                              aria-describedby={error ? errorId : undefined}
                              onChange={(e) => onChange?.(i, { ...d, text: e.target.value })}
                              className={
                                `num block w-28 min-w-0 ${KIND_UNITS[d.kind] === '–' ? 'rounded-sm' : 'rounded-l-sm'} border border-rule-strong bg-paper-raised px-2 py-1.5 ` +
                                'text-right text-sm text-ink aria-[invalid=true]:border-2 aria-[invalid=true]:border-caution'
                              }
                            />
                            {KIND_UNITS[d.kind] === '–' ? null : (
                              <span
                                aria-hidden="true"
                                className="num flex items-center whitespace-nowrap rounded-r-sm border border-l-0 border-rule-strong bg-paper-sunk px-1.5 text-xs text-ink-muted"
                              >
                                {KIND_UNITS[d.kind]}
                              </span>
                            )}
                          </div>
                        ) : null}
                        {d.kind === 'usPerm' ? (
                          <>
                            <label className="sr-only" htmlFor={`vapour-${i}-reference`}>
                              Reference temperature of the perm of {label}
                            </label>
                            <Select
                              id={`vapour-${i}-reference`}
                              value={d.reference}
                              onChange={(e) =>
                                onChange?.(i, { ...d, reference: e.target.value === '0C' ? '0C' : '23C' })
                              }
                              className="w-48! py-1.5 text-sm"
                            >
                              <option value="23C">at 23 °C (ASTM E96)</option>
                              <option value="0C">at 0 °C</option>
                            </Select>
                          </>
                        ) : null}
                      </div>
                    )}
                    {error ? (
                      <p
                        id={errorId}
                        className="mt-1 flex items-start gap-1 text-sm font-medium text-caution"
                      >
                        <span aria-hidden="true">✕</span>
                        <span>{error}</span>
                      </p>
                    ) : null}
                    {lib ? (
                      <LibraryLine
                        lib={lib}
                        readOnly={readOnly}
                        label={label}
                        onUse={(mu) =>
                          onChange?.(i, { kind: 'mu', text: String(mu), reference: d.reference })
                        }
                      />
                    ) : null}
                  </td>
                  <td className="num border-b border-rule px-2 py-2 text-right whitespace-nowrap">
                    {sd === null ? '—' : formatSd(sd)}
                    {system === 'IP' && sd !== null ? (
                      <span className="block text-xs text-ink-muted">≈ {formatPerm(sd)}</span>
                    ) : null}
                  </td>
                </tr>
              );
            })}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-muted">
        s_d = μ·d for μ; s_d = δ₀/W for a permeance W (1 perm at 23 °C = {PERM_IN_NG['23C']} ng/(Pa·s·m²), at
        0 °C = {PERM_IN_NG['0C']} ng/(Pa·s·m²)). Layers, thicknesses and λ are edited on the{' '}
        <Link to={builderHref}>build-up page</Link>.
      </p>
    </TableScroller>
  );
}

function LibraryLine({
  lib,
  readOnly,
  label,
  onUse,
}: {
  lib: NonNullable<ReturnType<typeof libraryMu>>;
  readOnly: boolean;
  label: string;
  onUse: (mu: number) => void;
}) {
  const quiet =
    'rounded-sm border border-rule-strong bg-paper-raised px-2 py-0.5 text-xs text-ink hover:bg-paper-sunk';
  const title = `${lib.source} — ${GENERIC_MATERIAL_NOTE}`;
  if (lib.dry === null && lib.wet === null)
    return (
      <p className="mt-1 text-xs text-ink-muted" title={title}>
        Library ({lib.materialName}): vapour-tight, μ = ∞ — enter the product’s s_d or permeance.
      </p>
    );
  const options =
    lib.dry !== null && lib.dry === lib.wet
      ? [{ mu: lib.dry, cup: 'dry and wet cup' }]
      : [
          { mu: lib.dry, cup: 'dry cup' },
          { mu: lib.wet, cup: 'wet cup' },
        ].filter((o): o is { mu: number; cup: string } => o.mu !== null);
  return (
    <p className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs text-ink-muted">
      <span>Library, {lib.materialName}:</span>
      {options.map((o) =>
        readOnly ? (
          <span key={o.cup} className="num">
            μ {o.mu} ({o.cup})
          </span>
        ) : (
          <button
            key={o.cup}
            type="button"
            className={quiet}
            onClick={() => onUse(o.mu)}
            aria-label={`Take μ ${o.mu} (${o.cup}) from the library for ${label}`}
          >
            take μ <span className="num">{o.mu}</span> ({o.cup})
          </button>
        ),
      )}
      <span className="basis-full">
        {lib.source}. {GENERIC_MATERIAL_NOTE}.
      </span>
    </p>
  );
}
