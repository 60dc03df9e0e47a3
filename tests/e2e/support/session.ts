/**
 * Signing the demo accounts in for the journeys, and calling the API as the page's user.
 * `page.request` shares the browser context's cookies, so API checks run with the same
 * session the screen uses; state-changing calls carry the app's Origin (CSRF check).
 */
import { inject } from 'vitest';
import type { APIResponse, BrowserContext, Page } from 'playwright-core';

export type DemoRole = 'viewer' | 'planner' | 'approver' | 'admin';

/** The demo accounts' shared password (server/demo/demo-accounts.ts; demo only). */
export const demoPassword = 'slackwater-demo';
export const demoEmail = (role: DemoRole) => `${role}@slackwater.example`;

export const appUrl = (pathname = '/') => new URL(pathname, inject('baseUrl')).toString();

/** Signs in through the form with the keyboard (Tab between fields, Enter to send) and waits for the main navigation. */
export async function signIn(page: Page, role: DemoRole, next = '/'): Promise<void> {
  await page.goto(appUrl(`/sign-in?next=${encodeURIComponent(next)}`));
  await page.getByLabel('E-mail address').fill(demoEmail(role));
  await page.getByLabel('E-mail address').press('Tab');
  await page.keyboard.type(demoPassword);
  await page.keyboard.press('Enter');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link').first().waitFor();
}

/** Signs a second context in through the API only (faster, for roles whose sign-in screen is not under test). */
export async function signInByApi(context: BrowserContext, role: DemoRole): Promise<void> {
  const response = await context.request.post(appUrl('/api/auth/sign-in'), {
    data: { email: demoEmail(role), password: demoPassword },
    headers: { Origin: inject('baseUrl') },
  });
  if (!response.ok()) throw new Error(`Signing in ${role} failed: ${response.status()} ${await response.text()}`);
}

async function json<T>(response: APIResponse, what: string): Promise<T> {
  if (!response.ok()) throw new Error(`${what} answered ${response.status()}: ${await response.text()}`);
  return (await response.json()) as T;
}

/** GET an API path as the page's signed-in user; throws with the body on a non-2xx answer. */
export async function apiGet<T>(page: Page, pathname: string): Promise<T> {
  return json<T>(await page.request.get(appUrl(pathname)), `GET ${pathname}`);
}

/** POST as the page's user with the app's Origin; returns the raw response so refusals can be asserted. */
export function apiPost(page: Page, pathname: string, data: unknown): Promise<APIResponse> {
  return page.request.post(appUrl(pathname), { data, headers: { Origin: inject('baseUrl') } });
}

export async function apiPatchJson<T>(page: Page, pathname: string, data: unknown): Promise<T> {
  return json<T>(
    await page.request.patch(appUrl(pathname), { data, headers: { Origin: inject('baseUrl') } }),
    `PATCH ${pathname}`,
  );
}

export async function apiPostJson<T>(page: Page, pathname: string, data: unknown): Promise<T> {
  return json<T>(await apiPost(page, pathname, data), `POST ${pathname}`);
}
