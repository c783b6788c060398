import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ARTIFACTS, browserSuite, openDemoAssembly, signIn } from '../setup/browser';

const fitsWidth = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
const rows = (page: Page, table: RegExp) =>
  page.getByRole('table', { name: table }).locator('tbody tr').count();

/** Finding projects and assemblies (the query kept in the address), and printing a page, in real Chromium. */
describe('lists and printing in the browser', () => {
  const suite = browserSuite();

  it('filters projects and assemblies; the address keeps the query through back and forward', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    const search = page.getByRole('search', { name: 'Find projects' }).getByLabel('Search');
    await search.fill('no such project');
    await page.getByText('No project matches the search.').waitFor();
    await search.fill('la-2611');
    await expect.poll(() => rows(page, /Current projects/)).toBe(1);
    await page.getByLabel('Climate zone').selectOption('5A');
    await page.waitForURL(/[?&]zone=5A/);
    expect(new URL(page.url()).searchParams.get('q')).toBe('la-2611');
    await page.getByRole('status').filter({ hasText: '1 of 1 projects match.' }).waitFor();

    await page.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
    await page.goBack();
    await expect.poll(() => search.inputValue()).toBe('la-2611');
    expect(await page.getByLabel('Climate zone').inputValue()).toBe('5A');

    // The assemblies tab: the last check's verdict is shown, and filtered on.
    const projectId = new URL(
      (await page.getByRole('link', { name: 'Corvid Lane Cold Store' }).getAttribute('href'))!,
      suite.baseUrl,
    ).pathname.split('/')[2];
    const api = page.request;
    const assemblies = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)).json())
      .assemblies as { id: string; name: string; wallCategory: string }[];
    const orgId = (await (await api.get(`${suite.baseUrl}/api/me`)).json()).organisations[0].id as string;
    const set = await api.post(`${suite.baseUrl}/api/organisations/${orgId}/criteria-sets`, {
      data: {
        name: 'List filter table (invented value)',
        rows: [
          {
            climateZone: '*',
            wallCategory: assemblies[0]!.wallCategory,
            criterion: 'max_u_factor',
            value: 0.5,
            note: 'invented',
          },
        ],
      },
    });
    expect(set.status()).toBe(201);
    const run = await api.post(`${suite.baseUrl}/api/assemblies/${assemblies[0]!.id}/check-runs`, {
      data: { criteriaSetId: (await set.json()).id },
    });
    expect(run.status()).toBe(201);
    const verdict = (await run.json()).verdict as 'pass' | 'fail' | 'incomplete';
    const word = { pass: 'Pass', fail: 'Fail', incomplete: 'Incomplete' }[verdict];

    await page.goto(`${suite.baseUrl}/projects/${projectId}/assemblies`);
    const table = /Assemblies of this project/;
    await page.getByRole('table', { name: table }).waitFor();
    const first = page.getByRole('row', { name: new RegExp(assemblies[0]!.name.slice(0, 30)) }).first();
    expect(await first.textContent()).toContain(word);
    const lastCheck = page.getByRole('search', { name: 'Find assemblies' }).getByLabel('Last check');
    await lastCheck.selectOption(verdict);
    await page.waitForURL(new RegExp(`[?&]verdict=${verdict}`));
    await expect.poll(() => rows(page, table)).toBe(1);
    await lastCheck.selectOption('none');
    await page.waitForURL(/[?&]verdict=none/);
    await expect.poll(() => rows(page, table).catch(() => 0)).toBe(assemblies.length - 1);
    await page.goBack();
    await expect.poll(() => lastCheck.inputValue()).toBe(verdict);
    await page.getByRole('search', { name: 'Find assemblies' }).getByLabel('Search').fill('zzzz');
    await page.getByText('No assembly matches the search.').waitFor();
    await page.getByRole('button', { name: 'Show all' }).click();
    await expect.poll(() => rows(page, table)).toBe(assemblies.length);
    await shot(page, 'assemblies-filter');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    await shot(page, 'assemblies-filter-390');
    expect(problems).toEqual([]);
  });

  it('prints a sheet without the navigation, buttons, save bar and input chrome', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    expect(await page.getByRole('navigation', { name: 'Assembly pages' }).isVisible()).toBe(true);

    await page.emulateMedia({ media: 'print' });
    await shot(page, 'print-build-up');
    expect(await page.locator('body > div header').first().isVisible()).toBe(false);
    expect(await page.getByRole('navigation', { name: 'Assembly pages' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Undo', exact: true }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: /Save as revision/ }).isVisible()).toBe(false);
    expect(await page.locator('footer').isVisible()).toBe(false);
    // The content prints: the sheet's title, its sections and the values typed in, as plain values.
    expect(
      await page
        .getByRole('heading', { name: /Metal rainscreen/ })
        .first()
        .isVisible(),
    ).toBe(true);
    expect(await page.getByRole('heading', { name: 'Build-up' }).isVisible()).toBe(true);
    const name = page.locator('input[name="name"]');
    expect(await name.isVisible()).toBe(true);
    const style = await name.evaluate((el) => {
      const s = getComputedStyle(el);
      return { border: s.borderTopWidth, background: s.backgroundColor, color: s.color };
    });
    expect(style).toEqual({ border: '0px', background: 'rgba(0, 0, 0, 0)', color: 'rgb(0, 0, 0)' });
    // Tables do not scroll on paper.
    const overflow = await page
      .locator('.overflow-x-auto')
      .first()
      .evaluate((el) => getComputedStyle(el).overflowX);
    expect(overflow).toBe('visible');

    // The projects list prints its table without the search and the menu.
    await page.emulateMedia({ media: 'screen' });
    await page.goto(`${suite.baseUrl}/projects`);
    await page.getByRole('table', { name: /Current projects/ }).waitFor();
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('search', { name: 'Find projects' }).isVisible()).toBe(false);
    expect(await page.getByRole('link', { name: 'New project' }).isVisible()).toBe(false);
    expect(await page.getByRole('table', { name: /Current projects/ }).isVisible()).toBe(true);
    await shot(page, 'print-projects');
    expect(problems).toEqual([]);
  });
});
