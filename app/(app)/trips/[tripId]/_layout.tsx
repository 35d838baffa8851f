import { Slot, useLocalSearchParams } from 'expo-router';
import { useEffect } from 'react';
import { preloadChart } from '@/components/budget/chart-loader';
import { preloadTripScreens } from '@/components/trip/lazy-trip-screens';
import { TripFrame } from '@/components/trip/trip-frame';

export default function TripLayout() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  // The chart's wasm and code start now, beside the budget's request, whichever tab the trip opens on.
  useEffect(preloadChart, []);
  // The tabs' own chunk too, so a tab switched to later opens at once.
  useEffect(preloadTripScreens, []);
  return (
    <TripFrame tripId={tripId}>
      <Slot />
    </TripFrame>
  );
}
