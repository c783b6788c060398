import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, signIn } from '../setup/browser';

/** A phone: 390 px wide. */
const PHONE = { width: 390, height: 844 };
const LABEL = 'Fastener type';

/** The card of the item named `LABEL` (its heading is "n. label"). */
const card = (page: Page): Locator =>
  page.locator('article').filter({ has: page.getByRole('heading', { name: new RegExp(`${LABEL}$`) }) });

async function answer(c: Locator, state: 'Pass' | 'Not applicable') {
  await c.getByRole('button', { name: state, exact: true }).click();
  await c.getByRole('button', { name: 'Save answer' }).click();
}

/**
 * Two people answer the same item of the demo inspection: the crew's phone has no signal and keeps its answer;
 * meanwhile the envelope consultant answers online. When the signal returns the crew's answer meets the newer
 * one (409 with the item as it is now): the phone says so with the current answer and offers "Save mine over
 * theirs" / "Keep theirs"; saving theirs over sends the crew's answer on the current version.
 */
describe('offline conflict on an inspection item', () => {
  const suite = browserSuite();

  it('the second answer sees the conflict and the current answer, and may save over it', async () => {
    const problems: string[] = [];
    const open = async (email: string) => {
      const context = await suite.browser.newContext({ viewport: PHONE });
      const page = await context.newPage();
      page.on('pageerror', (e) => problems.push(e.message));
      await signIn(page, suite.baseUrl, email);
      return { context, page };
    };
    const consultant = await open('consultant@skinwright.demo');
    const crew = await open('subcontractor@skinwright.demo');

    const api = (path: string) =>
      consultant.page.request.get(`${suite.baseUrl}${path}`).then((r) => r.json());
    const projectId = ((await api('/api/projects')).projects[0] as { id: string }).id;
    // The demo seed's inspection in progress (server/services/inspections/demo.ts): the oldest of the project.
    const inspectionId = (
      (await api(`/api/projects/${projectId}/inspections`)).inspections.at(-1) as { id: string }
    ).id;
    const url = `${suite.baseUrl}/projects/${projectId}/inspections/${inspectionId}`;
    const stateOnServer = async () =>
      ((await api(`/api/inspections/${inspectionId}`)).items as { label: string; state: string }[]).find(
        (i) => i.label === LABEL,
      )?.state;

    for (const { page } of [consultant, crew]) {
      await page.goto(url);
      await page.getByText('Everything sent').waitFor({ timeout: 30_000 });
    }

    // The crew's phone loses the signal and answers: kept on the device.
    await crew.context.setOffline(true);
    await crew.page.getByText(/Offline — answers are kept/).waitFor();
    await answer(card(crew.page), 'Not applicable');
    await crew.page.getByText('1 waiting to send').waitFor();

    // Meanwhile the consultant answers the same item online.
    await answer(card(consultant.page), 'Pass');
    await consultant.page.getByText('Everything sent').waitFor({ timeout: 30_000 });
    expect(await stateOnServer()).toBe('pass');

    // The signal returns: the crew sees the conflict, with the answer as it now is and theirs not saved.
    await crew.context.setOffline(false);
    const conflict = crew.page.getByRole('alert').filter({ hasText: `Conflict: “${LABEL}” was changed` });
    await conflict.waitFor({ timeout: 30_000 });
    const words = await conflict.textContent();
    expect(words).toContain('It is now ✓ Pass');
    expect(words).toContain('Your answer, – Not applicable, was not saved.');
    expect(await conflict.getByRole('button', { name: 'Keep theirs' }).isVisible()).toBe(true);
    expect(await stateOnServer()).toBe('pass');

    // "Save mine over theirs": the crew's answer goes on the current version.
    await conflict.getByRole('button', { name: 'Save mine over theirs' }).click();
    await expect.poll(stateOnServer, { timeout: 30_000 }).toBe('na');
    await crew.page.getByText('Everything sent').waitFor({ timeout: 30_000 });
    expect(await conflict.count()).toBe(0);

    expect(problems).toEqual([]);
  });
});
