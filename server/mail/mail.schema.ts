import { bigserial, index, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Every message the local fake SMTP server received (development, demo, tests). */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    messageId: text('message_id'),
    from: text('from').notNull(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html'),
    sentAt: timestamp('sent_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('mail_outbox_to_idx').on(t.to), index('mail_outbox_sent_at_idx').on(t.sentAt)],
);
