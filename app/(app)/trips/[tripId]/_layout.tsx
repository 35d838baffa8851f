import { Slot, useLocalSearchParams } from 'expo-router';
import { TripFrame } from '@/components/trip/trip-frame';

export default function TripLayout() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  return (
    <TripFrame tripId={tripId}>
      <Slot />
    </TripFrame>
  );
}
