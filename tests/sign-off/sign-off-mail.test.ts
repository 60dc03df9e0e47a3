/** The sign-off e-mails say what happened, carry a working link and the comment, and cannot be bent by names. */
import { describe, expect, it } from 'vitest';
import { decisionMail, planLink, submittedMail, type PlanMailFacts } from '../../server/sign-off/sign-off-mail';

const facts: PlanMailFacts = {
  planId: '0b6c5f8e-0000-4000-8000-000000000003',
  siteName: 'Harbour Road',
  batteryName: 'Unit 1',
  window: '2026-03-29 00:00 to 2026-03-30 00:00 (Europe/Berlin)',
  link: planLink('http://localhost:3000', '0b6c5f8e-0000-4000-8000-000000000003'),
};

describe('sign-off e-mails', () => {
  it('links to the plan page under the configured origin', () => {
    expect(facts.link).toBe('http://localhost:3000/plans/0b6c5f8e-0000-4000-8000-000000000003');
    expect(planLink('https://slackwater.example/', 'a b')).toBe('https://slackwater.example/plans/a%20b');
  });

  it('asks approvers to sign off, naming the submitter, the window and the link', () => {
    const mail = submittedMail(facts, 'Pat Planner', 'Spread looks wide tomorrow.');
    expect(mail.subject).toBe('Plan awaiting your sign-off: Harbour Road, 2026-03-29 00:00 to 2026-03-30 00:00 (Europe/Berlin)');
    expect(mail.text).toContain('Pat Planner submitted a plan for your sign-off.');
    expect(mail.text).toContain(facts.link);
    expect(mail.text).toContain('Spread looks wide tomorrow.');
  });

  it('tells the submitter the decision with the comment, and the checksum once approved', () => {
    const approved = decisionMail(facts, 'approved', 'Ada Approver', 'Go ahead.', 'f'.repeat(64));
    expect(approved.subject).toMatch(/^Plan approved: Harbour Road/);
    expect(approved.text).toContain('Comment: Go ahead.');
    expect(approved.text).toContain(`Checksum (SHA-256): ${'f'.repeat(64)}`);
    const rejected = decisionMail(facts, 'rejected', 'Ada Approver', 'SoC floor too low.', null);
    expect(rejected.text).toContain('Comment: SoC floor too low.');
    expect(rejected.text).toMatch(/copy the rejected plan into a new draft/);
  });

  it('keeps a line break in a name from adding header lines to the subject', () => {
    const mail = submittedMail({ ...facts, siteName: 'Harbour\r\nBcc: someone@example.com' }, 'Pat', undefined);
    expect(mail.subject).not.toMatch(/[\r\n]/);
    expect(mail.subject).toContain('Harbour Bcc: someone@example.com');
  });
});
