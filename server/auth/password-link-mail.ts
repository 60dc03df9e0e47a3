/**
 * Invitation and reset e-mails. The token travels in the URL fragment (`#token=`), which
 * browsers never send to a server or put in a Referer header, so it stays out of access logs.
 */
import type { MailInput } from '../mail/mail.service';
import type { LinkPurpose } from './auth.repo';

export const linkLifetimeHours: Record<LinkPurpose, number> = { invite: 72, reset: 1 };

export function passwordLinkUrl(appOrigin: string, token: string): string {
  return new URL(`/set-password#token=${token}`, appOrigin).toString();
}

const oneLine = (s: string) => s.replace(/[\r\n\t\u2028\u2029]+/g, ' ').trim();
const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

export function passwordLinkMail(
  purpose: LinkPurpose,
  to: { email: string; name: string },
  url: string,
  invitedBy?: string,
): MailInput {
  const hours = linkLifetimeHours[purpose];
  const name = oneLine(to.name);
  const lines =
    purpose === 'invite'
      ? [
          `Hello ${name},`,
          '',
          `${invitedBy ? oneLine(invitedBy) : 'An administrator'} invited you to Slackwater, where battery dispatch plans are made and signed off.`,
          'Choose your password with this link:',
          '',
          url,
          '',
          `The link works once and expires in ${hours} hours. If you did not expect this invitation, ignore this e-mail.`,
        ]
      : [
          `Hello ${name},`,
          '',
          'Someone asked to reset the password of your Slackwater account. Choose a new password with this link:',
          '',
          url,
          '',
          `The link works once and expires in ${hours} hour${hours === 1 ? '' : 's'}. If you did not ask for it, ignore this e-mail: your password stays as it is.`,
        ];
  const text = lines.join('\n');
  const html = lines
    .map((l) => (l === url ? `<p><a href="${escapeHtml(url)}">${escapeHtml(url)}</a></p>` : l ? `<p>${escapeHtml(l)}</p>` : ''))
    .join('\n');
  return {
    to: to.email,
    subject: purpose === 'invite' ? 'Your invitation to Slackwater' : 'Reset your Slackwater password',
    text,
    html,
  };
}
