import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';

import { withHousehold } from '../fixtures';
import { mailsTo, waitFor } from './helpers';


const { ctx, fx } = withHousehold({ workers: true });

const schema = () => ctx.config.JOBS_SCHEMA;
const waiting = async () =>
  (await sql<{ singleton_key: string }>`select singleton_key from ${sql.table(`${schema()}.job`)} where name = 'note-digest' and state = 'created'`.execute(ctx.db)).rows.map((r) => r.singleton_key);
/** The ten minutes pass: the waiting jobs become due now (pg-boss's own column), instead of the test sleeping. */
const tenMinutesLater = () => sql`update ${sql.table(`${schema()}.job`)} set start_after = now() where name = 'note-digest' and state = 'created'`.execute(ctx.db);
const noteMails = async (email: string) => (await mailsTo(email)).filter((m) => /new notes? on Fixture van/.test(m.subject));

describe('note e-mails', () => {
  it('gathers three notes within ten minutes into one e-mail for each person on the other side', async () => {
    for (const body of ['Fridge duty looks high.', 'Is the inverter on all night?', 'Fit a cut-off switch near the battery.']) {
      await fx.agents.advisor.post(`/api/rigs/${fx.rigId}/notes`).send({ body }).expect(201);
    }
    // One waiting job per person and rig: the owner and the member (the advisor wrote them).
    expect((await waiting()).sort()).toEqual([`${fx.users.member.id}:${fx.rigId}`, `${fx.users.owner.id}:${fx.rigId}`].sort());
    await tenMinutesLater();
    const mail = await waitFor(async () => (await noteMails(fx.users.owner.email))[0], 15_000, 'the owner’s note e-mail');
    expect(mail.subject).toBe('3 new notes on Fixture van');
    expect(mail.text).toContain('Is the inverter on all night?');
    await waitFor(async () => (await noteMails(fx.users.member.email)).length === 1, 15_000, 'the member’s note e-mail');
    expect(await noteMails(fx.users.advisor.email)).toHaveLength(0);
  });

  it('tells the advisor of the household’s reply, and sends nothing to someone who turned it off', async () => {
    await fx.agents.member
      .put('/api/me/email-prefs')
      .send({ reportsOn: false, reportWeekday: 6, reportHour: 18, timeZone: 'UTC', warningsOn: false, warnAt: 'tight', noteEmailsOn: false })
      .expect(200);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/notes`).send({ body: 'Switch ordered.' }).expect(201);
    await fx.agents.advisor.post(`/api/rigs/${fx.rigId}/notes`).send({ body: 'Good, send a photo.' }).expect(201);
    await tenMinutesLater();
    const toAdvisor = await waitFor(async () => (await noteMails(fx.users.advisor.email))[0], 15_000, 'the advisor’s note e-mail');
    expect(toAdvisor.subject).toBe('A new note on Fixture van');
    expect(toAdvisor.text).toContain('Switch ordered.');
    await waitFor(async () => (await noteMails(fx.users.owner.email)).length === 2, 15_000, 'the owner’s second note e-mail');
    await new Promise((r) => setTimeout(r, 1500));
    expect(await noteMails(fx.users.member.email)).toHaveLength(1);
  });
});
