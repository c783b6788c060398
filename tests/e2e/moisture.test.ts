import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

/**
 * The envelope consultant opens the demo assembly's moisture sheet: no condensation with the polyethylene
 * vapour retarder; with its vapour resistance taken away (μ = 1) the sheet predicts condensation live.
 */
describe('moisture sheet in the browser', () => {
  const suite = browserSuite();

  it('shows no condensation for the demo wall, and condensation once the film is taken out', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'consultant@skinwright.demo');
    await openDemoAssembly(page);
    await page
      .getByRole('navigation', { name: 'Assembly pages' })
      .getByRole('link', { name: 'Moisture' })
      .click();
    await page.waitForURL(/\/assemblies\/[0-9a-f-]{36}\/moisture$/);

    const inside = page.getByTestId('verdict-interstitial');
    await inside.waitFor();
    expect(await inside.textContent()).toMatch(/No interstitial condensation in any month/);
    expect(await page.getByTestId('moisture-verdict').textContent()).toMatch(/^✓/);
    await screenshot(page, 'moisture-demo');

    const film = page.getByLabel('μ of layer 7 (Polyethylene film)');
    expect(await film.inputValue()).toBe('100000');
    await film.fill('1');
    await expect
      .poll(() => inside.textContent(), { timeout: 10_000 })
      .toMatch(/Condenses between Water-resistive barrier and Mineral wool board from November/);
    expect(await inside.textContent()).toMatch(/dries out by the end of April/);
    expect(await page.getByTestId('moisture-verdict').textContent()).toMatch(/^▲/);
    expect(await page.getByTestId('condensation-plane').count()).toBeGreaterThan(0);
    expect(await page.locator('body').textContent()).not.toContain('NaN');
    await screenshot(page, 'moisture-film-removed');
    expect(problems).toEqual([]);
  });
});
