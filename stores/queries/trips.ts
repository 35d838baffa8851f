import { useQuery } from '@tanstack/react-query';
import type { TripListResponse, TripResponse } from '@/shared/schemas/trip-summary';
import { apiFetch } from './api-client';
import { STALE } from './stale';

export const tripKeys = {
  root: ['trips'] as const,
  list: () => [...tripKeys.root, 'list'] as const,
  detail: (tripId: string) => [...tripKeys.root, 'detail', tripId] as const,
};

export function useTripsQuery() {
  return useQuery({
    queryKey: tripKeys.list(),
    queryFn: () => apiFetch<TripListResponse>('/api/trips'),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useTripQuery(tripId: string) {
  return useQuery({
    queryKey: tripKeys.detail(tripId),
    queryFn: () => apiFetch<TripResponse>(`/api/trips/${encodeURIComponent(tripId)}`),
    staleTime: STALE.SECONDS.THIRTY,
  });
}
