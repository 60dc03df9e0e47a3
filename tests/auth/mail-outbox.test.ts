/** `sendMail` through nodemailer and SMTP to the local fake server, and the admin's mail outbox. */
import { describe, expect, it } from 'vitest';
import { sendMail } from '../../server/mail/mail.service';
import { createTestApp } from '../support/test-app';
import { signInAs, waitForMail } from '../support/auth';

const app = createTestApp();

describe('sendMail and the mail outbox', () => {
  it('delivers text and HTML over SMTP to the fake server, which stores them before sendMail resolves', async () => {
    const to = `outbox-${Date.now()}@test.slackwater.example`;
    await sendMail({
      to,
      subject: 'Plan awaiting\r\nBcc: someone@evil.example',
      text: 'Line one\nLine two',
      html: '<p>Line one</p>',
    });
    const mail = await waitForMail(to, { timeoutMs: 0 });
    expect(mail.to).toBe(to);
    // A line break in a subject cannot add a header (ASVS 5.0 1.2.x, header injection).
    expect(mail.subject).toBe('Plan awaiting Bcc: someone@evil.example');
    expect(mail.text.trim()).toBe('Line one\nLine two');
    expect(mail.html).toContain('<p>Line one</p>');
  });

  it('is listed for admins, newest first, filtered by recipient, with each message readable', async () => {
    const admin = await signInAs(app, 'admin');
    const to = `listed-${admin.user.id.slice(0, 8)}@test.slackwater.example`;
    await sendMail({ to, subject: 'First', text: 'one' });
    await sendMail({ to, subject: 'Second', text: 'two' });
    const list = await admin.get('/api/mail/outbox').query({ to });
    expect(list.status).toBe(200);
    expect(list.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['Second', 'First']);
    const one = await admin.get(`/api/mail/outbox/${list.body.messages[0].id}`);
    expect(one.body).toMatchObject({ to, subject: 'Second', html: null });
    expect(one.body.text.trim()).toBe('two');
    expect((await admin.get('/api/mail/outbox/999999999999')).status).toBe(404);
    expect((await admin.get('/api/mail/outbox/abc')).status).toBe(404);
  });
});
