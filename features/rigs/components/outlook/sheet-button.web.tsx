import { View } from 'react-native';

import { Small } from '@/components/ui';
import { apiUrl } from '@/lib/api-client';
import { colors, radius, space } from '@/shared/theme';

const link = { display: 'inline-flex', alignItems: 'center', minHeight: 44, padding: '0 20px', borderRadius: radius.md, background: colors.night, color: colors.paper, fontFamily: 'Nunito_700Bold, sans-serif', fontSize: 16, textDecoration: 'none' } as const;

/** The budget sheet (a PDF) as a download: the browser saves it with the rig's name. */
export function SheetButton({ rigId }: { rigId: string }) {
  return (
    <View style={{ gap: space.xs }}>
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <a href={apiUrl(`/api/rigs/${rigId}/sheet.pdf?size=a4`)} download data-testid="sheet-a4" style={link}>
          Budget sheet (A4)
        </a>
        <a href={apiUrl(`/api/rigs/${rigId}/sheet.pdf?size=letter`)} download data-testid="sheet-letter" style={link}>
          Budget sheet (Letter)
        </a>
      </View>
      <Small>The rig, its loads, the figures, the chart, the Fixes and the assumptions, as a PDF to print or send to an installer.</Small>
    </View>
  );
}
