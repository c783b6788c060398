import type { SavedSweep } from '@shared/schemas/sweeps';
import { niceTicks } from './charts';
import { type Formatter, num, sheetDate, VERDICT_WORDS } from './format';
import { INK, type SheetWriter } from './layout';

/*
 * The appendix of a sheet printed with a saved sweep of the same assembly: what the sweep varied and ran
 * against, what it explored, a chart of the governing margin against the first parameter (one line per value
 * of the second; margin 0 is the code limit), and the cheapest passing variants. Read from the saved summary.
 */

/** Most lines the chart draws (the first values of the second parameter; the rest are named as left out). */
const MAX_LINES = 6;
const LINE_COLORS = ['#1E1C19', '#97461F', '#1F4E8C', '#2C5E3F', '#7A5500', '#57514A'];
const DASHES: (number[] | undefined)[] = [undefined, [1.6, 0.9], undefined, [0.6, 0.8], [2.4, 1], undefined];

const PARAMETER_WORDS: Record<string, string> = {
  insulationThickness: 'insulation thickness',
  insulationProduct: 'insulation product',
  girtSpacing: 'girt spacing',
  clipSpacing: 'clip spacing',
  clipChi: 'clip χ (clip type)',
  studSpacing: 'stud spacing',
  panelModule: 'panel module',
  sealantClass: 'sealant class',
};
const SPACINGS = new Set(['girtSpacing', 'clipSpacing', 'studSpacing', 'panelModule']);

/** How a numeric parameter is shown: thickness in mm (in), spacings in m (ft), χ in W/K. */
function measureOf(kind: string, fmt: Formatter) {
  if (kind === 'insulationThickness')
    return {
      value: fmt.thicknessValue,
      unit: fmt.thicknessUnit,
      words: fmt.thickness,
      decimals: fmt.thicknessUnit === 'mm' ? 0 : 1,
    };
  if (SPACINGS.has(kind))
    return { value: fmt.lengthValue, unit: fmt.lengthUnit, words: (m: number) => fmt.length(m), decimals: 2 };
  return { value: (v: number) => v, unit: 'W/K', words: (v: number) => `${num(v, 4)} W/K`, decimals: 3 };
}

/** A parameter's value as printed (a sealant class as its class). */
function valueWords(kind: string, v: number | string, fmt: Formatter): string {
  if (typeof v === 'string') return kind === 'sealantClass' ? `class ${v}` : v;
  return measureOf(kind, fmt).words(v);
}

function drawChart(w: SheetWriter, sweep: SavedSweep, fmt: Formatter): void {
  const { parameters, points } = sweep.summary;
  const first = parameters[0]!;
  const numeric = points.filter((p) => typeof p.values[0] === 'number' && p.marginRatio !== null);
  if (numeric.length === 0) {
    w.paragraph('No chart: the first parameter is not a number, or no variant has a governing margin.', {
      size: 7.6,
      color: INK.muted,
    });
    return;
  }
  const second = parameters[1];
  const m = measureOf(first.kind, fmt);
  const keyOf = (values: (number | string)[]) => (second ? String(values[1]) : '');
  const groups = new Map<string, { x: number; y: number; pass: boolean }[]>();
  for (const p of numeric) {
    const k = keyOf(p.values);
    if (!groups.has(k) && groups.size >= MAX_LINES) continue;
    const list = groups.get(k) ?? [];
    list.push({
      x: m.value(p.values[0] as number),
      y: p.marginRatio! * 100,
      pass: p.verdict === 'pass',
    });
    groups.set(k, list);
  }
  const xs = numeric.map((p) => m.value(p.values[0] as number));
  const ys = [...groups.values()].flat().map((p) => p.y);
  const xTicks = niceTicks(Math.min(...xs), Math.max(...xs), 5);
  const yTicks = niceTicks(Math.min(0, ...ys), Math.max(0, ...ys), 5);
  const f = { x: w.left + 14, y: 0, w: w.width - 20, h: 52 };
  w.ensure(f.h + 26);
  w.text(
    `Margin of the governing check against ${PARAMETER_WORDS[first.kind] ?? first.kind}${second ? `, one line per ${PARAMETER_WORDS[second.kind] ?? second.kind}` : ''} (0 % is the limit)`,
    w.left,
    w.y + 3,
    { font: 'sansBold', size: 7.6 },
  );
  f.y = w.y + 9;
  const xLo = xTicks[0]!;
  const xHi = xTicks[xTicks.length - 1]!;
  const yLo = yTicks[0]!;
  const yHi = yTicks[yTicks.length - 1]!;
  const px = (v: number) => f.x + (xHi > xLo ? ((v - xLo) / (xHi - xLo)) * f.w : f.w / 2);
  const py = (v: number) => f.y + f.h - (yHi > yLo ? ((v - yLo) / (yHi - yLo)) * f.h : f.h / 2);
  const { doc } = w;
  for (const t of yTicks) {
    doc.setDrawColor(INK.rule);
    doc.setLineWidth(0.08);
    doc.line(f.x, py(t), f.x + f.w, py(t));
    w.text(`${num(t, 0)} %`, f.x - 1.2, py(t) + 1, { size: 6.2, align: 'right', color: INK.muted });
  }
  for (const t of xTicks)
    w.text(num(t, m.decimals), px(t), f.y + f.h + 3.2, {
      size: 6.2,
      align: 'center',
      color: INK.muted,
    });
  w.text(m.unit, f.x + f.w, f.y + f.h + 6.4, {
    size: 6.2,
    align: 'right',
    color: INK.muted,
  });
  // The limit: margin 0.
  doc.setDrawColor(INK.caution);
  doc.setLineWidth(0.4);
  doc.setLineDashPattern([1.2, 0.8], 0);
  doc.line(f.x, py(0), f.x + f.w, py(0));
  doc.setLineDashPattern([], 0);
  w.text('limit', f.x + f.w - 0.5, py(0) - 0.8, { size: 6, align: 'right', color: INK.caution });
  [...groups.values()].forEach((pts, i) => {
    pts.sort((a, b) => a.x - b.x);
    doc.setDrawColor(LINE_COLORS[i]!);
    doc.setLineWidth(0.45);
    if (DASHES[i]) doc.setLineDashPattern(DASHES[i]!, 0);
    for (let j = 1; j < pts.length; j++)
      doc.line(px(pts[j - 1]!.x), py(pts[j - 1]!.y), px(pts[j]!.x), py(pts[j]!.y));
    doc.setLineDashPattern([], 0);
    doc.setFillColor(LINE_COLORS[i]!);
    for (const p of pts) if (p.pass) doc.circle(px(p.x), py(p.y), 0.6, 'F');
  });
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.2);
  doc.line(f.x, f.y, f.x, f.y + f.h);
  doc.line(f.x, f.y + f.h, f.x + f.w, f.y + f.h);
  w.y = f.y + f.h + 9;
  if (second) {
    const keys = [...groups.keys()];
    let at = w.left;
    keys.forEach((k, i) => {
      const label = valueWords(second.kind, second.kind === 'sealantClass' ? k : Number(k), fmt);
      doc.setDrawColor(LINE_COLORS[i]!);
      doc.setLineWidth(0.5);
      if (DASHES[i]) doc.setLineDashPattern(DASHES[i]!, 0);
      doc.line(at, w.y - 1, at + 6, w.y - 1);
      doc.setLineDashPattern([], 0);
      w.text(label, at + 7.5, w.y, { size: 6.6 });
      at += 11 + w.measure(label, 'sans', 6.6);
    });
    w.y += 3;
    const total = new Set(numeric.map((p) => keyOf(p.values))).size;
    if (total > keys.length)
      w.paragraph(`The first ${keys.length} of ${total} values are drawn.`, { size: 6.8, color: INK.muted });
  }
  w.paragraph('Dots mark variants that pass every check.', { size: 6.8, color: INK.muted });
}

/** The appendix: heading, what the sweep was, the chart and the cheapest passing variants. */
export function drawSweepAppendix(w: SheetWriter, sweep: SavedSweep, fmt: Formatter): void {
  const s = sweep.summary;
  w.heading('A', `Appendix: sweep “${sweep.name}”`, 60);
  w.fields(
    [
      [
        'Varied',
        s.parameters
          .map((p) => `${PARAMETER_WORDS[p.kind] ?? p.kind} (${p.values.length} values)`)
          .join(' × '),
      ],
      [
        'Ran against',
        `revision ${sweep.assemblyRevision}, ${sweep.criteriaSetName} version ${sweep.criteriaSetVersion}, ${sheetDate(sweep.createdAt)}`,
      ],
      [
        'Variants',
        `${s.count} named, ${s.exploration.evaluated} run: ${s.verdicts.pass} ${VERDICT_WORDS.pass.word.toLowerCase()}, ${s.verdicts.fail} ${VERDICT_WORDS.fail.word.toLowerCase()}, ${s.verdicts.incomplete} ${VERDICT_WORDS.incomplete.word.toLowerCase()}`,
      ],
      [
        'Explored',
        s.exploration.mode === 'exhaustive'
          ? 'every variant'
          : `searched: ${s.exploration.unexplored} not explored`,
      ],
    ],
    2,
    7.8,
  );
  if (sweep.stale)
    w.paragraph(
      `The assembly has changed since this sweep ran (revision ${sweep.assemblyRevision}; it is now at revision ${sweep.currentRevision}): its figures are of the earlier revision.`,
      { size: 7.8, color: INK.caution },
    );
  if (s.exploration.mode === 'bounded')
    for (const note of s.exploration.notes) w.paragraph(note, { size: 7.2, color: INK.muted });
  drawChart(w, sweep, fmt);
  const top = s.ranking?.top ?? [];
  if (top.length > 0) {
    w.ensure(24);
    w.text('Cheapest passing variants (cost of what varies, per m² of wall)', w.left, w.y + 3, {
      font: 'sansBold',
      size: 7.6,
    });
    w.y += 5;
    w.table(
      [
        { header: '#', width: 8 },
        ...s.parameters.map((p) => ({ header: PARAMETER_WORDS[p.kind] ?? p.kind })),
        { header: 'Cost / m²', width: 22, align: 'right' as const },
        { header: 'Governs', width: 60 },
      ],
      top.map((v, i) => [
        String(i + 1),
        ...v.values.map((x, j) => valueWords(s.parameters[j]!.kind, x, fmt)),
        num(v.cost, 2),
        v.governing
          ? `${s.labels[v.governing.id] ?? v.governing.label} (margin ${v.governing.marginRatio === null ? '—' : `${num(v.governing.marginRatio * 100, 1)} %`})`
          : '—',
      ]),
      { size: 7.4 },
    );
    if (s.ranking?.runnerUp)
      w.paragraph(`The runner-up costs ${num(s.ranking.runnerUp.costDifference, 2)} more per m² of wall.`, {
        size: 7.2,
        color: INK.muted,
      });
  } else if (s.ranking) w.paragraph('No variant passes every check.', { size: 7.8 });
  w.paragraph(
    'A sweep explores variants of this assembly; this sheet certifies only the assembly as checked above. Make a chosen variant an assembly and check it before relying on it.',
    { size: 7.6, color: INK.caution },
  );
}
