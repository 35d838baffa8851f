import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { CreateTripRequest, TripDetail, UndoFixRequest, UpdateTripRequest } from '@/shared/schemas/api';
import type { TripListResponse } from '@/shared/schemas/trip-summary';
import { apiFetch } from './api-client';
import { STALE } from './stale';

export const tripKeys = {
  root: ['trips'] as const,
  list: () => [...tripKeys.root, 'list'] as const,
  detail: (tripId: string) => [...tripKeys.root, 'detail', tripId] as const,
  budget: (tripId: string) => [...tripKeys.root, 'budget', tripId] as const,
  /** Under the budget's key, so whatever refreshes a budget refreshes its ledger too. */
  ledger: (tripId: string) => [...tripKeys.budget(tripId), 'ledger'] as const,
  activity: (tripId: string) => [...tripKeys.root, 'activity', tripId] as const,
  members: (tripId: string) => [...tripKeys.root, 'members', tripId] as const,
  /** Where each stop's weather record stands: asked again after every change, so a new or moved stop shows loading. */
  weather: (tripId: string) => [...tripKeys.root, 'weather', tripId] as const,
};

const tripPath = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}`;

/** Every mutation on a trip bumps its version: refresh its detail, budget, activity, weather and the list's card. */
export async function invalidateTrip(queryClient: QueryClient, tripId: string): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: tripKeys.detail(tripId) }),
    queryClient.invalidateQueries({ queryKey: tripKeys.budget(tripId) }),
    queryClient.invalidateQueries({ queryKey: tripKeys.activity(tripId) }),
    queryClient.invalidateQueries({ queryKey: tripKeys.weather(tripId) }),
    queryClient.invalidateQueries({ queryKey: tripKeys.list() }),
  ]);
}

/** While a card's budget is being computed, the list asks again this often until its figures arrive. */
const COMPUTING_POLL_MS = 2_000;

export function useTripsQuery() {
  return useQuery({
    queryKey: tripKeys.list(),
    queryFn: () => apiFetch<TripListResponse>('/api/trips'),
    staleTime: STALE.SECONDS.THIRTY,
    refetchInterval: (query) =>
      query.state.data?.trips.some((trip) => trip.budgetStatus === 'computing') ? COMPUTING_POLL_MS : false,
  });
}

export function useTripQuery(tripId: string) {
  return useQuery({
    queryKey: tripKeys.detail(tripId),
    queryFn: () => apiFetch<TripDetail>(tripPath(tripId)),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useTripCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateTripRequest) => apiFetch<TripDetail>('/api/trips', { method: 'POST', json: body }),
    onSuccess: (detail) => {
      queryClient.setQueryData(tripKeys.detail(detail.trip.id), detail);
      return queryClient.invalidateQueries({ queryKey: tripKeys.list() });
    },
  });
}

export function useTripUpdateMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateTripRequest) => apiFetch<TripDetail>(tripPath(tripId), { method: 'PATCH', json: body }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useTripDeleteMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tripId: string) => apiFetch<void>(tripPath(tripId), { method: 'DELETE' }),
    onSuccess: (_data, tripId) => {
      queryClient.removeQueries({ queryKey: tripKeys.detail(tripId) });
      return queryClient.invalidateQueries({ queryKey: tripKeys.list() });
    },
  });
}

export function useTripDuplicateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tripId: string) => apiFetch<TripDetail>(`${tripPath(tripId)}/duplicate`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tripKeys.list() }),
  });
}

/** Puts back the one record an applied fix changed, as it was (content and version). */
export function useUndoFixMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UndoFixRequest) =>
      apiFetch<unknown>(`/api/trips/${encodeURIComponent(tripId)}/undo-fix`, { method: 'POST', json: body }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}
