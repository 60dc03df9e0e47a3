import { Router } from 'express';
import { databaseIsUp } from './health.service';

export const healthRouter = Router();

/** `{ok:true, db:"up"}` only when a query against PostgreSQL succeeds; 503 otherwise. */
healthRouter.get('/health', async (_req, res) => {
  if (await databaseIsUp()) res.json({ ok: true, db: 'up' });
  else res.status(503).json({ ok: false, db: 'down' });
});
