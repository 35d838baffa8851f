import { useRouter } from 'expo-router';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { BudgetResult } from '@/shared/budget-result';
import { chargeTone } from '@/shared/route-charge';
import type { TripDetail } from '@/shared/schemas/api';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { mapStops, RouteMap } from './route-map';

/** The Budget tab's small map: each marker opens its stop on the Route tab. */
export function BudgetRouteMap({ detail, result }: { detail: TripDetail; result: BudgetResult }) {
  const router = useRouter();
  if (detail.stops.length === 0) return null;
  return (
    <Card testID="budget-route">
      <Text variant="title" role="heading" aria-level={2}>
        Route
      </Text>
      <Text variant="caption" color="inkSoft">
        Each stop by its lowest charge: circle comfortable, ringed close to the reserve, square below it. Press one to
        open it.
      </Text>
      <RouteMap
        testID="budget-route-map"
        compact
        height={220}
        label="Map of the route with each stop marked by its lowest charge"
        stops={mapStops(detail.stops, result)}
        onOpenStop={(stopId) =>
          router.push({ pathname: '/trips/[tripId]/route', params: { tripId: detail.trip.id, stop: stopId } })
        }
      />
    </Card>
  );
}

/** A trip card's map: a picture of the route; the card itself is the link. */
export function TripCardMap({ trip }: { trip: TripSummary }) {
  const route = trip.route ?? [];
  if (route.length === 0) return null;
  const reserve = trip.reservePct ?? 0;
  return (
    <RouteMap
      testID={`trip-map-${trip.id}`}
      compact
      height={120}
      label={`Map of ${trip.name}: ${route.length} ${route.length === 1 ? 'stop' : 'stops'}`}
      stops={route.map((stop, i) => ({
        id: `${trip.id}-${i}`,
        name: `Stop ${i + 1}`,
        lat: stop.lat,
        lon: stop.lon,
        lowestSocPct: stop.lowestSocPct,
        tone: trip.reservePct === null || trip.reservePct === undefined ? null : chargeTone(stop.lowestSocPct, reserve),
      }))}
    />
  );
}
