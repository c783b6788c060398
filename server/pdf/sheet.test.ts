import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { niceTicks, nodePositions } from './charts';
import { formatter } from './format';
import { spread } from './section-sketch';

/** jsPDF's own parser, kept before server/pdf/fonts.ts replaces it with the caching one. */
type Open = (file: Uint8Array) => { directory: object };
const TTF = (jsPDF as unknown as { API: { TTFFont: { open: Open } } }).API.TTFFont;
const originalOpen = TTF.open;
const sample = createRequire(import.meta.url).resolve(
  '@expo-google-fonts/public-sans/400Regular/PublicSans_400Regular.ttf',
);
const directoryProto = Object.getPrototypeOf(
  originalOpen.call(TTF, new Uint8Array(readFileSync(sample))).directory,
);
const originalEncode = directoryProto.encode;

describe('the compliance sheet renderer', () => {
  it('gives the same bytes every time, and the same bytes as jsPDF without its speed-ups', async () => {
    const { renderComplianceSheet } = await import('./sheet');
    const { demoSheetData } = await import('./fixtures');
    const data = demoSheetData('SI');
    const first = renderComplianceSheet(data);
    renderComplianceSheet(demoSheetData('IP'));
    expect(Buffer.compare(renderComplianceSheet(data), first)).toBe(0);
    const cachedOpen = TTF.open;
    const fastEncode = directoryProto.encode;
    try {
      TTF.open = originalOpen;
      directoryProto.encode = originalEncode;
      expect(Buffer.compare(renderComplianceSheet(data), first)).toBe(0);
    } finally {
      TTF.open = cachedOpen;
      directoryProto.encode = fastEncode;
    }
    expect(first.length).toBeLessThan(500 * 1024);
  });

  it('keeps every character as selectable text: none is dropped for want of a glyph', async () => {
    const { renderComplianceSheet } = await import('./sheet');
    const { demoSheetData } = await import('./fixtures');
    const { readPdf } = await import('../../tests/setup/pdf');
    const { text } = await readPdf(renderComplianceSheet(demoSheetData('SI')));
    // Outside Latin-1 (a face without the glyph used to drop them silently), and from the serif fallback.
    for (const ch of ['—', '’', '–', '≤', '≥', '−', 'θ', 'χ', 'ψ', 'λ', 'Σ', 'Δ', '²', '·', '°', '₀', '×'])
      expect(text, ch).toContain(ch);
    expect(text).toContain('aid to — never a substitute for — the licensed professional of record');
  });

  it('prints the sources of χ/ψ, the panel’s load–span table and the clip capacity', async () => {
    const { renderComplianceSheet } = await import('./sheet');
    const { demoSheetData } = await import('./fixtures');
    const { readPdf } = await import('../../tests/setup/pdf');
    const data = demoSheetData('SI');
    const panel = data.run.inputs.assembly.input.windPanel!;
    const { text } = await readPdf(renderComplianceSheet(data));
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('PANEL LOAD–SPAN TABLE (ASD ALLOWABLES) AND CLIP CAPACITY');
    expect(flat).toContain(panel.sources!.loadSpanTable!.text);
    expect(flat).toContain(panel.sources!.clip!.text);
    expect(flat).toContain('2 × 1150 N = 2300 N');
    expect(flat).toContain('0.9 m 4.69 kPa 4.07 kPa 6.94 kPa');
    expect(flat).toContain('Source: Demo χ — invented for the Skinwright demo');
  });

  it('prints figures by the screen’s rounding: a 0.15 mm film, shares as the build-up page shows them, the deciding method', async () => {
    const { renderComplianceSheet } = await import('./sheet');
    const { demoSheetData } = await import('./fixtures');
    const { readPdf } = await import('../../tests/setup/pdf');
    const { fixed } = await import('@shared/units/rounding');
    const data = demoSheetData('SI');
    const { text } = await readPdf(renderComplianceSheet(data));
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('0.15 mm');
    expect(flat).not.toMatch(/\b0\.1 mm/);
    const thermal = data.run.outputs.modules.find((m) => m.id === 'thermal')!.result as {
      bridges: { share: number }[];
    };
    // The build-up page's share table prints fixed(share × 100, 1) too (formatShare): one rule, one text.
    for (const b of thermal.bridges) expect(flat).toContain(`${fixed(b.share * 100, 1)} %`);
    expect(flat).toContain('Method: Energy-code path for steel framing (ASHRAE 90.1 Appendix A)');
  });

  it('prints a run stored before messages became data (reasons in words) as it prints one stored now', async () => {
    const { renderComplianceSheet } = await import('./sheet');
    const { demoSheetData } = await import('./fixtures');
    const { readPdf } = await import('../../tests/setup/pdf');
    const { storedBefore } = await import('@shared/checks/fixtures');
    const { checkReportSchema } = await import('@shared/checks/report');
    const now = demoSheetData('SI');
    const outputs = checkReportSchema.parse(storedBefore(now.run.outputs));
    expect(outputs.checks.some((c) => typeof c.reason === 'string' && c.reason !== '')).toBe(true);
    const before = { ...now, run: { ...now.run, outputs } };
    const [a, b] = await Promise.all([now, before].map((d) => readPdf(renderComplianceSheet(d))));
    expect(b!.text).toBe(a!.text);
    expect(a!.text.replace(/\s+/g, ' ')).toContain('No interstitial condensation');
  });
});

describe('sheet helpers', () => {
  it('spreads labels at least a gap apart, inside the bounds', () => {
    expect(spread([10, 10.5, 11, 40], 3, 0, 100)).toEqual([10, 13, 16, 40]);
    expect(spread([95, 96, 97], 3, 0, 97)).toEqual([91, 94, 97]);
  });

  it('picks round axis ticks', () => {
    expect(niceTicks(0, 1.75, 5)).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(niceTicks(-12.3, 18.2, 6)).toEqual([-20, -10, 0, 10, 20]);
    expect(niceTicks(-12.3, 18.2, 7)).toEqual([-15, -10, -5, 0, 5, 10, 15, 20]);
  });

  it('places moisture nodes through the wall in proportion to resistance within a layer', () => {
    const nodes = [
      { kind: 'exteriorSurface', label: '', outerLayer: null, innerLayer: 1, resistance: 0.04, sd: 0 },
      { kind: 'withinLayer', label: '', outerLayer: 1, innerLayer: 1, resistance: 1.04, sd: 0 },
      { kind: 'interface', label: '', outerLayer: 1, innerLayer: 2, resistance: 2.04, sd: 0 },
      { kind: 'interiorSurface', label: '', outerLayer: 2, innerLayer: null, resistance: 2.2, sd: 0 },
    ] as const;
    expect(nodePositions([...nodes], [0.01, 0.1, 0.02])).toEqual([0.01, 0.060000000000000005, 0.11, 0.13]);
  });

  it('formats in SI or IP with a true minus sign', () => {
    const si = formatter('SI');
    const ip = formatter('IP');
    expect(si.temperature(-19)).toBe('\u221219\u202f°C');
    expect(ip.temperature(-19)).toBe('\u22122.2\u202f°F');
    expect(si.thickness(0.1)).toBe('100\u202fmm');
    expect(si.thickness(0.00015)).toBe('0.15\u202fmm');
    expect(si.num(3.35, 1)).toBe('3.4');
    expect(si.num(0.15, 1)).toBe('0.2');
    expect(ip.rValue(3.26)).toBe('18.5\u202fh·ft²·°F/Btu');
    expect(si.siValue(180, 'L/x')).toBe('L/180');
  });
});
