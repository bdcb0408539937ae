/** Every query key of the rigs feature; invalidation goes through these. */
export const rigKeys = {
  all: ['rigs'] as const,
  list: () => [...rigKeys.all, 'list'] as const,
  clients: () => [...rigKeys.all, 'clients'] as const,
  detail: (rigId: string) => [...rigKeys.all, 'detail', rigId] as const,
  outlook: (rigId: string) => [...rigKeys.all, 'outlook', rigId] as const,
  trips: (rigId: string) => [...rigKeys.all, 'trips', rigId] as const,
  tripOutlook: (rigId: string, tripId: string) => [...rigKeys.all, 'trips', rigId, tripId, 'outlook'] as const,
  hookups: (rigId: string) => [...rigKeys.all, 'hookup', rigId] as const,
  hookup: (rigId: string, control: string | null) => [...rigKeys.hookups(rigId), control ?? 'now'] as const,
  history: (rigId: string) => [...rigKeys.all, 'history', rigId] as const,
  emails: (rigId: string) => [...rigKeys.all, 'emails', rigId] as const,
  reportPreview: (rigId: string) => [...rigKeys.all, 'report-preview', rigId] as const,
  devices: () => ['devices'] as const,
};
