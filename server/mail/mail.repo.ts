import { desc, eq, ilike } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { mailOutbox } from './mail.schema';

export type NewMail = typeof mailOutbox.$inferInsert;

export async function insertMail(db: DbOrTx, mail: NewMail) {
  await db.insert(mailOutbox).values(mail);
}

const likeLiteral = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function listMail(db: DbOrTx, filter: { to?: string; limit: number }) {
  return db
    .select({
      id: mailOutbox.id,
      from: mailOutbox.from,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      sentAt: mailOutbox.sentAt,
    })
    .from(mailOutbox)
    .where(filter.to ? ilike(mailOutbox.to, `%${likeLiteral(filter.to)}%`) : undefined)
    .orderBy(desc(mailOutbox.id))
    .limit(filter.limit);
}

export async function findMail(db: DbOrTx, id: number) {
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id));
  return row;
}
