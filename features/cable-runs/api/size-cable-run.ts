import { useMutation } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { CableRunSized } from '@/shared/api/cable-runs';
import type { CableRunSizeForm } from '@/shared/schemas/cable-run';

export const sizeCableRun = (input: CableRunSizeForm) => apiFetch<CableRunSized>('/api/cable-runs/size', { method: 'POST', json: input });

export const useCableRunSizeMutation = () => useMutation({ mutationFn: sizeCableRun });
