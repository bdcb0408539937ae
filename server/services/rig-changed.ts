import type { AppContext } from '../context';

/** What a service that changes a rig needs: the database, and the job queue to hear of the change. */
export type WriteCtx = Pick<AppContext, 'db' | 'jobs'>;

/**
 * After a saved change to a rig: its margin is checked soon (the low-margin warnings). The services that
 * change a rig call this once the change is committed; a save that changed nothing, a preview, the drop
 * test and the rig's deletion do not. Not awaited: queuing never holds up or fails the answer
 * (jobs.rigChanged logs a failure, and the daily check catches up).
 */
export function rigChanged({ jobs }: Pick<AppContext, 'jobs'>, rigId: string) {
  void jobs.rigChanged(rigId);
}
