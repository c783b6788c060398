import type { ComputedBridge } from '@shared/calc/bridge/computed';
import { bandRects, isotherms, PALETTE } from '@shared/calc/bridge/section';
import { detailDrawing, scaleFor } from '@shared/sheets/bridge-drawing';
import { type Formatter, num } from './format';
import { INK, type SheetWriter } from './layout';
import { hatch } from './section-sketch';
import type { SheetData } from './sheet-data';

/*
 * Each thermal bridge whose χ or ψ was computed by the bridge solver: its detail drawn to scale (hatch per
 * material), the temperature map stored with it (bands of the screen's palette, isotherms at the band edges),
 * and the figures — χ/ψ, mesh, iterations, energy balance, the coldest inside surface and f_Rsi. All read from
 * the stored run: the map is the one kept with the value, nothing is solved again.
 */

const FIGURE = { width: 84, height: 52 } as const;

/** Millimetres on paper from model metres at 1:n. */
const onPaper = (m: number, n: number) => (m * 1000) / n;

function drawDetail(w: SheetWriter, c: ComputedBridge, x0: number, top: number): number {
  const { doc } = w;
  const d = detailDrawing(c.detail);
  const [wm, hm] = [d.max[0] - d.min[0], d.max[1] - d.min[1]];
  const n = Math.max(scaleFor(wm, FIGURE.width), scaleFor(hm, FIGURE.height));
  const k = (m: number) => onPaper(m, n);
  const y = (v: number) => (d.yDown ? top + k(v - d.min[1]) : top + k(d.max[1] - v));
  for (const b of d.boxes) {
    const [bx, bw] = [x0 + k(b.min[0] - d.min[0]), k(b.max[0] - b.min[0])];
    const [by0, by1] = [y(b.min[1]), y(b.max[1])];
    const [by, bh] = [Math.min(by0, by1), Math.abs(by1 - by0)];
    if (bw <= 0 || bh <= 0) continue;
    hatch(doc, b.cls, bx, by, bw, bh);
    doc.setDrawColor(INK.ink);
    doc.setLineWidth(0.1);
    doc.rect(bx, by, bw, bh, 'S');
  }
  w.text(`Section, 1:${n}`, x0, top + k(hm) + 3.5, { font: 'sans', size: 6.8, color: INK.muted });
  return k(hm) + 5;
}

function drawMap(w: SheetWriter, c: ComputedBridge, x0: number, top: number, yDown: boolean): number {
  const { doc } = w;
  const { map, inside, outside } = c;
  const [mx0, mx1, my0, my1] = [map.x[0]!, map.x.at(-1)!, map.y[0]!, map.y.at(-1)!];
  const s = Math.min(FIGURE.width / (mx1 - mx0), FIGURE.height / (my1 - my0));
  const px = (v: number) => x0 + (v - mx0) * s;
  const py = (v: number) => (yDown ? top + (v - my0) * s : top + (my1 - v) * s);
  for (const r of bandRects(map, inside, outside)) {
    doc.setFillColor(PALETTE[r.band]!);
    const [a, b] = [py(r.y), py(r.y + r.h)];
    doc.rect(px(r.x), Math.min(a, b), r.w * s, Math.abs(b - a), 'F');
  }
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.15);
  for (const line of isotherms(map, inside, outside))
    for (const [a, b, cc, dd] of line.segments) doc.line(px(a), py(b), px(cc), py(dd));
  const h = (my1 - my0) * s;
  w.text('Temperature map: light warm, dark cold; lines are isotherms', x0, top + h + 3.5, {
    font: 'sans',
    size: 6.8,
    color: INK.muted,
  });
  return h + 5;
}

export function drawComputedBridges(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const bridges = data.run.inputs.assembly.input.thermal.bridges.flatMap((b, i) =>
    b.kind !== 'fastener' && b.source?.computed ? [{ b, i, c: b.source.computed }] : [],
  );
  if (bridges.length === 0) return;
  w.caption('Thermal bridges computed here (ISO 10211)');
  for (const { b, i, c } of bridges) {
    w.ensure(FIGURE.height + 40);
    const value =
      c.detail.template === 'clip' || c.detail.template === 'fastener'
        ? `χ ${fmt.chi(c.value)}`
        : `ψ ${fmt.psi(c.value)}`;
    w.paragraph(`${b.name || `Bridge ${i + 1}`} — ${value}`, { font: 'sansBold', size: 9 });
    const top = w.y + 1;
    const left = drawDetail(w, c, w.left, top);
    const right = drawMap(w, c, w.left + FIGURE.width + 6, top, detailDrawing(c.detail).yDown);
    w.y = top + Math.max(left, right) + 1;
    w.paragraph(
      [
        `Mesh ${num(c.cells, 0)} cells, ${num(c.iterations, 0)} iterations, energy balance ${num(c.energyBalance * 100, 4)} % of the heat flow.`,
        `Coldest inside surface ${fmt.temperature(c.minInsideSurface)} (inside ${fmt.temperature(c.inside)}, outside ${fmt.temperature(c.outside)}), f_Rsi ${num(c.fRsi, 3)}; with the surface-check Rsi of ISO 13788, f_Rsi ${num(c.surface.fRsi, 3)}.`,
        `Source: ${b.source?.text ?? ''}. A computed value is an aid to design: the maker's tested value or a specialist's model of the actual product governs.`,
      ].join(' '),
      { size: 8, after: 3 },
    );
  }
}
