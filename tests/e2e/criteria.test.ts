import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

/**
 * Code tables and the compliance runner in real Chromium: the demo architect enters a maximum U-factor for
 * zone 5A and the demo assembly's wall category, checks the demo assembly against it (pass), tightens the
 * criterion — the used version is frozen, so the edit becomes version 2 — and checks again (fail).
 */
describe('code tables and check runs in the browser', () => {
  const suite = browserSuite();

  async function runOn(page: Page, checksUrl: string, tableLabel: RegExp) {
    await page.goto(checksUrl);
    const select = page.getByLabel('Code table');
    await select.waitFor();
    const option = (await select.locator('option').allTextContents()).find((t) => tableLabel.test(t));
    expect(option, `an option matching ${tableLabel}`).toBeDefined();
    await select.selectOption({ label: option! });
    const before = page.url();
    await page.getByRole('button', { name: 'Run the checks' }).click();
    await page.waitForURL((u) => u.toString() !== before && /[?&]run=/.test(u.toString()));
    // The report of this very run (the page may still show the previous run for a moment).
    const runId = new URL(page.url()).searchParams.get('run')!;
    const article = page.locator(`article[aria-labelledby="run-${runId}"]`);
    await article.getByTestId('verdict-criteria').waitFor();
    return article;
  }

  it('enters a criterion, checks the demo assembly (pass), tightens it and checks again (fail)', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');

    // The demo project and its assembly (steel-framed wall, climate zone 5A).
    const projects = await (await page.request.get(`${suite.baseUrl}/api/projects`)).json();
    const projectId = projects.projects[0].id as string;
    const assemblies = await (
      await page.request.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)
    ).json();
    const assembly = assemblies.assemblies[0] as { id: string; wallCategory: string };
    expect(assembly.wallCategory).toBe('steel_framed');
    const checksUrl = `${suite.baseUrl}/projects/${projectId}/assemblies/${assembly.id}/checks`;

    // A new code table with one row: maximum U-factor, 5A × steel-framed wall.
    await page.getByRole('link', { name: 'Code tables' }).click();
    await page.getByRole('button', { name: 'New code table' }).click();
    await page.getByLabel('Name', { exact: false }).first().fill('Browser test table');
    await page.getByRole('button', { name: 'Create code table' }).click();
    await page.waitForURL(/\/code-tables\/[0-9a-f-]{36}$/);
    const setUrl = page.url();
    await page.getByRole('button', { name: 'Add a row' }).click();
    await page.getByLabel('Row 1: climate zone').selectOption('5A');
    await page.getByLabel('Row 1: wall category').selectOption('steel_framed');
    await page.getByLabel('Row 1: criterion').selectOption('max_u_factor');
    await page.getByLabel(/Row 1: value/).fill('0.35');
    await page.getByRole('button', { name: 'Save rows' }).click();
    await page.getByRole('button', { name: 'Save rows' }).and(page.locator('[disabled]')).waitFor();

    // Check the demo assembly against it: U_eff ≈ 0.307 W/(m²·K) ≤ 0.35 → the code table verdict is pass.
    const passed = await runOn(page, checksUrl, /^Browser test table — version 1/);
    expect(await passed.getByTestId('verdict-criteria').textContent()).toMatch(/Pass/);
    const uRow = passed.locator('tr[data-check="criterion.max_u_factor"]');
    expect(await uRow.getAttribute('data-status')).toBe('pass');
    expect(await uRow.textContent()).toMatch(/meets — margin \d+/);
    await screenshot(page, 'criteria-check-pass');

    // Tighten: version 1 is frozen by the stored run, so saving makes version 2.
    await page.goto(setUrl);
    await page.getByText('Version 1 is frozen', { exact: false }).waitFor();
    await page.getByLabel(/Row 1: value/).fill('0.25');
    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await page.waitForURL(
      (u) => u.toString() !== setUrl && /\/code-tables\/[0-9a-f-]{36}$/.test(u.toString()),
    );
    await page.getByText('Saved as version 2.').waitFor();

    const failed = await runOn(page, checksUrl, /^Browser test table — version 2/);
    expect(await failed.getByTestId('verdict-criteria').textContent()).toMatch(/Fail/);
    const tight = failed.locator('tr[data-check="criterion.max_u_factor"]');
    expect(await tight.getAttribute('data-status')).toBe('fail');
    expect(await tight.textContent()).toMatch(/fails — short by 0\.0\d+\s*W\/\(m²·K\)/);
    await screenshot(page, 'criteria-check-fail');

    // The two versions side by side.
    await page.goto(setUrl);
    await page.getByRole('link', { name: /What changed from version 1/ }).click();
    await page.getByRole('heading', { name: 'Version 1 → version 2' }).waitFor();
    expect(await page.getByRole('table', { name: 'Changed rows' }).textContent()).toMatch(/0\.35.*0\.25/s);
    await screenshot(page, 'criteria-diff');
    expect(problems).toEqual([]);
  });
});
