/**
 * Sends the sign-off e-mails after the action has committed, so nobody is
 * told about a change that rolled back. A failed delivery does not undo the
 * sign-off: it is logged and written to the audit trail, and the plan page and
 * the "awaiting my sign-off" list still show the plan.
 */
import type { PlanRow } from '../plans/plans.schema';
import { getDb } from '../db/client';
import { logger } from '../logger';
import { recordAudit } from '../audit/audit.service';
import { sendMail } from '../mail/mail.service';
import { planFacts } from './plan-facts';
import { decisionMail, planLink, submittedMail, type MailText, type PlanMailFacts } from './sign-off-mail';
import { findPeople, listSignOffRecipients } from '../users/users.repo';
import type { Actor } from '../http/request-context';

function mailFacts(actor: Actor, plan: PlanRow): PlanMailFacts {
  const facts = planFacts(plan);
  return {
    planId: plan.id,
    siteName: facts.siteName,
    batteryName: facts.batteryName,
    window: facts.window,
    link: planLink(actor.origin, plan.id),
  };
}

async function deliver(actor: Actor, plan: PlanRow, to: string, mail: MailText, purpose: string): Promise<void> {
  try {
    await sendMail({ to, subject: mail.subject, text: mail.text });
  } catch (error) {
    logger.error(`Could not send the ${purpose} e-mail for plan ${plan.id}`, error);
    try {
      await recordAudit(getDb(), actor, {
        action: 'mail.failed',
        entityType: 'plan',
        entityId: plan.id,
        details: { purpose, to },
      });
    } catch (auditError) {
      logger.error('Could not record the failed e-mail in the audit trail', auditError);
    }
  }
}

/** Every approver and admin except the submitter hears of the submitted plan, with a link to it. */
export async function notifySubmitted(actor: Actor, plan: PlanRow, comment: string | undefined): Promise<void> {
  const recipients = await listSignOffRecipients(getDb(), actor.id);
  const mail = submittedMail(mailFacts(actor, plan), actor.name, comment);
  await Promise.all(recipients.map((r) => deliver(actor, plan, r.email, mail, 'sign-off request')));
}

/** The submitter hears the decision, with the approver's comment. */
export async function notifyDecision(
  actor: Actor,
  plan: PlanRow,
  decision: 'approved' | 'rejected',
  comment: string | undefined,
): Promise<void> {
  if (!plan.submittedBy) return;
  const submitter = (await findPeople(getDb(), [plan.submittedBy])).get(plan.submittedBy);
  if (!submitter || submitter.disabled) return;
  const mail = decisionMail(
    mailFacts(actor, plan),
    decision,
    actor.name,
    comment,
    decision === 'approved' ? plan.checksum : null,
  );
  await deliver(actor, plan, submitter.email, mail, `plan ${decision}`);
}
