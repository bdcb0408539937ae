import { DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';

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
