// Stops and drives: the trip's route. Every change bumps the trip, so all invalidate through tripKeys.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DriveRecord, StopRecord, TripDetail } from '@/shared/schemas/api';
import type { Drive, StopInput } from '@/shared/schemas/trip';
import { apiFetch } from './api-client';
import { invalidateTrip } from './trips';

const base = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}`;

export type StopSave = { stopId: string | null; version?: number; stop: StopInput; notes: string };

export function useStopSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ stopId, version, stop, notes }: StopSave) =>
      stopId
        ? apiFetch<StopRecord>(`${base(tripId)}/stops/${encodeURIComponent(stopId)}`, {
            method: 'PATCH',
            json: { version, stop, notes },
          })
        : apiFetch<StopRecord>(`${base(tripId)}/stops`, { method: 'POST', json: { stop, notes } }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useStopDeleteMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stopId: string) =>
      apiFetch<void>(`${base(tripId)}/stops/${encodeURIComponent(stopId)}`, { method: 'DELETE' }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useStopsReorderMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { tripVersion: number; stopIds: string[] }) =>
      apiFetch<TripDetail>(`${base(tripId)}/stops/reorder`, { method: 'POST', json: body }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useDriveSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ driveId, version, drive }: { driveId: string; version: number; drive: Drive }) =>
      apiFetch<DriveRecord>(`${base(tripId)}/drives/${encodeURIComponent(driveId)}`, {
        method: 'PATCH',
        json: { version, drive },
      }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}
