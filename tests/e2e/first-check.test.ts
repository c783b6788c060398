import { CRITERION_TYPE_KEYS } from '@shared/checks/criteria';
import { describe, expect, it } from 'vitest';
import demoAssembly from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { browserSuite, screenshot, signIn } from '../setup/browser';

/**
 * A firm with no code table yet: the checks page starts one (name, code and edition), and the table's
 * editor opens with one empty row per criterion for the assembly's zone and category, and a way back.
 */
describe('a new firm runs its first check in the browser', () => {
  const suite = browserSuite();

  it('starts a code table from the checks page, fills its empty rows and runs the check', async () => {
    const { page, problems } = await suite.openPage();
    // The other demo firm's administrator: its project has no assembly and the firm no code table.
    await signIn(page, suite.baseUrl, 'outsider@skinwright.demo');
    const api = page.request;
    const project = (
      (await (await api.get(`${suite.baseUrl}/api/projects`)).json()).projects as {
        id: string;
        name: string;
      }[]
    ).find((p) => /Harwick/.test(p.name))!;
    const made = await api.post(`${suite.baseUrl}/api/projects/${project.id}/assemblies`, {
      data: { ...demoAssembly.assembly, name: 'First wall' },
    });
    expect(made.status()).toBe(201);
    const assembly = (await made.json()) as { id: string };
    const checks = `/projects/${project.id}/assemblies/${assembly.id}/checks`;

    await page.goto(`${suite.baseUrl}${checks}`);
    const form = page.getByRole('form', { name: 'Start a code table' });
    await form.waitFor();
    // What each row limits, its direction and its unit, in plain words.
    await page.getByText('The rows a check reads').click();
    await page.getByText(/Maximum U-factor.*at most \(≤\), in W\/\(m²·K\)/).waitFor();
    await screenshot(page, 'first-check-start');
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'first-check-start-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.setViewportSize({ width: 1280, height: 900 });

    await form.getByLabel(/^Table name/).fill('Our adopted code (invented values)');
    await form.getByLabel(/^Code and edition/).fill('Invented edition for the test');
    await form.getByRole('button', { name: 'Start the code table' }).click();
    await page.waitForURL(/\/code-tables\/[^/?]+\?/);
    expect(new URL(page.url()).searchParams.get('back')).toBe(checks);

    // One blank row per criterion type, for the assembly's zone (the project's 4A) — no value filled in.
    const grid = page.getByRole('table', { name: /Rows of version 1/ });
    await grid.waitFor();
    const values = grid.getByLabel(/^Row \d+: value/);
    expect(await values.count()).toBe(CRITERION_TYPE_KEYS.length);
    for (const v of await values.all()) expect(await v.inputValue()).toBe('');
    expect(await grid.getByLabel('Row 1: climate zone').inputValue()).toBe('4A');
    await screenshot(page, 'first-check-outline');
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'first-check-outline-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.setViewportSize({ width: 1280, height: 900 });

    // Saving with blanks names the rows; keep the U-factor row only (invented value) and save.
    await page.getByRole('button', { name: 'Save rows' }).click();
    await page.getByText(`${CRITERION_TYPE_KEYS.length} rows need attention; nothing was saved.`).waitFor();
    for (let i = 1; i < CRITERION_TYPE_KEYS.length; i++)
      await grid
        .getByRole('button', { name: /^Remove row/ })
        .last()
        .click();
    await values.first().fill('0.5');
    await page.getByRole('button', { name: 'Save rows' }).click();
    await page.getByRole('button', { name: 'Save rows' }).and(page.locator('[disabled]')).waitFor();

    await page.getByRole('link', { name: 'Back to the checks' }).click();
    await page.waitForURL((u) => u.pathname === checks);
    await page.getByRole('button', { name: 'Run the checks' }).click();
    await page.waitForURL(/[?&]run=/);
    expect(problems).toEqual([]);
  });
});
