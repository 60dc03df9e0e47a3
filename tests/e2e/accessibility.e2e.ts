/**
 * Every main screen, as each role sees it with the demo data, has no WCAG 2.1 level A or AA
 * violation that axe-core can detect ([S] W3C WCAG 2.1; rules and tags of axe-core 4.10, an
 * independent checker from the registry). Automated checks find only part of what WCAG asks;
 * keyboard use and labels are also checked in the journeys.
 */
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newLocalContext, useBrowser } from './support/browser';
import { apiGet, appUrl, signInByApi, type DemoRole } from './support/session';

const axeScript = createRequire(import.meta.url).resolve('axe-core/axe.min.js');

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[]; failureSummary?: string }[];
}

async function violationsOn(page: Page, pathname: string): Promise<string[]> {
  await page.goto(appUrl(pathname));
  await page.getByRole('heading', { level: 1 }).first().waitFor({ timeout: 30_000 });
  // Scan the page as it settles, not a loading state: no "Loading…" left (queries, lazy charts), and
  // every chart drawn (they draw once they have measured their box). Pages may keep polling, so no
  // wait for an idle network.
  await page.waitForFunction(
    () =>
      [...document.querySelectorAll('[role="status"]')].every((el) => !el.textContent?.startsWith('Loading')) &&
      [...document.querySelectorAll('figure')].every((figure) => figure.querySelector('svg path') !== null),
    undefined,
    { timeout: 30_000 },
  );
  await page.waitForTimeout(300);
  await page.addScriptTag({ path: axeScript });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, options: object) => Promise<{ violations: Violation[] }> } })
      .axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
      resultTypes: ['violations'],
    });
    return result.violations;
  });
  return violations.map(
    (v) => `${pathname}: ${v.id} (${v.impact}) ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`,
  );
}

describe('accessibility of the main screens', () => {
  const browser = useBrowser();

  async function scan(role: DemoRole, paths: (page: Page) => Promise<string[]>): Promise<void> {
    // axe is injected as a script tag, which the app's Content-Security-Policy rightly refuses: bypassed for the test only.
    const { context, offsite } = await newLocalContext(browser(), { bypassCSP: true });
    await signInByApi(context, role);
    const page = await context.newPage();
    await page.goto(appUrl('/'));
    const found: string[] = [];
    for (const pathname of await paths(page)) found.push(...(await violationsOn(page, pathname)));
    expect(found).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  }

  it('has none for the approver: overview, plans, a submitted plan, studies, a study, sign-off', async () => {
    await scan('approver', async (page) => {
      const plans = await apiGet<{ id: string; status: string }[]>(page, '/api/plans');
      const studies = await apiGet<{ id: string }[]>(page, '/api/studies');
      const submitted = plans.find((p) => p.status === 'submitted') ?? plans[0];
      return ['/', '/plans', `/plans/${submitted!.id}`, '/studies', `/studies/${studies[0]!.id}`, '/sign-off'];
    });
  }, 180_000);

  it('has none for the planner: the forms, sites, a site, profiles, a profile, a comparison', async () => {
    await scan('planner', async (page) => {
      const sites = await apiGet<{ id: string }[]>(page, '/api/sites');
      const profiles = await apiGet<{ id: string }[]>(page, `/api/sites/${sites[0]!.id}/profiles`);
      const plans = await apiGet<{ batteryId: string; deliveryStart: string; deliveryEnd: string }[]>(page, '/api/plans');
      const { batteryId, deliveryStart, deliveryEnd } = plans[0]!;
      const compare = `/plans/compare?${new URLSearchParams({ batteryId, deliveryStart, deliveryEnd }).toString()}`;
      return [
        '/plans/new',
        '/studies/new',
        '/sites',
        `/sites/${sites[0]!.id}`,
        '/profiles',
        `/profiles/${profiles[0]!.id}`,
        compare,
      ];
    });
  }, 180_000);

  it('has none for the admin: users, audit trail, mail outbox', async () => {
    await scan('admin', async () => ['/users', '/audit', '/mail']);
  }, 120_000);
});
