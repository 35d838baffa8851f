import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RigRecord, SavedRigRecord } from '@/shared/schemas/api';
import type { ApplianceFields } from '@/shared/schemas/appliance';
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
    queryFn: () => apiFetch<{ rigs: SavedRigRecord[] }>('/api/rigs'),
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

const savedRig = (rigId: string) => `/api/rigs/${encodeURIComponent(rigId)}`;

/** A new one of My rigs, from a preset or blank, with its usual loads (none to begin with). */
export function useRigCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { rig: RigInput; loads?: ApplianceFields[] }) =>
      apiFetch<SavedRigRecord>('/api/rigs', { method: 'POST', json: body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}

/** Saves one of My rigs' parts (its loads are saved on their own). */
export function useSavedRigSaveMutation(rigId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { version: number; rig: RigInput }) =>
      apiFetch<SavedRigRecord>(savedRig(rigId), { method: 'PUT', json: body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}

/** Replaces one of My rigs' usual loads. */
export function useRigLoadsMutation(rigId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { version: number; loads: ApplianceFields[] }) =>
      apiFetch<SavedRigRecord>(`${savedRig(rigId)}/loads`, { method: 'PUT', json: body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}

export function useRigDeleteMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (rigId: string) => apiFetch<void>(`/api/rigs/${encodeURIComponent(rigId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: rigKeys.mine() }),
  });
}
