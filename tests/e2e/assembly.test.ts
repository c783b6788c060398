import { describe, expect, it } from 'vitest';
import { ARTIFACTS, browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

/** The architect opens the demo assembly, halves the clip spacing, and sees the effective R drop live. */
describe('assembly builder in the browser', () => {
  const suite = browserSuite();

  it('effective R changes when the clip spacing changes', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    const live = page.getByTestId('live-Reff');
    await live.waitFor();
    const before = await live.textContent();
    const clips = page
      .getByRole('group', { name: /Bridge 1/ })
      .or(page.getByLabel(/Bridge 1/))
      .first();
    const spacing = clips.getByLabel('Horizontal spacing');
    await spacing.fill('400');
    await spacing.blur();
    await expect.poll(() => live.textContent(), { timeout: 10_000 }).not.toBe(before);
    const after = await live.textContent();
    const number = (s: string | null) => Number.parseFloat((s ?? '').replace(/[^\d.]/g, ''));
    expect(number(after)).toBeLessThan(number(before));
    await screenshot(page, 'assembly-builder');
    expect(problems).toEqual([]);
  });

  it('a layer thickness typed in inches is converted to mm and the conversion shown (390 px)', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 390, height: 900 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    const live = page.getByTestId('live-Reff');
    await live.waitFor();
    const before = await live.textContent();
    const thickness = page
      .getByRole('listitem', { name: /Mineral wool board/ })
      .getByRole('textbox', { name: /^Thickness d\b.*in mm$/ });
    // 1 in = 25.4 mm exactly (NIST SP 811 (2008) B.8): 3.5 in = 88.9 mm.
    await thickness.fill('3.5 in');
    await thickness.press('Enter');
    await expect.poll(() => thickness.inputValue()).toBe('88.9');
    const note = page.getByText('3.5 in → 88.9 mm');
    expect(await note.isVisible()).toBe(true);
    expect(await thickness.getAttribute('aria-describedby')).toContain(await note.getAttribute('id'));
    await expect.poll(() => live.textContent(), { timeout: 10_000 }).not.toBe(before);
    await screenshot(page, 'assembly-thickness-in-inches');

    await thickness.fill('3.5 kg');
    await thickness.blur();
    expect(await page.getByText('“3.5 kg” is a mass; this box takes a length (mm)').isVisible()).toBe(true);
    expect(await thickness.getAttribute('aria-invalid')).toBe('true');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    expect(await page.evaluate(() => document.body.textContent?.includes('NaN'))).toBe(false);
    expect(problems).toEqual([]);
  });

  it('Solve ψ of the demo girt: a temperature map, then Use this value stores ψ with its source (390 px)', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 390, height: 900 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    const girt = page.getByRole('listitem', { name: /Horizontal girts/ });
    const psi = girt.getByRole('textbox', { name: /^ψ per length/ });
    const before = await psi.inputValue();
    await girt.getByRole('button', { name: /^Solve ψ/ }).click();
    const dialog = page.getByRole('dialog', { name: /Solve ψ/ });
    await dialog.getByRole('button', { name: 'Solve', exact: true }).click();
    await dialog.getByTestId('temperature-map').waitFor({ timeout: 30_000 });
    expect(await dialog.getByTestId('coldest-point').count()).toBe(1);
    expect(await dialog.getByTestId('isotherms').locator('path').count()).toBe(9);
    expect(await dialog.getByTestId('detail-section').isVisible()).toBe(true);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    // The modal sits in the top layer, over the viewport: shot as seen, not as a full page.
    await page.screenshot({ path: `${ARTIFACTS}/assembly-solve-girt-390.png` });
    await page.setViewportSize({ width: 1280, height: 1000 });
    await page.screenshot({ path: `${ARTIFACTS}/assembly-solve-girt-1280.png` });
    await dialog.getByRole('button', { name: 'Use this value' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);
    await expect.poll(() => psi.inputValue()).not.toBe(before);
    expect(
      await girt.getByText(/computed by Skinwright .*, mesh [\d,]+ cells, \d{4}-\d{2}-\d{2}/).count(),
    ).toBe(1);
    expect(problems).toEqual([]);
  });

  it('Solve χ of the demo clip (3-D): map and drawing, saved to the firm library, value applied (1280 px)', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    const clip = page.getByRole('listitem', { name: /Thermally broken clips/ });
    const chi = clip.getByRole('textbox', { name: /^χ per clip/ });
    const before = await chi.inputValue();
    await clip.getByRole('button', { name: /^Solve χ/ }).click();
    const dialog = page.getByRole('dialog', { name: /Solve χ/ });
    await dialog.getByTestId('detail-section').waitFor({ timeout: 15_000 });
    await dialog.getByRole('button', { name: 'Solve', exact: true }).click();
    await dialog.getByTestId('temperature-map').waitFor({ timeout: 90_000 });
    expect(await dialog.getByTestId('coldest-point').count()).toBe(1);
    expect(await dialog.getByTestId('surface-frsi').textContent()).toMatch(/^0\.\d{3} /);
    // The architect is an editor of the demo firm: the value goes to its library with its detail.
    await dialog.getByLabel('Name in the library').fill('Demo clip, computed');
    await dialog.getByRole('button', { name: /^Save to .* library$/ }).click();
    await dialog.getByText(/^✓ Saved to .* library$/).waitFor({ timeout: 15_000 });
    await page.screenshot({ path: `${ARTIFACTS}/assembly-solve-clip-1280.png` });
    await page.setViewportSize({ width: 390, height: 900 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: `${ARTIFACTS}/assembly-solve-clip-390.png` });
    await dialog.getByRole('button', { name: 'Use this value' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);
    await expect.poll(() => chi.inputValue()).not.toBe(before);
    // The row names the source, and the entry just saved is the library value it is taken from.
    const source = clip.locator('p').filter({ hasText: /computed by Skinwright .*, mesh [\d,]+ cells/ });
    expect(await source.isVisible()).toBe(true);
    expect(await clip.getByRole('option', { name: /Demo clip, computed/, selected: true }).count()).toBe(1);
    expect(problems).toEqual([]);
  }, 180_000);
});
