import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import {
  DEFICIENCY_STATE_TEXT,
  type Inspection,
  type InspectionItem,
  ITEM_STATE_TEXT,
  type ItemQuantity,
} from '@shared/inspections/schema';
import { formatVerificationCode } from '@shared/sheets/verification';
import type { UnitSystem } from '@shared/units/registry';
import { QUANTITIES } from '@shared/units/registry';
import { cautionList } from './closing';
import { type Formatter, formatter, sheetDate, sheetDateTime } from './format';
import { type Glyph, INK, newSheetWriter, pageFooters, type SheetWriter } from './layout';
import { PRODUCT } from './title-block';

/*
 * The field report of one inspection, as a PDF: scope, each item with its design value, limits, measured value,
 * state and photo thumbnails beside it, the deficiencies still open, signatures, cautions and a verification code
 * derived from the SHA-256 of the report's content. Built like the compliance sheet (the same flow layout, fonts
 * and cautions approach); nothing is recomputed: the items are printed as stored. Same content → same bytes.
 */

export interface ReportPhoto {
  itemId: string;
  bytes: Buffer;
  format: 'PNG' | 'JPEG';
}

export interface FieldReportData {
  inspection: Inspection;
  projectName: string;
  units: UnitSystem;
  /** At most a few photos per item, in the order taken. */
  photos: ReportPhoto[];
  /** SHA-256 (hex) of the canonical JSON of the inspection and its photos' hashes. */
  hash: string;
  code: string;
  /** Where anyone can confirm the code (the public verification page). */
  verifyUrl: string;
  /** The time of the latest change the report shows (its creation date, so the same content gives the same bytes). */
  asOf: string;
}

/** The cautions every field report carries. */
export const FIELD_REPORT_CAUTIONS = [
  `${PRODUCT} is an aid to — never a substitute for — the licensed professional of record, who reviews the installed work and decides whether it is acceptable.`,
  'The checklist compares the wall with the assembly revision named above: a change made on site, or a later revision, needs its own inspection.',
  'Attachment (girts, clips, fasteners) resists wind: a spacing wider than designed, a missing fastener or another clip type is not covered by the wind check and must be referred to the engineer before the panels close it in.',
  'Air and vapour barrier laps, tape and sealant joints keep water and moisture out: a defect hidden behind the cladding can wet the insulation and rot or corrode what it touches.',
  'Measurements are as reported by the person who answered each item; the photos show what was seen at the place noted.',
] as const;

const STATE_GLYPH: Record<InspectionItem['state'], Glyph | null> = {
  pass: 'pass',
  fail: 'fail',
  unseen: 'not_evaluated',
  na: null,
};

/** A value of an item in the report's units: lengths as the sheet words them, counts as whole numbers. */
function figure(fmt: Formatter, q: ItemQuantity | null, v: number): string {
  if (q === null) return '';
  if (q === 'count') return fmt.num(v, 0);
  if (q === 'shortLength') return Math.abs(v) < 0.1 ? fmt.thickness(v) : fmt.length(v);
  return fmt.siValue(v, QUANTITIES[q].si);
}

function limitsText(fmt: Formatter, item: InspectionItem): string {
  const t = item.tolerance;
  if (!t || (t.min === null && t.max === null)) return '';
  const at = (v: number) => figure(fmt, item.quantity, v);
  if (t.min !== null && t.max !== null) return `accept ${at(t.min)} to ${at(t.max)}`;
  return t.min !== null ? `accept at least ${at(t.min)}` : `accept at most ${at(t.max!)}`;
}

function titleBlock(w: SheetWriter, d: FieldReportData): void {
  const i = d.inspection;
  w.text(PRODUCT, w.left, w.y + 4, { font: 'serifBold', size: 11, color: INK.copper });
  w.text('metal-panel walls, proved', w.left + 22, w.y + 4, { size: 7.5, color: INK.muted });
  w.y += 7;
  w.text('Field inspection report', w.left, w.y + 7, { font: 'serifBold', size: 21 });
  w.y += 9;
  w.paragraph(`Inspection ${i.number} — ${i.title}`, { font: 'serif', size: 12.5, after: 1 });
  w.hline(w.y + 1, 0.5, INK.ink);
  w.y += 2;
  const area =
    i.scope.area.kind === 'grid'
      ? `grid lines ${i.scope.area.from} to ${i.scope.area.to}`
      : `${i.scope.area.zone} zone`;
  w.fields([
    ['PROJECT', d.projectName],
    ['STATUS', i.status === 'closed' ? `Closed ${i.closedAt ? sheetDate(i.closedAt) : ''}` : 'In progress'],
    ['ASSEMBLY', `${i.assemblyName}, revision ${i.scope.revision}`],
    ['WHERE', `${i.scope.elevation}, ${area}`],
    [
      'PROVED BY',
      i.sheetCode
        ? `Check run ${i.checkRunId?.slice(0, 8)}, compliance sheet ${formatVerificationCode(i.sheetCode)}`
        : 'No check run of this revision when the inspection began',
    ],
    [
      'ITEMS',
      `${i.counts.items}: ${i.counts.pass} pass, ${i.counts.fail} fail, ${i.counts.na} not applicable, ${i.counts.unseen} not yet seen`,
    ],
    ['STARTED', `${sheetDateTime(i.createdAt)}${i.createdByName ? ` by ${i.createdByName}` : ''}`],
    ['OPEN DEFICIENCIES', String(i.counts.openDeficiencies)],
  ]);
}

const THUMB_W = 34;
const THUMB_GAP = 3;

/** One item: words on the left, its photos beside them on the right. */
function drawItem(w: SheetWriter, fmt: Formatter, item: InspectionItem, photos: ReportPhoto[]): void {
  const { doc } = w;
  const thumbs = photos.slice(0, 2).map((p) => {
    const props = doc.getImageProperties(p.bytes);
    const h = Math.min(40, (THUMB_W * props.height) / Math.max(1, props.width));
    return { p, h };
  });
  const textW = w.width - (thumbs.length > 0 ? thumbs.length * (THUMB_W + THUMB_GAP) : 0) - 8;
  const design = [
    item.designText,
    item.designValue === null ? '' : `design ${figure(fmt, item.quantity, item.designValue)}`,
    limitsText(fmt, item),
  ]
    .filter(Boolean)
    .join(' · ');
  const measured =
    item.measured === null
      ? ''
      : `Measured ${figure(fmt, item.quantity, item.measured)} — ${item.check.text}`;
  const more = item.photos.length - thumbs.length;
  const where = [
    item.location && `At ${item.location}`,
    item.note,
    more > 0 ? `${more} more photo${more === 1 ? '' : 's'} in ${PRODUCT}` : '',
  ]
    .filter(Boolean)
    .join(' · ');
  const blocks: [string, number, string][] = [
    [design, 7.6, INK.ink],
    [measured, 7.6, item.check.status === 'below' || item.check.status === 'above' ? INK.caution : INK.ink],
    [where, 7.4, INK.ink],
    [`Source: ${item.source.text}`, 6.6, INK.muted],
  ];
  const lines = blocks.flatMap(([text, size, color]) =>
    text ? w.wrap(text, textW, 'sans', size).map((l) => [l, size, color] as const) : [],
  );
  const labelH = w.lineHeight(8.6) + 1;
  const textH = labelH + lines.reduce((s, [, size]) => s + w.lineHeight(size), 0);
  const h = Math.max(textH, ...thumbs.map((t) => t.h + 1)) + 2.5;
  w.ensure(h);
  const top = w.y;
  const glyph = STATE_GLYPH[item.state];
  if (glyph) w.glyph(glyph, w.left, top + 1, 3.2);
  else w.text('–', w.left + 1, top + 3.6, { font: 'sansBold', size: 9 });
  w.text(item.label, w.left + 6, top + 3.6, { font: 'sansBold', size: 8.6 });
  w.text(ITEM_STATE_TEXT[item.state].label, w.left + 6 + textW, top + 3.6, {
    font: 'sansBold',
    size: 7.6,
    align: 'right',
    color: item.state === 'fail' ? INK.caution : INK.ink,
  });
  let y = top + labelH;
  for (const [line, size, color] of lines) {
    y += w.lineHeight(size);
    w.text(line, w.left + 6, y - 0.8, { size, color });
  }
  let x = w.right - thumbs.length * (THUMB_W + THUMB_GAP) + THUMB_GAP;
  for (const t of thumbs) {
    doc.addImage(t.p.bytes, t.p.format, x, top + 1, THUMB_W, t.h, undefined, 'FAST');
    doc.setDrawColor(INK.rule);
    doc.setLineWidth(0.1);
    doc.rect(x, top + 1, THUMB_W, t.h, 'S');
    x += THUMB_W + THUMB_GAP;
  }
  w.y = top + h;
  w.hline(w.y - 1, 0.1, INK.rule);
}

function drawDeficiencies(w: SheetWriter, d: FieldReportData): void {
  const open = d.inspection.deficiencies.filter((x) => x.state !== 'accepted');
  w.heading('2', 'Open deficiencies', 20);
  if (open.length === 0) {
    w.paragraph('None: every deficiency found has been corrected and accepted.', { size: 8.4 });
    return;
  }
  w.table(
    [
      { header: 'No.', width: 10 },
      { header: 'Item' },
      { header: 'State', width: 34 },
      { header: 'Owner', width: 32 },
      { header: 'Due', width: 22 },
    ],
    open.map((x) => [
      String(x.number),
      `${x.itemLabel}${x.description ? ` — ${x.description}` : ''}`,
      DEFICIENCY_STATE_TEXT[x.state].label,
      x.ownerName ?? '—',
      x.dueDate ?? '—',
    ]),
  );
}

function drawSignatures(w: SheetWriter, d: FieldReportData): void {
  w.heading('3', 'Signatures', 30);
  const rows = d.inspection.signatures.map((s) => [
    s.name,
    PROJECT_ROLE_LABELS[s.role],
    s.what === 'created' ? 'Began the inspection' : 'Closed (signed off) the inspection',
    sheetDateTime(s.at),
  ]);
  w.table(
    [
      { header: 'Name' },
      { header: 'Role', width: 42 },
      { header: 'What', width: 52 },
      { header: 'Date', width: 34 },
    ],
    rows.length > 0 ? rows : [['—', '—', 'Not yet signed off', '—']],
  );
}

function drawCautionsAndCode(w: SheetWriter, d: FieldReportData): void {
  w.heading('4', 'Cautions', 30);
  cautionList(w, FIELD_REPORT_CAUTIONS);
  w.ensure(34);
  w.y += 4;
  w.text('VERIFICATION CODE', w.left, w.y + 3, { font: 'sansBold', size: 6.6, color: INK.muted });
  w.text(formatVerificationCode(d.code), w.left, w.y + 12, { font: 'sansBold', size: 18 });
  w.y += 16;
  w.paragraph(
    `Derived from the SHA-256 hash of this report’s content (the inspection as of ${sheetDateTime(d.asOf)} and its photos): ${d.hash}`,
    { size: 7.2 },
  );
  w.paragraph(`Confirm it at ${d.verifyUrl} — the page shows what this report stated and who issued it.`, {
    size: 7.2,
  });
}

function footers(w: SheetWriter, d: FieldReportData): void {
  pageFooters(w, [
    `Report code ${formatVerificationCode(d.code)} (SHA-256 of its content)`,
    `${d.projectName} · inspection ${d.inspection.number} · as of ${sheetDate(d.asOf)}`,
  ]);
}

/** Renders the field report; returns the PDF bytes. */
export function renderFieldReport(d: FieldReportData): Buffer {
  const w = newSheetWriter(
    `${PRODUCT} · Field inspection report`,
    `Inspection ${d.inspection.number}, ${d.inspection.scope.elevation}`,
  );
  const { doc } = w;
  const fmt = formatter(d.units);
  titleBlock(w, d);
  w.heading('1', 'Checklist', 30);
  for (const item of d.inspection.items)
    drawItem(
      w,
      fmt,
      item,
      d.photos.filter((p) => p.itemId === item.id),
    );
  drawDeficiencies(w, d);
  drawSignatures(w, d);
  drawCautionsAndCode(w, d);
  footers(w, d);
  const title = `Field inspection report — inspection ${d.inspection.number}, ${d.inspection.title}`;
  doc.setProperties({
    title,
    subject: `${d.inspection.assemblyName}, revision ${d.inspection.scope.revision}, ${d.projectName}`,
    author: d.inspection.createdByName ?? PRODUCT,
    creator: PRODUCT,
    keywords: `field inspection, verification ${d.code}`,
  });
  doc.setLanguage('en-GB');
  doc.setCreationDate(new Date(d.asOf));
  doc.setFileId(d.hash.slice(0, 32).toUpperCase());
  return Buffer.from(doc.output('arraybuffer'));
}
