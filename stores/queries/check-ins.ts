import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { CheckInFieldsInput, CheckInRecord } from '@/shared/schemas/check-in';
import { apiFetch } from './api-client';
import { defineQueuedSave, queuedSaveKeys } from './offline-queue';
import { STALE } from './stale';
import { tripKeys } from './trips';

export const checkInKeys = {
  list: (tripId: string) => [...tripKeys.root, 'check-ins', tripId] as const,
};

const base = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/check-ins`;

export function useCheckInsQuery(tripId: string) {
  return useQuery({
    queryKey: checkInKeys.list(tripId),
    queryFn: async () => (await apiFetch<{ checkIns: CheckInRecord[] }>(base(tripId))).checkIns,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export type CheckInSave = { tripId: string; checkInId: string | null; version?: number; checkIn: CheckInFieldsInput };

/** A check-in is kept on the device while there is no connection and sent when it returns. */
export function defineCheckInSave(queryClient: QueryClient): void {
  defineQueuedSave(queryClient, queuedSaveKeys.checkIn, {
    mutationFn: ({ tripId, checkInId, version, checkIn }: CheckInSave) =>
      checkInId
        ? apiFetch<CheckInRecord>(`${base(tripId)}/${encodeURIComponent(checkInId)}`, {
            method: 'PATCH',
            json: { version, checkIn },
          })
        : apiFetch<CheckInRecord>(base(tripId), { method: 'POST', json: { checkIn } }),
    onSuccess: (_saved: CheckInRecord, { tripId }: CheckInSave) =>
      queryClient.invalidateQueries({ queryKey: checkInKeys.list(tripId) }),
  });
}

export function useCheckInSaveMutation() {
  return useMutation<CheckInRecord, Error, CheckInSave>({ mutationKey: queuedSaveKeys.checkIn });
}

export function useCheckInDeleteMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (checkInId: string) =>
      apiFetch<void>(`${base(tripId)}/${encodeURIComponent(checkInId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checkInKeys.list(tripId) }),
  });
}
