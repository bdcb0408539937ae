import { HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { unsubscribeToken } from '@/server/emails/unsubscribe';
import { figuresOfRigs } from '@/server/jobs/figures';
import { sendReport } from '@/server/jobs/reports';
import { withHousehold } from '../fixtures';
import { agentFor, signIn, WREN_POWER } from '../helpers';
import { mailsTo } from '../jobs/helpers';
import { TEST_ORIGIN } from '../test-app';

const { ctx, fx } = withHousehold();

describe('e-mails on the Reports screen carry no personal link (issue 15, item 3)', () => {
  it('shows the household the owner’s report without the owner’s unsubscribe link; links expire', async () => {
    const rig = await ctx.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', fx.rigId).executeTakeFirstOrThrow();
    const figures = (await figuresOfRigs(ctx.db, [rig])).get(fx.rigId)!;
    const weekKey = `privacy-${Date.now()}`;
    expect(await sendReport(ctx, { userId: fx.users.owner.id, rigId: fx.rigId, weekKey, scheduledFor: new Date().toISOString(), figures })).toBe('sent');
    // The e-mail as delivered has the owner's own link.
    const delivered = (await mailsTo(fx.users.owner.email)).find((m) => m.text.includes(weekKey))!;
    const link = delivered.text.match(/\/api\/email\/unsubscribe\?token=([A-Za-z0-9_.-]+)/);
    expect(link).toBeTruthy();

    // Every household role opens the kept copy: no token in it, the Settings page instead.
    const listed = (await fx.agents.member.get(`/api/rigs/${fx.rigId}/emails`).expect(200)).body.emails;
    const id = listed.find((e: { recipient: { id: string } }) => e.recipient.id === fx.users.owner.id).id;
    for (const who of ['member', 'advisor', 'owner'] as const) {
      const html = (await fx.agents[who].get(`/api/rigs/${fx.rigId}/emails/${id}`).expect(200)).text;
      expect(html).not.toMatch(/unsubscribe\?token=/);
      expect(html).toContain(`${TEST_ORIGIN}/settings`);
    }
    const kept = await ctx.db.selectFrom('email_log').select(['html', 'text']).where('id', '=', id).executeTakeFirstOrThrow();
    expect(`${kept.html}${kept.text}`).not.toMatch(/token=/);

    // The owner's own link works; one issued 61 days ago has expired (410), one altered is refused (400).
    await agentFor(ctx.app).post(`/api/email/unsubscribe?token=${link![1]}`).expect(200);
    const old = unsubscribeToken(ctx.config.AUTH_SECRET, fx.users.owner.id, 'warnings', new Date(Date.now() - 61 * 86_400_000));
    const expired = await request(ctx.app).get(`/api/email/unsubscribe?token=${old}`).expect(410);
    expect(expired.body.fields[0].path).toBe('token');
    await request(ctx.app).get(`/api/email/unsubscribe?token=${link![1].slice(0, -2)}xx`).expect(400);
  });
});

describe('a rig’s stored objects go with it (issue 15, item 6)', () => {
  const s3 = () => new S3Client({ endpoint: ctx.config.S3_ENDPOINT, region: ctx.config.S3_REGION, forcePathStyle: true, credentials: { accessKeyId: ctx.config.S3_ACCESS_KEY_ID, secretAccessKey: ctx.config.S3_SECRET_ACCESS_KEY } });
  const exists = async (key: string) =>
    s3()
      .send(new HeadObjectCommand({ Bucket: ctx.config.S3_BUCKET, Key: key }))
      .then(() => true)
      .catch((err) => (err.$metadata?.httpStatusCode === 404 ? false : Promise.reject(err)));

  it('deletes every log, photo and thumbnail of a deleted rig, and the objects of a removed upload', async () => {
    const rigId = (await fx.agents.owner.post('/api/rigs').send({ name: 'Short-lived', householdId: fx.householdId, power: WREN_POWER }).expect(201)).body.id;
    const csv = Buffer.from('time,volts\n2026-11-20T18:00:00Z,12.6\n');
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#17324A' } }).png().toBuffer();
    const upload = (agent = fx.agents.owner) => agent.post(`/api/rigs/${rigId}/uploads`).field('mapping', JSON.stringify({ time: 'time', voltage: 'volts' })).attach('file', csv, 'log.csv').expect(201);
    await upload();
    const removed = (await upload(fx.agents.member)).body.upload.id;
    await fx.agents.member.post(`/api/rigs/${rigId}/photos`).attach('file', png, 'dot.png').expect(201);
    const rows = await ctx.db.selectFrom('uploads').select(['id', 'object_key', 'thumb_key']).where('rig_id', '=', rigId).execute();
    const keys = rows.flatMap((r) => [r.object_key, r.thumb_key]).filter((k): k is string => !!k);
    expect(keys).toHaveLength(4);
    for (const key of keys) expect(await exists(key)).toBe(true);

    await fx.agents.owner.delete(`/api/rigs/${rigId}/uploads/${removed}`).expect(204);
    expect(await exists(rows.find((r) => r.id === removed)!.object_key)).toBe(false);
    await fx.agents.owner.delete(`/api/rigs/${rigId}`).expect(204);
    for (const key of keys) expect([key, await exists(key)]).toEqual([key, false]);
  });

  it('finds the local store as open as docs/security.md says (production needs a private bucket)', async () => {
    const anonymousList = await fetch(`${ctx.config.S3_ENDPOINT}/${ctx.config.S3_BUCKET}?max-keys=1`);
    expect(anonymousList.status).toBe(200);
    const photo = (await fx.agents.owner.post(`/api/rigs/${fx.rigId}/photos`).attach('file', await sharp({ create: { width: 8, height: 8, channels: 3, background: '#F6F3EC' } }).png().toBuffer(), 'dot.png').expect(201)).body.id;
    const signed = new URL((await fx.agents.owner.get(`/api/rigs/${fx.rigId}/photos/${photo}`).expect(200)).body.url);
    expect((await fetch(signed)).status).toBe(200);
    signed.searchParams.set('X-Amz-Signature', '0'.repeat(64));
    expect((await fetch(signed)).status).toBe(200);
  });
});

describe('reads after sign-out (issue 15, item 7)', () => {
  it('shuts a copied cookie out at once after sign-out, though its signed cache is still young', async () => {
    const agent = await signIn(ctx.app, fx.users.member.email);
    const copied = (await agentFor(ctx.app).post('/api/auth/sign-in/email').send({ email: fx.users.member.email, password: 'a-long-test-password' })).headers['set-cookie'] as unknown as string[];
    const cookie = copied.map((c) => c.split(';')[0]).join('; ');
    await request(ctx.app).get(`/api/rigs/${fx.rigId}`).set('Cookie', cookie).expect(200);
    await agentFor(ctx.app).post('/api/auth/sign-out').set('Cookie', cookie).expect(200);
    // The signed cookie cache (session_data) is still within its age, yet reads are refused.
    await request(ctx.app).get(`/api/rigs/${fx.rigId}`).set('Cookie', cookie).expect(401);
    await request(ctx.app).get(`/api/rigs/${fx.rigId}/outlook`).set('Cookie', cookie).expect(401);
    await agent.get(`/api/rigs/${fx.rigId}`).expect(200);
  });
});

describe('private answers are never stored (issue 15, item 8)', () => {
  it('sends Cache-Control: no-store on every API answer, private or not, errors included', async () => {
    const owner = fx.agents.owner;
    const answers = [
      await owner.get('/api/me'),
      await owner.get('/api/me/email-prefs'),
      await owner.get('/api/rigs'),
      await owner.get(`/api/rigs/${fx.rigId}`),
      await owner.get(`/api/rigs/${fx.rigId}/outlook`),
      await owner.get(`/api/rigs/${fx.rigId}/people`),
      await owner.get(`/api/rigs/${fx.rigId}/history`),
      await owner.get(`/api/rigs/${fx.rigId}/emails`),
      await owner.get(`/api/rigs/${fx.rigId}/readings`),
      await owner.get(`/api/rigs/${fx.rigId}/notes`),
      await owner.get('/api/clients'),
      await owner.get('/api/auth/get-session'),
      await owner.get(`/api/auth/organization/list-members?organizationId=${fx.householdId}`),
      await fx.agents.admin.get('/api/admin/users'),
      await fx.agents.outsider.get(`/api/rigs/${fx.rigId}`),
      await request(ctx.app).get('/api/me'),
    ];
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200, 200, 200, 200, 200, 200, 200, 200, 200, 200, 200, 200, 404, 401]);
    expect(answers.map((r) => r.headers['cache-control'])).toEqual(answers.map(() => 'no-store'));
  });
});
