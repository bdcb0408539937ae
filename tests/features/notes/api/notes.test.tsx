// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { withApiHooks } from '../../harness';

const api = withApiHooks();
const notes = api.load(() => import('@/features/notes/api/notes'));
const client = api.load(() => import('@/lib/api-client'));

/** The notes query and every notes mutation of one rig, as one screen would hold them. */
const notesScreen = () => ({
  notes: notes.useNotesQuery(api.fx.rigId),
  create: notes.useNoteCreateMutation(api.fx.rigId),
  edit: notes.useNoteEditMutation(api.fx.rigId),
  remove: notes.useNoteDeleteMutation(api.fx.rigId),
  resolve: notes.useThreadResolveMutation(api.fx.rigId),
  read: notes.useNotesReadMutation(api.fx.rigId),
});

async function openNotes(person: Parameters<typeof api.render>[1]) {
  const screen = api.render(notesScreen, person);
  await waitFor(() => expect(screen.result.current.notes.isSuccess).toBe(true));
  return screen;
}

const threadOf = (data: { threads: { id: string }[] } | undefined, id: string) => data?.threads.find((t) => t.id === id);

describe('notes hooks', () => {
  it('creates a note, and the notes query shows it once its key is invalidated', async () => {
    const { result, client: qc } = await openNotes('member');
    const before = qc.getQueryState(notes.noteKeys.rig(api.fx.rigId))!.dataUpdatedAt;
    let id = '';
    await act(async () => {
      id = (await result.current.create.mutateAsync({ body: 'Check the fuse by the step.' })).id;
    });
    await waitFor(() => expect(threadOf(result.current.notes.data, id)).toMatchObject({ body: 'Check the fuse by the step.', mine: true, resolved: false }));
    const state = qc.getQueryState(notes.noteKeys.rig(api.fx.rigId))!;
    expect(state.dataUpdatedAt).toBeGreaterThan(before);
    expect(state.isInvalidated).toBe(false);
  });

  it('edits, resolves, reopens and deletes a note, each answer refetched into the cache', async () => {
    const { result, client: qc } = await openNotes('owner');
    let id = '';
    await act(async () => {
      id = (await result.current.create.mutateAsync({ body: 'Solar cable gland leaks.' })).id;
    });
    await act(() => result.current.edit.mutateAsync({ id, body: 'Solar cable gland leaks when it rains.' }));
    await waitFor(() => expect(threadOf(result.current.notes.data, id)).toMatchObject({ body: 'Solar cable gland leaks when it rains.', edited: true }));

    await act(() => result.current.resolve.mutateAsync({ id, resolved: true }));
    await waitFor(() => expect(threadOf(result.current.notes.data, id)).toMatchObject({ resolved: true }));
    await act(() => result.current.resolve.mutateAsync({ id, resolved: false }));
    await waitFor(() => expect(threadOf(result.current.notes.data, id)).toMatchObject({ resolved: false }));

    await act(() => result.current.remove.mutateAsync(id));
    await waitFor(() => expect(threadOf(result.current.notes.data, id)).toBeUndefined());
    expect(threadOf(qc.getQueryData(notes.noteKeys.rig(api.fx.rigId)), id)).toBeUndefined();
  });

  it("counts another person's note as unread until the notes are marked read", async () => {
    const writer = await openNotes('advisor');
    await act(() => writer.result.current.create.mutateAsync({ body: 'Is the fridge on eco at night?' }));
    const reader = await openNotes('owner');
    expect(reader.result.current.notes.data!.unread).toBeGreaterThan(0);
    await act(() => reader.result.current.read.mutateAsync());
    await waitFor(() => expect(reader.result.current.notes.data!.unread).toBe(0));
  });

  it('surfaces a refused note as an ApiError naming the field, and leaves the cache as it was', async () => {
    const { result, client: qc } = await openNotes('member');
    const before = qc.getQueryState(notes.noteKeys.rig(api.fx.rigId))!.dataUpdatedAt;
    const err = await act(() => result.current.create.mutateAsync({ body: 'x'.repeat(4001) }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400, fields: [expect.objectContaining({ path: 'body' })] });
    await waitFor(() => expect(result.current.create.error).toBe(err));
    expect(qc.getQueryState(notes.noteKeys.rig(api.fx.rigId))!.dataUpdatedAt).toBe(before);
  });

  it("refuses the advisor's edit of another person's note with 403", async () => {
    const mine = await openNotes('member');
    let id = '';
    await act(async () => {
      id = (await mine.result.current.create.mutateAsync({ body: 'Mine to change.' })).id;
    });
    const advisor = await openNotes('advisor');
    const err = await act(() => advisor.result.current.edit.mutateAsync({ id, body: 'Not yours' }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 403 });
    expect(threadOf(advisor.result.current.notes.data, id)).toMatchObject({ body: 'Mine to change.' });
  });

  it('answers an outsider 404 for the rig’s notes', async () => {
    const { result } = api.render(() => notes.useNotesQuery(api.fx.rigId), 'outsider');
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect(result.current.error).toBeInstanceOf(client.ApiError);
    expect(result.current.error).toMatchObject({ status: 404 });
    expect(result.current.data).toBeUndefined();
  });
});
