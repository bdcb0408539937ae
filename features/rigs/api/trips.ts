import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { SavedTrip, TripList, TripOutlookAnswer } from '@/shared/api/trips';
import type { TripInput } from '@/shared/schemas/trip';
import { rigKeys } from './rig-keys';

export type { RecentPlace, SavedTrip } from '@/shared/api/trips';

export const useTripsQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.trips(rigId), queryFn: () => apiFetch<TripList>(`/api/rigs/${rigId}/trips`) });

export const useTripOutlookQuery = (rigId: string, tripId: string | null) =>
  useQuery({
    queryKey: rigKeys.tripOutlook(rigId, tripId ?? ''),
    queryFn: () => apiFetch<TripOutlookAnswer>(`/api/rigs/${rigId}/trips/${tripId}/outlook`),
    enabled: tripId !== null,
  });

/** A trip change moves the rig's Outlook (the active trip) and the trips' own outlooks. */
function useTripMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: rigKeys.trips(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.outlook(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.detail(rigId) }),
      ]),
  });
}

export const useTripCreateMutation = (rigId: string) => useTripMutation(rigId, (trip: TripInput) => apiFetch<SavedTrip>(`/api/rigs/${rigId}/trips`, { method: 'POST', json: trip }));
export const useTripUpdateMutation = (rigId: string) =>
  useTripMutation(rigId, ({ id, trip }: { id: string; trip: TripInput }) => apiFetch<SavedTrip>(`/api/rigs/${rigId}/trips/${id}`, { method: 'PUT', json: trip }));
export const useTripDeleteMutation = (rigId: string) => useTripMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/trips/${id}`, { method: 'DELETE' }));
