import { METHOD_LABELS } from '@shared/calc/thermal/thermal';
import type { TraceStep } from '@shared/calc/trace';
import { storedMessageText } from '@shared/format';
import { fixed } from '@shared/units/rounding';
import { drawAccumulationChart, drawProfileChart, drawSpacingChart } from './charts';
import { type Formatter, MONTHS, num } from './format';
import { INK, type SheetWriter } from './layout';
import { type ModuleResults, moduleOutcome, moduleResult, type SheetData } from './sheet-data';

/*
 * The results of every module as the run stored them, each with the formulas that govern its figures
 * (from the trace: label, formula, source). A module that could not run says why.
 */

function notRun(w: SheetWriter, data: SheetData, id: string): boolean {
  const m = moduleOutcome(data.run, id);
  if (!m || m.status === 'ran') return false;
  w.paragraph(
    m.status === 'missing'
      ? `Not run — missing: ${m.missing.map((x) => storedMessageText(x)).join('; ')}. Every criterion that reads this module is reported “not evaluated”.`
      : `Not run — the calculation refused the input: ${m.error === null ? 'unknown reason' : storedMessageText(m.error)}.`,
    { size: 8, color: INK.warning },
  );
  return true;
}

/** The governing formulas of a module: the trace steps the checks and metrics refer to. */
function formulas(w: SheetWriter, steps: TraceStep[], fmt: Formatter): void {
  if (steps.length === 0) return;
  w.caption('Governing formulas');
  w.table(
    [
      { header: 'Figure', width: 50 },
      { header: 'Formula', width: 52 },
      { header: 'Source' },
      { header: 'Value', width: 24, align: 'right' },
    ],
    steps.map((s) => [
      s.label,
      { text: s.formula, font: 'serif' as const },
      s.source,
      fmt.siValue(s.value, s.unit),
    ]),
    { size: 6.9 },
  );
}

const stepsOf = (data: SheetData, prefix: string) =>
  data.run.outputs.steps.filter((s) => s.id.startsWith(prefix));

/** A module's section: its heading, why it did not run or what it found, then the formulas that govern it. */
function moduleSection<K extends keyof ModuleResults>(
  w: SheetWriter,
  data: SheetData,
  fmt: Formatter,
  id: K,
  [number, title, keep]: [string, string, number],
  draw: (w: SheetWriter, r: ModuleResults[K], fmt: Formatter, data: SheetData) => void,
): void {
  w.heading(number, title, keep);
  const r = moduleResult(data.run, id);
  if (notRun(w, data, id) || !r) return;
  draw(w, r, fmt, data);
  formulas(w, stepsOf(data, `${id}.`), fmt);
}

/** A share of U_eff as the build-up page prints it (formatShare: one decimal, kept even when 0). */
const share = (x: number) => `${fixed(x * 100, 1)} %`;

function thermal(w: SheetWriter, r: ModuleResults['thermal'], fmt: Formatter): void {
  w.fields(
    [
      ['Clear field R₀ · U₀', `${fmt.rValue(r.R0)} · ${fmt.uValue(r.U0)}`],
      ['Effective R_eff · U_eff', `${fmt.rValue(r.Reff)} · ${fmt.uValue(r.Ueff)}`],
      [
        'Method used',
        `${METHOD_LABELS[r.defaultMethod] ?? r.defaultMethod} (spread of the offered methods ${num(r.methodSpread * 100, 1)} %)`,
      ],
      ['Surface resistances', `R_si ${fmt.rValue(r.Rsi)} · R_se ${fmt.rValue(r.Rse)}`],
    ],
    2,
  );
  // A run stored by an engine before 0.3.0 has no basis sentence; its method name above stands alone.
  if (r.basis) w.paragraph(r.basis.text, { size: 7.6 });
  if (r.bridges.length > 0) {
    w.caption('What the heat loss goes through');
    w.table(
      [
        { header: 'Path' },
        { header: 'Kind', width: 24 },
        { header: 'ΔU', width: 36, align: 'right' },
        { header: 'Share of U_eff', width: 26, align: 'right' },
      ],
      [
        ['Clear field', '—', fmt.uValue(r.U0), share(r.clearFieldShare)],
        ...r.bridges.map((b) => [b.name, b.kind, fmt.uValue(b.deltaU), share(b.share)]),
      ],
      { size: 7.2 },
    );
  }
}

function moisture(w: SheetWriter, r: ModuleResults['moisture'], fmt: Formatter, data: SheetData): void {
  const s = r.surface;
  w.fields(
    [
      ['Result', storedMessageText(r.verdict, fmt.system)],
      [
        'Interstitial condensation',
        r.interstitial.condensationOccurs
          ? `yes — largest ${fmt.accumulation(r.interstitial.maxAccumulation)}${r.interstitial.maxAccumulationMonth ? ` (${MONTHS[r.interstitial.maxAccumulationMonth - 1]})` : ''}; ${r.interstitial.driesOut ? 'dries out within the year' : 'does not dry out within the year'}`
          : 'none in any month',
      ],
      [
        'Surface (mould) check',
        s.fRsiMax === null
          ? 'not applicable — in no month is the outside cold enough for the surface to reach 80 % RH'
          : `f_Rsi ${num(s.fRsi, 3)} ${s.pass ? '≥' : '<'} f_Rsi,max ${num(s.fRsiMax, 3)}${s.criticalMonth ? ` (${MONTHS[s.criticalMonth - 1]})` : ''}`,
      ],
      [
        'Balance',
        `starts in ${MONTHS[r.startMonth - 1]}; safety factor on Δp ${num(r.safetyFactor, 2)}; s_d,T ${num(r.totalSd, 2)} m`,
      ],
    ],
    2,
  );
  drawProfileChart(w, data, r, fmt);
  drawAccumulationChart(w, data, r, fmt);
}

function wind(w: SheetWriter, r: ModuleResults['wind'], fmt: Formatter, data: SheetData): void {
  w.fields(
    [
      ['Velocity pressure', `q_h ${fmt.pressure(r.velocity.qh)} (${r.velocity.equation})`],
      ['Figure', `${r.figure}; end-zone width a = ${fmt.length(r.edgeWidth)}`],
    ],
    2,
  );
  w.table(
    [
      { header: 'Zone', width: 56 },
      { header: 'Table', width: 18 },
      { header: 'Governs', width: 20 },
      { header: 'Max girt spacing', align: 'right' },
      { header: 'Max clip spacing', align: 'right' },
      { header: 'ASD suction', align: 'right' },
    ],
    r.zones.map((z) => [
      z.name,
      z.status === 'ok' ? 'in table' : z.status === 'table-end' ? 'table end' : 'outside',
      z.governingCheck ?? '—',
      z.girtSpacing === null ? '—' : fmt.length(z.girtSpacing),
      z.clip ? fmt.length(z.clip.maxSpacing) : '—',
      z.pressures ? fmt.pressure(Math.abs(z.pressures.asd.outward)) : '—',
    ]),
    { size: 7.2 },
  );
  drawSpacingChart(w, data, r, fmt);
}

function joints(w: SheetWriter, r: ModuleResults['joints'], fmt: Formatter): void {
  w.table(
    [
      { header: 'Joint', width: 58 },
      { header: 'Movement ext. / comp.', align: 'right' },
      { header: 'Required width', align: 'right' },
      { header: 'Design width', align: 'right' },
      { header: 'Governs', width: 20 },
      { header: 'Result', width: 34 },
    ],
    r.joints.map((j) => [
      j.name,
      `${fmt.length(j.movementExtension)} / ${fmt.length(j.movementCompression)}`,
      fmt.length(j.requiredWidth, { inchFractions: true }),
      fmt.length(j.designWidth, { inchFractions: true }),
      j.governing,
      {
        text:
          j.verdict === 'pass'
            ? `meets — margin ${fmt.percent(j.margin)}`
            : `fails — short by ${fmt.length(j.requiredWidth - j.designWidth)}`,
        glyph: j.verdict === 'pass' ? ('pass' as const) : ('fail' as const),
      },
    ]),
    { size: 7.2 },
  );
}

export function drawResults(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  w.heading('3', 'Results of every module', 80);
  w.paragraph(
    'As stored with the run: figures are the engine’s own, converted to the units of this sheet only for printing.',
    { size: 7.6, color: INK.muted },
  );
  moduleSection(w, data, fmt, 'thermal', ['3.1', 'Thermal: effective R-value and U-factor', 40], thermal);
  moduleSection(
    w,
    data,
    fmt,
    'moisture',
    ['3.2', 'Moisture: condensation and surface humidity', 60],
    moisture,
  );
  moduleSection(w, data, fmt, 'wind', ['3.3', 'Wind: girt and clip spacing per zone', 50], wind);
  moduleSection(w, data, fmt, 'joints', ['3.4', 'Sealant joints', 40], joints);
}
