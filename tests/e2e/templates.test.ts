import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

const fitsWidth = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

/** New assembly from a template, in real Chromium: the demo project's insulated panel wall and the templates. */
describe('assembly templates in the browser', () => {
  const suite = browserSuite();

  it('the demo project lists the insulated panel wall; a template creates an assembly in the category chosen', async () => {
    const { page, problems } = await suite.openPage();
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    const projectId = (
      (await (await page.request.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as { id: string }
    ).id;
    const base = `${suite.baseUrl}/projects/${projectId}/assemblies`;
    await page.goto(base);
    await page
      .getByRole('link', { name: /insulated metal panel on girts/i })
      .first()
      .waitFor();

    await page.goto(`${base}/new?start=steel-stud`);
    await page.getByRole('heading', { name: 'Steel-stud backup with exterior insulation' }).waitFor();
    await page.getByText(/generic design values \(ISO 10456 \/ ASHRAE Fundamentals\)/).waitFor();
    await page.getByTestId('result-Reff').waitFor();
    const category = page.getByLabel('Wall category');
    expect(await category.inputValue()).toBe('steel_framed');
    await page.getByRole('link', { name: 'Insulated metal panel on girts' }).click();
    await page.waitForURL(/start=insulated-panel/);
    await page.getByRole('heading', { name: 'Insulated metal panel on girts', level: 2 }).waitFor();
    await expect.poll(() => category.inputValue()).toBe('metal_building');
    await screenshot(page, 'new-assembly-template');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    await screenshot(page, 'new-assembly-template-390');
    await page.setViewportSize({ width: 1280, height: 900 });

    // The person changes the preselected category, then creates the assembly.
    await category.selectOption('other');
    await page.getByLabel('Name').fill('Dock wall from the panel template');
    await page.getByRole('button', { name: 'Create assembly' }).click();
    await page.waitForURL(/\/assemblies\/[0-9a-f-]{36}$/);
    const assemblyId = page.url().split('/').pop()!;
    const saved = await (await page.request.get(`${suite.baseUrl}/api/assemblies/${assemblyId}`)).json();
    expect(saved.wallCategory).toBe('other');
    expect(saved.current.input.thermal.bridges).toHaveLength(2);
    expect(saved.current.input.joints).toHaveLength(2);

    // Blank: no category until the person picks one.
    await page.goto(`${base}/new?start=blank`);
    await page.getByText(/Starting blank: choose the wall category/).waitFor();
    await expect.poll(() => category.inputValue()).toBe('');
    expect(problems).toEqual([]);
  });
});
