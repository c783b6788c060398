import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

/**
 * The engineer opens the demo assembly's attachment sheet, reads the maximum girt spacing of zones 4 and 5, raises
 * the design girt spacing beyond it and sees the failure in words.
 */
describe('attachment & wind page in the browser', () => {
  const suite = browserSuite();

  it('shows the schedule per zone and fails a girt spacing beyond the maximum, in words', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'engineer@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByRole('link', { name: 'Attachment & wind' }).click();
    await page.waitForURL(/\/assemblies\/[0-9a-f-]{36}\/attachment$/);

    const zone4 = page.getByTestId('schedule-zone-4');
    const zone5 = page.getByTestId('schedule-zone-5');
    await zone4.waitFor();
    await zone5.waitFor();
    expect(await zone4.textContent()).toContain('Zone 4');
    expect(await zone5.textContent()).toContain('Zone 5');
    const metres = (s: string | null) => Number.parseFloat((s ?? '').replace(/[^\d.]/g, ''));
    const max4 = metres(await page.getByTestId('max-girt-4').locator('span').first().textContent());
    const max5 = metres(await page.getByTestId('max-girt-5').locator('span').first().textContent());
    expect(max4).toBeGreaterThan(0.9);
    expect(max5).toBeGreaterThan(0.9);
    expect(await page.getByTestId('status-zone-4').textContent()).toMatch(/meets/);

    // Raise the design girt spacing past the larger of the two maximums (still inside the table's spans).
    const beyond = (Math.max(max4, max5) + 0.3).toFixed(2);
    const girt = page.getByLabel('Design girt spacing', { exact: false });
    await girt.fill(beyond);
    await girt.blur();
    await expect
      .poll(() => page.getByTestId('status-zone-4').textContent(), { timeout: 10_000 })
      .toMatch(/exceeds/);
    const status4 = await page.getByTestId('status-zone-4').textContent();
    expect(status4).toMatch(
      new RegExp(`girt spacing ${beyond}0\\s*m is more than the ${max4.toFixed(3)}\\s*m allowed`),
    );
    expect(await page.getByTestId('status-zone-5').textContent()).toMatch(/exceeds/);
    expect(await page.locator('body').textContent()).not.toContain('NaN');
    await page.getByTestId('schedule-zone-4').scrollIntoViewIfNeeded();
    await screenshot(page, 'wind-attachment');
    expect(problems).toEqual([]);
  });

  it('takes a clip from the firm library with its source, and keeps the data sheet in the library', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'engineer@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByRole('link', { name: 'Attachment & wind' }).click();
    await page.getByTestId('schedule-zone-4').waitFor();

    const pickers = page.getByLabel(/Take from Okonkwo & Brandt Structural \(demo\)’s library/);
    await expect.poll(() => pickers.count()).toBe(2);
    await pickers.nth(1).selectOption({ label: 'Demo heavy clip, rated (invented)' });
    await expect
      .poll(() => page.getByLabel('Source of the clip capacity').inputValue())
      .toBe('Demo data sheet HC-1 (invented for the Skinwright demo)');
    expect(await page.getByLabel('Allowable load per clip').inputValue()).toBe('3200');
    expect(await page.locator('body').textContent()).not.toContain('NaN');

    await page.goto(`${suite.baseUrl}/library`);
    const section = page.locator('section', {
      has: page.getByRole('heading', { name: /Panel tables and clips/ }),
    });
    await section.getByText('Demo 80 mm insulated panel, 600 mm module (invented)').waitFor();
    await section.getByLabel('Data sheet file for Demo heavy clip, rated (invented)').setInputFiles({
      name: 'HC-1.pdf',
      mimeType: 'application/pdf',
      buffer: Buffer.from('%PDF-1.4\n%%EOF\n'),
    });
    await section.getByRole('link', { name: 'HC-1.pdf' }).waitFor();
    await section.scrollIntoViewIfNeeded();
    await screenshot(page, 'library-attachment-products');
    expect(problems).toEqual([]);
  });

  it('saves the engineer’s wind data although the consultant saved the climate meanwhile', async () => {
    const problems: string[] = [];
    const { page: engineer } = await suite.openPage({ problems });
    const { page: consultant } = await suite.openPage({ problems });
    await signIn(engineer, suite.baseUrl, 'engineer@skinwright.demo');
    await signIn(consultant, suite.baseUrl, 'consultant@skinwright.demo');

    // Both open their part of the same project version.
    await engineer.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
    await engineer.getByRole('link', { name: 'Wind', exact: true }).click();
    await engineer.getByRole('button', { name: /the wind data/ }).click();
    await consultant.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
    await consultant.getByRole('link', { name: 'Climate', exact: true }).click();
    await consultant.getByRole('button', { name: /the climate/ }).click();

    // The consultant saves first; the engineer, still on the version read before, saves the wind data.
    await consultant.getByLabel(/^Source/).fill('Station C, 1991–2020 (demo)');
    await consultant.getByRole('button', { name: 'Save the climate' }).click();
    await consultant.getByText('Station C, 1991–2020 (demo)').waitFor();
    const speed = engineer.getByLabel(/^Basic wind speed V/);
    await speed.fill('52');
    await speed.blur();
    await engineer.getByRole('button', { name: 'Save wind data' }).click();
    await engineer.getByRole('button', { name: /Edit the wind data/ }).waitFor();
    expect(await engineer.getByText('Someone else saved the wind data first.').count()).toBe(0);

    // Both saves stand.
    await engineer.goto(`${engineer.url().replace(/\/wind.*$/, '')}/climate`);
    await engineer.getByText('Station C, 1991–2020 (demo)').waitFor();
    expect(problems).toEqual([]);
  });
});
