import { useRigQuery } from './rig';

/** What a note on this rig can be about (the rig, each load, each cable run, read by the route) and what the viewer may do. */
export function useNoteTargets(rigId: string, cableRuns: { id: string; label: string }[]) {
  const rig = useRigQuery(rigId);
  const targets = [
    { kind: 'rig' as const, name: 'The whole rig' },
    ...(rig.data?.loads ?? []).map((l) => ({ kind: 'load' as const, id: l.id, name: l.name })),
    ...cableRuns.map((r) => ({ kind: 'cable-run' as const, id: r.id, name: `Cable run: ${r.label}` })),
  ];
  return { ready: !!rig.data, targets, canComment: rig.data?.permissions.comment ?? false, canDeleteAny: rig.data?.permissions.delete ?? false };
}
