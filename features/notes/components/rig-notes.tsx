import { ActivityIndicator } from 'react-native';

import { type NotePhoto, NotesPanel, type NoteTarget } from './notes-panel';

type Props = {
  rigId: string;
  /** The rig and what the viewer may do (from the rig's own query). */
  rig: { ready: boolean; targets: NoteTarget[]; canComment: boolean; canDeleteAny: boolean };
  /** The rig's uploaded logs and photos (from Readings). */
  readings: { targets: NoteTarget[]; photos?: NotePhoto[]; openPhoto: (id: string) => void };
};

/** The rig's Notes, about the rig, a load, a cable run or an uploaded log or photo, with the photos beside them. */
export function RigNotes({ rigId, rig, readings }: Props) {
  if (!rig.ready) return <ActivityIndicator />;
  return (
    <NotesPanel
      rigId={rigId}
      canComment={rig.canComment}
      canDeleteAny={rig.canDeleteAny}
      targets={[...rig.targets, ...readings.targets]}
      photos={readings.photos}
      onOpenPhoto={readings.openPhoto}
    />
  );
}
