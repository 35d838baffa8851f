import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ApplianceRecord } from '@/shared/schemas/api';
import type { ApplianceFields, Schedule } from '@/shared/schemas/appliance';
import { apiFetch } from './api-client';
import { defineQueuedSave, queuedSaveKeys } from './offline-queue';
import { invalidateTrip } from './trips';

const base = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/appliances`;

export type ApplianceSave = {
  tripId: string;
  applianceId: string | null;
  version?: number;
  appliance: ApplianceFields;
  caretakerUserId: string | null;
};

export type ScheduleSave = { tripId: string; applianceId: string; version: number; schedule: Schedule };

/** An appliance's figures and its routine are kept on the device while there is no connection. */
export function defineApplianceSaves(queryClient: QueryClient): void {
  defineQueuedSave(queryClient, queuedSaveKeys.appliance, {
    mutationFn: ({ tripId, applianceId, version, appliance, caretakerUserId }: ApplianceSave) =>
      applianceId
        ? apiFetch<ApplianceRecord>(`${base(tripId)}/${encodeURIComponent(applianceId)}`, {
            method: 'PATCH',
            json: { version, appliance, caretakerUserId },
          })
        : apiFetch<ApplianceRecord>(base(tripId), { method: 'POST', json: { appliance, caretakerUserId } }),
    onSuccess: (_saved: ApplianceRecord, { tripId }: ApplianceSave) => invalidateTrip(queryClient, tripId),
  });
  defineQueuedSave(queryClient, queuedSaveKeys.applianceSchedule, {
    mutationFn: ({ tripId, applianceId, version, schedule }: ScheduleSave) =>
      apiFetch<ApplianceRecord>(`${base(tripId)}/${encodeURIComponent(applianceId)}/schedule`, {
        method: 'PUT',
        json: { version, schedule },
      }),
    onSuccess: (_saved: ApplianceRecord, { tripId }: ScheduleSave) => invalidateTrip(queryClient, tripId),
  });
}

export function useApplianceSaveMutation() {
  return useMutation<ApplianceRecord, Error, ApplianceSave>({ mutationKey: queuedSaveKeys.appliance });
}

export function useApplianceDeleteMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (applianceId: string) =>
      apiFetch<void>(`${base(tripId)}/${encodeURIComponent(applianceId)}`, { method: 'DELETE' }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useScheduleSaveMutation() {
  return useMutation<ApplianceRecord, Error, ScheduleSave>({ mutationKey: queuedSaveKeys.applianceSchedule });
}
