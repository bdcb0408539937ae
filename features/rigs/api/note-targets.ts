import { useCableRunsQuery } from './cable-runs';
import { useRigQuery } from './rig';

/** What a note on this rig can be about (the rig, each load, each cable run) and what the viewer may do. */
export function useNoteTargets(rigId: string) {
  const rig = useRigQuery(rigId);
  const runs = useCableRunsQuery(rigId);
  const targets = [
    { kind: 'rig' as const, name: 'The whole rig' },
    ...(rig.data?.loads ?? []).map((l) => ({ kind: 'load' as const, id: l.id, name: l.name })),
    ...(runs.data ?? []).map((r) => ({ kind: 'cable-run' as const, id: r.id, name: `Cable run: ${r.label}` })),
  ];
  return { ready: !!rig.data, targets, canComment: rig.data?.permissions.comment ?? false, canDeleteAny: rig.data?.permissions.delete ?? false };
}
