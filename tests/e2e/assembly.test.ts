import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

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
});
