import { createRequire } from 'node:module';
import type { WindScheduleResult } from '@shared/calc/wind/schema';
import { runChecks } from '@shared/checks/runner';
import { assemblyInputSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import demoPanel from '../../data/seed/demo-panel-assembly.json' with { type: 'json' };
import { demoSheetData } from '../../server/pdf/fixtures';
import { renderComplianceSheet } from '../../server/pdf/sheet';
import type { SheetData } from '../../server/pdf/sheet-data';
import { CheckReportView } from '../../src/features/checks/components/CheckReportView';
import { ScheduleTable } from '../../src/features/joints/components/ScheduleTable';
import { evaluateJoints } from '../../src/features/joints/evaluate';
import { VelocityBlock } from '../../src/features/wind/components/VelocityBlock';
import { UnitSystemProvider } from '../../src/lib/unit-system';
import { readPdf } from '../setup/pdf';

/*
 * The same check run reads the same on the checks page and on its compliance sheet: every figure the page
 * prints — each check's required and provided value and its "meets — margin … / fails — short by …" result,
 * and the value of each step of "Show the work" (U_eff, R_eff, R₀, accumulation, f_Rsi, the wind
 * utilisations and spacings, the joints' required widths) — is found with the same value and unit in the
 * text of the rendered PDF, next to what it belongs to. Both are worded by shared/format (DEVELOPERS.md
 * D-019); this test reads the page as rendered by its React component and the sheet as extracted from the
 * PDF (pdfjs), so a formatter either side that drifts fails it. Demo data: the two invented demo assemblies
 * of data/seed against the demo code table, and the first one without the project's monthly climate (a
 * module that cannot run and says why).
 */

/** jsdom (the client tests' DOM) parses the page's markup here; it ships no types of its own. */
const { JSDOM } = createRequire(import.meta.url)('jsdom') as {
  JSDOM: new (html: string) => { window: { document: Document } };
};

/** Whitespace of any kind (the narrow no-break space before a unit, line breaks of a wrapped cell) as one space. */
const flat = (t: string) => t.replace(/\s+/g, ' ').trim();
/** Without any whitespace: a narrow PDF column may break a long unit ("Btu/(h·ft²·°F" | ")") across lines. */
const squash = (t: string) => t.replace(/\s+/g, '');

/** What the checks page shows for a run: each check's row, and each step of the work with its source. */
function screenOf(data: SheetData, system: UnitSystem) {
  const html = renderToStaticMarkup(createElement(CheckReportView, { run: data.run, system }));
  const doc = new JSDOM(html).window.document;
  const rows = [...doc.querySelectorAll('tr[data-check]')].map((tr) => {
    const cells = [...tr.querySelectorAll('td')];
    const resultCell = cells[3]!.querySelector('.text-ink')!;
    return {
      id: tr.getAttribute('data-check')!,
      required: flat(cells[1]!.textContent ?? ''),
      provided: flat(cells[2]!.textContent ?? ''),
      result: flat(resultCell.textContent ?? ''),
    };
  });
  const steps = [...doc.querySelectorAll('details li')].map((li) => {
    const figures = li.querySelectorAll('.num');
    return {
      label: flat(li.querySelector('.font-semibold')?.textContent ?? ''),
      value: flat(figures[1]?.textContent ?? ''),
      source: flat(li.querySelector('.text-ink-muted')?.textContent ?? ''),
    };
  });
  return { rows, steps };
}

async function sheetText(data: SheetData): Promise<string> {
  const { text } = await readPdf(renderComplianceSheet(data));
  return flat(text);
}

/** The sheet holds `text`, whitespace aside (a failure names the text, not the whole sheet). */
const holds = (sheet: string, text: string) => expect(squash(sheet).includes(squash(text)), text).toBe(true);

/** The demo run without the project's monthly climate: the moisture module cannot run. */
function withoutClimate(data: SheetData): SheetData {
  const project = { ...data.run.inputs.project, climate: null };
  const outputs = runChecks(
    data.run.inputs.assembly.input,
    { ...project, elevationM: project.elevationM ?? 0 },
    data.run.inputs.criteriaSet.rows,
  );
  return { ...data, run: { ...data.run, inputs: { ...data.run.inputs, project }, outputs } };
}

const panelAssembly = assemblyInputSchema.parse(demoPanel.assembly);
const CASES: [string, (system: UnitSystem) => SheetData][] = [
  ['steel-stud demo assembly', (s) => demoSheetData(s)],
  ['insulated panel demo assembly', (s) => demoSheetData(s, panelAssembly)],
  ['steel-stud demo assembly without the monthly climate', (s) => withoutClimate(demoSheetData(s))],
];

describe('the checks page and the compliance sheet print the same figures', () => {
  describe.each(CASES)('%s', (_name, make) => {
    it.each(['SI', 'IP'] as const)('in %s units', async (system) => {
      const data = make(system);
      const screen = screenOf(data, system);
      const sheet = await sheetText(data);
      expect(screen.rows).toHaveLength(data.run.outputs.checks.length);
      // Each check's row on the sheet reads "<required> <provided> <result>", as the page's three cells do.
      for (const row of screen.rows) holds(sheet, `${row.required} ${row.provided} ${row.result}`);
      // Each step of the work: its value printed right after its source in the sheet's formulas.
      expect(screen.steps.length).toBeGreaterThan(0);
      for (const step of screen.steps) holds(sheet, `${step.source} ${step.value}`);
    });
  });

  it('words a module that could not run alike: what is missing, in the same words', async () => {
    const data = withoutClimate(demoSheetData('SI'));
    const sheet = await sheetText(data);
    const moisture = screenOf(data, 'SI').rows.find((r) => r.id === 'moisture.run')!;
    expect(moisture.result).toBe('not evaluated — the project’s monthly climate is missing');
    holds(sheet, moisture.result);
    holds(sheet, 'Not run — missing: the project’s monthly climate.');
  });

  it.each(['SI', 'IP'] as const)(
    'prints each joint’s required and design width as the joints page shows them, inch fractions and all (%s)',
    async (system) => {
      const data = demoSheetData(system);
      const joints = data.run.inputs.assembly.input.joints ?? [];
      expect(joints.length).toBeGreaterThan(0);
      const html = renderToStaticMarkup(
        createElement(UnitSystemProvider, {
          value: system,
          // biome-ignore lint/correctness/noChildrenProp: no JSX in a .ts test; the provider's props name its children
          children: createElement(ScheduleTable, { joints, evaluation: evaluateJoints(joints) }),
        }),
      );
      const rows = [...new JSDOM(html).window.document.querySelectorAll('tr[data-joint]')];
      expect(rows).toHaveLength(joints.length);
      const sheet = await sheetText(data);
      for (const tr of rows) {
        const cells = tr.querySelectorAll('td');
        const required = flat(cells[2]!.querySelector('.font-semibold')!.textContent ?? '');
        const design = flat(cells[3]!.textContent ?? '');
        expect(required).toMatch(system === 'SI' ? / mm$/ : / in$/);
        holds(sheet, `${required} ${design}`);
      }
    },
  );

  it.each(['SI', 'IP'] as const)(
    'prints q_h and the end-zone width as the attachment sheet shows them (%s)',
    async (system) => {
      const data = demoSheetData(system);
      const wind = data.run.outputs.modules.find((m) => m.id === 'wind')!.result as WindScheduleResult;
      const html = renderToStaticMarkup(
        createElement(UnitSystemProvider, {
          value: system,
          // biome-ignore lint/correctness/noChildrenProp: no JSX in a .ts test; the provider's props name its children
          children: createElement(VelocityBlock, { result: wind }),
        }),
      );
      const cells = [...new JSDOM(html).window.document.querySelectorAll('dd.num')];
      const qh = flat(cells.find((c) => /Pa|psf/.test(c.textContent ?? ''))!.firstChild!.textContent ?? '');
      const a = flat(cells.at(-2)!.textContent ?? '');
      expect(qh).toMatch(system === 'SI' ? /^\d+\.\d{1,3} kPa$/ : /^\d+(\.\d)? psf$/);
      const sheet = await sheetText(data);
      holds(sheet, `q_h ${qh}`);
      holds(sheet, `end-zone width a = ${a}`);
      expect(sheet).not.toMatch(/\d Pa\b/);
    },
  );
});
