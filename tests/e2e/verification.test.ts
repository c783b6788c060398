import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

/** Nothing wider than the window: tables scroll inside, the page does not. */
const noSidewaysScroll = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

/**
 * The public verification page names the issuer by its handle and its standing, and the site administrator
 * withdraws (and gives back) a firm's verification on /admin/organisations: the page follows at once.
 * Desk (1280 px) and phone (390 px) widths.
 */
describe('sheet verification and firm verification in the browser', () => {
  const suite = browserSuite();

  it('shows a verified issuer, and an unverified one after the administrator withdraws it', async () => {
    // A sheet issued by the demo subcontractor (Ridgeline, verified in the demo), through the API.
    const { page: sub, problems } = await suite.openPage();
    await signIn(sub, suite.baseUrl, 'subcontractor@skinwright.demo');
    const api = sub.request;
    const projectId = (
      (await (await api.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as { id: string }
    ).id;
    const assemblyId = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)).json())
      .assemblies[0].id as string;
    const sets = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/criteria-sets`)).json())
      .criteriaSets as { id: string; name: string }[];
    const run = await (
      await api.post(`${suite.baseUrl}/api/assemblies/${assemblyId}/check-runs`, {
        data: { criteriaSetId: sets.find((s) => s.name.startsWith('Illustrative example'))!.id },
      })
    ).json();
    const sheet = await api.get(`${suite.baseUrl}/api/check-runs/${run.id}/sheet.pdf`);
    expect(sheet.status()).toBe(200);
    const code = sheet.headers()['x-verification-code']!;

    for (const width of [1280, 390]) {
      const { page: anon } = await suite.openPage({ problems, viewport: { width, height: 900 } });
      await anon.goto(`${suite.baseUrl}/verify/${code}`);
      const found = anon.getByTestId('verified');
      await found.waitFor();
      expect(await found.getAttribute('data-issuer-verified')).toBe('true');
      await anon.getByRole('heading', { name: 'Issued by a verified firm' }).waitFor();
      expect(await anon.getByTestId('issuer').textContent()).toMatch(
        /Ridgeline Cladding Co\. \(demo\)@demo-ridgeline✓ verified by Skinwright’s site administrator on/,
      );
      expect(await anon.getByTestId('run-hash').textContent()).toBe(run.hash);
      expect(await noSidewaysScroll(anon)).toBe(true);
      await screenshot(anon, `verify-issuer-verified-${width}`);
      await anon.close();
    }

    // The site administrator withdraws Ridgeline's verification (on the desk), confirming it first.
    for (const width of [390, 1280]) {
      const { page: admin } = await suite.openPage({ problems, viewport: { width, height: 900 } });
      await signIn(admin, suite.baseUrl, 'admin@skinwright.demo');
      await admin.goto(`${suite.baseUrl}/admin/organisations`);
      const row = admin.locator('tr[data-firm="@demo-ridgeline"]');
      await row.getByText(/✓ verified .* by Ada Quarrie/).waitFor();
      expect(await noSidewaysScroll(admin)).toBe(true);
      await screenshot(admin, `admin-organisations-${width}`);
      if (width === 390) {
        await admin.close();
        continue;
      }
      await row.getByRole('button', { name: 'Withdraw… @demo-ridgeline' }).click();
      await row.getByText(/Withdraw the verification of @demo-ridgeline\?/).waitFor();
      await screenshot(admin, 'admin-organisations-confirm');
      await row.getByRole('button', { name: 'Withdraw @demo-ridgeline' }).click();
      await row.getByText('not verified').waitFor();
      // Nothing is verified by one click: the confirmation is gone and the action reads "Verify…" again.
      await row.getByRole('button', { name: 'Verify… @demo-ridgeline' }).waitFor();
      await admin.close();
    }

    for (const width of [1280, 390]) {
      const { page: anon } = await suite.openPage({ problems, viewport: { width, height: 900 } });
      await anon.goto(`${suite.baseUrl}/verify/${code}`);
      const found = anon.getByTestId('verified');
      await found.waitFor();
      expect(await found.getAttribute('data-issuer-verified')).toBe('false');
      await anon.getByRole('heading', { name: 'Issued by a firm nobody has verified' }).waitFor();
      await anon.getByText('Issuer not verified by Skinwright’s site administrator.').waitFor();
      expect(await anon.getByTestId('issuer').textContent()).toContain(
        '@demo-ridgeline▲ issuer not verified by Skinwright’s site administrator',
      );
      expect(await noSidewaysScroll(anon)).toBe(true);
      await screenshot(anon, `verify-issuer-not-verified-${width}`);
      await anon.close();
    }
    expect(problems).toEqual([]);
  });
});
