import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, TextInput, View } from 'react-native';

import { Body, Button, Card, Heading, Small, Title } from '@/components/ui';
import { colors, radius, space, type } from '@/shared/theme';
import { type Account, type AccountRole, useAccountRoleMutation, useAccountsQuery } from '../api/accounts';

const ROLES: { value: AccountRole; label: string }[] = [
  { value: 'traveller', label: 'Traveller' },
  { value: 'advisor', label: 'Advisor' },
  { value: 'admin', label: 'Admin' },
];

/** Accounts (admins): every account with its role, and the role changed in place. No budgets are shown here. */
export function AccountsScreen({ selfId }: { selfId: string }) {
  const accounts = useAccountsQuery();
  const [query, setQuery] = useState('');
  if (accounts.isPending) return <ActivityIndicator color={colors.night} />;
  if (accounts.isError)
    return (
      <Card>
        <Body style={{ color: colors.short }}>The accounts could not be loaded: {accounts.error.message}</Body>
        <Button label="Try again" onPress={() => accounts.refetch()} />
      </Card>
    );
  const q = query.trim().toLowerCase();
  const shown = accounts.data.filter((a) => !q || a.name.toLowerCase().includes(q) || a.email.toLowerCase().includes(q));
  return (
    <View style={{ gap: space.lg }} testID="accounts-screen">
      <Title>Accounts</Title>
      <Small>As an admin you manage accounts and their roles; you see a rig only when its household invites you.</Small>
      <Card>
        <Text nativeID="accounts-search-label" style={styles.label}>
          Find an account
        </Text>
        <TextInput testID="accounts-search" aria-labelledby="accounts-search-label" value={query} onChangeText={setQuery} placeholder="name or e-mail" placeholderTextColor={colors.inkSoft} style={styles.input} />
        <Small>
          {shown.length} of {accounts.data.length} accounts
        </Small>
        {shown.map((a) => (
          <AccountRow key={a.id} account={a} self={a.id === selfId} />
        ))}
      </Card>
    </View>
  );
}

function AccountRow({ account, self }: { account: Account; self: boolean }) {
  const change = useAccountRoleMutation();
  return (
    <View style={styles.row} testID={`account-${account.email}`}>
      <View style={{ flex: 1, minWidth: 200, gap: 2 }}>
        <Heading>{account.name}</Heading>
        <Small>
          {account.email}
          {account.emailVerified ? '' : ' · not verified yet'}
          {self ? ' · you' : ''}
        </Small>
      </View>
      <View style={styles.chips} role="radiogroup" aria-label={`Role of ${account.name}`}>
        {ROLES.map((r) => {
          const on = account.role === r.value;
          return (
            <Pressable
              key={r.value}
              role="radio"
              aria-checked={on}
              aria-disabled={self}
              disabled={self || on || change.isPending}
              onPress={() => change.mutate({ userId: account.id, role: r.value })}
              style={[styles.chip, on && styles.chipOn, self && !on ? { opacity: 0.5 } : null]}
              testID={`role-${account.email}-${r.value}`}
            >
              <Text style={[styles.chipText, on && styles.chipTextOn]}>{r.label}</Text>
            </Pressable>
          );
        })}
      </View>
      {self ? <Small>Another admin changes your own role.</Small> : null}
      {change.isError ? (
        <Text role="alert" style={{ ...type.small, color: colors.short }}>
          {change.error.message}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  input: { ...type.body, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.card, color: colors.ink, minHeight: 44 },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  chips: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
  chip: { borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, minHeight: 44, justifyContent: 'center' },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
});
