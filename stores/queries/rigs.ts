import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RigRecord } from '@/shared/schemas/api';
import type { Rig, RigInput } from '@/shared/schemas/rig';
import { apiFetch } from './api-client';
import { STALE } from './stale';
import { invalidateTrip } from './trips';

export type RigPreset = { id: string; label: string; description: string; rig: Rig };

export const rigKeys = {
  root: ['rigs'] as const,
  mine: () => [...rigKeys.root, 'mine'] as const,
  presets: () => [...rigKeys.root, 'presets'] as const,
};

export function useMyRigsQuery() {
  return useQuery({
    queryKey: rigKeys.mine(),
    queryFn: () => apiFetch<{ rigs: RigRecord[] }>('/api/rigs'),
    staleTime: STALE.MINUTES.ONE,
  });
}

export function useRigPresetsQuery() {
  // Presets ship with the server and do not change while the app runs.
  return useQuery({
    queryKey: rigKeys.presets(),
    queryFn: () => apiFetch<{ presets: RigPreset[] }>('/api/rig-presets'),
    staleTime: STALE.MINUTES.FIVE,
  });
}

const tripRig = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/rig`;

export function useTripRigSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { version: number; rig: RigInput }) =>
      apiFetch<RigRecord>(tripRig(tripId), { method: 'PUT', json: body }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useTripRigCopyToMineMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) =>
      apiFetch<{ rig: RigRecord }>(`${tripRig(tripId)}/save`, { method: 'POST', json: { name } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}

export function useTripRigReplaceMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { version: number; rigId: string }) =>
      apiFetch<RigRecord>(`${tripRig(tripId)}/replace`, { method: 'POST', json: body }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useRigDeleteMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (rigId: string) => apiFetch<void>(`/api/rigs/${encodeURIComponent(rigId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}
