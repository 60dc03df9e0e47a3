import { Router } from 'express';
import { sql } from 'drizzle-orm';
import { getDb } from '../db/client';

export const healthRouter = Router();

/** `{ok:true, db:"up"}` only when a query against PostgreSQL succeeds; 503 otherwise. */
healthRouter.get('/health', async (_req, res) => {
  try {
    await getDb().execute(sql`select 1`);
    res.json({ ok: true, db: 'up' });
  } catch {
    res.status(503).json({ ok: false, db: 'down' });
  }
});
