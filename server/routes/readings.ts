import { Router } from 'express';

import { analyzeReadings } from '@/shared/energy/readings';
import { analyzeSchema, logUploadFieldsSchema, LOG_LIMITS, PHOTO_LIMIT_BYTES, photoFieldsSchema, photoParamsSchema, readingParamsSchema, readingSchema, readingsQuerySchema, uploadParamsSchema, voltageDropSchema } from '@/shared/schemas/reading';
import type { AppContext } from '../context';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import { singleFile } from '../middleware/upload';
import { parsed, validate } from '../middleware/validate';
import * as readings from '../services/readings';
import { readingsOf } from '../services/readings-view';

/** /api/rigs/:rigId readings, log uploads and install photos (after requireSession). */
export function rigReadingsRouter({ db, storage }: AppContext) {
  const router = Router();
  const actor = (res: Parameters<typeof session>[0]) => ({ id: session(res).user.id, name: session(res).user.name });

  router.get('/:rigId/readings', rigAccess(db, { rig: ['read'] }), validate(readingsQuerySchema, 'query'), async (_req, res) => {
    res.json(await readingsOf(db, storage, rigOf(res), actor(res), parsed(res, readingsQuerySchema, 'query').timeZone));
  });
  router.post('/:rigId/readings', rigAccess(db, { reading: ['create'] }), validate(readingSchema), async (_req, res) => {
    await readings.addSpotReading(db, rigOf(res), actor(res), parsed(res, readingSchema));
    res.status(201).json({ ok: true });
  });
  router.delete('/:rigId/readings/:readingId', rigAccess(db, { reading: ['delete'] }), validate(readingParamsSchema, 'params'), async (_req, res) => {
    await readings.removeSpotReading(db, rigOf(res), actor(res), parsed(res, readingParamsSchema, 'params').readingId);
    res.status(204).end();
  });
  router.post('/:rigId/voltage-drop', rigAccess(db, { rig: ['read'] }), validate(voltageDropSchema), async (_req, res) => {
    res.json(await readings.dropTestOn(db, rigOf(res), parsed(res, voltageDropSchema)));
  });

  router.post('/:rigId/uploads/preview', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), async (req, res) => {
    res.json(await readings.previewLog(rigOf(res), req.file!.buffer));
  });
  router.post('/:rigId/uploads', rigAccess(db, { reading: ['create'] }), singleFile(LOG_LIMITS.bytes), validate(logUploadFieldsSchema), async (req, res) => {
    res.status(201).json(await readings.uploadLog(db, storage, rigOf(res), actor(res), req.file!, parsed(res, logUploadFieldsSchema)));
  });
  router.delete('/:rigId/uploads/:uploadId', rigAccess(db, { reading: ['delete'] }), validate(uploadParamsSchema, 'params'), async (_req, res) => {
    await readings.removeUpload(db, storage, rigOf(res), actor(res), parsed(res, uploadParamsSchema, 'params').uploadId, 'log');
    res.status(204).end();
  });

  router.post('/:rigId/photos', rigAccess(db, { reading: ['create'] }), singleFile(PHOTO_LIMIT_BYTES), validate(photoFieldsSchema), async (req, res) => {
    res.status(201).json(await readings.uploadPhoto(db, storage, rigOf(res), actor(res), req.file!, parsed(res, photoFieldsSchema).caption));
  });
  router.get('/:rigId/photos/:photoId', rigAccess(db, { rig: ['read'] }), validate(photoParamsSchema, 'params'), async (_req, res) => {
    res.json(await readings.photoUrls(db, storage, rigOf(res), parsed(res, photoParamsSchema, 'params').photoId));
  });
  router.delete('/:rigId/photos/:photoId', rigAccess(db, { reading: ['delete'] }), validate(photoParamsSchema, 'params'), async (_req, res) => {
    await readings.removeUpload(db, storage, rigOf(res), actor(res), parsed(res, photoParamsSchema, 'params').photoId, 'photo');
    res.status(204).end();
  });
  return router;
}

/** /api/readings/analyze: open, stores nothing. */
export function readingsAnalyzeRouter() {
  const router = Router();
  router.post('/analyze', validate(analyzeSchema), (_req, res) => {
    const input = parsed(res, analyzeSchema);
    const { spans: _spans, ...analysis } = analyzeReadings({ ...input, readings: input.readings.map((r) => ({ ...r, currentA: r.currentA ?? null, socPercent: r.socPercent ?? null })) });
    res.json(analysis);
  });
  return router;
}
