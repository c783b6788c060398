import type { Vapour } from '@shared/calc/moisture/schema';
import type { Bridge, Layer } from '@shared/calc/thermal/schema';
import { SPAN_CONDITION_WORDS } from '@shared/calc/wind/attachment';
import { drawClass } from '@shared/sheets/layer-class';
import { type Formatter, MONTHS, num } from './format';
import type { Cell, SheetWriter } from './layout';
import { type SheetData, stepOf } from './sheet-data';

const KIND: Record<Layer['kind'], string> = {
  homogeneous: 'homogeneous',
  resistance: 'declared R',
  air: 'air layer',
  framed: 'framed',
};

function vapourText(v: Vapour | null | undefined): string {
  if (!v) return '—';
  switch (v.kind) {
    case 'mu':
      return `μ = ${num(v.mu, 0)}`;
    case 'sd':
      return `s_d = ${num(v.sd, 3)} m`;
    case 'permeance':
      return `W = ${num(v.permeance, 1)} ng/(Pa·s·m²)`;
    case 'usPerm':
      return `${num(v.perm, 2)} perm (${v.reference === '23C' ? '23 °C' : '0 °C'})`;
  }
}

function layerDetail(layer: Layer, fmt: Formatter): string {
  switch (layer.kind) {
    case 'homogeneous':
      return `λ = ${fmt.lambda(layer.conductivity)}`;
    case 'resistance':
      return `R = ${fmt.rValue(layer.resistance)} (declared)`;
    case 'air':
      return layer.ventilation === 'well'
        ? 'well ventilated'
        : layer.ventilation === 'slightly'
          ? `slightly ventilated, A_v ${layer.ventArea === undefined ? '—' : fmt.ventArea(layer.ventArea)}`
          : 'unventilated';
    case 'framed':
      return [
        layer.sections
          .map((s) => `${s.name} ${num(s.fraction * 100, 1)} % λ ${fmt.lambda(s.conductivity)}`)
          .join('; '),
        layer.spacing ? `@ ${fmt.length(layer.spacing)}` : '',
        layer.metal ? 'metal' : '',
      ]
        .filter(Boolean)
        .join(' · ');
  }
}

function bridgeText(b: Bridge, fmt: Formatter): [string, string, string] {
  if (b.kind === 'fastener')
    return [
      b.name,
      'fastener',
      `λ_f ${fmt.lambda(b.conductivity)}, ⌀ ${fmt.thickness(b.diameter)}, ${num(b.countPerArea, 2)} per m², ${b.penetration === 'full' ? 'through' : 'recessed into'} layer ${b.layerIndex + 1}`,
    ];
  const source = `\nSource: ${b.source?.text ?? 'entered by hand'}`;
  if (b.kind === 'point')
    return [
      b.name,
      'point χ',
      `χ = ${fmt.chi(b.chi)}, ${'spacingHorizontal' in b ? `@ ${fmt.length(b.spacingHorizontal)} × ${fmt.length(b.spacingVertical)}` : `${num(b.countPerArea, 2)} per m²`}${source}`,
    ];
  return [
    b.name,
    'linear ψ',
    `ψ = ${fmt.psi(b.psi)}, ${'spacing' in b ? `@ ${fmt.length(b.spacing)}` : `${num(b.lengthPerArea, 2)} m per m²`}${source}`,
  ];
}

/** The build-up as the run read it: layers outside → inside, bridges and the attachment. */
export function drawLayers(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const { input } = data.run.inputs.assembly;
  const layers = input.thermal.layers;
  w.caption('Layers, outside → inside');
  w.table(
    [
      { header: '#', width: 7 },
      { header: 'Layer', width: 48 },
      { header: 'Kind', width: 20 },
      { header: 'Thickness', width: 18, align: 'right' },
      { header: 'Properties' },
      { header: 'R used', width: 22, align: 'right' },
      { header: 'Vapour', width: 26 },
    ],
    layers.map((layer, i): (string | Cell)[] => {
      const r = stepOf(data.run, `thermal.layer.${i}.R`);
      return [
        String(i + 1),
        layer.name,
        `${KIND[layer.kind]}\n${drawClass(layer)}`,
        layer.thickness === undefined ? '—' : fmt.thickness(layer.thickness),
        layerDetail(layer, fmt),
        r ? fmt.rValue(r.value) : 'not counted',
        vapourText(input.vapour?.[i]),
      ];
    }),
    { size: 7.2 },
  );
  if (input.thermal.bridges.length > 0) {
    w.caption('Thermal bridges crossing the insulation');
    w.table(
      [{ header: 'Bridge', width: 60 }, { header: 'Kind', width: 22 }, { header: 'Values' }],
      input.thermal.bridges.map((b) => bridgeText(b, fmt)),
      { size: 7.2 },
    );
  }
  const a = input.attachment;
  w.caption('Attachment');
  w.fields(
    [
      [
        'Girts',
        `${a.girtOrientation}${a.girtSpacing ? `, design spacing ${fmt.length(a.girtSpacing)}` : ''}`,
      ],
      [
        'Clips',
        `${a.clipType || '—'}${a.clipSpacing ? `, design spacing ${fmt.length(a.clipSpacing)}` : ''}`,
      ],
      ['Fasteners', a.fastenerType || '—'],
      ['Heat flow', input.thermal.heatFlow],
    ],
    4,
    7.6,
  );
  drawWindPanel(w, data, fmt);
}

/** The panel's load–span table and the clip capacity the wind check read, each with its source. */
function drawWindPanel(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const panel = data.run.inputs.assembly.input.windPanel;
  if (!panel) return;
  const table = panel.loadSpanTable;
  const clip = panel.clip;
  const hasDeflection = table.rows.every((r) => r.allowableDeflectionPressure !== undefined);
  w.caption('Panel load–span table (ASD allowables) and clip capacity');
  w.fields(
    [
      ['Span condition', SPAN_CONDITION_WORDS[table.spanCondition]],
      ['Deflection column', hasDeflection ? table.deflectionLimit : 'none'],
      ['Module width', fmt.length(panel.panelModuleWidth)],
      [
        'Clip capacity P',
        'allowableLoad' in clip
          ? `${fmt.force(clip.allowableLoad)} (rated)`
          : `${clip.fastenersPerClip} × ${fmt.force(clip.fastenerCapacity)} = ${fmt.force(clip.fastenersPerClip * clip.fastenerCapacity)}`,
      ],
      ['Source of the table', panel.sources?.loadSpanTable?.text ?? 'not named'],
      ['Source of the clip value', panel.sources?.clip?.text ?? 'not named'],
    ],
    2,
    7.6,
  );
  w.table(
    [
      { header: 'Span', align: 'right' },
      { header: 'Allowable inward', align: 'right' },
      { header: 'Allowable outward', align: 'right' },
      ...(hasDeflection ? [{ header: `Pressure at ${table.deflectionLimit}`, align: 'right' as const }] : []),
    ],
    table.rows.map((r) => [
      fmt.length(r.span),
      fmt.pressure(r.allowableInward),
      fmt.pressure(r.allowableOutward),
      ...(r.allowableDeflectionPressure !== undefined ? [fmt.pressure(r.allowableDeflectionPressure)] : []),
    ]),
    { size: 7.2 },
  );
}

/**
 * The one site elevation of the run: the z_e its K_e step used (what the figures rest on), else the snapshot's
 * site field; a run stored before the wind data stopped keeping a copy has only the former.
 */
function siteElevation(data: SheetData): number | undefined {
  return stepOf(data.run, 'wind.Ke')?.inputs.z_e?.value ?? data.run.inputs.project.elevationM;
}

/** Site, indoor conditions, monthly climate and wind data from the run's snapshot of the project. */
export function drawSite(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const p = data.run.inputs.project;
  const elevation = siteElevation(data);
  w.caption('Site and indoor design conditions');
  w.fields(
    [
      ['Climate zone', p.climateZone],
      ['Ground elevation', elevation === undefined ? 'not recorded' : fmt.dimension(elevation)],
      ['Mean roof height', fmt.dimension(p.buildingHeightM)],
      ['Plan', `${fmt.dimension(p.planLengthM)} × ${fmt.dimension(p.planWidthM)}`],
      ['Indoor', `${fmt.temperature(p.indoorTempC)}, ${fmt.rh(p.indoorRh)} RH`],
      ['Winter design', fmt.temperature(p.winterDesignTempC)],
      ['Summer design', fmt.temperature(p.summerDesignTempC)],
      [
        'Humidity class',
        p.climate?.humidityClass ? `ISO 13788 class ${p.climate.humidityClass}` : 'fixed indoor RH',
      ],
      ['Climate source', p.climate?.source ?? 'not entered'],
    ],
    4,
    7.6,
  );
  if (p.climate) {
    w.caption('Monthly exterior climate');
    w.table(
      [{ header: '', width: 16 }, ...MONTHS.map((m) => ({ header: m, align: 'right' as const }))],
      [
        [
          { text: fmt.temperatureUnit, font: 'sansBold' },
          ...p.climate.months.map((m) => num(fmt.temperatureValue(m.exteriorTemperature), 1)),
        ],
        [
          { text: 'RH %', font: 'sansBold' },
          ...p.climate.months.map((m) => num(m.exteriorRelativeHumidity * 100, 0)),
        ],
      ],
      { size: 7 },
    );
  }
  w.caption('Wind (ASCE 7 site data)');
  if (!p.wind) {
    w.paragraph('Not entered: the wind attachment check could not run.', { size: 8 });
    return;
  }
  const wind = p.wind;
  w.fields(
    [
      ['Edition', wind.edition],
      ['Basic wind speed V', fmt.speed(wind.basicWindSpeed)],
      ['Risk category · exposure', `${wind.riskCategory} · ${wind.exposure}`],
      [
        'K_zt · K_e',
        `${num(wind.Kzt, 2)} · ${wind.keEqualsOne ? '1 (taken as 1.0)' : 'from the site elevation'}`,
      ],
      ['Enclosure', wind.enclosure.replace('_', ' ')],
      ['Roof slope', `${num(wind.roofSlopeDeg, 1)}°`],
    ],
    3,
    7.6,
  );
}
