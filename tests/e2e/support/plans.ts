/**
 * Plans on the demo scenario for the journeys that start from an existing plan: the demo
 * site's battery and its 15-minute price week (sample-data/README.md), one delivery day per
 * journey so journeys never supersede each other's approved plans.
 */
import { expect } from 'vitest';
import type { Page } from 'playwright-core';
import { apiGet, apiPostJson } from './session';

export const DEMO_SITE = 'Harbourside Depot';
export const DEMO_BATTERY = 'Depot battery 1';
export const DEMO_PRICE_WEEK = 'Prices week of 4 May 2026 (15 min)';

interface Named {
  id: string;
  name: string;
}
export interface DemoSources {
  siteId: string;
  batteryId: string;
  priceProfileId: string;
}

/** The demo site, battery and price week, looked up by name through the API. */
export async function demoSources(page: Page): Promise<DemoSources> {
  const site = (await apiGet<Named[]>(page, '/api/sites')).find((s) => s.name === DEMO_SITE);
  if (!site) throw new Error(`The demo site "${DEMO_SITE}" is missing: run the demo seeder.`);
  const battery = (await apiGet<Named[]>(page, `/api/sites/${site.id}/batteries`)).find((b) => b.name === DEMO_BATTERY);
  const price = (await apiGet<Named[]>(page, `/api/sites/${site.id}/profiles`)).find((p) => p.name === DEMO_PRICE_WEEK);
  if (!battery || !price) throw new Error('The demo battery or price week is missing: run the demo seeder.');
  return { siteId: site.id, batteryId: battery.id, priceProfileId: price.id };
}

export interface PlanRequest {
  deliveryStart: string;
  deliveryEnd: string;
  horizonHours: number;
  terminalRule: string;
  initialSocPct: number;
}

/** Queues a plan through `POST /api/plans` as the page's user and returns its id. */
export async function createPlan(page: Page, sources: DemoSources, plan: PlanRequest): Promise<string> {
  const created = await apiPostJson<{ plan: { id: string } }>(page, '/api/plans', {
    batteryId: sources.batteryId,
    priceProfileId: sources.priceProfileId,
    ...plan,
  });
  return created.plan.id;
}

export interface PlanState {
  id: string;
  status: string;
  version: number;
  job: { state: string } | null;
  results?: unknown;
}

/** Waits until the plan's job is done and returns the plan (status and version for sign-off calls). */
export async function waitForPlan(page: Page, id: string, timeout = 90_000): Promise<PlanState> {
  let plan: PlanState | undefined;
  await expect
    .poll(
      async () => {
        plan = await apiGet<PlanState>(page, `/api/plans/${id}`);
        return plan.job?.state ?? 'none';
      },
      { timeout, interval: 500, message: `plan ${id} to be computed` },
    )
    .toMatch(/^(completed|failed)$/);
  if (!plan?.results) throw new Error(`Plan ${id} has no results (job ${plan?.job?.state}).`);
  return plan;
}

/** Takes a computed plan through sign-off by API: the page's user submits, `approverPage`'s user approves. */
export async function submitAndApprove(submitterPage: Page, approverPage: Page, id: string): Promise<void> {
  const draft = await apiGet<{ version: number }>(submitterPage, `/api/plans/${id}/sign-off`);
  await apiPostJson(submitterPage, `/api/plans/${id}/submit`, { version: draft.version });
  const submitted = await apiGet<{ version: number }>(approverPage, `/api/plans/${id}/sign-off`);
  await apiPostJson(approverPage, `/api/plans/${id}/approve`, {
    version: submitted.version,
    comment: 'Approved for the export journey.',
  });
}
