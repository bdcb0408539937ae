import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { RigCreated } from '@/shared/api/rigs';
import type { RigCreateInput } from '@/shared/schemas/rig';
import { rigKeys } from './rig-keys';

export const createRig = (input: RigCreateInput) => apiFetch<RigCreated>('/api/rigs', { method: 'POST', json: input });

export function useRigCreateMutation() {
  const client = useQueryClient();
  return useMutation({ mutationFn: createRig, onSuccess: () => client.invalidateQueries({ queryKey: rigKeys.all }) });
}
