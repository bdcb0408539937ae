import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, Image, Pressable, StyleSheet, Text, View } from 'react-native';
import { z } from 'zod';

import { ChoiceField, Form, showApiErrors, SubmitButton } from '@/components/form';
import { formatWhen } from '@/components/format';
import { TextField } from '@/components/text-field';
import { Body, Card, Heading, Small } from '@/components/ui';
import type { NoteTargetKind } from '@/shared/api/notes';
import { noteCreateSchema, noteEditSchema } from '@/shared/schemas/note';
import { colors, pressTarget, radius, space, type } from '@/shared/theme';
import { type Note, type Thread, useNoteCreateMutation, useNoteDeleteMutation, useNoteEditMutation, useNotesQuery, useNotesReadMutation, useThreadResolveMutation } from '../api/notes';

export type NoteTarget = { kind: NoteTargetKind; id?: string; name: string };
export type NotePhoto = { id: string; thumbUrl: string; caption: string };
type Props = { rigId: string; canComment: boolean; canDeleteAny: boolean; targets: NoteTarget[]; photos?: NotePhoto[]; onOpenPhoto?: (id: string) => void };

/** Notes: a rig's comment threads, open ones first; write, reply, resolve, reopen, edit or delete your own. */
export function NotesPanel({ rigId, canComment, canDeleteAny, targets, photos = [], onOpenPhoto }: Props) {
  const notes = useNotesQuery(rigId);
  const read = useNotesReadMutation(rigId);
  const [showResolved, setShowResolved] = useState(false);
  const unread = notes.data?.unread ?? 0;
  // Opening the notes reads them; the count is shown until then (in the rig's tabs and on Clients).
  useEffect(() => {
    if (unread > 0 && !read.isPending) read.mutate();
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [unread]);
  if (notes.isPending) return <ActivityIndicator color={colors.night} />;
  if (notes.isError) return <Body style={{ color: colors.short }}>{notes.error.message}</Body>;
  const open = notes.data.threads.filter((t) => !t.resolved);
  const resolved = notes.data.threads.filter((t) => t.resolved);
  return (
    <View style={{ gap: space.lg }} testID="notes-panel">
      {photos.length ? (
        <View style={{ gap: space.xs }} testID="note-photos">
          <Small>Install photos (from Readings)</Small>
          <View style={styles.photos}>
            {photos.map((p) => (
              <Pressable key={p.id} role="link" aria-label={`Open ${p.caption || 'photo'}`} onPress={() => onOpenPhoto?.(p.id)}>
                <Image source={{ uri: p.thumbUrl }} style={styles.thumb} accessibilityLabel={p.caption || 'Install photo'} />
              </Pressable>
            ))}
          </View>
        </View>
      ) : null}
      {canComment ? <NewNote rigId={rigId} targets={targets} /> : null}
      <Heading>{open.length ? `Open (${open.length})` : 'No open notes'}</Heading>
      {open.map((t) => (
        <ThreadCard key={t.id} rigId={rigId} thread={t} canComment={canComment} canDeleteAny={canDeleteAny} />
      ))}
      {resolved.length ? (
        <Pressable role="button" onPress={() => setShowResolved(!showResolved)} style={pressTarget} testID="toggle-resolved">
          <Text style={styles.link}>{showResolved ? 'Hide' : 'Show'} resolved ({resolved.length})</Text>
        </Pressable>
      ) : null}
      {showResolved ? resolved.map((t) => <ThreadCard key={t.id} rigId={rigId} thread={t} canComment={canComment} canDeleteAny={canDeleteAny} />) : null}
    </View>
  );
}

/** The longest note the server takes (noteCreateSchema), shown as a count under each note field. */
const NOTE_MAX = 4000;

/** The form: the note's text (the server's rule) and what it is about, as "kind:id". */
const newNoteSchema = z.object({ body: noteCreateSchema.shape.body, about: z.string() });
type NewNoteForm = z.infer<typeof newNoteSchema>;

function NewNote({ rigId, targets }: { rigId: string; targets: NoteTarget[] }) {
  const create = useNoteCreateMutation(rigId);
  const options = targets.map((t) => ({ value: t.id ? `${t.kind}:${t.id}` : t.kind, label: t.name }));
  const { control, handleSubmit, reset, setError } = useForm<NewNoteForm>({ resolver: zodResolver(newNoteSchema), defaultValues: { body: '', about: 'rig' } });
  const submit = handleSubmit(async ({ body, about }) => {
    const [kind, id] = about.split(':') as [NoteTarget['kind'], string | undefined];
    try {
      await create.mutateAsync({ body, targetKind: kind, ...(id ? { targetId: id } : {}) });
      reset({ body: '', about });
    } catch (err) {
      showApiErrors(err, setError, 'body');
    }
  });
  return (
    <Card testID="new-note">
      <Heading>Write a note</Heading>
      <Form control={control} onSubmit={submit} busy={create.isPending}>
        <ChoiceField control={control} name="about" label="About" options={options} />
        <TextField control={control} name="body" label="Note" multiline numberOfLines={4} placeholder="What you noticed, asked or changed" style={styles.multiline} maxLength={NOTE_MAX} />
        <SubmitButton label="Post note" testID="post-note" />
      </Form>
    </Card>
  );
}

function ThreadCard({ rigId, thread, canComment, canDeleteAny }: { rigId: string; thread: Thread; canComment: boolean; canDeleteAny: boolean }) {
  const [replying, setReplying] = useState(false);
  const resolve = useThreadResolveMutation(rigId);
  return (
    <Card testID={`thread-${thread.id}`} style={thread.resolved ? { opacity: 0.8 } : undefined}>
      <Small>
        {thread.targetKind === 'rig' ? 'About the whole rig' : `About ${thread.targetName ?? 'a removed item'}`}
        {thread.resolved ? ' · resolved' : ''}
      </Small>
      <NoteView rigId={rigId} note={thread} canDeleteAny={canDeleteAny} />
      {thread.replies.map((r) => (
        <View key={r.id} style={styles.reply}>
          <NoteView rigId={rigId} note={r} canDeleteAny={canDeleteAny} />
        </View>
      ))}
      {canComment ? (
        <View style={styles.actions}>
          {!thread.resolved ? <Chip label="Reply" onPress={() => setReplying(!replying)} testID={`reply-${thread.id}`} /> : null}
          <Chip label={thread.resolved ? 'Reopen' : 'Resolve'} onPress={() => resolve.mutate({ id: thread.id, resolved: !thread.resolved })} testID={`${thread.resolved ? 'reopen' : 'resolve'}-${thread.id}`} />
        </View>
      ) : null}
      {replying ? <ReplyForm rigId={rigId} parentId={thread.id} onDone={() => setReplying(false)} /> : null}
    </Card>
  );
}

function NoteView({ rigId, note, canDeleteAny }: { rigId: string; note: Note; canDeleteAny: boolean }) {
  const [editing, setEditing] = useState(false);
  const remove = useNoteDeleteMutation(rigId);
  return (
    <View style={{ gap: space.xs }} testID={`note-${note.id}`}>
      <Text style={styles.author}>
        {note.author?.name ?? 'Someone who left'} <Text style={styles.when}>· {formatWhen(note.createdAt)}{note.edited ? ' · edited' : ''}</Text>
      </Text>
      {editing ? <EditForm rigId={rigId} note={note} onDone={() => setEditing(false)} /> : <Body>{note.body}</Body>}
      {note.writtenWhen ? <Small style={{ fontStyle: 'italic' }}>{note.writtenWhen.charAt(0).toUpperCase() + note.writtenWhen.slice(1)}.</Small> : null}
      {!editing && (note.mine || canDeleteAny) ? (
        <View style={styles.actions}>
          {note.mine ? <Chip label="Edit" onPress={() => setEditing(true)} /> : null}
          <Chip label="Delete" onPress={() => remove.mutate(note.id)} />
        </View>
      ) : null}
    </View>
  );
}

function ReplyForm({ rigId, parentId, onDone }: { rigId: string; parentId: string; onDone: () => void }) {
  const create = useNoteCreateMutation(rigId);
  const { control, handleSubmit, setError } = useForm<{ body: string }>({ resolver: zodResolver(noteEditSchema), defaultValues: { body: '' } });
  const submit = handleSubmit(async ({ body }) => {
    try {
      await create.mutateAsync({ body, parentId });
      onDone();
    } catch (err) {
      showApiErrors(err, setError, 'body');
    }
  });
  return (
    <Form control={control} onSubmit={submit} busy={create.isPending}>
      <View style={{ gap: space.sm }}>
        <TextField control={control} name="body" label="Reply" multiline numberOfLines={3} style={styles.multiline} maxLength={NOTE_MAX} />
        <SubmitButton label="Post reply" testID={`post-reply-${parentId}`} />
      </View>
    </Form>
  );
}

function EditForm({ rigId, note, onDone }: { rigId: string; note: Note; onDone: () => void }) {
  const edit = useNoteEditMutation(rigId);
  const { control, handleSubmit, setError } = useForm<{ body: string }>({ resolver: zodResolver(noteEditSchema), defaultValues: { body: note.body } });
  const submit = handleSubmit(async ({ body }) => {
    try {
      await edit.mutateAsync({ id: note.id, body });
      onDone();
    } catch (err) {
      showApiErrors(err, setError, 'body');
    }
  });
  return (
    <Form control={control} onSubmit={submit} busy={edit.isPending}>
      <View style={{ gap: space.sm }}>
        <TextField control={control} name="body" label="Edit note" multiline numberOfLines={3} style={styles.multiline} maxLength={NOTE_MAX} />
        <SubmitButton label="Save" extra={<Chip label="Cancel" onPress={onDone} />} />
      </View>
    </Form>
  );
}

function Chip({ label, onPress, testID }: { label: string; onPress: () => void; testID?: string }) {
  return (
    <Pressable role="button" onPress={onPress} style={styles.chip} testID={testID}>
      <Text style={styles.chipText}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  multiline: { minHeight: 88, textAlignVertical: 'top' },
  reply: { borderLeftWidth: 3, borderLeftColor: colors.line, paddingLeft: space.md, marginLeft: space.xs },
  author: { ...type.heading, fontSize: 15, color: colors.ink },
  when: { ...type.small, color: colors.inkSoft },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.card },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  link: { ...type.small, color: colors.focus, fontFamily: 'Nunito_700Bold' },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  thumb: { width: 96, height: 72, borderRadius: radius.sm, backgroundColor: colors.paper },
});
