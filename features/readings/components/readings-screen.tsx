import { ActivityIndicator, View } from 'react-native';

import { Body, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { MEASURING_CAUTION } from '@/shared/safety';
import { colors, space } from '@/shared/theme';
import { useReadingsQuery } from '../api/readings';
import { AnalysisCard } from './analysis-card';
import { ChartCard } from './chart-card';
import { DropTestCard } from './drop-test-card';
import { PhotosCard } from './photos-card';
import { SpotList } from './spot-list';
import { SpotReadingCard } from './spot-reading-card';
import { styles } from './styles';
import { UploadsCard } from './uploads-card';

type Props = {
  rigId: string;
  canEdit: boolean;
  cableRuns: { id: string; label: string }[];
  /** Sets the rig's key-off draw (the route composes the rig's own update). */
  onAdoptKeyOff?: (amps: number) => Promise<void>;
};

/** Readings: measured voltages and currents against the model, CSV logs, install photos, and what they tell. */
export function ReadingsScreen({ rigId, canEdit, cableRuns, onAdoptKeyOff }: Props) {
  const readings = useReadingsQuery(rigId);
  const wide = useIsWide();
  if (readings.isPending) return <ActivityIndicator color={colors.night} />;
  if (readings.isError) return <Body style={{ color: colors.short }}>{readings.error.message}</Body>;
  const r = readings.data;
  return (
    <View style={{ gap: space.lg }} testID="readings-screen">
      <View style={styles.caution} role="note">
        <Small style={{ color: colors.ink }}>{MEASURING_CAUTION}</Small>
      </View>
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
          <ChartCard readings={r} />
          <AnalysisCard readings={r} canEdit={canEdit} onAdoptKeyOff={onAdoptKeyOff} />
          <UploadsCard rigId={rigId} readings={r} canEdit={canEdit} />
          <PhotosCard rigId={rigId} readings={r} canEdit={canEdit} />
        </View>
        <View style={[{ gap: space.lg }, wide && { flex: 2 }]}>
          {canEdit ? <SpotReadingCard rigId={rigId} /> : null}
          <SpotList rigId={rigId} readings={r} />
          <DropTestCard rigId={rigId} cableRuns={cableRuns} />
        </View>
      </View>
    </View>
  );
}
