import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

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

  it('duplicates the demo assembly from its page into a project the person edits, and opens the copy', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'engineer@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByRole('button', { name: 'Duplicate…' }).click();
    const form = page.getByRole('form', { name: 'Duplicate this assembly' });
    const picker = form.getByLabel('Into project');
    expect(await picker.locator('option').allTextContents()).toContain('Corvid Lane Cold Store');
    await form.getByLabel(/Name of the copy/).fill('North wall, option B');
    await screenshot(page, 'assembly-duplicate');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    await form.screenshot({ path: 'tests/artifacts/assembly-duplicate-390.png' });
    await page.setViewportSize({ width: 1280, height: 900 });
    const before = page.url();
    await form.getByRole('button', { name: 'Make the copy' }).click();
    await page.waitForURL(
      (u) => u.toString() !== before && /\/assemblies\/[0-9a-f-]{36}$/.test(u.toString()),
    );
    await page
      .getByText(/copied from Corvid Lane Cold Store rev \d+/)
      .first()
      .waitFor();
    expect(await page.getByRole('textbox', { name: /^Name/ }).first().inputValue()).toBe(
      'North wall, option B',
    );
    expect(problems).toEqual([]);
  });

  it('duplicates the demo project from its overview, the person its only member', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await page.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
    await page.getByRole('button', { name: 'Duplicate…' }).click();
    const form = page.getByRole('form', { name: 'Duplicate this project' });
    await form.getByLabel(/Name of the copy/).fill('Corvid Lane Cold Store, phase 2');
    await form.getByLabel('Project number').fill('LA-2612');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    await form.screenshot({ path: 'tests/artifacts/project-duplicate-390.png' });
    await page.setViewportSize({ width: 1280, height: 900 });
    await screenshot(page, 'project-duplicate');
    const before = page.url();
    await form.getByRole('button', { name: 'Make the copy' }).click();
    await page.waitForURL((u) => u.toString() !== before && /\/projects\/[0-9a-f-]{36}$/.test(u.toString()));
    await page.getByRole('heading', { name: 'Corvid Lane Cold Store, phase 2' }).waitFor();
    await page.getByRole('link', { name: 'People' }).click();
    await page.getByText('Marguerite Oyelaran').first().waitFor();
    expect(await page.getByText('Ngozi Okonkwo').count()).toBe(0);
    expect(problems).toEqual([]);
  });
});
