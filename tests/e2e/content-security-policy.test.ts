import type { Browser, BrowserContext, Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { reevaluateTank } from '../../server/modules/concerns/reevaluate-tank';
import { DESK, launchBrowser, PHONE, signInOn } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { assignMentor, makeClub, makeMember } from '../helpers/factories';
import { signedIn } from '../helpers/http';
import { insertTank, insertWaterTest } from '../helpers/tank-rows';

/**
 * The built client under its own Content-Security-Policy (ASVS 3.4.3): every main page loads with 0 violations,
 * nothing comes from another origin, and stored text that looks like HTML stays text (ASVS 1.2.1): no script runs.
 */
const HOSTILE_NAME = '<img src=x onerror="window.__xss=1">Reef';
const HOSTILE_QUESTION = '<script>window.__xss=2</script>Is this fine?';

interface Watched {
  context: BrowserContext;
  page: Page;
  violations: () => Promise<string[]>;
  foreign: string[];
  errors: string[];
}

/** A context that records CSP violations (the DOM event and the console), requests to other origins and page errors. */
async function watchedContext(browser: Browser, viewport: typeof PHONE): Promise<Watched> {
  const base = inject('baseUrl');
  const context = await browser.newContext(viewport);
  await context.addInitScript(() => {
    const seen: string[] = [];
    Object.assign(window, { __cspViolations: seen });
    document.addEventListener('securitypolicyviolation', (e) =>
      seen.push(`${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  const foreign: string[] = [];
  const consoleViolations: string[] = [];
  const errors: string[] = [];
  // Nothing may come from the internet: every other origin is recorded and refused.
  await context.route(
    (url) => url.origin !== new URL(base).origin,
    (route) => {
      foreign.push(route.request().url());
      return route.abort();
    },
  );
  const page = await context.newPage();
  page.on('console', (m) => /Content Security Policy/i.test(m.text()) && consoleViolations.push(m.text()));
  page.on('pageerror', (e) => errors.push(e.message));
  const violations = async () => [
    ...consoleViolations,
    ...(await page.evaluate(() => (window as unknown as { __cspViolations: string[] }).__cspViolations)),
  ];
  return { context, page, violations, foreign, errors };
}

describe('Content-Security-Policy in Chromium', () => {
  let browser: Browser;
  let ds: DataSource;
  let keeperEmail: string;
  let mentorEmail: string;
  let tankId: string;
  let questionId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Policy Keepers');
    const keeper = await makeMember(ds, club, 'Petra Policy');
    const mentor = await makeMember(ds, club, 'Moss Mentor', 'mentor');
    await assignMentor(ds, club, mentor.user, keeper.user);
    keeperEmail = keeper.user.email;
    mentorEmail = mentor.user.email;
    tankId = await insertTank(ds, {
      clubId: club.id,
      ownerId: keeper.user.id,
      systemType: 'seahorse',
      name: HOSTILE_NAME,
    });
    const testId = await insertWaterTest(ds, tankId, new Date(Date.now() - 86_400_000), {
      nitrate: 20,
      pH: 8.1,
      temperature: 24.5,
      salinity: 33,
    });
    await ds.transaction((tx) => reevaluateTank(tx, tankId));
    const api = await signedIn(inject('baseUrl'), keeperEmail);
    const asked = await api.post(`/api/clubs/${club.id}/tanks/${tankId}/questions`, {
      title: HOSTILE_QUESTION,
      body: '<b onmouseover="window.__xss=3">bold?</b>',
      waterTestId: testId,
    });
    expect(asked.status).toBe(201);
    questionId = asked.body.question.id as string;
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when the document is served, then its policy allows scripts from our origin only', async () => {
    const res = await fetch(`${inject('baseUrl')}/tanks`);
    const csp = res.headers.get('content-security-policy') ?? '';
    const directive = (name: string) =>
      csp
        .split(';')
        .map((d) => d.trim())
        .find((d) => d.startsWith(`${name} `));
    expect(directive('script-src')).toBe("script-src 'self'");
    expect(directive('object-src')).toBe("object-src 'none'");
    expect(directive('base-uri')).toBe("base-uri 'none'");
    expect(directive('frame-ancestors')).toBe("frame-ancestors 'none'");
    expect(csp).not.toMatch(/unsafe-eval|\*/);
  });

  it('when a keeper and a mentor go through the main pages, then 0 violations, 0 foreign requests and no stored markup runs', async () => {
    const visits: [string, typeof PHONE, string, string[]][] = [
      [
        'keeper',
        PHONE,
        keeperEmail,
        [
          '/tanks',
          `/tanks/${tankId}`,
          `/tanks/${tankId}/tests/new`,
          `/tanks/${tankId}/entries/new`,
          '/questions',
          `/questions/${questionId}`,
          '/club',
          '/profile',
        ],
      ],
      [
        'mentor',
        DESK,
        mentorEmail,
        ['/desk', `/tanks/${tankId}`, '/club/profiles', `/questions/${questionId}`],
      ],
    ];
    const report: Record<string, { violations: string[]; errors: string[] }> = {};
    let foreign: string[] = [];
    for (const [who, viewport, email, paths] of visits) {
      const w = await watchedContext(browser, viewport);
      await signInOn(w.page, email, paths[0]!);
      await w.page.waitForURL((u) => u.pathname === paths[0]);
      for (const path of paths) {
        if (new URL(w.page.url()).pathname !== path) await w.page.goto(`${inject('baseUrl')}${path}`);
        await w.page.waitForLoadState('networkidle');
        await w.page.locator('main h1, main h2').first().waitFor();
        expect(new URL(w.page.url()).pathname, 'still signed in').toBe(path);
        report[`${who} ${path}`] = { violations: await w.violations(), errors: [...w.errors] };
        w.errors.length = 0;
        expect(
          await w.page.evaluate(() => (window as unknown as { __xss?: number }).__xss),
          `${who} ${path}`,
        ).toBeUndefined();
      }
      // The stored markup is shown as the text it is.
      await w.page.goto(`${inject('baseUrl')}/questions/${questionId}`);
      await w.page.getByText(HOSTILE_QUESTION).first().waitFor();
      foreign = foreign.concat(w.foreign);
      await w.context.close();
    }
    const pages = Object.keys(report).length;
    const bad = Object.entries(report).filter(([, r]) => r.violations.length || r.errors.length);
    console.info(
      `content security policy: ${pages} page visits, ${bad.length} with violations or errors, ${foreign.length} requests to other origins`,
    );
    expect(bad).toEqual([]);
    expect(foreign).toEqual([]);
  });

  it('when a page tries an inline script, then the policy blocks it and the watcher sees the violation (the check can fail)', async () => {
    const w = await watchedContext(browser, DESK);
    await w.page.goto(`${inject('baseUrl')}/sign-in`);
    await w.page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await w.page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__xss = 4';
      document.body.append(s);
    });
    await w.page.waitForTimeout(200);
    expect(await w.page.evaluate(() => (window as unknown as { __xss?: number }).__xss)).toBeUndefined();
    expect((await w.violations()).join(' ')).toMatch(/script-src/);
    await w.context.close();
  });
});
