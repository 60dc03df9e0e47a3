/**
 * The sign-off e-mails (issue 7): approvers hear of a submitted plan with a
 * link to it; the submitter hears the decision with the approver's comment.
 * Plain text only, so no user-written text can become markup; line breaks in
 * names are flattened so they cannot forge mail headers or extra lines in the
 * subject (ASVS 5.0 1.2.x, output encoding for the target context).
 */

export interface PlanMailFacts {
  readonly planId: string;
  readonly siteName: string;
  readonly batteryName: string;
  /** Delivery window as the site's local time, e.g. "2026-03-29 00:00 to 2026-03-30 00:00 (Europe/Berlin)". */
  readonly window: string;
  /** Absolute link to the plan page. */
  readonly link: string;
}

export interface MailText {
  readonly subject: string;
  readonly text: string;
}

const oneLine = (s: string): string => s.replace(/[\r\n\t\u2028\u2029]+/g, ' ').trim();

/** Absolute link to a plan page from the configured app origin. */
export function planLink(appOrigin: string, planId: string): string {
  return new URL(`/plans/${encodeURIComponent(planId)}`, appOrigin).toString();
}

export function submittedMail(facts: PlanMailFacts, submitter: string, comment: string | undefined): MailText {
  const lines = [
    `${oneLine(submitter)} submitted a plan for your sign-off.`,
    '',
    `Site: ${oneLine(facts.siteName)}`,
    `Battery: ${oneLine(facts.batteryName)}`,
    `Delivery window: ${facts.window}`,
  ];
  if (comment) lines.push('', 'Comment from the planner:', comment);
  lines.push(
    '',
    `Open the plan to approve or reject it: ${facts.link}`,
    '',
    'You cannot sign off a plan you submitted yourself.',
  );
  return {
    subject: oneLine(`Plan awaiting your sign-off: ${facts.siteName}, ${facts.window}`),
    text: lines.join('\n'),
  };
}

export function decisionMail(
  facts: PlanMailFacts,
  decision: 'approved' | 'rejected',
  approver: string,
  comment: string | undefined,
  checksum: string | null,
): MailText {
  const lines = [
    `${oneLine(approver)} ${decision} your plan.`,
    '',
    `Site: ${oneLine(facts.siteName)}`,
    `Battery: ${oneLine(facts.batteryName)}`,
    `Delivery window: ${facts.window}`,
  ];
  lines.push('', comment ? `Comment: ${comment}` : 'No comment was given.');
  if (decision === 'approved' && checksum) lines.push('', `Checksum (SHA-256): ${checksum}`);
  if (decision === 'rejected') lines.push('', 'You can copy the rejected plan into a new draft, change it and submit it again.');
  lines.push('', `Open the plan: ${facts.link}`);
  return {
    subject: oneLine(`Plan ${decision}: ${facts.siteName}, ${facts.window}`),
    text: lines.join('\n'),
  };
}
