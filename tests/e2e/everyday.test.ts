import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

const fitsWidth = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

/** Everyday use in real Chromium: the ways from one page to the next that a person expects to find. */
describe('everyday use in the browser', () => {
  const suite = browserSuite();

  it('a run on the checks page opens its compliance sheet and downloads the PDF in the person’s units', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    const api = page.request;
    const projectId = (
      (await (await api.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as { id: string }
    ).id;
    const assembly = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)).json())
      .assemblies[0] as { id: string; wallCategory: string };
    const orgId = (await (await api.get(`${suite.baseUrl}/api/me`)).json()).organisations[0].id as string;
    const made = await api.post(`${suite.baseUrl}/api/organisations/${orgId}/criteria-sets`, {
      data: {
        name: 'Sheet link table (invented value)',
        rows: [
          {
            climateZone: '*',
            wallCategory: assembly.wallCategory,
            criterion: 'max_u_factor',
            value: 0.5,
            note: 'invented',
          },
        ],
      },
    });
    expect(made.status()).toBe(201);
    // The person works in inch-pound units: the PDF comes in them.
    expect((await api.put(`${suite.baseUrl}/api/me/preferences`, { data: { unitSystem: 'IP' } })).ok()).toBe(
      true,
    );

    await page.goto(`${suite.baseUrl}/projects/${projectId}/assemblies/${assembly.id}/checks`);
    const select = page.getByLabel('Code table');
    await select.waitFor();
    const option = (await select.locator('option').allTextContents()).find((t) =>
      /^Sheet link table/.test(t),
    );
    await select.selectOption({ label: option! });
    await page.getByRole('button', { name: 'Run the checks' }).click();
    await page.waitForURL(/[?&]run=/);
    const runId = new URL(page.url()).searchParams.get('run')!;
    const current = page.getByText('Compliance sheet of this run:').locator('..');
    const pdf = current.getByRole('link', { name: 'Download PDF' });
    expect(await pdf.getAttribute('href')).toBe(
      `/api/check-runs/${runId}/sheet.pdf?units=IP&disposition=attachment`,
    );
    const [download] = await Promise.all([page.waitForEvent('download'), pdf.click()]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    const bytes = await (await api.get(`${suite.baseUrl}${await pdf.getAttribute('href')}`)).body();
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');

    // The past runs list each run's sheet too.
    const past = page.getByRole('table', { name: /Past runs/ });
    await past
      .getByRole('link', { name: /Download PDF/ })
      .first()
      .waitFor();
    await screenshot(page, 'checks-sheet-links');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    await screenshot(page, 'checks-sheet-links-390');
    await page.setViewportSize({ width: 1280, height: 900 });

    await current.getByRole('link', { name: 'Open the sheet' }).click();
    await page.waitForURL(new RegExp(`/projects/${projectId}/check-runs/${runId}/sheet$`));
    await page.getByRole('heading', { name: 'Compliance sheet' }).waitFor();
    expect(problems).toEqual([]);
  });

  it('a signed-out page logs no failed request to the console', async () => {
    const { page, problems } = await suite.openPage();
    const logged: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') logged.push(m.text());
    });
    await page.goto(`${suite.baseUrl}/sign-in`);
    await page.getByRole('button', { name: /sign in/i }).waitFor();
    await page.goto(`${suite.baseUrl}/projects`);
    await page.waitForURL(/\/sign-in/);
    await page.getByRole('button', { name: /sign in/i }).waitFor();
    expect(logged).toEqual([]);
    expect(problems).toEqual([]);
  });
});
