// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { uniqueEmail } from '../../../server/helpers';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const people = api.load(() => import('@/features/people/api/people'));
const client = api.load(() => import('@/lib/api-client'));

const peopleScreen = () => ({
  people: people.usePeopleQuery(api.fx.rigId),
  invite: people.useInvitationCreateMutation(api.fx.rigId),
  resend: people.useInvitationResendMutation(api.fx.rigId),
  revoke: people.useInvitationRevokeMutation(api.fx.rigId),
  role: people.useMemberRoleMutation(api.fx.rigId),
});

async function openPeople(person: Person) {
  const screen = api.render(peopleScreen, person);
  await waitFor(() => expect(screen.result.current.people.isSuccess).toBe(true));
  return screen;
}

describe('people hooks', () => {
  it('lists the household, and an invitation sent, resent and revoked, each time refetched', async () => {
    const { result, client: qc } = await openPeople('owner');
    expect(result.current.people.data!.members.map((m) => m.role).sort()).toEqual(['advisor', 'member', 'owner']);
    const before = qc.getQueryState(people.peopleKeys.rig(api.fx.rigId))!.dataUpdatedAt;

    const email = uniqueEmail('invitee');
    const sent = await act(() => result.current.invite.mutateAsync({ email, role: 'advisor' }));
    expect(sent).toMatchObject({ email, role: 'advisor', status: 'pending' });
    await waitFor(() => expect(result.current.people.data!.invitations.find((i) => i.id === sent.id)).toMatchObject({ email, role: 'advisor', expired: false }));
    expect(qc.getQueryState(people.peopleKeys.rig(api.fx.rigId))!.dataUpdatedAt).toBeGreaterThan(before);

    const resent = await act(() => result.current.resend.mutateAsync(sent.id));
    await waitFor(() => expect(result.current.people.data!.invitations.map((i) => i.id)).toContain(resent.id));

    await act(() => result.current.revoke.mutateAsync(resent.id));
    await waitFor(() => expect(result.current.people.data!.invitations.map((i) => i.id)).not.toContain(resent.id));
  });

  it("changes the member's role and back, the list refetched each time", async () => {
    const { result } = await openPeople('owner');
    const member = result.current.people.data!.members.find((m) => m.userId === api.fx.users.member.id)!;
    await act(() => result.current.role.mutateAsync({ memberId: member.id, role: 'advisor' }));
    await waitFor(() => expect(result.current.people.data!.members.find((m) => m.id === member.id)).toMatchObject({ role: 'advisor' }));
    await act(() => result.current.role.mutateAsync({ memberId: member.id, role: 'member' }));
    await waitFor(() => expect(result.current.people.data!.members.find((m) => m.id === member.id)).toMatchObject({ role: 'member' }));
  });

  it('surfaces a refused invitation as an ApiError with status 400 naming its fields', async () => {
    const { result, client: qc } = await openPeople('owner');
    const before = qc.getQueryState(people.peopleKeys.rig(api.fx.rigId))!.dataUpdatedAt;
    const err = await act(() => result.current.invite.mutateAsync({ email: 'nope', role: 'king' as 'owner' }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400 });
    expect((err as InstanceType<typeof client.ApiError>).fields.map((f) => f.path).sort()).toEqual(['email', 'role']);
    expect(qc.getQueryState(people.peopleKeys.rig(api.fx.rigId))!.dataUpdatedAt).toBe(before);
  });

  it("refuses the advisor's invitation with 403 and answers an outsider 404", async () => {
    const advisor = await openPeople('advisor');
    const err = await act(() => advisor.result.current.invite.mutateAsync({ email: uniqueEmail('x') }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 403 });

    const outsider = api.render(() => people.usePeopleQuery(api.fx.rigId), 'outsider');
    await waitFor(() => expect(outsider.result.current.isError).toBe(true));
    expect(outsider.result.current.error).toMatchObject({ status: 404 });
  });

  // Last: the outsider joins the household here.
  it('shows the invitee the invitation; accepting it refetches every other query, and the refused one now answers', async () => {
    const owner = await openPeople('owner');
    const sent = await act(() => owner.result.current.invite.mutateAsync({ email: api.fx.users.outsider.email }));

    const invitee = api.render(
      () => ({ invitation: people.useInvitationQuery(sent.id), people: people.usePeopleQuery(api.fx.rigId), accept: people.useInvitationAcceptMutation(sent.id) }),
      'outsider',
    );
    await waitFor(() => expect(invitee.result.current.invitation.isSuccess && invitee.result.current.people.isError).toBe(true));
    expect(invitee.result.current.invitation.data).toMatchObject({ id: sent.id, householdName: 'Fixture van household', role: 'member' });
    expect(invitee.result.current.people.error).toMatchObject({ status: 404 });

    await act(() => invitee.result.current.accept.mutateAsync());
    await waitFor(() => expect(invitee.result.current.people.isSuccess).toBe(true));
    expect(invitee.result.current.people.data!.members.find((m) => m.userId === api.fx.users.outsider.id)).toMatchObject({ role: 'member' });
    // The invitation itself is left as it was read: used, it would now answer 409 and flash an error on the way out.
    const invitation = invitee.client.getQueryState(people.peopleKeys.invitation(sent.id))!;
    expect(invitation).toMatchObject({ status: 'success', isInvalidated: false, error: null });
    expect(invitee.result.current.invitation.data).toMatchObject({ id: sent.id });

    const again = await act(() => invitee.result.current.accept.mutateAsync().catch((e: unknown) => e));
    expect(again).toMatchObject({ status: 409 });
  });
});
