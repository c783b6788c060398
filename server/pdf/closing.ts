import { storedMessageText } from '@shared/format';
import { formatVerificationCode } from '@shared/sheets/verification';
import { INK, PAGE, type SheetWriter } from './layout';
import type { SheetData } from './sheet-data';
import { issuerLine, PRODUCT } from './title-block';

/** The cautions every sheet ends with, before the module's own. */
export const SHEET_CAUTIONS = [
  `${PRODUCT} is an aid to — never a substitute for — the licensed professional of record, who reviews, accepts and seals the design.`,
  'Local codes and the authority having jurisdiction govern: the criteria on this sheet are the values a firm entered for its adopted code; check each against the adopted code, edition and amendments.',
  'The manufacturer’s tested values govern: panel load–span tables, clip and fastener capacities, thermal bridge values and sealant movement classes must be those of the actual products installed.',
  'This sheet prints one stored check run exactly as it was computed; a change to the assembly, the site data or the code table needs a new run and a new sheet.',
] as const;

/** The cautions block: the sheet's own, then every caution the modules attached to their results. */
export function drawCautions(w: SheetWriter, data: SheetData): void {
  w.heading('5', 'Cautions', 30);
  const own = new Set<string>(SHEET_CAUTIONS);
  // The runner's own "aid to, never a substitute for" line is said first here already.
  const items = [
    ...SHEET_CAUTIONS,
    ...data.run.outputs.cautions
      .map((c) => storedMessageText(c, data.units))
      .filter((c) => !own.has(c) && !c.includes('never a substitute')),
  ];
  cautionList(w, [...new Set(items)]);
  w.y += 2;
}

/** Cautions as a list, each behind a small caution-coloured square (the sheet's and the field report's). */
export function cautionList(w: SheetWriter, items: readonly string[]): void {
  const { doc } = w;
  for (const item of items) {
    const lines = w.wrap(item, w.width - 8, 'sans', 7.8);
    const h = lines.length * w.lineHeight(7.8) + 1.2;
    w.ensure(h);
    doc.setFillColor(INK.caution);
    doc.rect(w.left + 1, w.y + 1.6, 1.4, 1.4, 'F');
    lines.forEach((line, i) => {
      w.text(line, w.left + 5, w.y + (i + 1) * w.lineHeight(7.8) - 0.6, { size: 7.8 });
    });
    w.y += h;
  }
}

/** A blank box for the professional's review stamp, beside the verification code. */
export function drawStampAndVerification(w: SheetWriter, data: SheetData): void {
  const h = 58;
  w.ensure(h + 10);
  w.heading('6', 'Review', h);
  const { doc } = w;
  const top = w.y;
  const boxW = 92;
  doc.setDrawColor(INK.ink);
  doc.setLineWidth(0.3);
  doc.rect(w.left, top, boxW, h, 'S');
  w.text('PROFESSIONAL’S REVIEW STAMP', w.left + 2, top + 4, {
    font: 'sansBold',
    size: 6.6,
    color: INK.muted,
  });
  w.text('Left blank for the licensed professional of record.', w.left + 2, top + h - 2.2, {
    size: 6.4,
    color: INK.muted,
  });

  const x = w.left + boxW + 8;
  w.text('VERIFY THIS SHEET', x, top + 4, { font: 'sansBold', size: 6.6, color: INK.muted });
  w.text(formatVerificationCode(data.code), x, top + 13, { font: 'sansBold', size: 18 });
  const lines = [
    `Verification code ${data.code} — derived from the SHA-256 hash of the stored run.`,
    `Open ${data.verifyUrl} (no sign-in needed) to confirm the issuer, project, assembly, date and verdict.`,
    `Issued by ${issuerLine(data.issuer)} (when printed; the page shows it now). Firm names are not unique: check the handle.`,
    `Run hash (SHA-256): ${data.run.hash}`,
  ];
  let y = top + 19;
  for (const text of lines)
    for (const line of w.wrap(text, PAGE.width - PAGE.right - x, 'sans', 7.2)) {
      w.text(line, x, y, { size: 7.2 });
      y += w.lineHeight(7.2);
    }
  w.y = top + h + 4;
}
