import { zoneLabel } from '@shared/checks/criteria';
import { WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import type { SheetIssuer } from '@shared/schemas/sheets';
import { formatVerificationCode, ISSUER_NOT_VERIFIED, ISSUER_VERIFIED } from '@shared/sheets/verification';
import { type Formatter, sheetDate, sheetDateTime, VERDICT_WORDS } from './format';
import { type Glyph, INK, type SheetWriter } from './layout';
import type { SheetData } from './sheet-data';

export const PRODUCT = 'Skinwright';

/**
 * The issuer as the sheet names it: the name (not unique), the firm's unique handle, and whether a site
 * administrator had verified the firm when the sheet was printed.
 */
export function issuerLine({ name, handle, verifiedAt }: SheetIssuer): string {
  const standing = verifiedAt ? `${ISSUER_VERIFIED} on ${sheetDate(verifiedAt)}` : ISSUER_NOT_VERIFIED;
  return `${name} · ${handle ?? 'firm since removed'} — ${standing}`;
}

/** The sheet's name, what it is of, and the title block of who, what and when. */
export function drawTitleBlock(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const { run } = data;
  const { inputs } = run;
  w.text(PRODUCT, w.left, w.y + 4, { font: 'serifBold', size: 11, color: INK.copper });
  w.text('metal-panel walls, proved', w.left + 22, w.y + 4, { size: 7.5, color: INK.muted });
  w.text(`calculation engine ${run.engineVersion}`, w.right, w.y + 4, {
    size: 7.5,
    color: INK.muted,
    align: 'right',
  });
  w.y += 7;
  w.text('Compliance sheet', w.left, w.y + 7, { font: 'serifBold', size: 21 });
  w.y += 9;
  w.paragraph(run.assemblyName, { font: 'serif', size: 12.5, after: 1 });
  w.hline(w.y + 1, 0.5, INK.ink);
  w.y += 2;

  const set = inputs.criteriaSet;
  const project = inputs.project;
  w.fields(
    [
      [
        'Project',
        [project.name, data.project.number && `No. ${data.project.number}`].filter(Boolean).join(' · '),
      ],
      ['Site', data.project.siteAddress || '—'],
      ['Assembly', `${run.assemblyName}, revision ${run.assemblyRevision}`],
      [
        'Wall category · climate zone',
        `${set.categoryLabels[inputs.assembly.input.wallCategory] ?? WALL_CATEGORY_LABELS[inputs.assembly.input.wallCategory]} · ${zoneLabel(project.climateZone)}`,
      ],
      ['Code table (criteria set)', `${run.criteriaSetName}, version ${run.criteriaSetVersion}`],
      ['Jurisdiction · edition', [set.jurisdiction, set.edition].filter(Boolean).join(' · ') || '—'],
      ['Date of the run', sheetDateTime(run.createdAt)],
      ['Prepared by', data.preparedBy ?? '—'],
      ['Issued by', issuerLine(data.issuer)],
      ['Made with', `${PRODUCT}, calculation engine ${run.engineVersion}`],
      ['Units on this sheet', fmt.system === 'SI' ? 'SI (metric)' : 'IP (inch-pound)'],
      ['Run', `${run.id} · SHA-256 ${run.hash.slice(0, 16)}…`],
    ],
    2,
  );
  w.y += 3;
  drawVerdict(w, data);
}

const VERDICT_GLYPH: Record<SheetData['run']['verdict'], Glyph> = {
  pass: 'pass',
  fail: 'fail',
  incomplete: 'not_evaluated',
};
const VERDICT_COLOUR = { pass: INK.meets, fail: INK.caution, incomplete: INK.warning } as const;

/** The overall verdict in words and a glyph, with the verification code beside it. */
export function drawVerdict(w: SheetWriter, data: SheetData): void {
  const { run } = data;
  const h = 27;
  w.ensure(h + 2);
  const top = w.y;
  const { doc } = w;
  doc.setDrawColor(VERDICT_COLOUR[run.verdict]);
  doc.setLineWidth(0.6);
  doc.rect(w.left, top, w.width, h, 'S');
  w.glyph(VERDICT_GLYPH[run.verdict], w.left + 4, top + 4.5, 9);
  const v = VERDICT_WORDS[run.verdict];
  w.text(`Overall verdict: ${v.word}`, w.left + 17, top + 8.5, {
    font: 'serifBold',
    size: 15,
    color: VERDICT_COLOUR[run.verdict],
  });
  w.text(`— ${v.sentence}.`, w.left + 17, top + 14, { size: 8.8 });
  w.text(
    `${run.counts.pass} met · ${run.counts.fail} failed · ${run.counts.notEvaluated} not evaluated`,
    w.left + 17,
    top + 19.2,
    { size: 7.6, color: INK.muted },
  );
  w.text(
    `Code table rows: ${VERDICT_WORDS[run.criteriaVerdict].word.toLowerCase()} · module checks: ${VERDICT_WORDS[run.moduleVerdict].word.toLowerCase()}`,
    w.left + 17,
    top + 23.2,
    { size: 7.6, color: INK.muted },
  );

  // Verification: code and address, right of the verdict.
  const x = w.right - 62;
  doc.setDrawColor(INK.rule);
  doc.setLineWidth(0.2);
  doc.line(x - 3, top + 3, x - 3, top + h - 3);
  w.text('VERIFICATION CODE', x, top + 6.5, { font: 'sansBold', size: 6.6, color: INK.muted });
  // The issuer's standing beside the code, where a reader looks first (the title block says it in full).
  w.text(data.issuer.verifiedAt ? 'ISSUER VERIFIED' : 'ISSUER NOT VERIFIED', w.right - 3, top + 6.5, {
    font: 'sansBold',
    size: 6.6,
    color: data.issuer.verifiedAt ? INK.meets : INK.caution,
    align: 'right',
  });
  w.text(formatVerificationCode(data.code), x, top + 13.5, { font: 'sansBold', size: 15 });
  const lines = w.wrap(`Confirm this sheet at ${data.verifyUrl}`, 60, 'sans', 6.6);
  lines.forEach((line, i) => {
    w.text(line, x, top + 18.5 + i * 2.7, { size: 6.6, color: INK.muted });
  });
  w.y = top + h + 3;
}
