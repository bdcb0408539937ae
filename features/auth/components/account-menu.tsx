import { useRouter } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { colors, space, TAP_MIN, type } from '@/shared/theme';
import { type Me, useSignOutMutation } from '../api/session';

const ROLE_LABEL = { traveller: 'Traveller', advisor: 'Advisor', admin: 'Admin' } as const;

/** Who is signed in, and sign out. */
export function AccountMenu({ me, compact }: { me: Me; compact?: boolean }) {
  const router = useRouter();
  const signOut = useSignOutMutation();
  return (
    <View style={[styles.root, compact && styles.compact]} testID="account-menu">
      {!compact ? (
        <View>
          <Text style={styles.name} testID="signed-in-as">
            {me.user.name}
          </Text>
          <Text style={styles.role}>
            {ROLE_LABEL[me.user.role] ?? me.user.role} · {me.user.email}
          </Text>
        </View>
      ) : (
        <Text style={styles.name} testID="signed-in-as" numberOfLines={1}>
          {me.user.name.split(' ')[0]}
        </Text>
      )}
      <Pressable
        role="button"
        testID="sign-out"
        onPress={() => signOut.mutate(undefined, { onSettled: () => router.replace('/sign-in') })}
        style={styles.button}
      >
        <Text style={styles.buttonLabel}>{signOut.isPending ? 'Signing out…' : 'Sign out'}</Text>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  compact: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  name: { ...type.heading, color: colors.paper, maxWidth: 140 },
  role: { ...type.small, color: '#C9D6E2' },
  button: { minHeight: TAP_MIN, justifyContent: 'center', paddingVertical: space.xs, paddingHorizontal: space.md, borderRadius: 8, borderWidth: 1, borderColor: '#C9D6E2', alignSelf: 'flex-start' },
  buttonLabel: { ...type.small, color: colors.paper, fontFamily: 'Nunito_700Bold' },
});
