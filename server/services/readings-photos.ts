import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';

import type { Db } from '@/db/client';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { findUpload, insertUpload } from '../repositories/readings';
import { type Storage, storeThenSave } from '../storage';
import type { Actor } from './history';
import { cleanName, recordReadingChange } from './readings-shared';
import { rigChanged, type WriteCtx } from './rig-changed';

const PHOTO_TYPES = new Set(['image/jpeg', 'image/png']);
const HEIC_TYPES = ['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence', 'image/avif'];

/**
 * An install photo: JPEG or PNG by its bytes (HEIC refused with what to do), metadata stripped, a thumbnail
 * made. Both go to object storage first, and are removed again if the row cannot be saved (storeThenSave).
 */
export async function uploadPhoto(ctx: WriteCtx, storage: Storage, rig: RigAccess, actor: Actor, file: { buffer: Buffer; originalname: string }, caption: string) {
  const { db } = ctx;
  const detected = await fileTypeFromBuffer(file.buffer);
  if (detected && HEIC_TYPES.includes(detected.mime)) {
    throw new HttpError(415, 'unsupported_media_type', 'HEIC photos are not taken yet: export the photo as JPEG (on most phones: share it, or set the camera to "most compatible").', [{ path: 'file', message: 'HEIC is not supported; use JPEG or PNG.' }]);
  }
  if (!detected || !PHOTO_TYPES.has(detected.mime)) {
    throw new HttpError(415, 'unsupported_media_type', `This file is ${detected ? `a ${detected.ext.toUpperCase()}` : 'not an image'}; install photos are JPEG or PNG.`, [{ path: 'file', message: 'Use a JPEG or PNG photo.' }]);
  }
  let cleaned: Buffer;
  let thumb: Buffer;
  try {
    // Turned upright by its EXIF, then written without metadata (no GPS position leaves with the photo).
    cleaned = await sharp(file.buffer).rotate().toBuffer();
    thumb = await sharp(cleaned).resize({ width: 480, height: 480, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 75 }).toBuffer();
  } catch {
    throw new HttpError(415, 'unsupported_media_type', 'The image could not be read; it may be damaged.', [{ path: 'file', message: 'Unreadable image.' }]);
  }
  const id = randomUUID();
  const ext = detected.mime === 'image/png' ? 'png' : 'jpg';
  const key = `rigs/${rig.id}/photos/${id}.${ext}`;
  const thumbKey = `rigs/${rig.id}/photos/${id}-thumb.jpg`;
  const objects = [
    { key, body: cleaned, contentType: detected.mime },
    { key: thumbKey, body: thumb, contentType: 'image/jpeg' },
  ];
  const saved = await storeThenSave({ db, storage }, objects, async (trx) => {
    const row = await insertUpload(trx, { id, rig_id: rig.id, kind: 'photo', file_name: cleanName(file.originalname), content_type: detected.mime, size_bytes: cleaned.length, object_key: key, thumb_key: thumbKey, caption, created_by: actor.id, created_at: new Date() });
    await recordReadingChange(trx, rig, actor, 'reading-added', `added the photo ${row.file_name}${caption ? ` (${caption})` : ''}`);
    return { id: row.id };
  });
  rigChanged(ctx, rig.id);
  return saved;
}

/** Short-lived addresses of a photo and its thumbnail. */
export async function photoUrls(db: Db, storage: Storage, rig: RigAccess, photoId: string) {
  const photo = await findUpload(db, rig.id, photoId, 'photo');
  if (!photo) throw new HttpError(404, 'not_found', 'No such photo on this rig.');
  const full = await storage.signedUrl(photo.object_key, photo.file_name);
  const thumb = photo.thumb_key ? await storage.signedUrl(photo.thumb_key) : full;
  return { id: photo.id, url: full.url, thumbUrl: thumb.url, expiresAt: full.expiresAt, caption: photo.caption, fileName: photo.file_name };
}
