/** Every query key of the rigs feature; invalidation goes through these. */
export const rigKeys = {
  all: ['rigs'] as const,
  list: () => [...rigKeys.all, 'list'] as const,
  detail: (rigId: string) => [...rigKeys.all, 'detail', rigId] as const,
  outlook: (rigId: string) => [...rigKeys.all, 'outlook', rigId] as const,
  cableRuns: (rigId: string) => [...rigKeys.all, 'cable-runs', rigId] as const,
};
