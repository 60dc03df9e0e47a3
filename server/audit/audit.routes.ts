/** `GET /api/audit` (admin): the audit trail, newest first, with filters and keyset paging. */
import { Router } from 'express';
import { auditQuerySchema } from '@shared/schemas/audit';
import { readAuditTrail } from './audit.service';

export const auditRouter = Router();

auditRouter.get('/audit', async (req, res) => {
  res.json(await readAuditTrail(auditQuerySchema.parse(req.query)));
});
