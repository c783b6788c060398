import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

/** A person's path through the foundation in real Chromium against the real server (built client, fresh PGlite). */
describe('foundation in the browser', () => {
  const suite = browserSuite();

  it('the demo architect signs in, creates a project and sees it listed', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await expect(page.getByRole('link', { name: 'Corvid Lane Cold Store' })).toBeTruthy();
    await page.getByRole('link', { name: 'New project' }).first().click();
    await page.waitForURL(/\/projects\/new/);

    const fill = (label: string, value: string) =>
      page.getByLabel(label, { exact: false }).first().fill(value);
    await fill('Project name', 'Quarry Road Workshop');
    await fill('Site address', '2 Quarry Road (test)');
    await page.getByLabel('Climate zone', { exact: false }).selectOption('6A');
    await fill('Site elevation', '250');
    await fill('Mean roof height', '8');
    await fill('Plan length', '40');
    await fill('Plan width', '20');
    await fill('Indoor design temperature', '20');
    await fill('Indoor design relative humidity', '40');
    await fill('Winter design temperature', '-24');
    await fill('Summer design temperature', '29');
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Quarry Road Workshop' }).first().waitFor();

    await page.goto(`${suite.baseUrl}/projects`);
    await page.getByRole('link', { name: 'Quarry Road Workshop' }).waitFor();
    await screenshot(page, 'foundation-projects-list');
    expect(problems).toEqual([]);
  });

  it('a viewer sees the project but no edit or invite actions', async () => {
    const context = await suite.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, suite.baseUrl, 'viewer@skinwright.demo');
    await page.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Corvid Lane Cold Store' }).first().waitFor();
    expect(await page.getByRole('link', { name: /edit site data/i }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /archive/i }).count()).toBe(0);
    await screenshot(page, 'foundation-viewer-project');
    await context.close();
  });
});
