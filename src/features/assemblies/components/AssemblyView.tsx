import { findMaterial } from '@shared/calc/thermal/materials';
import type { Bridge, Layer, ThermalResult } from '@shared/calc/thermal/schema';
import { firstKeptLayer } from '@shared/calc/thermal/thermal';
import { type AssemblyInput, type BridgeValue, WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { type ReactNode, useMemo } from 'react';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { evaluateThermal } from '../evaluate';
import { LAYER_KIND_LABELS } from '../form';
import { formatMeasure } from '../units';
import { ThermalSummary } from './ResultFigures';
import { PageSection, ResultPanel } from './ResultPanel';
import { SOURCE_TYPE_LABELS } from './ThermalBridgesEditor';

const HEAT_FLOW_WORDS = { horizontal: 'horizontal (walls)', upward: 'upward', downward: 'downward' } as const;
const VENT_WORDS = {
  unventilated: 'unventilated',
  slightly: 'slightly ventilated',
  well: 'well ventilated',
} as const;

function layerFigures(l: Layer, system: UnitSystem): { d: string; value: string } {
  switch (l.kind) {
    case 'homogeneous':
      return {
        d: formatMeasure(l.thickness, 'thickness', system),
        value: `λ ${formatMeasure(l.conductivity, 'conductivity', system)}`,
      };
    case 'resistance':
      return { d: '—', value: `R ${formatMeasure(l.resistance, 'resistance', system)} declared` };
    case 'air':
      return {
        d: formatMeasure(l.thickness, 'thickness', system),
        value: `${VENT_WORDS[l.ventilation]}${l.emissivityFactor !== undefined ? `, E ${l.emissivityFactor}` : ''}`,
      };
    case 'framed':
      return {
        d: formatMeasure(l.thickness, 'thickness', system),
        value:
          l.sections
            .map(
              (s) =>
                `${s.name}: λ ${formatMeasure(s.conductivity, 'conductivity', system)}, ${formatMeasure(s.fraction, 'fraction', system, 2)}`,
            )
            .join('; ') +
          (l.metal
            ? `; metal, flange ${formatMeasure(l.flangeWidth, 'spacing', system)} @ ${formatMeasure(l.spacing, 'spacing', system)}`
            : ''),
      };
  }
}

function bridgeFigures(b: Bridge, layers: readonly Layer[], system: UnitSystem): string {
  switch (b.kind) {
    case 'point':
      return `χ ${formatMeasure(b.chi, 'chi', system)} ${
        'spacingHorizontal' in b
          ? `@ ${formatMeasure(b.spacingHorizontal, 'spacing', system)} × ${formatMeasure(b.spacingVertical, 'spacing', system)}`
          : `× ${formatMeasure(b.countPerArea, 'countPerArea', system)}`
      }`;
    case 'linear':
      return `ψ ${formatMeasure(b.psi, 'psi', system)} ${
        'spacing' in b
          ? `@ ${formatMeasure(b.spacing, 'spacing', system)}`
          : `× ${formatMeasure(b.lengthPerArea, 'lengthPerArea', system)}`
      }`;
    case 'fastener':
      return `λ_f ${formatMeasure(b.conductivity, 'conductivity', system)}, ⌀ ${formatMeasure(b.diameter, 'diameter', system)}, ${formatMeasure(b.countPerArea, 'countPerArea', system)}, ${b.penetration === 'full' ? 'through' : `recessed ${formatMeasure(b.recessDepth, 'thickness', system)}`} layer ${b.layerIndex + 1} ${layers[b.layerIndex]?.name ?? ''}`;
  }
}

function Meta({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="bg-paper-raised px-3 py-2">
      <dt className="label-caps">{label}</dt>
      <dd className="mt-0.5">{children}</dd>
    </div>
  );
}

interface AssemblyViewProps {
  input: AssemblyInput;
  /** The result stored with the revision; recomputed here when there is none. */
  storedResult: ThermalResult | null;
  engineVersion: string;
  heading: ReactNode;
  bridgeValues?: readonly BridgeValue[];
}

/** An assembly set out read-only, as the same calculation page the builder shows. */
export function AssemblyView({
  input,
  storedResult,
  engineVersion,
  heading,
  bridgeValues = [],
}: AssemblyViewProps) {
  const system = useUnitSystem();
  const computed = useMemo(
    () => (storedResult ? null : evaluateThermal(input.thermal, system)),
    [storedResult, input.thermal, system],
  );
  const result = storedResult ?? computed?.result ?? null;
  const layerR = new Map<number, number>();
  for (const s of result?.trace ?? []) {
    const m = /^thermal\.layer\.(\d+)\.R$/.exec(s.id);
    if (m) layerR.set(Number(m[1]), s.value);
  }
  const { thermal, attachment } = input;
  const counted = firstKeptLayer(thermal.layers);

  return (
    <article className="flex flex-col gap-10" aria-label={`Assembly ${input.name}, read-only`}>
      {heading}
      <ThermalSummary result={result} problems={Object.keys(computed?.errors ?? {}).length} stale={false} />
      <PageSection n={1} title="Build-up" id="buildup-heading">
        <dl className="grid grid-cols-1 gap-px border border-ink bg-rule sm:grid-cols-4">
          <Meta label="Wall category">{WALL_CATEGORY_LABELS[input.wallCategory]}</Meta>
          <Meta label="Heat flow">{HEAT_FLOW_WORDS[thermal.heatFlow]}</Meta>
          <Meta label="Layers">
            <span className="num">{thermal.layers.length}</span>
          </Meta>
          <Meta label="Bridges">
            <span className="num">{thermal.bridges.length}</span>
          </Meta>
          {input.description ? (
            <div className="bg-paper-raised px-3 py-2 sm:col-span-4">
              <dt className="label-caps">Description</dt>
              <dd className="mt-0.5 whitespace-pre-line">{input.description}</dd>
            </div>
          ) : null}
        </dl>
        <Table
          caption="Layers, outside to inside"
          head={[numeric('No.'), 'Layer', 'Kind', numeric('d'), 'Values', numeric('R of layer')]}
        >
          <tbody>
            {thermal.layers.map((l, i) => {
              const f = layerFigures(l, system);
              const m = l.kind === 'homogeneous' && l.materialId ? findMaterial(l.materialId) : undefined;
              return (
                // biome-ignore lint/suspicious/noArrayIndexKey: layers are positional
                <tr key={i}>
                  <Td numeric>{i + 1}</Td>
                  <Td>
                    {l.name}
                    {m ? (
                      <span className="block text-xs text-ink-muted">Generic library: {m.source}</span>
                    ) : null}
                  </Td>
                  <Td className="whitespace-nowrap">{LAYER_KIND_LABELS[l.kind]}</Td>
                  <Td numeric className="whitespace-nowrap">
                    {f.d}
                  </Td>
                  <Td className="num text-xs">{f.value}</Td>
                  <Td numeric className="whitespace-nowrap">
                    {(() => {
                      const R = layerR.get(i);
                      if (R === undefined)
                        return i < counted ? <span className="font-sans text-xs">not counted</span> : '—';
                      return R > 0 && R < 0.001
                        ? `< ${formatMeasure(0.001, 'resistance', system)}`
                        : formatMeasure(R, 'resistance', system);
                    })()}
                  </Td>
                </tr>
              );
            })}
          </tbody>
        </Table>
      </PageSection>

      <PageSection n={2} title="Thermal bridges" id="bridges-heading">
        <p className="text-sm">
          Girts run {attachment.girtOrientation === 'horizontal' ? 'horizontally' : 'vertically'}.
          {attachment.clipType ? ` Clip: ${attachment.clipType}.` : ''}
          {attachment.fastenerType ? ` Fastener: ${attachment.fastenerType}.` : ''}
        </p>
        {thermal.bridges.length === 0 ? (
          <p className="text-ink-muted">No bridges entered.</p>
        ) : (
          <Table
            caption="Bridges through the insulation"
            head={['Ref.', 'Bridge', 'Values', 'Source of χ/ψ']}
          >
            <tbody>
              {thermal.bridges.map((b, j) => {
                const v = b.kind === 'point' ? b.chi : b.kind === 'linear' ? b.psi : null;
                // Revisions saved before sources were stored: the library entry of the same name and value.
                const lib =
                  v === null || (b.kind !== 'fastener' && b.source)
                    ? undefined
                    : bridgeValues.find(
                        (x) =>
                          x.kind === b.kind &&
                          x.name.slice(0, 120) === b.name &&
                          Math.abs(x.value - v) < 1e-12,
                      );
                return (
                  // biome-ignore lint/suspicious/noArrayIndexKey: bridges are positional
                  <tr key={j}>
                    <Td className="num">{String.fromCharCode(65 + (j % 26))}</Td>
                    <Td>{b.name}</Td>
                    <Td className="num text-xs">{bridgeFigures(b, thermal.layers, system)}</Td>
                    <Td className="text-xs">
                      {b.kind === 'fastener'
                        ? 'ISO 6946:2017 Annex F'
                        : b.source
                          ? b.source.text
                          : lib
                            ? `${SOURCE_TYPE_LABELS[lib.sourceType]} — ${lib.source}`
                            : 'entered by hand'}
                    </Td>
                  </tr>
                );
              })}
            </tbody>
          </Table>
        )}
      </PageSection>

      <ResultPanel
        thermal={thermal}
        girtOrientation={attachment.girtOrientation}
        result={result}
        errors={computed?.errors ?? {}}
        engineVersion={engineVersion}
        resultNote={
          storedResult
            ? `as stored with the revision (engine ${engineVersion})`
            : 'recomputed in your browser'
        }
      />
    </article>
  );
}
