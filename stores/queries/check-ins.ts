import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CheckInFieldsInput, CheckInRecord } from '@/shared/schemas/check-in';
import { apiFetch } from './api-client';
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

export type CheckInSave = { checkInId: string | null; version?: number; checkIn: CheckInFieldsInput };

export function useCheckInSaveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ checkInId, version, checkIn }: CheckInSave) =>
      checkInId
        ? apiFetch<CheckInRecord>(`${base(tripId)}/${encodeURIComponent(checkInId)}`, {
            method: 'PATCH',
            json: { version, checkIn },
          })
        : apiFetch<CheckInRecord>(base(tripId), { method: 'POST', json: { checkIn } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checkInKeys.list(tripId) }),
  });
}

export function useCheckInDeleteMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (checkInId: string) =>
      apiFetch<void>(`${base(tripId)}/${encodeURIComponent(checkInId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checkInKeys.list(tripId) }),
  });
}
