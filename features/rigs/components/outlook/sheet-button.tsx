import { Linking, View } from 'react-native';

import { Button, Small } from '@/components/ui';
import { apiUrl } from '@/lib/api-client';
import { space } from '@/shared/theme';

/** The budget sheet (a PDF) for an installer or to print; on a phone it opens in the system's viewer. */
export function SheetButton({ rigId }: { rigId: string }) {
  return (
    <View style={{ gap: space.xs }}>
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <Button label="Budget sheet (A4)" onPress={() => Linking.openURL(apiUrl(`/api/rigs/${rigId}/sheet.pdf?size=a4`))} />
        <Button label="Budget sheet (Letter)" onPress={() => Linking.openURL(apiUrl(`/api/rigs/${rigId}/sheet.pdf?size=letter`))} />
      </View>
      <Small>The rig, its loads, the figures, the chart, the Fixes and the assumptions, as a PDF.</Small>
    </View>
  );
}
