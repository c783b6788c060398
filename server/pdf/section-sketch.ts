import type { Layer } from '@shared/calc/thermal/schema';
import { type DrawClass, drawClass, isInsulation, layerThickness } from '@shared/sheets/layer-class';
import type { jsPDF } from 'jspdf';
import { type Formatter, num } from './format';
import { INK, type SheetWriter } from './layout';
import type { SheetData } from './sheet-data';

/*
 * The wall drawn to scale as a plan section (outside at the top, inside at the bottom), in vectors: each
 * layer hatched by its material class, studs drawn at their spacing, clips and fasteners drawn where they
 * cross the insulation. Scale: the largest of 1:1 … 1:50 at which the wall fits, stated on the drawing and
 * checked by a scale bar.
 */

const SCALES = [1, 2, 5, 10, 20, 50];
const MAX_HEIGHT = 62;
const DRAW_WIDTH = 92;
/** Layers thinner than this on paper are drawn as a line (said under the drawing). */
const HAIRLINE = 0.45;

function clipped(doc: jsPDF, x: number, y: number, w: number, h: number, draw: () => void): void {
  doc.saveGraphicsState();
  doc.rect(x, y, w, h, null);
  doc.clip();
  doc.discardPath();
  draw();
  doc.restoreGraphicsState();
}

function diagonals(
  doc: jsPDF,
  x: number,
  y: number,
  w: number,
  h: number,
  gap: number,
  reverse = false,
): void {
  for (let t = -h; t < w + h; t += gap) {
    if (reverse) doc.line(x + t, y, x + t + h, y + h);
    else doc.line(x + t, y + h, x + t + h, y);
  }
}

/** Hatch of one material class inside the band (x, y, w, h). */
export function hatch(doc: jsPDF, cls: DrawClass, x: number, y: number, w: number, h: number): void {
  doc.setDrawColor(INK.ink);
  doc.setFillColor(INK.ink);
  doc.setLineWidth(0.08);
  switch (cls) {
    case 'metal':
      doc.rect(x, y, w, h, 'F');
      return;
    case 'air':
      return;
    case 'membrane':
      doc.setLineDashPattern([0.8, 0.6], 0);
      doc.line(x, y + h / 2, x + w, y + h / 2);
      doc.setLineDashPattern([], 0);
      return;
    case 'glass':
      doc.line(x, y + h * 0.3, x + w, y + h * 0.3);
      doc.line(x, y + h * 0.7, x + w, y + h * 0.7);
      return;
    case 'other':
      doc.setFillColor(INK.wash);
      doc.rect(x, y, w, h, 'F');
      return;
  }
  clipped(doc, x, y, w, h, () => {
    switch (cls) {
      case 'batt': {
        // Insulation batt: a continuous zigzag touching both faces of the band.
        const step = Math.max(0.8, Math.min(h * 0.45, 3));
        const pts: [number, number][] = [];
        for (let t = 0, i = 0; t <= w + step; t += step, i++)
          pts.push([x + t, i % 2 ? y + h * 0.12 : y + h * 0.88]);
        doc.setLineWidth(0.12);
        for (let i = 1; i < pts.length; i++) doc.line(pts[i - 1]![0], pts[i - 1]![1], pts[i]![0], pts[i]![1]);
        return;
      }
      case 'rigid':
        diagonals(doc, x, y, w, h, 1.4);
        diagonals(doc, x, y, w, h, 1.4, true);
        return;
      case 'gypsum':
        for (let row = 0, yy = y + 0.45; yy < y + h; yy += 0.9, row++)
          for (let xx = x + (row % 2 ? 0.45 : 0.9); xx < x + w; xx += 1.1) doc.circle(xx, yy, 0.09, 'F');
        return;
      case 'masonry':
        diagonals(doc, x, y, w, h, 1.1);
        return;
      case 'board':
        diagonals(doc, x, y, w, h, 2.2);
        return;
    }
  });
}

interface Band {
  layer: Layer;
  index: number;
  y: number;
  h: number;
}

/** Studs of a framed layer at their spacing: steel as C-channels, others as boxed crosses. */
function drawMembers(doc: jsPDF, b: Band, x0: number, width: number, k: number): number[] {
  if (b.layer.kind !== 'framed') return [];
  const spacing = b.layer.spacing ?? 0.4;
  const flange = Math.max(0.6, (b.layer.flangeWidth ?? 0.04) * k);
  const xs: number[] = [];
  for (let m = spacing / 2; m * k < width; m += spacing) xs.push(x0 + m * k);
  doc.setDrawColor(INK.ink);
  for (const x of xs) {
    doc.setFillColor('#ffffff');
    doc.rect(x - flange / 2, b.y, flange, b.h, 'F');
    if (b.layer.metal) {
      doc.setLineWidth(0.3);
      doc.line(x - flange / 2, b.y + 0.15, x - flange / 2, b.y + b.h - 0.15);
      doc.line(x - flange / 2, b.y + 0.15, x + flange / 2, b.y + 0.15);
      doc.line(x - flange / 2, b.y + b.h - 0.15, x + flange / 2, b.y + b.h - 0.15);
      doc.line(x + flange / 2, b.y + 0.15, x + flange / 2, b.y + 0.15 + Math.min(1.2, b.h / 6));
      doc.line(x + flange / 2, b.y + b.h - 0.15, x + flange / 2, b.y + b.h - 0.15 - Math.min(1.2, b.h / 6));
    } else {
      doc.setLineWidth(0.15);
      doc.rect(x - flange / 2, b.y, flange, b.h, 'S');
      doc.line(x - flange / 2, b.y, x + flange / 2, b.y + b.h);
      doc.line(x + flange / 2, b.y, x - flange / 2, b.y + b.h);
    }
  }
  return xs;
}

/** Spreads label positions so that no two are closer than `gap`, keeping them near their targets. */
export function spread(targets: number[], gap: number, min: number, max: number): number[] {
  const out = targets.map((t) => Math.min(Math.max(t, min), max));
  for (let i = 1; i < out.length; i++) out[i] = Math.max(out[i]!, out[i - 1]! + gap);
  if (out.length > 0 && out[out.length - 1]! > max) {
    out[out.length - 1] = max;
    for (let i = out.length - 2; i >= 0; i--) out[i] = Math.min(out[i]!, out[i + 1]! - gap);
  }
  return out;
}

export function drawSectionSketch(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const { doc } = w;
  const { thermal, attachment } = data.run.inputs.assembly.input;
  const layers = thermal.layers;
  const total = layers.reduce((s, l) => s + layerThickness(l), 0);
  const scale = SCALES.find((s) => (total * 1000) / s <= MAX_HEIGHT) ?? SCALES[SCALES.length - 1]!;
  const k = 1000 / scale;
  const height = total * k;
  const labelGap = 3.1;
  const needed = Math.max(height, layers.length * labelGap) + 30;
  w.ensure(needed);

  const x0 = w.left + 9;
  const width = DRAW_WIDTH;
  const top = w.y + 6;
  w.text('EXTERIOR', x0, top - 1.6, { font: 'sansBold', size: 6.4, color: INK.muted });

  let y = top;
  const bands: Band[] = layers.map((layer, index) => {
    const h = layerThickness(layer) * k;
    const band = { layer, index, y, h };
    y += h;
    return band;
  });
  const bottom = y;

  for (const b of bands) {
    const cls = drawClass(b.layer);
    if (b.layer.kind === 'resistance') continue;
    if (b.h < HAIRLINE) {
      doc.setDrawColor(INK.ink);
      doc.setLineWidth(cls === 'metal' ? 0.45 : 0.25);
      if (cls !== 'metal') doc.setLineDashPattern([0.8, 0.5], 0);
      doc.line(x0, b.y + b.h / 2, x0 + width, b.y + b.h / 2);
      doc.setLineDashPattern([], 0);
      continue;
    }
    hatch(doc, cls, x0, b.y, width, b.h);
  }
  // Declared-resistance layers (membranes, boards entered by their R) as dashed lines at their face.
  for (const b of bands.filter((x) => x.layer.kind === 'resistance')) {
    doc.setDrawColor(INK.caution);
    doc.setLineWidth(0.3);
    doc.setLineDashPattern([1.2, 0.6], 0);
    doc.line(x0, b.y, x0 + width, b.y);
    doc.setLineDashPattern([], 0);
  }
  // Layer faces.
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.12);
  for (const b of bands) if (b.h >= HAIRLINE) doc.rect(x0, b.y, width, b.h, 'S');

  // Studs, clips across the continuous insulation, fasteners across their layer.
  const studs = bands.flatMap((b) => drawMembers(doc, b, x0, width, k));
  const framedAt = bands.findIndex((b) => b.layer.kind === 'framed');
  const ci = bands.find((b) => isInsulation(b.layer) && (framedAt < 0 || b.index < framedAt));
  const notes: string[] = [];
  for (const bridge of thermal.bridges) {
    if (bridge.kind === 'point' && 'spacingHorizontal' in bridge && ci) {
      doc.setFillColor(INK.ink);
      for (let m = bridge.spacingHorizontal / 2; m * k < width; m += bridge.spacingHorizontal) {
        const x = x0 + m * k;
        doc.rect(x - 0.35, ci.y, 0.7, ci.h, 'F');
        doc.rect(x - 1.6, ci.y + ci.h - 0.35, 3.2, 0.35, 'F');
      }
      notes.push(
        `${bridge.name}: drawn across layer ${ci.index + 1} at ${fmt.length(bridge.spacingHorizontal)} (χ = ${fmt.chi(bridge.chi)})`,
      );
    } else if (bridge.kind === 'fastener') {
      const b = bands[bridge.layerIndex];
      if (!b) continue;
      const spacing = 1 / Math.sqrt(bridge.countPerArea);
      doc.setDrawColor(INK.ink);
      doc.setLineWidth(Math.max(0.2, bridge.diameter * k));
      const depth = bridge.penetration === 'recessed' ? (bridge.recessDepth ?? 0) * k : 0;
      for (let m = spacing / 4; m * k < width; m += spacing)
        doc.line(x0 + m * k, b.y - 0.6, x0 + m * k, b.y + b.h + 0.4 - depth);
      notes.push(`${bridge.name}: drawn across layer ${b.index + 1} about every ${fmt.length(spacing)}`);
    } else if (bridge.kind === 'linear')
      notes.push(
        `${bridge.name}: ψ = ${fmt.psi(bridge.psi)}${'spacing' in bridge ? ` at ${fmt.length(bridge.spacing)}` : ''} (runs along the wall; not in this cut)`,
      );
  }
  if (studs.length > 0) {
    const framed = bands[framedAt]!.layer;
    notes.push(
      `Studs of layer ${framedAt + 1} at ${fmt.length(framed.kind === 'framed' ? (framed.spacing ?? 0.4) : 0)} on centre`,
    );
  }
  w.text('INTERIOR', x0, bottom + 3.6, { font: 'sansBold', size: 6.4, color: INK.muted });

  // Overall thickness, dimensioned on the left.
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.12);
  doc.line(x0 - 4, top, x0 - 4, bottom);
  for (const yy of [top, bottom]) {
    doc.line(x0 - 5.2, yy, x0 - 1, yy);
    doc.line(x0 - 4.8, yy + 0.4, x0 - 3.2, yy - 0.4);
  }

  // Labels with leaders on the right.
  const labelX = x0 + width + 7;
  const ys = spread(
    bands.map((b) => b.y + b.h / 2 + 1),
    labelGap,
    top + 1,
    Math.max(bottom, top + layers.length * labelGap),
  );
  bands.forEach((b, i) => {
    doc.setDrawColor(INK.ruleStrong);
    doc.setLineWidth(0.1);
    doc.line(x0 + width, b.y + b.h / 2, labelX - 1.2, ys[i]! - 1);
    const thickness =
      b.layer.kind === 'resistance'
        ? `${b.layer.thickness === undefined ? '' : `${fmt.thickness(b.layer.thickness)} `}declared R`
        : fmt.thickness(layerThickness(b.layer));
    const text = `${i + 1}   ${thickness}   ${b.layer.name}`;
    let shown = text;
    while (w.measure(shown, 'sans', 6.6) > w.right - labelX && shown.length > 8)
      shown = `${shown.slice(0, -2)}…`;
    w.text(shown, labelX, ys[i]!, { size: 6.6 });
  });

  // Scale bar: 100 mm (or 4 in) of wall.
  const barReal = fmt.system === 'IP' ? 0.1016 : 0.1;
  const barY = Math.max(bottom, ys[ys.length - 1] ?? bottom) + 8;
  const barLen = barReal * k;
  doc.setLineWidth(0.2);
  doc.setDrawColor(INK.ink);
  doc.setFillColor(INK.ink);
  doc.rect(x0, barY, barLen / 2, 1, 'F');
  doc.rect(x0 + barLen / 2, barY, barLen / 2, 1, 'S');
  w.text('0', x0, barY + 3.8, { size: 6.2, align: 'center' });
  w.text(fmt.system === 'IP' ? '4 in' : '100 mm', x0 + barLen, barY + 3.8, { size: 6.2, align: 'center' });
  w.text(
    `Plan section, outside at the top. Scale 1:${scale} on A4 printed at 100 % (check with the bar). Overall ${fmt.thickness(total)}; ${num(width / k, 2)} m of wall shown.`,
    x0 + barLen + 8,
    barY + 1.2,
    { size: 6.6, color: INK.muted },
  );
  w.y = barY + 5.5;
  const hairlines = bands
    .filter((b) => b.layer.kind !== 'resistance' && b.h < HAIRLINE)
    .map((b) => b.index + 1);
  if (hairlines.length > 0)
    notes.push(`Layers ${hairlines.join(', ')} are thinner than a line at this scale and are drawn as one.`);
  if (bands.some((b) => b.layer.kind === 'resistance'))
    notes.push('Declared-resistance layers are drawn as a dashed line at their outer face.');
  if (attachment.girtSpacing)
    notes.push(`Girts ${attachment.girtOrientation} at ${fmt.length(attachment.girtSpacing)} (design).`);
  for (const n of notes) w.paragraph(`· ${n}`, { size: 6.8, color: INK.muted, after: 0.2 });
  w.y += 2;
}
