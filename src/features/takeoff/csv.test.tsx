import { takeoffToCsv } from '@shared/calc/takeoff/csv';
import { demoElevation } from '@shared/calc/takeoff/examples';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { UnitSystemProvider } from '../../lib/unit-system';
import { TakeoffTable } from './components/TakeoffTable';
import { takeoffCsvFile, takeoffFileName } from './csv';
import { evaluateTakeoff } from './evaluate';

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

/** Blob text through FileReader (jsdom's Blob may lack `text()`). */
const readBlob = (blob: Blob) =>
  new Promise<string>((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(String(r.result));
    r.onerror = () => reject(r.error);
    r.readAsText(blob);
  });

/** Split RFC 4180 text into rows of fields (quoted fields may hold commas, quotes and line breaks). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      row.push(field);
      field = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
    } else field += c;
  }
  return rows;
}

describe('takeoff CSV export', () => {
  it('names the file after the assembly', () => {
    expect(takeoffFileName('Metal rainscreen on clips & girts, level 2')).toBe(
      'metal-rainscreen-on-clips-girts-level-2-takeoff.csv',
    );
    expect(takeoffFileName('Façade — Zinc')).toBe('facade-zinc-takeoff.csv');
    expect(takeoffFileName('***')).toBe('assembly-takeoff.csv');
  });

  it("the file is the shared CSV writer's text: header, one row per trace step, CRLF, RFC 4180 quoting", async () => {
    const input = demoElevation();
    input.walls[0]!.name = 'North, "main" elevation';
    const result = calculateTakeoff(input);
    const { name, blob } = takeoffCsvFile(result, 'Demo wall');
    expect(name).toBe('demo-wall-takeoff.csv');
    expect(blob.type).toBe('text/csv;charset=utf-8');
    const text = await readBlob(blob);
    expect(text).toBe(takeoffToCsv(result));
    expect(text.startsWith('Item,Quantity,Unit,Formula,Source,Note\r\n')).toBe(true);
    expect(text.endsWith('\r\n')).toBe(true);
    const rows = parseCsv(text);
    expect(rows).toHaveLength(result.trace.length + 1);
    for (const r of rows) expect(r).toHaveLength(6);
    expect(rows[1]![0]).toBe('North, "main" elevation: vertical panel joints');
    expect(text).toContain('"North, ""main"" elevation: vertical panel joints"');
    const cartridges = rows.find((r) => r[0] === 'Cartridges, 10.1 US fl oz');
    expect(cartridges?.[1]).toBe(String(result.sealant.cartridges.usFlOz10_1));
    expect(cartridges?.[2]).toBe('pcs');
    const fasteners = rows.find((r) => r[0] === 'Fasteners');
    expect(fasteners?.[1]).toBe(String(result.fasteners));
  });

  it('in IP the quantities are in ft, ft² and US gallons (exact factors), counts unchanged', () => {
    const result = calculateTakeoff(demoElevation());
    const si = parseCsv(takeoffToCsv(result));
    const ip = parseCsv(takeoffToCsv(result, 'IP'));
    expect(ip[0]).toEqual(si[0]);
    // 1 ft = 0.3048 m exactly, 1 US gal = 231 in³ = 3.785411784 L exactly (NIST SP 811 and Handbook 44).
    const factor: Record<string, [string, number]> = {
      m: ['ft', 0.3048],
      'm²': ['ft²', 0.3048 ** 2],
      'm³': ['US gal', 0.003785411784],
      pcs: ['pcs', 1],
    };
    for (const [i, row] of si.slice(1).entries()) {
      const [unit, perUnit] = factor[row[2]!]!;
      expect(ip[i + 1]![2]).toBe(unit);
      expect(Number(ip[i + 1]![1])).toBeCloseTo(Number(row[1]) / perUnit, 6);
    }
    expect(si.find((r) => r[2] === 'm³')).toBeDefined();
  });

  it('the download button hands that file to the browser, made in the page', async () => {
    const input = demoElevation();
    const { result } = evaluateTakeoff(input);
    if (!result) throw new Error('demo elevation did not compute');
    let handed: Blob | null = null;
    const create = vi.fn((b: Blob) => {
      handed = b;
      return 'blob:takeoff';
    });
    Object.assign(URL, { createObjectURL: create, revokeObjectURL: vi.fn() });
    const clicks: { href: string; download: string }[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicks.push({ href: this.getAttribute('href') ?? '', download: this.download });
    });
    const fetchSpy = vi.spyOn(globalThis, 'fetch');
    render(
      <UnitSystemProvider value="SI">
        <TakeoffTable input={input} result={result} assemblyName="Corvid Lane — wall A" />
      </UnitSystemProvider>,
    );
    fireEvent.click(screen.getByRole('button', { name: /download the takeoff \(csv\)/i }));
    expect(clicks).toEqual([{ href: 'blob:takeoff', download: 'corvid-lane-wall-a-takeoff.csv' }]);
    expect(handed).not.toBeNull();
    expect(await readBlob(handed!)).toBe(takeoffToCsv(result));
    expect(fetchSpy).not.toHaveBeenCalled();
    expect(screen.getByText(/Saved as/).textContent).toContain('corvid-lane-wall-a-takeoff.csv');
  });

  it('the download follows the person’s unit choice', async () => {
    const input = demoElevation();
    const { result } = evaluateTakeoff(input);
    if (!result) throw new Error('demo elevation did not compute');
    let handed: Blob | null = null;
    Object.assign(URL, {
      createObjectURL: vi.fn((b: Blob) => {
        handed = b;
        return 'blob:takeoff';
      }),
      revokeObjectURL: vi.fn(),
    });
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
    render(
      <UnitSystemProvider value="IP">
        <TakeoffTable input={input} result={result} assemblyName="Wall A" />
      </UnitSystemProvider>,
    );
    expect(screen.getByText(/in ft, ft² and US gallons/)).toBeDefined();
    fireEvent.click(screen.getByRole('button', { name: /download the takeoff \(csv\)/i }));
    expect(await readBlob(handed!)).toBe(takeoffToCsv(result, 'IP'));
  });

  it('the table shows the packages in both unit families and never NaN', () => {
    const input = demoElevation();
    const result = calculateTakeoff(input);
    render(
      <UnitSystemProvider value="IP">
        <TakeoffTable input={input} result={result} assemblyName="x" />
      </UnitSystemProvider>,
    );
    expect(screen.getByTestId('cartridges-us').textContent).toBe(
      result.sealant.cartridges.usFlOz10_1.toLocaleString('en-US'),
    );
    expect(screen.getByText('300 ml')).toBeTruthy();
    expect(screen.getByText('20 US fl oz')).toBeTruthy();
    expect(screen.getByText('600 ml')).toBeTruthy();
    expect(screen.getByTestId('sealant-with-waste').textContent).toMatch(/US gal$/);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it("impossible elevation: the engine's field error, not a takeoff", () => {
    const input = demoElevation();
    input.walls[1]!.openings[0]!.width = 13;
    const e = evaluateTakeoff(input);
    expect(e.result).toBeNull();
    expect(e.problems['takeoff.walls.1.openings.0.width']).toEqual({
      kind: 'text',
      text: 'The opening (13 m) is wider than the wall (12 m).',
    });
  });
});
