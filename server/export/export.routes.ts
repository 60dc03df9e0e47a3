/** `GET /api/plans/:id/export.csv`: RFC 4180 CSV with the checksum and status in headers. */
import { Router } from 'express';
import { actorOf } from '../http/request-context';
import { planPathId } from '../sign-off/plan-path-id';
import { CSV_MEDIA_TYPE } from './csv-writer';
import { exportPlan } from './export.service';

export const exportRouter = Router();

exportRouter.get('/plans/:id/export.csv', async (req, res) => {
  const id = planPathId(req);
  const file = await exportPlan(actorOf(req), id);
  res.setHeader('Content-Type', CSV_MEDIA_TYPE);
  // The name is ASCII by construction (export-file-name.ts), so the plain form of RFC 6266 suffices.
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  res.setHeader('X-Slackwater-Plan-Status', file.status);
  res.setHeader('X-Slackwater-Plan-Id', id);
  if (file.checksum) {
    res.setHeader('X-Slackwater-Checksum', `sha256=${file.checksum}`);
    res.setHeader('X-Slackwater-Checksum-Verified', 'true');
  }
  res.send(file.csv);
});
