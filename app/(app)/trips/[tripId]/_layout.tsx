import { Slot, useLocalSearchParams } from 'expo-router';
import { useEffect } from 'react';
import { preloadChart } from '@/components/budget/chart-loader';
import { TripFrame } from '@/components/trip/trip-frame';

export default function TripLayout() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  // The chart's wasm and code start now, beside the budget's request, whichever tab the trip opens on.
  useEffect(preloadChart, []);
  return (
    <TripFrame tripId={tripId}>
      <Slot />
    </TripFrame>
  );
}
