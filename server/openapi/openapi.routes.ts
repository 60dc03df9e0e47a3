/** `GET /api/openapi.json`: the OpenAPI 3.1 description of every route, for anyone signed in. */
import { Router } from 'express';
import { openApiDocument } from './openapi-document';

export const openApiRouter = Router();

openApiRouter.get('/openapi.json', (_req, res) => {
  res.json(openApiDocument());
});
