import { Router } from 'express';

import { openApiDocument } from '../openapi/document';

/** GET /api/openapi.json: open; the document is made once, from server/openapi and shared/api. */
export function openApiRouter(version: string) {
  const router = Router();
  let body: string | null = null;
  router.get('/', (_req, res) => {
    body ??= JSON.stringify(openApiDocument(version));
    res.type('json').send(body);
  });
  return router;
}
