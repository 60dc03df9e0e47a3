/**
 * `POST|GET /api/sites/:id/profiles`, `GET /api/profiles/:id`,
 * plus `GET /api/profiles/:id/original` (the file as uploaded) and
 * `DELETE /api/profiles/:id`.
 */
import { Router } from 'express';
import { profileListQuerySchema, profileWindowQuerySchema } from '@shared/schemas/profile';
import { actorOf, pathId } from '../http/request-context';
import { honourIdempotencyKey } from '../idempotency/idempotency-key';
import { receiveProfileUpload } from './profile-upload.middleware';
import { uploadProfile } from './profile-upload.service';
import * as service from './profiles.service';

export const profilesRouter = Router();

profilesRouter.post('/sites/:id/profiles', receiveProfileUpload, honourIdempotencyKey({ forUploads: true }), async (req, res) => {
  const siteId = pathId(req, 'site');
  const { id, created } = await uploadProfile(siteId, req.file, req.body ?? {}, actorOf(req));
  // 200 when the same file was already stored (a retried push): the existing profile, no duplicate.
  res.status(created ? 201 : 200).json(await service.getProfileSummary(id));
});

profilesRouter.get('/sites/:id/profiles', async (req, res) => {
  const siteId = pathId(req, 'site');
  const { kind } = profileListQuerySchema.parse(req.query);
  res.json(await service.listSiteProfiles(siteId, kind));
});

profilesRouter.get('/profiles/:id', async (req, res) => {
  const id = pathId(req, 'profile');
  res.json(await service.getProfile(id, profileWindowQuerySchema.parse(req.query)));
});

profilesRouter.get('/profiles/:id/original', async (req, res) => {
  const file = await service.getOriginalFile(pathId(req, 'profile'));
  res.attachment(file.filename);
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Digest', `sha-256=${Buffer.from(file.sha256, 'hex').toString('base64')}`);
  res.send(file.file);
});

profilesRouter.delete('/profiles/:id', async (req, res) => {
  await service.deleteProfile(pathId(req, 'profile'), actorOf(req));
  res.status(204).end();
});
