import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { type Browser, chromium, type Page } from 'playwright-core';
import { loadConfig } from '../../server/config';
import { startServer } from '../../server/start';

export const ARTIFACTS = path.resolve('tests/artifacts');

/** Debian's Chromium, headless, with the flags this machine needs (no network beyond loopback). */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** The real server (built client + API) on a random port with a fresh in-memory PGlite seeded with the demo. */
export async function startTestServer() {
  const config = loadConfig({ NODE_ENV: 'test' }, { port: 0, pgliteDir: 'memory://', authRateLimit: 10_000 });
  return startServer(config);
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'skinwright-demo') {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL(/\/projects/);
}

/** From the project list, open the demo project's demo assembly (its build-up sheet), as a person would. */
export async function openDemoAssembly(page: Page) {
  await page.getByRole('link', { name: 'Corvid Lane Cold Store' }).click();
  await page.getByRole('link', { name: 'Assemblies', exact: true }).click();
  await page
    .getByRole('link', { name: /Metal rainscreen on clips and girts/ })
    .first()
    .click();
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
}
