import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApplyCalibrationRequest, TripDetail } from '@/shared/schemas/api';
import { apiFetch } from './api-client';
import { invalidateTrip } from './trips';

/** Saves a calibration from check-ins (a stop's sky openness and the loads' draws); the answer is the trip as it stands. */
export function useApplyCalibrationMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ApplyCalibrationRequest) =>
      apiFetch<TripDetail>(`/api/trips/${encodeURIComponent(tripId)}/calibration`, { method: 'POST', json: body }),
    // A 409 means the trip moved on: refresh it either way, so the offer is worked out on what is there now.
    onSettled: () => invalidateTrip(queryClient, tripId),
  });
}
