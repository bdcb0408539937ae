import { randomUUID } from 'node:crypto';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { storeThenSave } from '@/server/storage';
import { makeTestApp } from './test-app';

// storeThenSave on the real object store (s3rver) and the real database: a probe table made inside the
// save stands for the rows (DDL is transactional in PostgreSQL, so it is gone again on a rollback).
let ctx: Awaited<ReturnType<typeof makeTestApp>>;
beforeAll(async () => {
  ctx = await makeTestApp();
});
afterAll(async () => {
  await ctx.jobs.stop();
  await ctx.db.destroy();
});

const s3 = new S3Client({ endpoint: 'http://127.0.0.1:4569', region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
const keysUnder = async (prefix: string) => ((await s3.send(new ListObjectsV2Command({ Bucket: 'keyoff', Prefix: prefix }))).Contents ?? []).map((o) => o.Key).sort();
const tableExists = async (name: string) => (await sql<{ t: string | null }>`select to_regclass(${name})::text as t`.execute(ctx.db)).rows[0].t !== null;

const objectsUnder = (prefix: string) => [
  { key: `${prefix}a.txt`, body: Buffer.from('first'), contentType: 'text/plain' },
  { key: `${prefix}b.txt`, body: Buffer.from('second'), contentType: 'text/plain' },
];

describe('storeThenSave', () => {
  it('keeps both objects and the rows when the transaction commits, and answers what the save answered', async () => {
    const prefix = `tests/storage/${randomUUID()}/`;
    const table = `probe_${randomUUID().replaceAll('-', '')}`;
    const answer = await storeThenSave({ db: ctx.db, storage: ctx.storage }, objectsUnder(prefix), async (trx) => {
      await sql`create table ${sql.table(table)} (id int)`.execute(trx);
      return 'saved';
    });
    try {
      expect(answer).toBe('saved');
      expect(await keysUnder(prefix)).toEqual([`${prefix}a.txt`, `${prefix}b.txt`]);
      expect(await tableExists(table)).toBe(true);
    } finally {
      await sql`drop table if exists ${sql.table(table)}`.execute(ctx.db);
      for (const key of await keysUnder(prefix)) await ctx.storage.remove(key!);
    }
  });

  it('removes every stored object and rolls the rows back when the transaction fails, passing its error on', async () => {
    const prefix = `tests/storage/${randomUUID()}/`;
    const table = `probe_${randomUUID().replaceAll('-', '')}`;
    const saving = storeThenSave({ db: ctx.db, storage: ctx.storage }, objectsUnder(prefix), async (trx) => {
      await sql`create table ${sql.table(table)} (id int)`.execute(trx);
      // Both objects are in the store while the transaction runs.
      expect(await keysUnder(prefix)).toHaveLength(2);
      throw new Error('the database refused');
    });
    await expect(saving).rejects.toThrow('the database refused');
    expect(await keysUnder(prefix)).toEqual([]);
    expect(await tableExists(table)).toBe(false);
  });
});
