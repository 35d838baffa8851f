import { useQueryClient } from '@tanstack/react-query';
import { Slot, useLocalSearchParams } from 'expo-router';
import { useEffect } from 'react';
import { preloadChart } from '@/components/budget/chart-loader';
import { preloadTripScreens } from '@/components/trip/lazy-trip-screens';
import { TripFrame } from '@/components/trip/trip-frame';
import { prefetchBudget } from '@/stores/queries/budget';

export default function TripLayout() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const queryClient = useQueryClient();
  // The budget's request starts with the trip, not once its tab's code has arrived.
  useEffect(() => prefetchBudget(queryClient, tripId), [queryClient, tripId]);
  // The chart's wasm and code start now, beside the budget's request, whichever tab the trip opens on.
  useEffect(preloadChart, []);
  // The tabs' own chunk too, so a tab switched to later opens at once.
  useEffect(() => void preloadTripScreens(), []);
  return (
    <TripFrame tripId={tripId}>
      <Slot />
    </TripFrame>
  );
}
