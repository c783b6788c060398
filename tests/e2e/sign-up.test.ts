import type { APIRequestContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { browserSuite, screenshot } from '../setup/browser';

/**
 * Creating an account in real Chromium: the page says the same for a new and a registered address ("check
 * your e-mail"), and the e-mailed link confirms the new address and signs in, landing where sign-up was asked
 * to go.
 */
describe('sign-up in the browser', () => {
  const suite = browserSuite();

  async function signUp(page: Page, email: string) {
    await page.goto(`${suite.baseUrl}/sign-up?next=%2Fprojects%2Fnew`);
    await page.getByLabel(/^Name/).fill('Rowan Fenwick');
    await page.getByLabel(/^E-mail/).fill(email);
    await page.getByLabel(/^Password(?! again)/).fill('a-long-password-1');
    await page.getByLabel(/^Password again/).fill('a-long-password-1');
    await page.getByRole('button', { name: 'Create account' }).click();
    const notice = page.getByRole('status').filter({ hasText: 'Check your e-mail' });
    await notice.waitFor();
    return ((await notice.textContent()) ?? '').replace(email, '<address>');
  }

  /** The newest captured e-mail to `to` with `subject` in its subject, read as the site administrator. */
  async function mailTo(api: APIRequestContext, to: string, subject: string) {
    for (let tries = 0; tries < 100; tries++) {
      const { messages } = (await (await api.get(`${suite.baseUrl}/api/admin/mail`)).json()) as {
        messages: { to: string; subject: string; text: string }[];
      };
      const found = messages.find((m) => m.to.includes(to) && m.subject.includes(subject));
      if (found) return found;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    throw new Error(`no e-mail "${subject}…" to ${to}`);
  }

  it('answers a new and a registered address alike; the link signs the new account in', async () => {
    const { page, problems } = await suite.openPage({ viewport: { width: 390, height: 844 } });
    const fresh = await signUp(page, 'rowan.fenwick@example.com');
    await screenshot(page, 'sign-up-check-email-390');
    const { page: other } = await suite.openPage({ problems });
    expect(await signUp(other, 'viewer@skinwright.demo')).toBe(fresh);
    await screenshot(other, 'sign-up-check-email-1280');

    const admin = await suite.browser.newContext();
    const signedIn = await admin.request.post(`${suite.baseUrl}/api/auth/sign-in/email`, {
      data: { email: 'admin@skinwright.demo', password: 'skinwright-demo' },
      headers: { origin: suite.baseUrl },
    });
    expect(signedIn.status()).toBe(200);
    await mailTo(admin.request, 'viewer@skinwright.demo', 'Someone tried to create');
    const confirm = await mailTo(admin.request, 'rowan.fenwick@example.com', 'Confirm your address');
    await admin.close();

    await page.goto(confirm.text.match(/https?:\/\/\S+/)![0]);
    await page.waitForURL(/\/projects\/new$/);
    // Signed in: the page of a signed-in person (a new account first names its firm there).
    await page.getByRole('heading', { name: 'Project and site data' }).waitFor();
    await screenshot(page, 'sign-up-confirmed-390');
    expect(problems).toEqual([]);
  });
});
