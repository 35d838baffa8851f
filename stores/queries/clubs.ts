import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TripDetail } from '@/shared/schemas/api';
import type { ClubDetail, ClubInviteReport, ClubInviteRequest, ClubSummary, TripShare } from '@/shared/schemas/sharing';
import { apiFetch } from './api-client';
import { STALE } from './stale';
import { invalidateTrip, tripKeys } from './trips';

export const clubKeys = {
  root: ['clubs'] as const,
  list: () => [...clubKeys.root, 'list'] as const,
  detail: (clubId: string) => [...clubKeys.root, 'detail', clubId] as const,
  /** Under the clubs root, so sharing or withdrawing from either side refreshes both. */
  tripShares: (tripId: string) => [...clubKeys.root, 'trip-shares', tripId] as const,
};

export type ClubInviteResult = ClubInviteReport;

const clubPath = (clubId: string) => `/api/clubs/${encodeURIComponent(clubId)}`;

export function useClubsQuery() {
  return useQuery({
    queryKey: clubKeys.list(),
    queryFn: () => apiFetch<{ clubs: ClubSummary[] }>('/api/clubs'),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useClubQuery(clubId: string) {
  return useQuery({
    queryKey: clubKeys.detail(clubId),
    queryFn: () => apiFetch<ClubDetail>(clubPath(clubId)),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useClubCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => apiFetch<{ club: ClubSummary }>('/api/clubs', { method: 'POST', json: { name } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clubKeys.list() }),
  });
}

// Invites are saved even when their e-mail fails (502): refresh the list whatever the answer.
export function useClubInviteMutation(clubId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ClubInviteRequest) =>
      apiFetch<ClubInviteResult>(`${clubPath(clubId)}/invites`, { method: 'POST', json: body }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: clubKeys.detail(clubId) }),
  });
}

/** Sends a club invite again with a fresh link: "Retry" when its e-mail did not go out. */
export function useClubInviteResendMutation(clubId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) =>
      apiFetch<unknown>(`${clubPath(clubId)}/invites/${encodeURIComponent(inviteId)}/resend`, { method: 'POST' }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: clubKeys.detail(clubId) }),
  });
}

export function useClubInviteRevokeMutation(clubId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) =>
      apiFetch<void>(`${clubPath(clubId)}/invites/${encodeURIComponent(inviteId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clubKeys.detail(clubId) }),
  });
}

export function useShareTripToClubMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ clubId, tripId }: { clubId: string; tripId: string }) =>
      apiFetch<unknown>(`${clubPath(clubId)}/trips`, { method: 'POST', json: { tripId } }),
    // The trips list shows where each trip is shared, so it is read again too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: clubKeys.root }),
        queryClient.invalidateQueries({ queryKey: tripKeys.list() }),
      ]),
  });
}

export function useUnshareTripMutation(clubId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tripId: string) =>
      apiFetch<void>(`${clubPath(clubId)}/trips/${encodeURIComponent(tripId)}`, { method: 'DELETE' }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: clubKeys.root }),
        queryClient.invalidateQueries({ queryKey: tripKeys.list() }),
      ]),
  });
}

const sharesPath = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/shares`;

/** Every club the trip is shared with (owner and planners). */
export function useTripSharesQuery(tripId: string, enabled: boolean) {
  return useQuery({
    queryKey: clubKeys.tripShares(tripId),
    queryFn: () => apiFetch<{ shares: TripShare[] }>(sharesPath(tripId)),
    staleTime: STALE.SECONDS.THIRTY,
    enabled,
  });
}

/** The owner withdraws the trip from a club, whoever shared it there. */
export function useTripShareWithdrawMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (clubId: string) =>
      apiFetch<void>(`${sharesPath(tripId)}/${encodeURIComponent(clubId)}`, { method: 'DELETE' }),
    onSuccess: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: clubKeys.root }), invalidateTrip(queryClient, tripId)]),
  });
}

/** "Copy onto my rig": a new trip the caller owns, running on one of their saved rigs. */
export function useCopyOntoRigMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      tripId,
      ...body
    }: {
      tripId: string;
      rigId: string;
      name?: string;
      sharedApplianceIds?: string[];
    }) => apiFetch<TripDetail>(`/api/trips/${encodeURIComponent(tripId)}/copy`, { method: 'POST', json: body }),
    onSuccess: (detail) => {
      queryClient.setQueryData(tripKeys.detail(detail.trip.id), detail);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: tripKeys.list() }),
        queryClient.invalidateQueries({ queryKey: clubKeys.root }),
      ]);
    },
  });
}

export function useBasedOnSeenMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<unknown>(`/api/trips/${encodeURIComponent(tripId)}/based-on/seen`, { method: 'POST' }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}
