import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { type Browser, type BrowserContext, chromium, type Page, type ViewportSize } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
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

export type TestServer = Awaited<ReturnType<typeof startTestServer>>;

/**
 * A new page whose uncaught errors are collected in `problems` (a test expects it empty at the end). From a
 * browser the page gets its own context with `viewport` (1280 × 900 unless told); from a context it takes
 * the context's. Pass `problems` to collect several pages' errors in one list.
 */
export async function openPage(
  from: Browser | BrowserContext,
  {
    viewport = { width: 1280, height: 900 },
    problems = [],
  }: { viewport?: ViewportSize; problems?: string[] } = {},
): Promise<{ page: Page; problems: string[] }> {
  const page = 'newContext' in from ? await from.newPage({ viewport }) : await from.newPage();
  page.on('pageerror', (e) => problems.push(e.message));
  return { page, problems };
}

/**
 * The scaffolding of a browser test file: call it inside `describe` to start the test server and Chromium
 * before its tests and close both after them. The getters are valid inside the tests.
 */
export function browserSuite() {
  let server: TestServer | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    server = await startTestServer();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });
  const started = <T>(value: T | undefined): T => {
    if (value === undefined) throw new Error('browserSuite: the server and browser start in beforeAll');
    return value;
  };
  return {
    get server() {
      return started(server);
    },
    get browser() {
      return started(browser);
    },
    /** The test server's address, e.g. http://127.0.0.1:41234. */
    get baseUrl() {
      return started(server).baseUrl;
    },
    /** `openPage` on the suite's browser. */
    openPage: (options?: Parameters<typeof openPage>[1]) => openPage(started(browser), options),
  };
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'skinwright-demo') {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL(/\/projects/);
}

/** From the project list, open the demo project's demo assembly (its build-up page), as a person would. */
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
