import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { matchPath } from 'react-router';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { browserSuite, openDemoAssembly, screenshot, signIn } from '../setup/browser';

interface Pattern {
  path: string;
  /** Under `<RequireSession />`: visited signed in (as the site administrator, who may open every page). */
  signedIn: boolean;
}

const ROUTER = 'src/app/router.tsx';

/**
 * Every page of the router as a full path pattern (`/projects/:projectId/assemblies/:assemblyId/moisture`),
 * read from the route objects written in `createBrowserRouter([...])` (importing the router would need a
 * window). A route array built any other way fails here, so that no page goes unchecked.
 */
function routePatterns(): Pattern[] {
  const file = ts.createSourceFile(ROUTER, readFileSync(ROUTER, 'utf8'), ts.ScriptTarget.Latest, true);
  const refuse = (node: ts.Node, what: string): never => {
    const { line } = file.getLineAndCharacterOfPosition(node.getStart());
    throw new Error(`${ROUTER}:${line + 1}: ${what} — teach tests/e2e/phone-width.test.ts to read it`);
  };
  const walk = (list: ts.Expression, parent: string, signedIn: boolean): Pattern[] => {
    if (!ts.isArrayLiteralExpression(list)) return refuse(list, 'routes that are not an array literal');
    return list.elements.flatMap((route) => {
      if (!ts.isObjectLiteralExpression(route)) return refuse(route, 'a route that is not an object literal');
      const prop = (name: string) =>
        route.properties.find(
          (p): p is ts.PropertyAssignment =>
            ts.isPropertyAssignment(p) && ts.isIdentifier(p.name) && p.name.text === name,
        )?.initializer;
      const pathNode = prop('path');
      if (pathNode && !ts.isStringLiteral(pathNode)) return refuse(pathNode, 'a path that is not a string');
      const path = pathNode ? joinPath(parent, pathNode.text) : parent;
      const element = prop('element');
      const inSession =
        signedIn ||
        (element !== undefined &&
          ts.isJsxSelfClosingElement(element) &&
          element.tagName.getText(file) === 'RequireSession');
      const index = prop('index')?.kind === ts.SyntaxKind.TrueKeyword;
      const children = prop('children');
      return [
        ...(pathNode || index ? [{ path, signedIn: inSession }] : []),
        ...(children ? walk(children, path, inSession) : []),
      ];
    });
  };
  let found: Pattern[] | undefined;
  const visit = (node: ts.Node) => {
    if (ts.isCallExpression(node) && node.expression.getText(file) === 'createBrowserRouter')
      found = walk(node.arguments[0]!, '', false);
    else ts.forEachChild(node, visit);
  };
  visit(file);
  if (!found) throw new Error(`${ROUTER}: no createBrowserRouter([...]) found`);
  return found;
}
const joinPath = (parent: string, path: string) =>
  path.startsWith('/') ? path : `${parent.replace(/\/$/, '')}/${path}`;

/**
 * Whether the page scrolls sideways, and if so the widest element that reaches past the window and is not
 * inside a box that scrolls or clips it (what a person would have to scroll to see).
 */
const sidewaysScroll = (page: Page) =>
  page.evaluate(() => {
    const root = document.documentElement;
    if (root.scrollWidth <= root.clientWidth) return null;
    const clipped = (el: Element) => {
      for (let p = el.parentElement; p && p !== document.body; p = p.parentElement)
        if (getComputedStyle(p).overflowX !== 'visible') return true;
      return false;
    };
    const describe = (el: Element) => {
      const classes = [...el.classList].slice(0, 6).join('.');
      const label = el.getAttribute('aria-label') ?? el.textContent?.trim().replace(/\s+/g, ' ').slice(0, 50);
      return `<${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''}${classes ? `.${classes}` : ''}> “${label}”`;
    };
    let widest: { el: Element; width: number; right: number } | null = null;
    for (const el of document.body.querySelectorAll('*')) {
      const box = el.getBoundingClientRect();
      if (box.right <= root.clientWidth + 0.5 || box.width === 0 || clipped(el)) continue;
      if (!widest || box.width > widest.width) widest = { el, width: box.width, right: box.right };
    }
    return {
      scrollWidth: root.scrollWidth,
      clientWidth: root.clientWidth,
      widest: widest
        ? `${describe(widest.el)}, ${Math.round(widest.width)} px wide, right edge at ${Math.round(widest.right)} px`
        : 'no element found (a margin or a transform?)',
    };
  });

/** Open a page and wait until its loaders, chunks and queries are done. */
async function settle(page: Page, url: string) {
  await page.goto(url);
  await page.locator('#main').waitFor();
  // `Loading …` lines (the page's own and the bar at the top) and results still computing (aria-busy).
  await page.waitForFunction(
    () =>
      ![...document.querySelectorAll('[role="status"]')].some((s) => /^Loading/.test(s.textContent ?? '')) &&
      !document.querySelector('[aria-busy="true"]'),
    undefined,
    { timeout: 15_000 },
  );
  // A page that keeps asking (a sheet being produced) is measured as it stands after a while.
  await page.waitForLoadState('networkidle', { timeout: 5000 }).catch(() => {});
}

/** Same-origin paths linked from the page (where the pages of records without a seeded value are found). */
const linkedPaths = (page: Page) =>
  page.evaluate(() =>
    [...document.querySelectorAll('a[href]')]
      .map((a) => new URL((a as HTMLAnchorElement).href))
      .filter((u) => u.origin === location.origin)
      .map((u) => u.pathname + u.search),
  );

/**
 * Every page of the app at 390 px (a phone) must not scroll sideways: tables, tab strips and code scroll
 * inside their own box. The pages are the router's own, so a new page is checked the day it is added; its
 * parameters come from the demo (and records made here: a check run and its sheet, a submittal, an
 * invitation) or from a link on a page already visited. Each failure names the page and the widest element
 * past the window's edge.
 */
describe('every page at 390 px wide', () => {
  const suite = browserSuite();
  const viewport = { width: 390, height: 844 };

  it('no page scrolls sideways, signed in (as the site administrator) or signed out', async () => {
    const patterns = routePatterns().filter((p) => p.path !== '*' && p.path !== '/');
    expect(patterns.length).toBeGreaterThan(30);

    const { page: admin, problems } = await suite.openPage({ viewport });
    await signIn(admin, suite.baseUrl, 'admin@skinwright.demo');
    const api = admin.request;
    const get = async (path: string) => (await api.get(`${suite.baseUrl}/api${path}`)).json();
    const post = async (path: string, data: unknown) => {
      const res = await api.post(`${suite.baseUrl}/api${path}`, { data });
      expect(res.status(), `POST ${path}: ${await res.text()}`).toBeLessThan(300);
      return res.json();
    };

    // Records the demo does not hold: a check run of each assembly (and a sheet's code), a submittal with
    // the sheet, an invitation (its token read from the captured mail).
    const projectId = (await get('/projects')).projects[0].id as string;
    const assemblies = (await get(`/projects/${projectId}/assemblies`)).assemblies as { id: string }[];
    const sets = (await get(`/projects/${projectId}/criteria-sets`)).criteriaSets as {
      id: string;
      name: string;
    }[];
    const set = sets.find((s) => s.name.startsWith('Illustrative example')) ?? sets[0]!;
    const runs: string[] = [];
    for (const a of assemblies)
      runs.push((await post(`/assemblies/${a.id}/check-runs`, { criteriaSetId: set.id })).id);
    const sheet = await api.get(`${suite.baseUrl}/api/check-runs/${runs[0]}/sheet.pdf`);
    const code = sheet.headers()['x-verification-code']!;
    const submittal = await post(`/projects/${projectId}/submittals`, {
      title: 'Metal wall panels — phone width check',
      specSection: '07 42 13',
      specTitle: 'Metal Wall Panels',
    });
    await post(`/submittals/${submittal.id}/sheets`, { checkRunId: runs[0] });
    await post(`/projects/${projectId}/invitations`, { email: 'phone.width@example.com', role: 'viewer' });
    let token = '';
    for (let tries = 0; tries < 100 && !token; tries++) {
      const { messages } = (await get('/admin/mail')) as { messages: { to: string; text: string }[] };
      token =
        messages.find((m) => m.to.includes('phone.width@'))?.text.match(/\/invite\/([\w-]+)/)?.[1] ?? '';
      if (!token) await new Promise((resolve) => setTimeout(resolve, 50));
    }
    // A deficiency: the crew fails an unseen item of the demo inspection (a failed item opens one).
    const deficiencyId: string[] = [];
    const inspectionId: string[] = [];
    const crew = await suite.browser.newContext();
    const crewIn = await crew.request.post(`${suite.baseUrl}/api/auth/sign-in/email`, {
      data: { email: 'subcontractor@skinwright.demo', password: 'skinwright-demo' },
      headers: { origin: suite.baseUrl },
    });
    expect(crewIn.status()).toBe(200);
    const inspections = await crew.request.get(`${suite.baseUrl}/api/projects/${projectId}/inspections`);
    const firstInspection = inspections.ok() ? (await inspections.json()).inspections[0] : undefined;
    if (firstInspection) {
      inspectionId.push(firstInspection.id);
      const { items } = await (
        await crew.request.get(`${suite.baseUrl}/api/inspections/${firstInspection.id}`)
      ).json();
      const item = (items as { id: string; version: number; state: string }[]).find(
        (i) => i.state === 'unseen',
      );
      if (item) {
        const answer = await crew.request.put(`${suite.baseUrl}/api/inspection-items/${item.id}`, {
          data: { version: item.version, state: 'fail', note: 'Phone width check (invented)' },
          headers: { origin: suite.baseUrl },
        });
        expect(answer.status(), await answer.text()).toBe(200);
        deficiencyId.push((await answer.json()).openedDeficiency.id);
      }
    }
    await crew.close();

    const known: Record<string, string[]> = {
      inspectionId,
      deficiencyId,
      projectId: [projectId],
      assemblyId: assemblies.map((a) => a.id),
      runId: runs,
      submittalId: [submittal.id],
      setId: [set.id],
      revision: ['1'],
      token: [token],
      code: [code],
    };

    /** Concrete addresses of a pattern: every combination of the known values, else links seen so far. */
    const seen = new Set<string>();
    const addresses = (pattern: string) => {
      const names = [...pattern.matchAll(/:(\w+)/g)].map((m) => m[1]!);
      if (names.every((n) => known[n]?.[0])) {
        let paths = [pattern];
        for (const n of names) paths = paths.flatMap((p) => known[n]!.map((v) => p.replace(`:${n}`, v)));
        return paths;
      }
      return [...seen].filter((href) => matchPath(pattern, href.split('?')[0]!)).slice(0, 2);
    };

    const failures: string[] = [];
    const visited = new Set<string>();
    const visit = async (page: Page, pattern: string, address: string) => {
      visited.add(pattern);
      try {
        await settle(page, `${suite.baseUrl}${address}`);
      } catch (e) {
        failures.push(
          `${address} (${pattern}) did not finish loading: ${(e as Error).message.split('\n')[0]}`,
        );
        return;
      }
      const landed = new URL(page.url()).pathname;
      if (!matchPath(pattern, landed)) failures.push(`${address}: landed on ${landed} instead`);
      const wide = await sidewaysScroll(page);
      if (wide) {
        failures.push(
          `${address} (${pattern}) scrolls sideways: ${wide.scrollWidth} px wide in ${wide.clientWidth} px; widest: ${wide.widest}`,
        );
        await screenshot(page, `phone-width-${pattern.replace(/[/:]+/g, '-').replace(/^-/, '')}`);
      }
      for (const href of await linkedPaths(page)) seen.add(href);
    };

    // Signed in, as long as a round finds pages to visit (a link on one page names another's record).
    for (let progress = true; progress; ) {
      progress = false;
      for (const { path } of patterns.filter((p) => p.signedIn && !visited.has(p.path)))
        for (const address of addresses(path)) {
          await visit(admin, path, address);
          progress = true;
        }
    }

    // Signed out: sign-in, sign-up, password, invitation and verification pages.
    const anonymous = await suite.browser.newContext({ viewport });
    const anon = await anonymous.newPage();
    anon.on('pageerror', (e) => problems.push(e.message));
    for (const { path } of patterns.filter((p) => !p.signedIn))
      for (const address of addresses(path)) await visit(anon, path, address);
    await anonymous.close();

    // Pages with no address need a record (seed one in the demo, or make one above) or a link to one.
    const unreached = patterns.filter((p) => !visited.has(p.path)).map((p) => p.path);
    expect({ failures, unreached, problems }).toEqual({ failures: [], unreached: [], problems: [] });
  }, 600_000);

  it('tabs scroll in their strip with the page shown in view; the save bar is one line until More', async () => {
    const { page, problems } = await suite.openPage({ viewport });
    await signIn(page, suite.baseUrl, 'architect@skinwright.demo');
    await openDemoAssembly(page);
    await page.getByTestId('live-Reff').waitFor();
    await page.getByRole('link', { name: 'Checks', exact: true }).click();
    await page.waitForURL(/\/checks$/);
    // A tab past the phone's edge is active: its strip scrolls inside itself and shows it whole.
    const strip = page.getByRole('navigation', { name: 'Assembly pages' });
    const fit = () =>
      strip.evaluate((nav) => {
        const box = nav.getBoundingClientRect();
        const active = nav.querySelector('[aria-current="page"]')!;
        const tab = active.getBoundingClientRect();
        return {
          active: active.textContent,
          scrolls: nav.scrollWidth > nav.clientWidth,
          shown: tab.left >= box.left && tab.right <= box.right,
        };
      });
    // The address changes a moment before the page is drawn.
    await expect.poll(fit).toEqual({ active: 'Checks', scrolls: true, shown: true });

    // An edit on the build-up page: the bar is the live figure, More and Save on one line.
    await page.getByRole('link', { name: 'Build-up & R-value' }).click();
    await page.getByTestId('live-Reff').waitFor();
    await page.locator('input[name="name"]').fill('Edited at 390 px');
    const bar = page
      .getByRole('button', { name: 'Save as revision 2' })
      .locator('xpath=ancestor::div[contains(@class, "sticky")]');
    const note = page.getByLabel('Revision note');
    expect(await note.isVisible()).toBe(false);
    const height = (await bar.boundingBox())!.height;
    expect(height).toBeLessThan(viewport.height * 0.1);
    await page.getByRole('button', { name: 'More' }).click();
    expect(await note.isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Undo', exact: true }).isVisible()).toBe(true);
    await screenshot(page, 'phone-width-save-bar-more');
    expect(await sidewaysScroll(page)).toBeNull();
    expect(problems).toEqual([]);
  });
});
