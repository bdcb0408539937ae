import { useMutation } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { CableRunResult } from '@/shared/energy/wiring';
import type { CableRunSizeForm } from '@/shared/schemas/cable-run';

export const sizeCableRun = (input: CableRunSizeForm) => apiFetch<CableRunResult>('/api/cable-runs/size', { method: 'POST', json: input });

export const useCableRunSizeMutation = () => useMutation({ mutationFn: sizeCableRun });
