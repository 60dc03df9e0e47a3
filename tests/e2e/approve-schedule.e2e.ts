/**
 * Journey 3: the planner submits a computed plan; the approver, in a browser
 * context of their own, opens the link from the e-mail the fake SMTP server caught,
 * signs in, reviews the charts and cautions and signs off; the planner's open page shows
 * the new status; a viewer sees no sign-off buttons and the API refuses them (403,
 * the roles: only approvers and admins approve or reject, only planners submit).
 */
import { describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newLocalContext, screenshot, withFailureShots, useBrowser } from './support/browser';
import { lastMailId, waitForMail } from './support/mail';
import { createPlan, demoSources } from './support/plans';
import { apiPost, appUrl, demoEmail, demoPassword, signIn, signInByApi } from './support/session';

/** The delivery day of this journey (others use other days of the demo price week). */
const day = { deliveryStart: '2026-05-06T00:00:00+02:00', deliveryEnd: '2026-05-07T00:00:00+02:00' };

const signOffPanel = (page: Page) => page.getByRole('region', { name: 'Sign-off' });
const statusBadge = (page: Page, label: string) => signOffPanel(page).getByText(label, { exact: true });

describe('approving a schedule', () => {
  const browser = useBrowser();

  it('goes from the planner’s submission through the e-mailed link to the approver’s sign-off, and refuses a viewer', async () => {
    const planner = await newLocalContext(browser());
    const approver = await newLocalContext(browser());
    const viewer = await newLocalContext(browser());
    const plannerPage = await planner.context.newPage();
    const approverPage = await approver.context.newPage();
    const viewerPage = await viewer.context.newPage();
    await withFailureShots(
      'approve',
      () => [plannerPage, approverPage, viewerPage],
      async () => {
        // The planner has a computed draft plan open.
        await signIn(plannerPage, 'planner');
        const planId = await createPlan(plannerPage, await demoSources(plannerPage), {
          ...day,
          horizonHours: 48,
          terminalRule: 'steady-value',
          initialSocPct: 50,
        });
        await plannerPage.goto(appUrl(`/plans/${planId}`));
        await plannerPage.getByRole('heading', { name: 'Schedule' }).waitFor({ timeout: 90_000 });
        await statusBadge(plannerPage, 'Draft: not approved').waitFor();

        // Submit with a comment, keyboard only once in the comment box.
        const approverEmail = demoEmail('approver');
        const mailBefore = await lastMailId(approverEmail);
        const comment = signOffPanel(plannerPage).getByLabel('Comment (optional)');
        await comment.fill('Morning peak covered; please check the evening discharge.');
        await comment.press('Tab');
        await expect.poll(() => plannerPage.evaluate(() => document.activeElement?.textContent)).toBe('Submit for sign-off');
        await plannerPage.keyboard.press('Enter');
        await statusBadge(plannerPage, 'Submitted: awaiting sign-off').waitFor();
        expect(await signOffPanel(plannerPage).getByRole('button', { name: 'Approve' }).count()).toBe(0); // never one's own plan
        await screenshot(plannerPage, 'approve-1-planner-submitted');

        // The e-mail to the approver links to the plan page on this server.
        const mail = await waitForMail(approverEmail, /^Plan awaiting your sign-off: Harbourside Depot/, mailBefore);
        const link = /Open the plan to approve or reject it: (\S+)/.exec(mail.text)?.[1] ?? '';
        expect(new URL(link).origin).toBe(new URL(inject('baseUrl')).origin);
        expect(new URL(link).pathname).toBe(`/plans/${planId}`);
        expect(mail.text).toContain('Morning peak covered');

        // The approver, not signed in yet, follows the link, signs in and lands on the plan.
        await approverPage.goto(link);
        await approverPage.getByRole('heading', { name: 'Sign in' }).waitFor();
        await approverPage.getByLabel('E-mail address').fill(approverEmail);
        await approverPage.getByLabel('Password').fill(demoPassword);
        await approverPage.keyboard.press('Enter');
        await approverPage.waitForURL(new RegExp(`/plans/${planId}$`));
        await approverPage.getByRole('heading', { name: 'Schedule' }).waitFor({ timeout: 60_000 });

        // Reviews the charts (each with its table as text alternative) and the cautions.
        for (const chart of ['Price and dispatch', 'State of charge against the steady cycle']) {
          const figure = approverPage.getByRole('figure', { name: new RegExp(chart) });
          await figure.locator('svg path').first().waitFor({ timeout: 30_000 });
          expect((await figure.boundingBox())?.height ?? 0).toBeGreaterThan(120); // drawn at its height, not collapsed
        }
        await approverPage.getByRole('table', { name: /Schedule/ }).waitFor();
        // The page's own links lead to the cautions (one full list, pointed to from the sign-off panel).
        await approverPage.getByRole('navigation', { name: 'On this page' }).getByRole('link', { name: 'Cautions' }).click();
        await approverPage.waitForURL(/#cautions-heading$/);
        expect(await approverPage.getByRole('heading', { name: 'Cautions' }).isVisible()).toBe(true);
        const cautions = approverPage.getByRole('note', { name: 'Before you sign off' });
        expect(await cautions.innerText()).toMatch(/interconnection agreement[\s\S]*operating limits[\s\S]*fire and safety/);
        await expect
          .poll(() => approverPage.getByRole('region', { name: 'Cautions' }).innerText())
          .toMatch(/qualified personnel decide dispatch/);
        await statusBadge(approverPage, 'Submitted: awaiting sign-off').waitFor();
        await screenshot(approverPage, 'approve-2-approver-reviews');

        // Signs off: the button waits for the confirmation box (Space ticks it).
        const approve = signOffPanel(approverPage).getByRole('button', { name: 'Approve' });
        expect(await approve.isDisabled()).toBe(true);
        await signOffPanel(approverPage)
          .getByLabel('Comment (required to reject; the planner receives it)')
          .fill('Checked against the site limits.');
        await signOffPanel(approverPage)
          .getByRole('checkbox', { name: /I have checked this schedule/ })
          .press('Space');
        await approve.click();
        await statusBadge(approverPage, 'Approved').waitFor();
        const checksum = await signOffPanel(approverPage)
          .getByText(/^[0-9a-f]{64}$/)
          .innerText();
        await signOffPanel(approverPage).getByText('Verified just now').waitFor();
        await screenshot(approverPage, 'approve-3-approver-signed-off');

        // The planner's page, left open, shows the decision with the same checksum.
        await statusBadge(plannerPage, 'Approved').waitFor({ timeout: 60_000 });
        await signOffPanel(plannerPage).getByText(checksum).waitFor();
        await signOffPanel(plannerPage)
          .getByRole('definition')
          .filter({ hasText: 'Checked against the site limits.' })
          .first()
          .waitFor();
        await screenshot(plannerPage, 'approve-4-planner-sees-approval');

        // A viewer sees the plan but no sign-off buttons, and the API refuses every action.
        await signInByApi(viewer.context, 'viewer');
        await viewerPage.goto(appUrl(`/plans/${planId}`));
        await statusBadge(viewerPage, 'Approved').waitFor({ timeout: 60_000 });
        for (const name of ['Submit for sign-off', 'Approve', 'Reject', 'Copy into a new draft']) {
          expect(await viewerPage.getByRole('button', { name }).count()).toBe(0);
        }
        // The viewer reads the same charts (drawn once the figure has measured its width).
        await viewerPage
          .getByRole('figure', { name: /Price and dispatch/ })
          .locator('svg path')
          .first()
          .waitFor({ timeout: 30_000 });
        await screenshot(viewerPage, 'approve-5-viewer');
        for (const action of ['submit', 'approve', 'reject']) {
          const response = await apiPost(viewerPage, `/api/plans/${planId}/${action}`, { version: 1, comment: 'viewer tries' });
          expect(response.status(), `viewer ${action}`).toBe(403);
        }
      },
    );

    for (const { offsite } of [planner, approver, viewer]) expect(offsite).toEqual([]);
    await Promise.all([planner.context.close(), approver.context.close(), viewer.context.close()]);
  });
});
