import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TripDetail } from '@/shared/schemas/api';
import type { ChangeStayRequest } from '@/shared/schemas/stay';
import { apiFetch } from './api-client';
import { invalidateTrip } from './trips';

/** Stay longer or leave early at one stop; the answer is the trip as it now stands. */
export function useStayChangeMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ stopId, ...body }: ChangeStayRequest & { stopId: string }) =>
      apiFetch<TripDetail>(`/api/trips/${encodeURIComponent(tripId)}/stops/${encodeURIComponent(stopId)}/stay`, {
        method: 'POST',
        json: body,
      }),
    // A 409 means the trip moved on: refresh it either way, so the control works on what is there now.
    onSettled: () => invalidateTrip(queryClient, tripId),
  });
}
