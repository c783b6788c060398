import { zoneLabel } from '@shared/checks/criteria';
import { type Check, methodText } from '@shared/checks/report';
import { checkFigures } from '@shared/format';
import { WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import { type Formatter, STATUS_WORD, VERDICT_WORDS } from './format';
import { type Cell, INK, type SheetWriter } from './layout';
import type { SheetData } from './sheet-data';

const STATUS_COLOUR = { pass: INK.meets, fail: INK.caution, not_evaluated: INK.warning } as const;

function basis(c: Check, data: SheetData): string {
  if (c.source === 'module') return `${c.module} module`;
  const labels = data.run.inputs.criteriaSet.categoryLabels;
  return c.row
    ? `code table: ${zoneLabel(c.row.climateZone)} × ${labels[c.row.wallCategory] ?? WALL_CATEGORY_LABELS[c.row.wallCategory]}`
    : 'code table';
}

/** Every check: what was required, what the assembly provides, and the result in words and a glyph. */
export function drawCheckList(w: SheetWriter, data: SheetData, fmt: Formatter): void {
  const { run } = data;
  w.heading('4', 'Checks', 40);
  w.paragraph(
    `${run.outputs.matchedRows} row(s) of “${run.criteriaSetName}” (version ${run.criteriaSetVersion}) apply to climate zone ${run.inputs.project.climateZone} and this wall category; the modules add their own checks. A check that cannot be evaluated is never counted as met.`,
    { size: 7.6, color: INK.muted },
  );
  w.table(
    [
      { header: 'Result', width: 22 },
      { header: 'Check', width: 56 },
      { header: 'Required', width: 24, align: 'right' },
      { header: 'Provided', width: 24, align: 'right' },
      { header: 'Margin and reason' },
    ],
    run.outputs.checks.map((c): (string | Cell)[] => {
      const figures = checkFigures(c, fmt.system);
      return [
        {
          text: STATUS_WORD(c.status),
          glyph: c.status,
          font: 'sansBold',
          color: STATUS_COLOUR[c.status],
        },
        { text: `${c.label}\n${basis(c, data)}` },
        figures.required,
        figures.provided,
        [figures.result, figures.reason, c.method ? methodText(c.method, fmt.rValue) : '']
          .filter(Boolean)
          .join('. '),
      ];
    }),
    { size: 7 },
  );
  const v = VERDICT_WORDS[run.verdict];
  w.ensure(10);
  w.y += 2;
  w.glyph(
    run.verdict === 'pass' ? 'pass' : run.verdict === 'fail' ? 'fail' : 'not_evaluated',
    w.left,
    w.y,
    4,
  );
  w.text(`Overall verdict: ${v.word} — ${v.sentence}.`, w.left + 6, w.y + 3.3, {
    font: 'serifBold',
    size: 10.5,
  });
  w.y += 7;
}
