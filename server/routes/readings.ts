import { Router } from 'express';

import { analyzeReadings } from '@/shared/energy/readings';
import { analyzeSchema, logUploadFieldsSchema, LOG_LIMITS, PHOTO_LIMIT_BYTES, photoFieldsSchema, photoParamsSchema, readingParamsSchema, readingSchema, readingsQuerySchema, uploadParamsSchema, voltageDropSchema } from '@/shared/schemas/reading';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import { singleFile } from '../middleware/upload';
import * as readings from '../services/readings';
import { readingsOf } from '../services/readings-view';

/** /api/rigs/:rigId readings, log uploads and install photos (after requireSession). */
export function rigReadingsRouter(ctx: AppContext) {
  const { db, storage } = ctx;
  const router = Router({ mergeParams: true });

  router.get('/readings', rigAccess(db, { rig: ['read'] }), handler({ query: readingsQuerySchema }, async ({ query, res }) => {
    res.json(await readingsOf(db, storage, rigOf(res), actorOf(res), query.timeZone));
  }));
  router.post('/readings', rigAccess(db, { reading: ['create'] }), handler({ body: readingSchema }, async ({ body, res }) => {
    await readings.addSpotReading(ctx, rigOf(res), actorOf(res), body);
    res.status(201).json({ ok: true });
  }));
  router.delete('/readings/:readingId', rigAccess(db, { reading: ['delete'] }), handler({ params: readingParamsSchema }, async ({ params, res }) => {
    await readings.removeSpotReading(ctx, rigOf(res), actorOf(res), params.readingId);
    res.status(204).end();
  }));
  // The drop test stores nothing: no margin check.
  router.post('/voltage-drop', rigAccess(db, { rig: ['read'] }), handler({ body: voltageDropSchema }, async ({ body, res }) => {
    res.json(await readings.dropTestOn(db, rigOf(res), body));
  }));

  router.post('/uploads/preview', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), async (req, res) => {
    res.json(await readings.previewLog(rigOf(res), req.file!.buffer));
  });
  router.post('/uploads', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), handler({ body: logUploadFieldsSchema }, async ({ body, req, res }) => {
    res.status(201).json(await readings.uploadLog(ctx, storage, rigOf(res), actorOf(res), req.file!, body));
  }));
  router.delete('/uploads/:uploadId', rigAccess(db, { reading: ['delete'] }), handler({ params: uploadParamsSchema }, async ({ params, res }) => {
    await readings.removeUpload(ctx, storage, rigOf(res), actorOf(res), params.uploadId, 'log');
    res.status(204).end();
  }));

  router.post('/photos', rigAccess(db, { reading: ['create'] }), singleFile(PHOTO_LIMIT_BYTES), handler({ body: photoFieldsSchema }, async ({ body, req, res }) => {
    res.status(201).json(await readings.uploadPhoto(ctx, storage, rigOf(res), actorOf(res), req.file!, body.caption));
  }));
  router.get('/photos/:photoId', rigAccess(db, { rig: ['read'] }), handler({ params: photoParamsSchema }, async ({ params, res }) => {
    res.json(await readings.photoUrls(db, storage, rigOf(res), params.photoId));
  }));
  router.delete('/photos/:photoId', rigAccess(db, { reading: ['delete'] }), handler({ params: photoParamsSchema }, async ({ params, res }) => {
    await readings.removeUpload(ctx, storage, rigOf(res), actorOf(res), params.photoId, 'photo');
    res.status(204).end();
  }));
  return router;
}

/** /api/readings/analyze: open, stores nothing. */
export function readingsAnalyzeRouter() {
  const router = Router();
  router.post('/analyze', handler({ body: analyzeSchema }, ({ body, res }) => {
    const { spans: _spans, ...analysis } = analyzeReadings({ ...body, readings: body.readings.map((r) => ({ ...r, currentA: r.currentA ?? null, socPercent: r.socPercent ?? null })) });
    res.json(analysis);
  }));
  return router;
}
