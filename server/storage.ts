import { DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';

import type { Db } from '@/db/client';
import type { Config } from './config';
import { HttpError } from './errors';

export type Storage = {
  put: (key: string, body: Buffer, contentType: string) => Promise<void>;
  remove: (key: string) => Promise<void>;
  /** A short-lived address a browser can load the object from (SIGNED_URL_SECONDS). */
  signedUrl: (key: string, downloadName?: string) => Promise<{ url: string; expiresAt: string }>;
  ping: () => Promise<boolean>;
};

/** Objects through @aws-sdk/client-s3 (path-style, so s3rver and other S3-compatible stores answer). */
export function createStorage(config: Config): Storage {
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
    maxAttempts: 2,
  });
  const unavailable = (err: unknown) => new HttpError(503, 'storage_unavailable', `File storage is not answering; nothing was saved. Try again in a moment. (${err instanceof Error ? err.name : 'error'})`);
  return {
    async put(key, body, contentType) {
      try {
        await client.send(new PutObjectCommand({ Bucket: config.S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
      } catch (err) {
        throw unavailable(err);
      }
    },
    async remove(key) {
      await client.send(new DeleteObjectCommand({ Bucket: config.S3_BUCKET, Key: key }));
    },
    async signedUrl(key, downloadName) {
      const url = await getSignedUrl(
        client,
        new GetObjectCommand({ Bucket: config.S3_BUCKET, Key: key, ...(downloadName ? { ResponseContentDisposition: `inline; filename="${downloadName}"` } : {}) }),
        { expiresIn: config.SIGNED_URL_SECONDS },
      );
      return { url, expiresAt: new Date(Date.now() + config.SIGNED_URL_SECONDS * 1000).toISOString() };
    },
    async ping() {
      try {
        await client.send(new HeadBucketCommand({ Bucket: config.S3_BUCKET }));
        return true;
      } catch {
        return false;
      }
    },
  };
}

export type StoredObject = { key: string; body: Buffer; contentType: string };

/**
 * Puts the objects in the store, then saves their rows in one database transaction; if a put or the
 * transaction fails, the objects already stored are removed again (a removal that fails is left to the
 * store's own clean-up) and the error goes on: no row without its object, no object without its row.
 */
export async function storeThenSave<T>(ctx: { db: Db; storage: Storage }, objects: StoredObject[], save: (trx: Db) => Promise<T>): Promise<T> {
  const stored: string[] = [];
  try {
    for (const o of objects) {
      await ctx.storage.put(o.key, o.body, o.contentType);
      stored.push(o.key);
    }
    return await ctx.db.transaction().execute(save);
  } catch (err) {
    for (const key of stored) await ctx.storage.remove(key).catch(() => undefined);
    throw err;
  }
}
