import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

/** A small real PDF to upload (product data). */
const PRODUCT_DATA = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj 2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj 3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);

/**
 * Submittals in real Chromium: the cladding subcontractor starts a submittal with the compliance sheet of a
 * check run on the demo assembly and a product-data PDF, and submits it; the architect (a named reviewer)
 * approves it; both see the status. The sheet page and the public verification page are visited on the way.
 */
describe('submittals in the browser', () => {
  const suite = browserSuite();

  it('subcontractor submits a sheet and a file; the architect approves', async () => {
    const { page: sub, problems } = await suite.openPage();
    await signIn(sub, suite.baseUrl, 'subcontractor@skinwright.demo');

    // Setup through the API: a check run of the demo assembly against the demo firm's code table.
    const api = sub.request;
    const projectId = (
      (await (await api.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as { id: string }
    ).id;
    const assemblyId = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)).json())
      .assemblies[0].id as string;
    const sets = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/criteria-sets`)).json())
      .criteriaSets as { id: string; name: string }[];
    const setId = sets.find((s) => s.name.startsWith('Illustrative example'))!.id;
    const runRes = await api.post(`${suite.baseUrl}/api/assemblies/${assemblyId}/check-runs`, {
      data: { criteriaSetId: setId },
    });
    expect(runRes.status()).toBe(201);
    const runId = (await runRes.json()).id as string;

    // The project's Submittals tab → a new submittal naming the architect as reviewer.
    await sub.goto(`${suite.baseUrl}/projects/${projectId}`);
    await sub.getByRole('link', { name: 'Submittals', exact: true }).click();
    await sub.getByRole('link', { name: 'New submittal' }).click();
    await sub
      .getByRole('textbox', { name: 'Title', exact: true })
      .fill('Insulated metal wall panels — product data');
    await sub.getByLabel(/Marguerite Oyelaran/).check();
    await sub.getByRole('button', { name: 'Create the draft' }).click();
    await sub.waitForURL(/\/submittals\/[0-9a-f-]{36}$/);
    const submittalUrl = sub.url();
    await sub.getByTestId('submittal-status').locator('[data-status="draft"]').waitFor();

    // Items: the compliance sheet and a file (with its progress bar while it goes up).
    const select = sub.getByLabel('Compliance sheet of a check run');
    await select.selectOption({ value: runId });
    await sub.getByRole('button', { name: 'Attach the sheet' }).click();
    await sub.locator('li[data-item="sheet"]').waitFor();
    await sub.getByLabel(/Add files/).setInputFiles({
      name: 'Panel product data.pdf',
      mimeType: 'application/pdf',
      buffer: PRODUCT_DATA,
    });
    await sub.getByRole('button', { name: 'Upload 1 file' }).click();
    await sub.getByText('1 file added.').waitFor();
    await sub.locator('li[data-item="file"]').getByText('Panel product data.pdf').waitFor();
    await screenshot(sub, 'submittal-draft');

    await sub.getByRole('button', { name: 'Submit for review' }).click();
    await sub.getByTestId('submittal-status').locator('[data-status="submitted"]').waitFor();

    // The sheet page: produced, previewed, downloadable, with its verification code.
    await sub.locator('li[data-item="sheet"]').getByRole('link', { name: 'Preview the sheet' }).click();
    await sub.getByTestId('sheet-ready').waitFor({ timeout: 30_000 });
    const download = sub.getByRole('link', { name: /Download the sheet \(PDF, \d+ kB\)/ });
    expect(await download.getAttribute('href')).toMatch(/^blob:/);
    // Give the browser's PDF viewer a moment to draw the first page in the preview frame.
    await sub.waitForTimeout(1500);
    await screenshot(sub, 'compliance-sheet-page');
    const verifyHref = await sub
      .getByRole('link', { name: 'check it as a recipient would' })
      .getAttribute('href');

    // Anyone can verify the code without signing in.
    const anon = await suite.browser.newPage({ viewport: { width: 1100, height: 900 } });
    await anon.goto(`${suite.baseUrl}${verifyHref}`);
    await anon.getByTestId('verified').waitFor();
    expect(await anon.getByTestId('verified').textContent()).toMatch(/Ridgeline Cladding Co\. \(demo\)/);
    await screenshot(anon, 'sheet-verification');
    await anon.goto(`${suite.baseUrl}/verify/AAAAAAAAAA`);
    await anon.getByText('No such sheet.').waitFor();
    await anon.close();

    // The architect, a named reviewer, approves.
    const { page: arch } = await suite.openPage({ problems });
    await signIn(arch, suite.baseUrl, 'architect@skinwright.demo');
    await arch.goto(submittalUrl);
    await arch.getByRole('button', { name: 'Start the review' }).click();
    await arch.getByTestId('submittal-status').locator('[data-status="under_review"]').waitFor();
    await arch.getByLabel(/^✓ Approved — Proceed as submitted/).check();
    await arch.getByRole('button', { name: 'Record the decision' }).click();
    await arch.getByTestId('submittal-status').locator('[data-status="approved"]').waitFor();
    await arch
      .getByTestId('decision')
      .getByText(/Marguerite Oyelaran/)
      .waitFor();
    await screenshot(arch, 'submittal-approved');

    // The subcontractor sees it approved, in the list filtered by status too.
    await sub.goto(`${suite.baseUrl}/projects/${projectId}/submittals?status=approved`);
    const row = sub.locator('tr[data-submittal="07 42 13-001"]');
    await row.waitFor();
    expect(await row.locator('[data-status]').getAttribute('data-status')).toBe('approved');
    await screenshot(sub, 'submittal-list');
    expect(problems).toEqual([]);
  });
});
