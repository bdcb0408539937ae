import { Router } from 'express';

import { analyzeReadings } from '@/shared/energy/readings';
import {
  analysisAnswerSchema,
  analyzeSchema,
  dropResultSchema,
  logPreviewSchema,
  logUploadFieldsSchema,
  photoAddedSchema,
  photoFieldsSchema,
  photoParamsSchema,
  photoUrlsSchema,
  readingAddedSchema,
  readingParamsSchema,
  readingSchema,
  readingsQuerySchema,
  readingsViewSchema,
  uploadParamsSchema,
  uploadResultSchema,
  voltageDropSchema,
} from '@/shared/api/readings';
import { LOG_LIMITS, PHOTO_LIMIT_BYTES } from '@/shared/schemas/reading';
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

  router.get('/readings', rigAccess(db, { rig: ['read'] }), handler({ query: readingsQuerySchema, response: readingsViewSchema }, ({ query, res }) =>
    readingsOf(db, storage, rigOf(res), actorOf(res), query.timeZone)));
  router.post('/readings', rigAccess(db, { reading: ['create'] }), handler({ body: readingSchema, response: readingAddedSchema, status: 201 }, async ({ body, res }) => {
    await readings.addSpotReading(ctx, rigOf(res), actorOf(res), body);
    return { ok: true as const };
  }));
  router.delete('/readings/:readingId', rigAccess(db, { reading: ['delete'] }), handler({ params: readingParamsSchema, status: 204 }, async ({ params, res }) => {
    await readings.removeSpotReading(ctx, rigOf(res), actorOf(res), params.readingId);
  }));
  // The drop test stores nothing: no margin check.
  router.post('/voltage-drop', rigAccess(db, { rig: ['read'] }), handler({ body: voltageDropSchema, response: dropResultSchema }, ({ body, res }) => readings.dropTestOn(db, rigOf(res), body)));

  router.post('/uploads/preview', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), handler({ response: logPreviewSchema }, ({ req, res }) => readings.previewLog(rigOf(res), req.file!.buffer)));
  router.post('/uploads', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), handler({ body: logUploadFieldsSchema, response: uploadResultSchema, status: 201 }, ({ body, req, res }) =>
    readings.uploadLog(ctx, storage, rigOf(res), actorOf(res), req.file!, body)));
  router.delete('/uploads/:uploadId', rigAccess(db, { reading: ['delete'] }), handler({ params: uploadParamsSchema, status: 204 }, async ({ params, res }) => {
    await readings.removeUpload(ctx, storage, rigOf(res), actorOf(res), params.uploadId, 'log');
  }));

  router.post('/photos', rigAccess(db, { reading: ['create'] }), singleFile(PHOTO_LIMIT_BYTES), handler({ body: photoFieldsSchema, response: photoAddedSchema, status: 201 }, ({ body, req, res }) =>
    readings.uploadPhoto(ctx, storage, rigOf(res), actorOf(res), req.file!, body.caption)));
  router.get('/photos/:photoId', rigAccess(db, { rig: ['read'] }), handler({ params: photoParamsSchema, response: photoUrlsSchema }, ({ params, res }) => readings.photoUrls(db, storage, rigOf(res), params.photoId)));
  router.delete('/photos/:photoId', rigAccess(db, { reading: ['delete'] }), handler({ params: photoParamsSchema, status: 204 }, async ({ params, res }) => {
    await readings.removeUpload(ctx, storage, rigOf(res), actorOf(res), params.photoId, 'photo');
  }));
  return router;
}

/** /api/readings/analyze: open, stores nothing. */
export function readingsAnalyzeRouter() {
  const router = Router();
  router.post('/analyze', handler({ body: analyzeSchema, response: analysisAnswerSchema }, ({ body }) => {
    const { spans: _spans, ...analysis } = analyzeReadings({ ...body, readings: body.readings.map((r) => ({ ...r, currentA: r.currentA ?? null, socPercent: r.socPercent ?? null })) });
    return analysis;
  }));
  return router;
}
