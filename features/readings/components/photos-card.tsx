import { useForm } from 'react-hook-form';
import { ActivityIndicator, Image, Pressable, Text, View } from 'react-native';

import { FilePicker } from '@/components/file-picker';
import { TextField } from '@/components/text-field';
import { Card, Heading, Small } from '@/components/ui';
import { colors } from '@/shared/theme';
import { openPhoto, type Readings, usePhotoDeleteMutation, usePhotoUploadMutation } from '../api/readings';
import { styles } from './styles';
import { DeleteButton } from './toggle';

export function PhotosCard({ rigId, readings, canEdit }: { rigId: string; readings: Readings; canEdit: boolean }) {
  const up = usePhotoUploadMutation(rigId);
  const remove = usePhotoDeleteMutation(rigId);
  const captionForm = useForm<{ caption: string }>({ defaultValues: { caption: '' } });
  const error = up.error ?? remove.error;
  return (
    <Card testID="photos">
      <Heading>Install photos</Heading>
      <Small>JPEG or PNG, up to 10 MB; the advisor sees them here and beside the Notes. Location data is removed from the photo.</Small>
      {canEdit ? (
        <>
          <TextField control={captionForm.control} name="caption" label="Caption (optional)" maxLength={200} />
          <FilePicker label="Add a photo" accept="image/jpeg,image/png" onPick={(file) => up.mutate({ file, caption: captionForm.getValues('caption') }, { onSuccess: () => captionForm.reset({ caption: '' }) })} testID="pick-photo" />
        </>
      ) : null}
      {up.isPending ? <ActivityIndicator color={colors.night} /> : null}
      {error ? <Text role="alert" style={styles.error}>{error.message}</Text> : null}
      <View style={styles.photos}>
        {readings.photos.map((ph) => (
          <View key={ph.id} style={styles.photo} testID={`photo-${ph.id}`}>
            <Pressable role="link" aria-label={`Open ${ph.caption || ph.fileName}`} onPress={() => openPhoto(rigId, ph.id).then((url) => globalThis.open?.(url, '_blank', 'noopener'))}>
              <Image source={{ uri: ph.thumbUrl }} style={styles.thumb} accessibilityLabel={ph.caption || ph.fileName} />
            </Pressable>
            <Small>{ph.caption || ph.fileName}</Small>
            {ph.canDelete ? <DeleteButton label="Delete" onDelete={() => remove.mutate(ph.id)} testID={`delete-photo-${ph.id}`} /> : null}
          </View>
        ))}
      </View>
    </Card>
  );
}
