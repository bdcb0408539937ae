import { Router } from 'express';

import { handler } from '../http/handler';
import { openApiDocument } from '../openapi/document';

/** GET /api/openapi.json: open; the document is made once, from server/openapi and shared/api. */
export function openApiRouter(version: string) {
  const router = Router();
  let body: string | null = null;
  router.get('/', handler({}, ({ res }) => {
    body ??= JSON.stringify(openApiDocument(version));
    res.type('json').send(body);
  }));
  return router;
}
