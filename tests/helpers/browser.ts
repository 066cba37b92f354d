import { mkdirSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import type { Result } from 'axe-core';
import { onTestFinished } from 'vitest';
import { TEST_PASSWORD } from './factories';
import {
  chromium,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Page,
} from 'playwright-core';

export const ARTIFACTS = 'tests/e2e/artifacts';

/** Debian's Chromium, with the flags this closed network needs. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
      '--disable-gpu',
    ],
  });
}

export const PHONE: BrowserContextOptions = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 2,
  isMobile: true,
  hasTouch: true,
};
export const DESK: BrowserContextOptions = { viewport: { width: 1280, height: 800 } };

/** The whole page by default; `{ fullPage: false }` for what is on screen, e.g. a modal dialog over the page. */
export async function screenshot(page: Page, name: string, { fullPage = true } = {}): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = `${ARTIFACTS}/${name}.png`;
  await page.screenshot({ path, fullPage });
  return path;
}

/** A request the test makes fail on purpose (a stranger's 403, a send cut off), matched on its path. */
export interface ExpectedFailure {
  path: RegExp;
  /** The HTTP status; leave out for a request that never got an answer (aborted by the test). */
  status?: number;
}

/** Every signed-in page starts as a visitor: the first GET /api/me answers 401 before the sign-in form. */
const VISITOR_CHECK: ExpectedFailure = { path: /^\/api\/me$/, status: 401 };

export interface PageGuard {
  /** Names a failure this test causes; anything else that fails is a bug. */
  expectFailure(failure: ExpectedFailure): void;
  /** Console errors, uncaught exceptions and failed requests seen so far that no test asked for. */
  problems(): string[];
}

/**
 * Watches a page for console errors, uncaught exceptions and failed requests (no answer, or a status of 400 and up).
 * Failures are judged when the test asks, so a test may name the one it causes at any point.
 * A request cancelled because the page moved on (`net::ERR_ABORTED`) is the browser tidying up, not a failure.
 */
export function guardPage(page: Page, expected: ExpectedFailure[] = [VISITOR_CHECK]): PageGuard {
  const found: string[] = [];
  const failed: { url: string; status?: number; what: string }[] = [];
  // The browser echoes every failed resource in the console, sometimes before the response event: those lines
  // are judged by their request.
  const echoed: string[] = [];
  page.on('pageerror', (e) => found.push(`uncaught: ${e.message}`));
  page.on('response', (res) => {
    if (res.status() >= 400)
      failed.push({
        url: res.url(),
        status: res.status(),
        what: `${res.request().method()} ${new URL(res.url()).pathname} answered ${res.status()}`,
      });
  });
  page.on('requestfailed', (req) => {
    const reason = req.failure()?.errorText ?? 'failed';
    if (reason !== 'net::ERR_ABORTED')
      failed.push({
        url: req.url(),
        what: `${req.method()} ${new URL(req.url()).pathname} failed: ${reason}`,
      });
  });
  page.on('console', (m) => {
    if (m.type() !== 'error') return;
    if (/^Failed to load resource/.test(m.text())) echoed.push(m.location().url);
    else found.push(`console: ${m.text()}`);
  });
  const isExpected = (url: string, status?: number) =>
    expected.some(
      (e) => e.path.test(new URL(url).pathname) && (e.status === undefined || e.status === status),
    );
  return {
    expectFailure: (failure) => void expected.push(failure),
    problems: () => [
      ...found,
      ...failed.filter((f) => !isExpected(f.url, f.status)).map((f) => f.what),
      ...echoed
        .filter((url) => !failed.some((f) => f.url === url))
        .map((url) => `console: failed to load ${url}`),
    ],
  };
}

/**
 * A fresh context and page on `viewport`, guarded: when the test ends it fails on anything the guard saw,
 * and the context closes.
 */
export async function openPage(
  browser: Browser,
  viewport: BrowserContextOptions,
): Promise<{ context: BrowserContext; page: Page; guard: PageGuard }> {
  const context = await browser.newContext(viewport);
  const page = await context.newPage();
  const guard = guardPage(page);
  onTestFinished(async () => {
    const problems = guard.problems();
    await context.close();
    if (problems.length) throw new Error(`The page reported problems:\n- ${problems.join('\n- ')}`);
  });
  return { context, page, guard };
}

const WCAG_21_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

const describeViolation = (v: Result) =>
  `${v.id} (${v.impact ?? 'unrated'}): ${v.help}\n    ${v.nodes
    .slice(0, 5)
    .map((n) => `${n.target.join(' ')} — ${n.failureSummary?.replace(/\s+/g, ' ') ?? ''}`)
    .join('\n    ')}`;

/**
 * Runs axe-core's WCAG 2.1 A and AA rules on the page as it is now, in the light and the dark colour scheme,
 * and fails listing every violation.
 */
export async function expectAccessible(page: Page, what = new URL(page.url()).pathname): Promise<void> {
  const failures: string[] = [];
  // Colours ease between schemes (transition-colors); judge the settled colours, not a frame half-way.
  const still = await page.addStyleTag({
    content: '*, *::before, *::after { transition: none !important; animation: none !important; }',
  });
  for (const colorScheme of ['light', 'dark'] as const) {
    await page.emulateMedia({ colorScheme });
    const { violations } = await new AxeBuilder({ page }).withTags(WCAG_21_AA).analyze();
    failures.push(...violations.map((v) => `[${colorScheme}] ${describeViolation(v)}`));
  }
  await page.emulateMedia({ colorScheme: null });
  await still.evaluate((style) => (style as Element).remove());
  if (failures.length) throw new Error(`Accessibility violations on ${what}:\n${failures.join('\n')}`);
}

/** Opens `path` as a visitor and signs in on the form it is sent to, the way a person would. */
export async function signInOn(
  page: Page,
  email: string,
  path: string,
  password = TEST_PASSWORD,
): Promise<void> {
  const { inject } = await import('vitest');
  await page.goto(`${inject('baseUrl')}${path}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** A guarded page (see openPage) signed in as `email` and landed on `path`. */
export async function openSignedIn(
  browser: Browser,
  viewport: BrowserContextOptions,
  email: string,
  path: string,
): Promise<{ context: BrowserContext; page: Page; guard: PageGuard }> {
  const opened = await openPage(browser, viewport);
  await signInOn(opened.page, email, path);
  await opened.page.waitForURL((u) => u.pathname === path);
  return opened;
}
