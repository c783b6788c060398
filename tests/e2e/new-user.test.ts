import { readFileSync } from 'node:fs';
import type { CriterionType } from '@shared/checks/criteria';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot } from '../setup/browser';
import { readPdf } from '../setup/pdf';

/**
 * The first hour of a new user, in real Chromium, only through the links and buttons the screens offer (the
 * one address typed is the start page; the other is the link in the confirmation e-mail): sign up, confirm,
 * name the firm, create a project, an assembly from a template, a code table started from the checks page
 * and filled in, run the checks and download the compliance sheet.
 */
describe('a new user from sign-up to the compliance sheet', () => {
  const suite = browserSuite();

  /** Invented demo values a firm might type (SI, the new account's units) — no jurisdiction's values. */
  const ROW_VALUES: Record<CriterionType, string> = {
    max_u_factor: '0.6',
    min_effective_r: '1.6',
    min_continuous_insulation_r: '1.2',
    min_cavity_insulation_r: '0.5',
    max_condensation_accumulation: '0.5',
    must_dry_within_year: 'yes',
    max_surface_rh: '80',
    min_deflection_limit: '120',
    min_sealant_movement_class: '25',
  };

  /** The newest captured e-mail to `to` with `subject` in its subject, read as the site administrator. */
  async function confirmationLink(to: string) {
    const admin = await suite.browser.newContext();
    try {
      const signedIn = await admin.request.post(`${suite.baseUrl}/api/auth/sign-in/email`, {
        data: { email: 'admin@skinwright.demo', password: 'skinwright-demo' },
        headers: { origin: suite.baseUrl },
      });
      expect(signedIn.status()).toBe(200);
      for (let tries = 0; tries < 100; tries++) {
        const { messages } = (await (await admin.request.get(`${suite.baseUrl}/api/admin/mail`)).json()) as {
          messages: { to: string; subject: string; text: string }[];
        };
        const found = messages.find((m) => m.to.includes(to) && m.subject.includes('Confirm your address'));
        if (found) return found.text.match(/https?:\/\/\S+/)![0];
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
      throw new Error(`no confirmation e-mail to ${to}`);
    } finally {
      await admin.close();
    }
  }

  const fitsWidth = (page: Page) =>
    page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

  it('signs up, creates a project and an assembly from a template, starts a code table, runs the checks and downloads the PDF', async () => {
    const { page, problems } = await suite.openPage();
    const email = 'ines.halvorsen@example.com';

    // Sign up from the start page's link; the e-mailed link confirms the address and signs in.
    await page.goto(suite.baseUrl);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByLabel(/^Name/).fill('Ines Halvorsen');
    await page.getByLabel(/^E-mail/).fill(email);
    await page.getByLabel(/^Password(?! again)/).fill('a-long-password-2');
    await page.getByLabel(/^Password again/).fill('a-long-password-2');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('status').filter({ hasText: 'Check your e-mail' }).waitFor();
    await page.goto(await confirmationLink(email));

    // A project: first the firm, then the site data.
    await page.getByRole('link', { name: 'New project' }).first().click();
    await page.getByLabel(/^Firm name/).fill('Halvorsen Facade Studio');
    await page.getByRole('button', { name: 'Save firm' }).click();
    await page.getByLabel(/^Project name/).fill('Quayside Depot');
    await page.getByLabel(/^Climate zone/).selectOption('5A');
    // Invented site data (SI: the new account's units).
    const site: [RegExp, string][] = [
      [/^Mean roof height/, '9'],
      [/^Plan length/, '60'],
      [/^Plan width/, '30'],
      [/^Indoor design temperature/, '20'],
      [/^Indoor design relative humidity/, '40'],
      [/^Winter design temperature/, '-12'],
      [/^Summer design temperature/, '30'],
    ];
    for (const [label, value] of site) await page.getByLabel(label).fill(value);
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.getByRole('heading', { name: 'Quayside Depot' }).waitFor();

    // An assembly from the insulated-panel template.
    await page.getByRole('link', { name: 'Assemblies', exact: true }).click();
    await page.getByRole('link', { name: 'New assembly' }).click();
    await page.getByRole('link', { name: 'Insulated metal panel on girts' }).click();
    await page.getByRole('heading', { name: 'Insulated metal panel on girts', level: 2 }).waitFor();
    await page.getByLabel('Name').fill('Loading bay wall');
    await page.getByRole('button', { name: 'Create assembly' }).click();
    await page.waitForURL(/\/assemblies\/[0-9a-f-]{36}$/);

    // In inch-pound units at 1280 px no label of the build-up (λ with its long unit) runs past its column.
    await page.getByRole('button', { name: 'Inch-pound units (ft, °F)' }).click();
    await page
      .getByText(/Btu·in\/\(h·ft²·°F\)/)
      .first()
      .waitFor();
    const overruns = await page.evaluate(() =>
      [...document.querySelectorAll('form[aria-label="Assembly builder"] label')]
        .filter((l) => l.scrollWidth > l.clientWidth + 1)
        .map((l) => l.textContent),
    );
    expect(overruns).toEqual([]);
    await page.getByRole('button', { name: 'SI units (m, °C)' }).click();
    await page.getByRole('button', { name: 'SI units (m, °C)', pressed: true }).waitFor();

    // Result first on a phone: each sheet's summary (verdict and figures) stands above its inputs, no sideways scroll.
    await page.setViewportSize({ width: 390, height: 844 });
    for (const [tab, inputs, path] of [
      ['Build-up & R-value', 'Build-up', /\/assemblies\/[0-9a-f-]{36}$/],
      ['Moisture', 'Inputs — layers and their vapour data', /\/moisture$/],
      ['Attachment & wind', 'Inputs — site and wind', /\/attachment$/],
      ['Joints & quantities', 'Joint schedule — inputs', /\/joints$/],
    ] as const) {
      await page.getByRole('link', { name: tab, exact: true }).click();
      await page.waitForURL(path);
      await page.getByRole('heading', { name: inputs }).first().waitFor();
      const summary = page.getByTestId('result-summary');
      await summary.getByTestId('summary-verdict').waitFor();
      expect(await summary.getByTestId('summary-verdict').textContent()).toMatch(/^[✓✕?▲]/);
      const top = (await summary.boundingBox())!.y;
      const heading = page.getByRole('heading', { name: inputs, exact: false }).first();
      expect(top).toBeLessThan((await heading.boundingBox())!.y);
      expect(await fitsWidth(page)).toBe(true);
      await summary.screenshot({
        path: `tests/artifacts/result-summary-${tab.split(' ')[0]!.toLowerCase()}-390.png`,
      });
    }
    await page.setViewportSize({ width: 1280, height: 900 });

    // The checks page starts the firm's first code table; the editor opens with one empty row per criterion.
    await page.getByRole('link', { name: 'Checks', exact: true }).click();
    const start = page.getByRole('form', { name: 'Start a code table' });
    await start.getByLabel(/^Table name/).fill('Our adopted code (invented demo values)');
    await start.getByLabel(/^Code and edition/).fill('Invented edition for the demo');
    await start.getByRole('button', { name: 'Start the code table' }).click();
    const grid = page.getByRole('table', { name: /Rows of version 1/ });
    await grid.waitFor();
    const rows = await grid.getByLabel(/^Row \d+: criterion$/).all();
    expect(rows.length).toBe(Object.keys(ROW_VALUES).length);
    for (const [i, row] of rows.entries()) {
      const value = grid.getByLabel(new RegExp(`^Row ${i + 1}: value`));
      const criterion = (await row.inputValue()) as CriterionType;
      if (criterion === 'must_dry_within_year') await value.selectOption(ROW_VALUES[criterion]);
      else await value.fill(ROW_VALUES[criterion]);
    }
    await page.getByRole('button', { name: 'Save rows' }).click();
    await page.getByRole('button', { name: 'Save rows' }).and(page.locator('[disabled]')).waitFor();

    // Back to the checks: run them and download the sheet.
    await page.getByRole('link', { name: 'Back to the checks' }).click();
    await page.getByRole('button', { name: 'Run the checks' }).click();
    await page.waitForURL(/[?&]run=/);
    // The page's overall verdict (Pass / Fail / Incomplete) is the sheet's.
    const verdict = (await page.getByTestId('verdict-overall').locator('dd .uppercase').textContent()) ?? '';
    expect(verdict).toMatch(/^(Pass|Fail|Incomplete)$/);
    const current = page.getByText('Compliance sheet of this run:').locator('..');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      current.getByRole('link', { name: 'Download PDF' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    const bytes = readFileSync(await download.path());
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    const { text } = await readPdf(bytes);
    expect(text).toContain('Loading bay wall');
    expect(text).toContain(`Overall verdict: ${verdict.toUpperCase()}`);
    await screenshot(page, 'new-user-checks');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(page)).toBe(true);
    expect(problems).toEqual([]);
  });
});
