import { StyleSheet, Text, View } from 'react-native';

import { useCachedSince } from '@/lib/offline';
import { colors, radius, space, type } from '@/shared/theme';

/** "Offline: figures from 14:05, 2 Dec": shown while a screen's API answer came from this device's cache. */
export function OfflineNotice({ path }: { path: string }) {
  const since = useCachedSince(path);
  if (!since) return null;
  const time = since.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
  const day = since.toLocaleDateString([], { day: 'numeric', month: 'short' });
  return (
    <View style={styles.box} role="status" testID="offline-notice">
      <Text style={styles.text}>
        Offline: figures from {time}, {day}. They come back up to date when the signal does.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  text: { ...type.small, color: colors.ink },
});
