import { dewPoint } from '@shared/calc/moisture/psychrometrics';
import type { MoistureNode, MoistureResult, MonthResult } from '@shared/calc/moisture/schema';
import type { WindScheduleResult } from '@shared/calc/wind/schema';
import { layerThickness } from '@shared/sheets/layer-class';
import { type Formatter, MONTHS, num } from './format';
import { INK, type SheetWriter } from './layout';
import type { SheetData } from './sheet-data';

/*
 * Charts drawn as vectors from the stored results: the temperature and dew-point profile through the wall,
 * the water accumulated at the end of each month, and the wind zones' spacings against the design.
 */

/** Round numbers for an axis: about `count` ticks covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const ticks: number[] = [];
  for (let t = Math.floor(lo / step) * step; t <= hi + step * 1e-9; t += step)
    ticks.push(Number(t.toFixed(10)));
  if (ticks[ticks.length - 1]! < hi) ticks.push(ticks[ticks.length - 1]! + step);
  return ticks;
}

interface Frame {
  x: number;
  y: number;
  w: number;
  h: number;
  xLo: number;
  xHi: number;
  yLo: number;
  yHi: number;
}
const px = (f: Frame, v: number) => f.x + ((v - f.xLo) / (f.xHi - f.xLo)) * f.w;
const py = (f: Frame, v: number) => f.y + f.h - ((v - f.yLo) / (f.yHi - f.yLo)) * f.h;

function yAxis(w: SheetWriter, f: Frame, ticks: number[], unit: string, decimals: number): void {
  const { doc } = w;
  for (const t of ticks) {
    const y = py(f, t);
    doc.setDrawColor(INK.rule);
    doc.setLineWidth(t === 0 ? 0.25 : 0.08);
    doc.line(f.x, y, f.x + f.w, y);
    w.text(num(t, decimals), f.x - 1.2, y + 1, { size: 6.2, align: 'right', color: INK.muted });
  }
  w.text(unit, f.x - 1.2, f.y - 2, { size: 6.2, align: 'right', color: INK.muted });
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.2);
  doc.line(f.x, f.y, f.x, f.y + f.h);
  doc.line(f.x, f.y + f.h, f.x + f.w, f.y + f.h);
}

function polyline(w: SheetWriter, pts: [number, number][], color: string, weight: number, dash?: number[]) {
  const { doc } = w;
  doc.setDrawColor(color);
  doc.setLineWidth(weight);
  if (dash) doc.setLineDashPattern(dash, 0);
  for (let i = 1; i < pts.length; i++) doc.line(pts[i - 1]![0], pts[i - 1]![1], pts[i]![0], pts[i]![1]);
  if (dash) doc.setLineDashPattern([], 0);
}

function legend(
  w: SheetWriter,
  x: number,
  y: number,
  items: { label: string; color: string; dash?: number[] }[],
) {
  let at = x;
  for (const item of items) {
    polyline(
      w,
      [
        [at, y - 1],
        [at + 6, y - 1],
      ],
      item.color,
      0.5,
      item.dash,
    );
    w.text(item.label, at + 7.5, y, { size: 6.6 });
    at += 10 + w.measure(item.label, 'sans', 6.6);
  }
}

/** Position of each node through the wall, m from the outer face: exact within a layer (R ∝ d). */
export function nodePositions(nodes: MoistureNode[], thicknesses: number[]): number[] {
  const start: number[] = [];
  thicknesses.reduce((s, t, i) => {
    start[i] = s;
    return s + t;
  }, 0);
  const total = thicknesses.reduce((s, t) => s + t, 0);
  const rStart = new Map<number, number>();
  const rEnd = new Map<number, number>();
  for (const n of nodes) {
    if (n.kind === 'withinLayer') continue;
    if (n.innerLayer !== null) rStart.set(n.innerLayer, n.resistance);
    if (n.outerLayer !== null) rEnd.set(n.outerLayer, n.resistance);
  }
  return nodes.map((n) => {
    if (n.kind === 'interiorSurface') return total;
    if (n.kind === 'withinLayer' && n.outerLayer !== null) {
      const i = n.outerLayer;
      const r0 = rStart.get(i);
      const r1 = rEnd.get(i);
      const d = thicknesses[i] ?? 0;
      if (r0 === undefined || r1 === undefined || r1 <= r0) return (start[i] ?? 0) + d / 2;
      return (start[i] ?? 0) + (d * (n.resistance - r0)) / (r1 - r0);
    }
    return start[n.innerLayer ?? 0] ?? 0;
  });
}

/** The month the profile shows: the month of most accumulated water, else the coldest month. */
export function profileMonth(m: MoistureResult): MonthResult {
  const wanted = m.interstitial.condensationOccurs ? m.interstitial.maxAccumulationMonth : null;
  const byNumber = m.months.find((x) => x.month === wanted);
  return byNumber ?? m.months.reduce((a, b) => (b.exteriorTemperature < a.exteriorTemperature ? b : a));
}

export function drawProfileChart(w: SheetWriter, data: SheetData, m: MoistureResult, fmt: Formatter): void {
  const month = profileMonth(m);
  const layers = data.run.inputs.assembly.input.thermal.layers;
  const xs = nodePositions(m.nodes, layers.map(layerThickness)).map(fmt.thicknessValue);
  const temps = month.temperature.map(fmt.temperatureValue);
  const dews = month.vapourPressure.map((p) => fmt.temperatureValue(dewPoint(Math.max(p, 1e-3))));
  const all = [...temps, ...dews];
  const yTicks = niceTicks(Math.min(...all), Math.max(...all), 6);
  const f: Frame = {
    x: w.left + 12,
    y: w.y + 8,
    w: w.width - 16,
    h: 48,
    xLo: xs[0]!,
    xHi: xs[xs.length - 1]!,
    yLo: yTicks[0]!,
    yHi: yTicks[yTicks.length - 1]!,
  };
  w.ensure(f.h + 24);
  w.y += 2;
  f.y = w.y + 8;
  w.text(
    `Temperature and dew point through the wall — ${MONTHS[month.month - 1]} (θ_e ${fmt.temperature(month.exteriorTemperature)}, inside ${fmt.temperature(month.interiorTemperature)})`,
    w.left,
    w.y + 3,
    { font: 'sansBold', size: 7.6 },
  );
  yAxis(w, f, yTicks, fmt.temperatureUnit, 0);

  // Layer faces and numbers (as in the layer table).
  const { doc } = w;
  m.nodes.forEach((n, i) => {
    if (n.kind !== 'interface') return;
    doc.setDrawColor(INK.ruleStrong);
    doc.setLineWidth(0.1);
    doc.setLineDashPattern([0.6, 0.6], 0);
    doc.line(px(f, xs[i]!), f.y, px(f, xs[i]!), f.y + f.h);
    doc.setLineDashPattern([], 0);
  });
  const layerMid = new Map<number, number[]>();
  m.nodes.forEach((n, i) => {
    for (const l of [n.outerLayer, n.innerLayer])
      if (l !== null) layerMid.set(l, [...(layerMid.get(l) ?? []), xs[i]!]);
  });
  for (const [l, pos] of layerMid) {
    const a = Math.min(...pos);
    const b = Math.max(...pos);
    if (px(f, b) - px(f, a) > 2.5)
      w.text(String(l + 1), (px(f, a) + px(f, b)) / 2, f.y + 3, {
        size: 6,
        color: INK.muted,
        align: 'center',
      });
  }
  // Where the vapour pressure reaches saturation the dew point meets the temperature: shade it.
  const cond = new Set(month.condensationNodes);
  for (const i of cond) {
    doc.setFillColor(INK.caution);
    doc.circle(px(f, xs[i]!), py(f, temps[i]!), 0.8, 'F');
  }
  polyline(
    w,
    xs.map((x, i) => [px(f, x), py(f, temps[i]!)]),
    INK.caution,
    0.5,
  );
  polyline(
    w,
    xs.map((x, i) => [px(f, x), py(f, dews[i]!)]),
    INK.ink,
    0.45,
    [1.4, 0.8],
  );
  // x axis: thickness from the first layer the calculation includes.
  const xTicks = niceTicks(f.xLo, f.xHi, 6).filter((t) => t >= f.xLo - 1e-9 && t <= f.xHi + 1e-9);
  for (const t of xTicks)
    w.text(num(t, fmt.system === 'IP' ? 1 : 0), px(f, t), f.y + f.h + 3.2, {
      size: 6.2,
      align: 'center',
      color: INK.muted,
    });
  w.text(`${fmt.thicknessUnit} from the outer face`, f.x + f.w, f.y + f.h + 6.4, {
    size: 6.2,
    align: 'right',
    color: INK.muted,
  });
  legend(w, f.x, f.y + f.h + 6.6, [
    { label: 'temperature θ', color: INK.caution },
    {
      label: 'dew point of the vapour pressure p (ISO 13788 p_sat, inverted)',
      color: INK.ink,
      dash: [1.4, 0.8],
    },
  ]);
  w.y = f.y + f.h + 9;
  w.paragraph(
    cond.size > 0
      ? `Water condenses where the dew point reaches the temperature (marked). Layers outside a well-ventilated cavity are left out, as the calculation does.`
      : 'The dew point stays below the temperature everywhere in this month: no condensation plane. Layers outside a well-ventilated cavity are left out, as the calculation does.',
    { size: 6.8, color: INK.muted },
  );
}

export function drawAccumulationChart(
  w: SheetWriter,
  data: SheetData,
  m: MoistureResult,
  fmt: Formatter,
): void {
  const byMonth = MONTHS.map((_, i) => m.months.find((x) => x.month === i + 1)?.totalAccumulation ?? 0).map(
    fmt.accumulationValue,
  );
  const limitCheck = data.run.outputs.checks.find((c) => c.criterion === 'max_condensation_accumulation');
  const limit = typeof limitCheck?.required === 'number' ? fmt.accumulationValue(limitCheck.required) : null;
  const top = Math.max(...byMonth, limit ?? 0, fmt.accumulationValue(0.05));
  const ticks = niceTicks(0, top, 4);
  w.ensure(50);
  const f: Frame = {
    x: w.left + 14,
    y: w.y + 8,
    w: w.width - 18,
    h: 30,
    xLo: 0,
    xHi: 12,
    yLo: 0,
    yHi: ticks[ticks.length - 1]!,
  };
  w.text(
    'Water accumulated at the end of each month, ΣM_a (monthly balance, ISO 13788 §6)',
    w.left,
    w.y + 3,
    {
      font: 'sansBold',
      size: 7.6,
    },
  );
  yAxis(w, f, ticks, fmt.accumulationUnit, fmt.system === 'IP' ? 4 : 3);
  const { doc } = w;
  byMonth.forEach((v, i) => {
    const x = px(f, i + 0.18);
    const bw = (f.w / 12) * 0.64;
    doc.setFillColor(INK.ruleStrong);
    if (v > 0) doc.rect(x, py(f, v), bw, f.y + f.h - py(f, v), 'F');
    w.text(MONTHS[i]!, x + bw / 2, f.y + f.h + 3.2, { size: 6.2, align: 'center', color: INK.muted });
  });
  if (limit !== null) {
    polyline(
      w,
      [
        [f.x, py(f, limit)],
        [f.x + f.w, py(f, limit)],
      ],
      INK.caution,
      0.4,
      [1.6, 0.8],
    );
    w.text(`limit ${fmt.accumulation(limitCheck!.required as number)}`, f.x + f.w, py(f, limit) - 1, {
      size: 6.2,
      align: 'right',
      color: INK.caution,
    });
  }
  w.y = f.y + f.h + 6;
  w.paragraph(
    m.interstitial.condensationOccurs
      ? `Largest ${fmt.accumulation(m.interstitial.maxAccumulation)}${m.interstitial.maxAccumulationMonth ? ` in ${MONTHS[m.interstitial.maxAccumulationMonth - 1]}` : ''}; ${m.interstitial.driesOut ? 'dry again by the end of the year' : `${fmt.accumulation(m.interstitial.finalAccumulation)} left after the year`}.`
      : 'No interstitial condensation in any month: every bar is zero.',
    { size: 6.8, color: INK.muted },
  );
}

export function drawSpacingChart(
  w: SheetWriter,
  data: SheetData,
  r: WindScheduleResult,
  fmt: Formatter,
): void {
  const a = data.run.inputs.assembly.input.attachment;
  const rows = r.zones.flatMap((z) => [
    { label: `Zone ${z.zone} girt spacing`, max: z.girtSpacing, design: a.girtSpacing },
    { label: `Zone ${z.zone} clip spacing`, max: z.clip?.maxSpacing ?? null, design: a.clipSpacing },
  ]);
  const values = rows.flatMap((x) => [x.max ?? 0, x.design ?? 0]).map(fmt.lengthValue);
  const ticks = niceTicks(0, Math.max(...values, 0.5), 5);
  const barH = 4;
  const f: Frame = {
    x: w.left + 34,
    y: w.y + 8,
    w: w.width - 80,
    h: rows.length * (barH + 2.2),
    xLo: 0,
    xHi: ticks[ticks.length - 1]!,
    yLo: 0,
    yHi: 1,
  };
  w.ensure(f.h + 22);
  f.y = w.y + 8;
  w.text('Largest allowed spacing per wind zone (bar) against the design spacing (line)', w.left, w.y + 3, {
    font: 'sansBold',
    size: 7.6,
  });
  const { doc } = w;
  for (const t of ticks) {
    doc.setDrawColor(INK.rule);
    doc.setLineWidth(0.08);
    doc.line(px(f, t), f.y, px(f, t), f.y + f.h);
    w.text(num(t, 1), px(f, t), f.y + f.h + 3.2, { size: 6.2, align: 'center', color: INK.muted });
  }
  w.text(fmt.lengthUnit, f.x + f.w + 2, f.y + f.h + 3.2, { size: 6.2, color: INK.muted });
  rows.forEach((row, i) => {
    const y = f.y + i * (barH + 2.2) + 1;
    w.text(row.label, f.x - 1.5, y + barH - 0.8, { size: 6.8, align: 'right' });
    if (row.max !== null) {
      doc.setFillColor(INK.ruleStrong);
      doc.rect(f.x, y, px(f, fmt.lengthValue(row.max)) - f.x, barH, 'F');
    }
    if (row.design !== undefined) {
      const x = px(f, fmt.lengthValue(row.design));
      const short = row.max === null || row.design > row.max;
      doc.setDrawColor(short ? INK.caution : INK.ink);
      doc.setLineWidth(0.6);
      doc.line(x, y - 0.8, x, y + barH + 0.8);
    }
    const words =
      row.max === null
        ? 'no spacing works'
        : `max ${fmt.length(row.max)}${row.design !== undefined ? ` · design ${fmt.length(row.design)}` : ' · design not entered'}`;
    w.text(words, f.x + f.w + 2, y + barH - 0.8, { size: 6.6, color: INK.muted });
  });
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.2);
  doc.line(f.x, f.y, f.x, f.y + f.h);
  w.y = f.y + f.h + 7;
}
