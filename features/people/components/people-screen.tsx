import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { ChipGroup } from '@/components/chips';
import { ChoiceField, Form, SubmitButton } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { type InvitationCreateForm, invitationCreateSchema } from '@/shared/schemas/people';
import { colors, space, type } from '@/shared/theme';
import {
  type Person,
  useInvitationCreateMutation,
  useInvitationResendMutation,
  useInvitationRevokeMutation,
  useLeaveMutation,
  useMemberRemoveMutation,
  useMemberRoleMutation,
  usePeopleQuery,
} from '../api/people';

const ROLE_OPTIONS = [
  { value: 'owner', label: 'Owner' },
  { value: 'member', label: 'Member' },
  { value: 'advisor', label: 'Advisor' },
];
const ROLE_WORDS: Record<string, string> = { owner: 'Owner', member: 'Member', advisor: 'Advisor (reads and comments)' };

/**
 * People: members, advisors and pending invitations of a rig's household; actions for the owner only.
 * `canManage` comes from the rig the route already holds (the rig's own query), so the rig is fetched once.
 */
export function PeopleScreen({ rigId, myUserId, canManage, onLeft }: { rigId: string; myUserId: string; canManage: boolean; onLeft: () => void }) {
  const people = usePeopleQuery(rigId);
  const wide = useIsWide();
  const leave = useLeaveMutation(rigId);
  if (people.isPending) return <ActivityIndicator color={colors.night} />;
  if (people.isError) return <Body style={{ color: colors.short }}>{people.error.message}</Body>;
  const owner = canManage;
  return (
    <View style={{ gap: space.lg }} testID="people-screen">
      <Heading>People</Heading>
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <Card style={wide ? { flex: 3 } : undefined} testID="members">
          <Heading>In the household</Heading>
          {people.data.members.map((p) => (
            <MemberRow key={p.id} rigId={rigId} person={p} canManage={owner} me={p.userId === myUserId} />
          ))}
          {people.data.invitations.length ? <Heading>Invited</Heading> : null}
          {people.data.invitations.map((i) => (
            <InvitationRow key={i.id} rigId={rigId} id={i.id} email={i.email} role={i.role ?? 'member'} expired={i.expired} canManage={owner} />
          ))}
        </Card>
        <View style={[{ gap: space.lg }, wide && { flex: 2 }]}>
          {owner ? <InviteForm rigId={rigId} /> : null}
          <Card>
            <Heading>Leave</Heading>
            <Small>You stop seeing this rig. {owner ? 'A household keeps at least one owner.' : ''}</Small>
            <Button tone="danger" label="Leave this household" onPress={() => leave.mutate(undefined, { onSuccess: onLeft })} busy={leave.isPending} testID="leave" />
            {leave.isError ? <Text role="alert" style={styles.error}>{leave.error.message}</Text> : null}
          </Card>
        </View>
      </View>
    </View>
  );
}

function MemberRow({ rigId, person, canManage, me }: { rigId: string; person: Person; canManage: boolean; me: boolean }) {
  const role = useMemberRoleMutation(rigId);
  const remove = useMemberRemoveMutation(rigId);
  const error = role.error ?? remove.error;
  return (
    <View style={styles.row} testID={`member-${person.email}`}>
      <View style={{ flex: 1, minWidth: 180 }}>
        <Text style={styles.name}>
          {person.name}
          {me ? ' (you)' : ''}
        </Text>
        <Small>
          {person.email} · {ROLE_WORDS[person.role] ?? person.role}
        </Small>
      </View>
      {canManage ? (
        <View style={styles.actions}>
          <ChipGroup
            label={`Role of ${person.name}`}
            showLabel={false}
            options={ROLE_OPTIONS}
            value={person.role}
            onChange={(v) => v !== person.role && role.mutate({ memberId: person.id, role: v })}
            testIDPrefix={`role-${person.name}`}
          />
          {!me ? (
            <Pressable role="button" aria-label={`Remove ${person.name}`} onPress={() => remove.mutate(person.id)} style={styles.chip}>
              <Text style={styles.chipText}>Remove</Text>
            </Pressable>
          ) : null}
        </View>
      ) : null}
      {error ? <Text role="alert" style={styles.error}>{error.message}</Text> : null}
    </View>
  );
}

function InvitationRow(props: { rigId: string; id: string; email: string; role: string; expired: boolean; canManage: boolean }) {
  const resend = useInvitationResendMutation(props.rigId);
  const revoke = useInvitationRevokeMutation(props.rigId);
  return (
    <View style={styles.row} testID={`invitation-${props.email}`}>
      <View style={{ flex: 1, minWidth: 180 }}>
        <Text style={styles.name}>{props.email}</Text>
        <Small>
          {ROLE_WORDS[props.role] ?? props.role} · {props.expired ? 'expired' : 'waiting for an answer'}
        </Small>
      </View>
      {props.canManage ? (
        <View style={styles.actions}>
          <Pressable role="button" onPress={() => resend.mutate(props.id)} style={styles.chip} aria-label={`Send the invitation to ${props.email} again`}>
            <Text style={styles.chipText}>{resend.isSuccess ? 'Sent' : 'Resend'}</Text>
          </Pressable>
          <Pressable role="button" onPress={() => revoke.mutate(props.id)} style={styles.chip} aria-label={`Withdraw the invitation to ${props.email}`}>
            <Text style={styles.chipText}>Withdraw</Text>
          </Pressable>
        </View>
      ) : null}
    </View>
  );
}

function InviteForm({ rigId }: { rigId: string }) {
  const invite = useInvitationCreateMutation(rigId);
  const form = useForm<InvitationCreateForm>({ resolver: zodResolver(invitationCreateSchema), defaultValues: { email: '', role: 'member' } });
  const onSubmit = form.handleSubmit((values) => invite.mutate(values, { onSuccess: () => form.reset({ email: '', role: values.role }) }));
  return (
    <Form control={form.control} onSubmit={onSubmit} busy={invite.isPending}>
    <Card testID="invite-form">
      <Heading>Invite someone</Heading>
      <TextField control={form.control} name="email" label="E-mail" inputMode="email" autoCapitalize="none" />
      <ChoiceField control={form.control} name="role" label="As" options={ROLE_OPTIONS} hint="An advisor (your installer, say) reads everything and comments, and changes nothing." />
      <SubmitButton testID="invite-submit" label="Send invitation" />
      {invite.isSuccess ? <Text style={{ ...type.body, color: colors.comfortable }}>Invitation sent.</Text> : null}
      {invite.isError ? <Text role="alert" style={styles.error}>{invite.error.message}</Text> : null}
    </Card>
    </Form>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  name: { ...type.heading, fontSize: 15, color: colors.ink },
  actions: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
  error: { ...type.small, color: colors.short, width: '100%' },
});
