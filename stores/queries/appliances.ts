import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApplianceRecord } from '@/shared/schemas/api';
import type { ApplianceFields, Schedule } from '@/shared/schemas/appliance';
import { apiFetch } from './api-client';
import { invalidateTrip } from './trips';

const base = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/appliances`;

export type ApplianceSave = {
  applianceId: string | null;
  version?: number;
  appliance: ApplianceFields;
  caretakerUserId: string | null;
};

export function useApplianceSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ applianceId, version, appliance, caretakerUserId }: ApplianceSave) =>
      applianceId
        ? apiFetch<ApplianceRecord>(`${base(tripId)}/${encodeURIComponent(applianceId)}`, {
            method: 'PATCH',
            json: { version, appliance, caretakerUserId },
          })
        : apiFetch<ApplianceRecord>(base(tripId), { method: 'POST', json: { appliance, caretakerUserId } }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useApplianceDeleteMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (applianceId: string) =>
      apiFetch<void>(`${base(tripId)}/${encodeURIComponent(applianceId)}`, { method: 'DELETE' }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useScheduleSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ applianceId, version, schedule }: { applianceId: string; version: number; schedule: Schedule }) =>
      apiFetch<ApplianceRecord>(`${base(tripId)}/${encodeURIComponent(applianceId)}/schedule`, {
        method: 'PUT',
        json: { version, schedule },
      }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}
