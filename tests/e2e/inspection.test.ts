import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';
import { readPdf } from '../setup/pdf';

/** A phone: 390 px wide. */
const PHONE = { width: 390, height: 844 };
/** An invented wall photo (2400 × 1600 px JPEG carrying an invented GPS position), see tests/fixtures. */
const PHOTO = path.resolve('tests/fixtures/wall-photo.jpg');

const fitsWidth = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

/** Images drawn on the PDF's pages (pdfjs operator list: paintImageXObject and its kin). */
async function imagesInPdf(bytes: Buffer): Promise<number> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: new Uint8Array(bytes), isEvalSupported: false, verbosity: 0 })
    .promise;
  const paint = new Set([pdfjs.OPS.paintImageXObject, pdfjs.OPS.paintInlineImageXObject]);
  let count = 0;
  for (let i = 1; i <= doc.numPages; i++) {
    const ops = await (await doc.getPage(i)).getOperatorList();
    count += ops.fnArray.filter((op) => paint.has(op)).length;
  }
  await doc.destroy();
  return count;
}

/** The paused answers this device has saved in IndexedDB (what survives a reload). */
const savedMutations = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<number>((resolve) => {
        const open = indexedDB.open('skinwright-cache');
        open.onsuccess = () => {
          const get = open.result
            .transaction('query-client')
            .objectStore('query-client')
            .get('skinwright-query-client');
          get.onsuccess = () => resolve(get.result ? JSON.parse(get.result).clientState.mutations.length : 0);
          get.onerror = () => resolve(-1);
        };
        open.onerror = () => resolve(-1);
      }),
  );

const item = (page: Page, n: number): Locator => page.locator('article').nth(n);

async function answer(card: Locator, state: 'Pass' | 'Fail' | 'Not applicable', note?: string) {
  await card.getByRole('button', { name: state, exact: true }).click();
  if (note) await card.getByLabel('Note').fill(note);
  await card.getByRole('button', { name: 'Save answer' }).click();
}

/**
 * A field inspection on a 390 px phone: the envelope consultant generates it from the demo assembly, answers
 * items (a measured value within the tolerance, a photo taken with the camera input), fails one; with no signal
 * answers two more, which wait on the device, survive a reload and are sent when the connection returns. Then
 * the subcontractor corrects the deficiency with a photo, the consultant accepts it and downloads the field
 * report, which carries the photos.
 */
describe('field inspection on a phone', () => {
  const suite = browserSuite();

  it('generate, answer, photo, fail, offline and back, correct, accept, report', async () => {
    const problems: string[] = [];
    const inspector: BrowserContext = await suite.browser.newContext({ viewport: PHONE });
    const consultant = await inspector.newPage();
    consultant.on('pageerror', (e) => problems.push(e.message));
    await signIn(consultant, suite.baseUrl, 'consultant@skinwright.demo');
    const projectId = (
      (await (await consultant.request.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as {
        id: string;
      }
    ).id;

    // The Inspections tab → New inspection, built from the demo assembly's current revision.
    await consultant.goto(`${suite.baseUrl}/projects/${projectId}/inspections`);
    await consultant.getByRole('link', { name: 'New inspection' }).click();
    await consultant.waitForURL(/\/inspections\/new$/);
    expect(await fitsWidth(consultant)).toBe(true);
    await consultant.getByRole('textbox', { name: 'Elevation' }).fill('West elevation');
    await consultant.getByRole('textbox', { name: 'From grid line' }).fill('A');
    await consultant.getByRole('textbox', { name: 'To grid line' }).fill('D');
    await consultant.getByRole('button', { name: 'Create the inspection' }).click();
    await consultant.waitForURL(/\/inspections\/[0-9a-f-]{36}$/);
    const inspectionUrl = consultant.url();
    const inspectionId = inspectionUrl.split('/').pop() as string;
    await consultant.getByText('Everything sent').waitFor();
    expect(await fitsWidth(consultant)).toBe(true);

    // The app shell is kept by the service worker before the signal goes.
    await consultant.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
      timeout: 30_000,
    });

    // Item 1 (girt spacing): measured within the tolerance, passes; a photo from the camera input.
    const first = item(consultant, 0);
    await first.getByRole('textbox', { name: /Measured/ }).fill('1190');
    await first.getByRole('textbox', { name: /Measured/ }).press('Tab');
    await expect
      .poll(() => first.getByTestId('measured-check').textContent())
      .toContain('within the tolerance');
    await answer(first, 'Pass');
    await first.getByLabel('Take a photo').setInputFiles(PHOTO);
    await first.locator('img[src^="/api/inspection-photos/"]').waitFor({ timeout: 30_000 });
    await expect
      .poll(() => item(consultant, 0).locator('[data-state]').first().getAttribute('data-state'))
      .toBe('pass');

    // Item 2 fails: a deficiency opens.
    await answer(item(consultant, 1), 'Fail', 'Clip missing at grid B, second girt up (invented).');
    await consultant.getByRole('link', { name: /^D-1 · / }).waitFor({ timeout: 30_000 });
    await consultant.getByText('Everything sent').waitFor();
    await screenshot(consultant, 'inspection-phone-answered');

    // No signal: two more answers wait on the device.
    await inspector.setOffline(true);
    await consultant.getByText(/Offline — answers are kept/).waitFor();
    await answer(item(consultant, 2), 'Not applicable', 'Seen from the lift (invented).');
    await answer(item(consultant, 3), 'Pass');
    await consultant.getByText('2 waiting to send').waitFor();
    await expect.poll(() => savedMutations(consultant), { timeout: 10_000 }).toBe(2);

    // A reload with no signal: the shell from the service worker, the inspection and the queue from the device.
    await consultant.reload();
    await consultant.getByText('2 waiting to send').waitFor({ timeout: 30_000 });
    expect(await consultant.getByTestId('item-waiting').count()).toBe(2);
    expect(await fitsWidth(consultant)).toBe(true);
    await screenshot(consultant, 'inspection-phone-offline');

    // The signal returns: both are sent, and the server has them.
    await inspector.setOffline(false);
    await consultant.getByText('Everything sent').waitFor({ timeout: 30_000 });
    const stored = await (
      await consultant.request.get(`${suite.baseUrl}/api/inspections/${inspectionId}`)
    ).json();
    expect(stored.items.slice(0, 4).map((i: { state: string }) => i.state)).toEqual([
      'pass',
      'fail',
      'na',
      'pass',
    ]);
    expect(stored.items[0].photos).toHaveLength(1);
    const deficiency = stored.deficiencies[0] as { id: string };

    // The photo was made smaller on the phone (2000 px long edge) and lost its location.
    const photoBytes = await (
      await consultant.request.get(`${suite.baseUrl}${stored.items[0].photos[0].url}`)
    ).body();
    const exifr = (await import('exifr')).default;
    expect(await exifr.gps(photoBytes).catch(() => undefined)).toBeUndefined();
    expect(photoBytes.length).toBeLessThan(readFileSync(PHOTO).length * 4);

    // The subcontractor corrects the deficiency with a photo.
    const crew = await suite.browser.newContext({ viewport: PHONE });
    const sub = await crew.newPage();
    sub.on('pageerror', (e) => problems.push(e.message));
    await signIn(sub, suite.baseUrl, 'subcontractor@skinwright.demo');
    await sub.goto(`${inspectionUrl}/deficiencies/${deficiency.id}`);
    await sub.getByLabel('Photo of the correction').setInputFiles(PHOTO);
    await sub.getByTestId('correction-photo-ready').waitFor();
    await sub.getByLabel(/^Note/).fill('Clip added and fastened (invented).');
    await sub.getByRole('button', { name: 'Mark corrected' }).click();
    await sub.getByTestId('deficiency-state').locator('[data-state="corrected"]').waitFor();
    expect(await fitsWidth(sub)).toBe(true);
    await screenshot(sub, 'deficiency-phone-corrected');

    // The consultant accepts it.
    await consultant.goto(`${inspectionUrl}/deficiencies/${deficiency.id}`);
    await consultant.getByRole('button', { name: 'Accept the correction' }).click();
    await consultant.getByTestId('deficiency-state').locator('[data-state="accepted"]').waitFor();

    // The field report: the scope and items in words, and the photos drawn in it.
    await consultant.goto(inspectionUrl);
    const [download] = await Promise.all([
      consultant.waitForEvent('download'),
      consultant.getByTestId('report-link').click(),
    ]);
    const pdf = readFileSync((await download.path()) as string);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text } = await readPdf(pdf);
    expect(text).toContain('West elevation');
    expect(await imagesInPdf(pdf)).toBeGreaterThanOrEqual(1);

    expect(problems).toEqual([]);
    await crew.close();
    await inspector.close();
  });

  /**
   * The firm's checklist template, edited in the library by a firm editor (the architect) on a desk, read by a
   * firm reader; and the demo inspection's field report added by the subcontractor to a draft submittal on a
   * phone, as a PDF file item.
   */
  it('the firm checklist template is edited and read; a field report joins a draft submittal', async () => {
    const problems: string[] = [];
    const desk = await suite.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const architect = await desk.newPage();
    architect.on('pageerror', (e) => problems.push(e.message));
    await signIn(architect, suite.baseUrl, 'architect@skinwright.demo');
    await architect.goto(`${suite.baseUrl}/library`);
    const checklist = architect.getByRole('form', { name: 'Firm checklist items' });
    await checklist.getByRole('button', { name: 'Add an item' }).click();
    await checklist.getByRole('button', { name: 'Save the template' }).click();
    await checklist.getByText('Name the item.').waitFor();
    await checklist.getByRole('textbox', { name: /^Item 1/ }).fill('Offcuts and swarf cleared (invented)');
    await checklist.getByRole('button', { name: 'Save the template' }).click();
    await checklist.getByText(/Saved as version 1\./).waitFor();
    await screenshot(architect, 'library-checklist-desk');
    await architect.setViewportSize(PHONE);
    expect(await fitsWidth(architect)).toBe(true);
    await checklist.scrollIntoViewIfNeeded();
    await screenshot(architect, 'library-checklist-phone');

    // A firm reader sees the items, with no way to change them.
    const reader = await suite.browser.newContext({ viewport: PHONE });
    const viewer = await reader.newPage();
    await signIn(viewer, suite.baseUrl, 'viewer@skinwright.demo');
    await viewer.goto(`${suite.baseUrl}/library`);
    await viewer.getByText('Offcuts and swarf cleared (invented)').waitFor();
    expect(await viewer.getByRole('button', { name: 'Save the template' }).count()).toBe(0);

    // The subcontractor adds the demo inspection's field report to a new draft submittal.
    const crew = await suite.browser.newContext({ viewport: PHONE });
    const sub = await crew.newPage();
    sub.on('pageerror', (e) => problems.push(e.message));
    await signIn(sub, suite.baseUrl, 'subcontractor@skinwright.demo');
    const projectId = (
      (await (await sub.request.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as {
        id: string;
      }
    ).id;
    const created = await sub.request.post(`${suite.baseUrl}/api/projects/${projectId}/submittals`, {
      data: { title: 'Field report (invented)', specSection: '07 42 13', specTitle: 'Metal Wall Panels' },
    });
    expect(created.status()).toBe(201);
    const submittalId = ((await created.json()) as { id: string }).id;
    await sub.goto(`${suite.baseUrl}/projects/${projectId}/submittals/${submittalId}`);
    const report = sub.getByRole('combobox', { name: /Field report of an inspection/ });
    await report.selectOption({ index: 1 });
    await sub.getByRole('button', { name: 'Add the field report' }).click();
    await sub
      .getByText(/inspection-\d+-[A-Z2-7]{10}\.pdf/)
      .first()
      .waitFor({ timeout: 30_000 });
    expect(await fitsWidth(sub)).toBe(true);
    await screenshot(sub, 'submittal-phone-field-report');
    const stored = await (await sub.request.get(`${suite.baseUrl}/api/submittals/${submittalId}`)).json();
    expect(stored.items.map((i: { kind: string }) => i.kind)).toEqual(['file']);

    expect(problems).toEqual([]);
    await crew.close();
    await reader.close();
    await desk.close();
  });
});
