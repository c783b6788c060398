import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ARTIFACTS, browserSuite, openDemoAssembly, signIn } from '../setup/browser';

const layerCount = (page: Page) =>
  page.getByRole('list', { name: 'Layers, outside to inside' }).locator(':scope > li').count();

/** Undo and redo on an assembly sheet, and the question before leaving it with edits, in real Chromium. */
describe('editing an assembly sheet in the browser', () => {
  const suite = browserSuite();

  it('a removed layer comes back with Undo, goes again with Redo, and the keys do the same', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 1280, height: 1000 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    const undo = page.getByRole('button', { name: 'Undo', exact: true });
    const redo = page.getByRole('button', { name: 'Redo', exact: true });
    expect(await undo.isDisabled()).toBe(true);
    expect(await undo.getAttribute('aria-keyshortcuts')).toContain('Control+Z');
    expect(await page.getByText('No changes to save.').count()).toBe(1);

    const before = await layerCount(page);
    const first = page
      .getByRole('list', { name: 'Layers, outside to inside' })
      .locator(':scope > li')
      .first();
    const name = (await first.getAttribute('aria-label'))?.replace(/^Layer 1: /, '') ?? '';
    await first.getByRole('button', { name: `Remove ${name}` }).click();
    expect(await layerCount(page)).toBe(before - 1);
    const status = page.getByRole('status').filter({ hasText: `Removed ${name} —` });
    await status.waitFor();
    await status.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(ARTIFACTS, 'editing-removed-undo.png') });

    await status.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => layerCount(page)).toBe(before);
    expect(await page.getByText('No changes to save.').count()).toBe(1);
    await redo.click();
    await expect.poll(() => layerCount(page)).toBe(before - 1);

    // Ctrl+Z outside a text box steps back; inside one it is left to the box.
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(() => layerCount(page)).toBe(before);
    await page.keyboard.press('Control+Shift+Z');
    await expect.poll(() => layerCount(page)).toBe(before - 1);
    await page.keyboard.press('Control+z');
    await expect.poll(() => layerCount(page)).toBe(before);

    const assemblyName = page.locator('input[name="name"]');
    await assemblyName.fill('Renamed for the test');
    await assemblyName.press('Control+z');
    expect(await layerCount(page)).toBe(before);
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(() => assemblyName.inputValue()).not.toBe('Renamed for the test');
    expect(problems).toEqual([]);
  });

  it('leaving with unsaved edits asks in a dialog in view, at 390 px too', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 390, height: 800 } });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    await page.locator('input[name="name"]').fill('Edited, not saved');
    await page.getByRole('link', { name: 'Moisture', exact: false }).first().click();

    const dialog = page.getByRole('dialog', { name: 'This assembly has edits that are not saved.' });
    await dialog.waitFor();
    expect(await dialog.isVisible()).toBe(true);
    const box = await dialog.boundingBox();
    expect(box && box.y >= 0 && box.y + box.height <= 800).toBe(true);
    await page.screenshot({ path: path.join(ARTIFACTS, 'editing-unsaved-dialog-390.png') });
    await dialog.getByRole('button', { name: 'Stay and keep editing' }).click();
    await dialog.waitFor({ state: 'hidden' });
    expect(await page.locator('input[name="name"]').inputValue()).toBe('Edited, not saved');

    await page.getByRole('link', { name: 'Moisture', exact: false }).first().click();
    await dialog.getByRole('button', { name: 'Leave without saving' }).click();
    await page.waitForURL(/\/moisture$/);
    expect(problems).toEqual([]);
  });
});
