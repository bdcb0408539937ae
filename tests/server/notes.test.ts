import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { fx } = withHousehold();

const notes = () => `/api/rigs/${fx.rigId}/notes`;

describe('notes', () => {
  it('lets the advisor comment on a load but not edit it; says when the load changed since', async () => {
    const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    const fridge = rig.loads.find((l: { name: string }) => l.name === 'Fridge');
    const created = await fx.agents.advisor.post(notes()).send({ body: 'Duty cycle looks high\nfor 40 L.', targetKind: 'load', targetId: fridge.id }).expect(201);
    await fx.agents.advisor.patch(`/api/rigs/${fx.rigId}/loads/${fridge.id}`).send({ name: 'Fridge', supply: 'dc', watts: 40, hoursPerDay: 24 }).expect(403);
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/loads/${fridge.id}`).send({ name: 'Fridge', supply: 'dc', watts: 40, dutyPercent: 30, hoursPerDay: 24 }).expect(200);
    const list = await fx.agents.owner.get(notes()).expect(200);
    const thread = list.body.threads.find((t: { id: string }) => t.id === created.body.id);
    expect(thread.body).toBe('Duty cycle looks high\nfor 40 L.');
    expect(thread.writtenWhen).toBe('written when Fridge was 45 W, 24 h a day at 35 %');
  });

  it('counts unread notes per person, replies, resolves and reopens', async () => {
    await fx.agents.owner.post(`${notes()}/read`).expect(204);
    const root = await fx.agents.advisor.post(notes()).send({ body: 'Fit a cut-off switch.' }).expect(201);
    await fx.agents.advisor.post(notes()).send({ body: 'Near the battery.', parentId: root.body.id }).expect(201);
    expect((await fx.agents.owner.get(notes())).body.unread).toBe(2);
    expect((await fx.agents.advisor.get(notes())).body.unread).toBe(0);
    await fx.agents.owner.post(notes()).send({ body: 'Done, thanks.', parentId: root.body.id }).expect(201);
    expect((await fx.agents.owner.get(notes())).body.unread).toBe(0);
    await fx.agents.owner.post(`${notes()}/${root.body.id}/resolve`).expect(204);
    let thread = (await fx.agents.member.get(notes())).body.threads.find((t: { id: string }) => t.id === root.body.id);
    expect(thread.resolved).toBe(true);
    expect(thread.replies).toHaveLength(2);
    await fx.agents.member.post(`${notes()}/${root.body.id}/reopen`).expect(204);
    thread = (await fx.agents.member.get(notes())).body.threads.find((t: { id: string }) => t.id === root.body.id);
    expect(thread.resolved).toBe(false);
  });

  it("refuses editing another person's note, lets the owner delete any, hides notes from outsiders", async () => {
    const mine = await fx.agents.member.post(notes()).send({ body: 'Mine' }).expect(201);
    await fx.agents.advisor.patch(`${notes()}/${mine.body.id}`).send({ body: 'Not yours' }).expect(403);
    await fx.agents.advisor.delete(`${notes()}/${mine.body.id}`).expect(403);
    await fx.agents.owner.delete(`${notes()}/${mine.body.id}`).expect(204);
    await fx.agents.outsider.get(notes()).expect(404);
    const long = await fx.agents.member.post(notes()).send({ body: 'x'.repeat(4001) }).expect(400);
    expect(long.body.fields[0].path).toBe('body');
  });

  it("lists the advisor's clients with unread notes", async () => {
    const res = await fx.agents.advisor.get('/api/clients').expect(200);
    expect(res.body.clients.map((c: { id: string }) => c.id)).toContain(fx.rigId);
    expect(res.body.clients[0]).toHaveProperty('unreadNotes');
    expect((await fx.agents.owner.get('/api/clients')).body.clients).toHaveLength(0);
  });
});
