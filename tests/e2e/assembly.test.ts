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
});
