import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot, signIn } from '../setup/browser';

/** A small real PDF to upload (product data). */
const PRODUCT_DATA = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj 2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj 3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);

/** No sideways scroll: the page is no wider than the window. */
const fitsWidth = (page: import('playwright-core').Page) =>
  page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

/**
 * Submittals in real Chromium: the cladding subcontractor starts a submittal with a compliance sheet that
 * fails (the demo assembly against a code table of its own it cannot meet) and a product-data PDF, names the
 * architect and the engineer, and submits it after a confirmation that says the sheet fails. Each reviewer
 * decides with nothing preselected, and approving the failing sheet needs the word APPROVE typed; the first
 * decision leaves the revision under review, the second closes it with the more severe decision. The sheet
 * page and the public verification page are visited on the way.
 */
describe('submittals in the browser', () => {
  const suite = browserSuite();

  it('subcontractor submits a failing sheet and a file; architect and engineer both decide', async () => {
    const { page: sub, problems } = await suite.openPage();
    await signIn(sub, suite.baseUrl, 'subcontractor@skinwright.demo');

    // Setup through the API: a check run of the demo assembly.
    const api = sub.request;
    const projectId = (
      (await (await api.get(`${suite.baseUrl}/api/projects`)).json()).projects[0] as { id: string }
    ).id;
    const assemblyId = (await (await api.get(`${suite.baseUrl}/api/projects/${projectId}/assemblies`)).json())
      .assemblies[0].id as string;
    const wallCategory = (await (await api.get(`${suite.baseUrl}/api/assemblies/${assemblyId}`)).json())
      .wallCategory as string;
    // The subcontractor's firm keeps a table the demo wall cannot meet (invented value): its sheet fails.
    const orgId = (await (await api.get(`${suite.baseUrl}/api/me`)).json()).organisations[0].id as string;
    const strict = await api.post(`${suite.baseUrl}/api/organisations/${orgId}/criteria-sets`, {
      data: {
        name: 'Unmeetable table (invented value)',
        rows: [{ climateZone: '*', wallCategory, criterion: 'max_u_factor', value: 0.01, note: 'invented' }],
      },
    });
    expect(strict.status()).toBe(201);
    const setId = (await strict.json()).id as string;
    const runRes = await api.post(`${suite.baseUrl}/api/assemblies/${assemblyId}/check-runs`, {
      data: { criteriaSetId: setId },
    });
    expect(runRes.status()).toBe(201);
    const run = await runRes.json();
    expect(run.verdict).toBe('fail');
    const runId = run.id as string;

    // The project's Submittals tab → a new submittal naming the architect as reviewer.
    await sub.goto(`${suite.baseUrl}/projects/${projectId}`);
    await sub.getByRole('link', { name: 'Submittals', exact: true }).click();
    await sub.getByRole('link', { name: 'New submittal' }).click();
    await sub
      .getByRole('textbox', { name: 'Title', exact: true })
      .fill('Insulated metal wall panels — product data');
    await sub.getByLabel(/Marguerite Oyelaran/).check();
    await sub.getByLabel(/Ngozi Okonkwo/).check();
    await sub.getByRole('button', { name: 'Create the draft' }).click();
    await sub.waitForURL(/\/submittals\/[0-9a-f-]{36}$/);
    const submittalUrl = sub.url();
    await sub.getByTestId('submittal-status').locator('[data-status="draft"]').waitFor();

    // Items: the compliance sheet and a file (with its progress bar while it goes up).
    const select = sub.getByLabel('Compliance sheet of a check run');
    await select.selectOption({ value: runId });
    await sub.getByRole('button', { name: 'Add the sheet' }).click();
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

    // Submitting asks first, in view, and says that the attached sheet fails.
    await sub.getByRole('button', { name: 'Submit for review' }).click();
    const ask = sub.getByRole('dialog', { name: 'Submit revision 1 of 07 42 13-001 for review?' });
    await ask.waitFor();
    await ask.getByText('An attached compliance sheet fails. The reviewers will see it.').waitFor();
    expect(await ask.getByText(/Marguerite Oyelaran, Ngozi Okonkwo/).count()).toBe(1);
    await screenshot(sub, 'submittal-submit-confirmation');
    await ask.getByRole('button', { name: 'Cancel' }).click();
    await ask.waitFor({ state: 'hidden' });
    expect(await sub.getByTestId('submittal-status').locator('[data-status="draft"]').count()).toBe(1);
    await sub.getByRole('button', { name: 'Submit for review' }).click();
    await ask.getByRole('button', { name: 'Submit revision 1' }).click();
    await sub.getByTestId('submittal-status').locator('[data-status="submitted"]').waitFor();
    await ask.waitFor({ state: 'hidden' });

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
    await anon.getByText('No such sheet or report.').waitFor();
    await anon.close();

    // The architect, a named reviewer: nothing is preselected, and the form says so when nothing is chosen.
    const { page: arch } = await suite.openPage({ problems });
    await signIn(arch, suite.baseUrl, 'architect@skinwright.demo');
    await arch.goto(submittalUrl);
    await arch.getByRole('button', { name: 'Start the review' }).click();
    await arch.getByTestId('submittal-status').locator('[data-status="under_review"]').waitFor();
    const radios = arch.getByRole('radio');
    expect(await radios.count()).toBe(4);
    expect(await arch.getByRole('radio', { checked: true }).count()).toBe(0);
    await arch.getByRole('button', { name: 'Record my decision' }).click();
    await arch.getByRole('alert').getByText('Choose a decision: nothing is chosen for you.').waitFor();
    // The rule is on the page: two reviewers, nobody has decided yet.
    await arch.getByText(/Every named reviewer decides; the revision closes when the last one has/).waitFor();
    await arch.getByText('0 of 2 have decided.').waitFor();

    // Approving the failing sheet: a caution, then the word to type; without it nothing is recorded.
    await arch.getByLabel(/^✓ Approved — Proceed as submitted/).check();
    await arch.getByText('An attached compliance sheet fails. Approving it needs a confirmation.').waitFor();
    const confirmation = arch.getByRole('textbox', {
      name: /Type APPROVE to approve despite the failing sheet/,
    });
    await confirmation.waitFor();
    await arch.getByRole('button', { name: 'Record my decision' }).click();
    await arch.getByText('Type APPROVE to approve a package whose sheet fails').waitFor();
    expect(await confirmation.getAttribute('aria-invalid')).toBe('true');
    // Sending the package back needs no word typed.
    await arch.getByLabel(/Revise and resubmit/).check();
    expect(await confirmation.count()).toBe(0);
    await arch.getByLabel(/^✓ Approved — Proceed as submitted/).check();
    await confirmation.fill('APPROVE');
    await screenshot(arch, 'submittal-approve-failing-sheet');
    await arch.getByRole('button', { name: 'Record my decision' }).click();
    // One of two: still under review; the page shows who has decided and who is still to decide.
    await arch.locator('li[data-reviewer="Marguerite Oyelaran"][data-decision="approved"]').waitFor();
    await arch.getByText('1 of 2 have decided.').waitFor();
    expect(await arch.locator('li[data-reviewer="Ngozi Okonkwo"]').getByText('Still to decide').count()).toBe(
      1,
    );
    expect(await arch.getByTestId('submittal-status').locator('[data-status="under_review"]').count()).toBe(
      1,
    );
    await arch
      .getByText(/You decided approved on .*You may change it until Ngozi Okonkwo has decided/)
      .waitFor();
    await screenshot(arch, 'submittal-one-of-two-decided');
    await arch.setViewportSize({ width: 390, height: 844 });
    expect(await fitsWidth(arch)).toBe(true);
    await screenshot(arch, 'submittal-one-of-two-decided-390');

    // The engineer closes it: approved as noted is the more severe of the two decisions.
    const { page: eng } = await suite.openPage({ problems, viewport: { width: 390, height: 844 } });
    await signIn(eng, suite.baseUrl, 'engineer@skinwright.demo');
    await eng.goto(submittalUrl);
    await eng.getByLabel(/Approved as noted/).check();
    await eng.getByRole('textbox', { name: /Type APPROVE/ }).fill('approve');
    await eng
      .getByLabel(/Reviewer’s note/)
      .fill('Confirm the clip spacing at the corners on the shop drawings.');
    expect(await fitsWidth(eng)).toBe(true);
    await eng.getByRole('button', { name: 'Record my decision' }).click();
    await eng.getByTestId('submittal-status').locator('[data-status="approved_as_noted"]').waitFor();
    await eng.getByTestId('decision').getByText('Approved as noted').waitFor();
    await eng.locator('li[data-reviewer="Ngozi Okonkwo"][data-decision="approved_as_noted"]').waitFor();
    expect(await fitsWidth(eng)).toBe(true);
    await screenshot(eng, 'submittal-approved-390');
    await arch.setViewportSize({ width: 1280, height: 900 });
    await arch.reload();
    await arch.getByTestId('decision').getByText('Approved as noted').waitFor();
    await screenshot(arch, 'submittal-approved');

    // The subcontractor sees the outcome, in the list filtered by status too.
    await sub.goto(`${suite.baseUrl}/projects/${projectId}/submittals?status=approved_as_noted`);
    const row = sub.locator('tr[data-submittal="07 42 13-001"]');
    await row.waitFor();
    expect(await row.locator('[data-status]').getAttribute('data-status')).toBe('approved_as_noted');
    await screenshot(sub, 'submittal-list');
    expect(problems).toEqual([]);
  });
});
