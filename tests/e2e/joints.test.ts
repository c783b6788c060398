import { readFile } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, openPage, screenshot, signIn } from '../setup/browser';

/** Open the demo assembly's "Joints & quantities" sheet from the project list, as a person would. */
async function openJointsPage(page: Page) {
  await openDemoAssembly(page);
  await page.getByRole('link', { name: 'Joints & quantities' }).click();
  await page.waitForURL(/\/assemblies\/[0-9a-f-]{36}\/joints$/);
  await page.getByRole('heading', { name: 'Joints & quantities' }).waitFor();
}

/** The joint schedule and the takeoff in real Chromium against the real server (built client, fresh PGlite). */
describe('joints & quantities in the browser', () => {
  const suite = browserSuite();

  it('the subcontractor reads the schedule and the takeoff and downloads the CSV', async () => {
    const context = await suite.browser.newContext({
      viewport: { width: 1280, height: 1000 },
      acceptDownloads: true,
    });
    const { page, problems } = await openPage(context);
    await signIn(page, suite.baseUrl, 'subcontractor@skinwright.demo');
    await openJointsPage(page);

    const schedule = page.getByRole('table', { name: /Joint schedule/ });
    await schedule.waitFor();
    const vj1 = schedule.locator('tr[data-joint="0"]');
    await expect.poll(() => vj1.textContent()).toContain('meets — margin 46 %');
    expect(await schedule.locator('[data-verdict]').count()).toBe(3);
    await page.getByRole('table', { name: /Sealant packages/ }).waitFor();
    expect(
      Number((await page.getByTestId('cartridges-us').textContent())?.replace(/,/g, '')),
    ).toBeGreaterThan(0);
    // Read-only: no editor, no save.
    expect(await page.getByRole('button', { name: 'Add a joint' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /Save as revision/ }).count()).toBe(0);
    expect(await page.getByText(/read-only/).count()).toBeGreaterThan(0);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the takeoff (CSV)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^metal-rainscreen-on-clips-and-girts.*-takeoff\.csv$/);
    const file = await download.path();
    const csv = await readFile(file, 'utf8');
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('Item,Quantity,Unit,Formula,Source,Note');
    expect(
      lines.some(
        (l) => l.startsWith('Cartridges, 10.1 US fl oz') || l.startsWith('"Cartridges, 10.1 US fl oz"'),
      ),
    ).toBe(true);
    expect(csv).not.toContain('NaN');

    await screenshot(page, 'joints-subcontractor');
    expect(problems).toEqual([]);
    await context.close();
  });

  it('the architect narrows a joint below its required width and sees "short by", then saves a revision', async () => {
    const context = await suite.browser.newContext({ viewport: { width: 1280, height: 1000 } });
    const { page, problems } = await openPage(context);
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openJointsPage(page);

    const live = page.getByTestId('joint-live');
    await expect.poll(() => live.textContent()).toContain('meets — margin 46 %');
    const width = page.getByLabel('Design width', { exact: false }).first();
    await width.fill('10');
    await expect.poll(() => live.textContent()).toContain('short by 3.7 mm');
    const row = page.getByRole('table', { name: /Joint schedule/ }).locator('tr[data-joint="0"]');
    await expect.poll(() => row.textContent()).toContain('short by 3.7 mm');
    expect(await row.locator('[data-verdict="fail"]').count()).toBe(1);

    // An impossible value is named next to its box, never shown as NaN.
    await width.fill('narrow');
    await page.getByText('“narrow” is not one').first().waitFor();
    expect(await page.locator('body').textContent()).not.toContain('NaN');
    await width.fill('10');

    await page.getByLabel('Revision note').fill('VJ-1 narrowed to test the schedule');
    await page.getByRole('button', { name: 'Save as revision 2' }).click();
    await page.getByText('Saved as revision 2.').waitFor();
    await page.reload();
    await page.getByTestId('joint-live').waitFor();
    await expect.poll(() => page.getByTestId('joint-live').textContent()).toContain('short by 3.7 mm');

    await screenshot(page, 'joints-architect-short');
    expect(problems).toEqual([]);
    await context.close();
  });
});
