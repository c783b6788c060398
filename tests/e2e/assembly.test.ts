import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium, openDemoAssembly, screenshot, signIn, startTestServer } from '../setup/browser';

/** The architect opens the demo assembly, halves the clip spacing, and sees the effective R drop live. */
describe('assembly builder in the browser', () => {
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let browser: Browser;
  beforeAll(async () => {
    server = await startTestServer();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('effective R changes when the clip spacing changes', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
    const problems: string[] = [];
    page.on('pageerror', (e) => problems.push(e.message));
    await signIn(page, server.baseUrl, 'architect@skinwright.demo');
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
