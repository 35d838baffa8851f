import { lazy, Suspense } from 'react';
import { Skeleton } from '@/components/ui/skeleton';
import type { BudgetResult } from '@/shared/budget-result';
import { chargeTone, lowestChargeByStop } from '@/shared/route-charge';
import type { StopRecord } from '@/shared/schemas/api';
import type { MapStop, RouteMapProps } from './route-map-types';

// d3-geo and the drawing load only when a map is on screen.
const RouteMapCanvas = lazy(() => import('./route-map-canvas'));

/** A map of the route: Natural Earth land, the drives as lines, each stop a numbered marker toned by its charge. */
export function RouteMap(props: RouteMapProps) {
  return (
    <Suspense fallback={<Skeleton testID={`${props.testID}-loading`} height={props.height} />}>
      <RouteMapCanvas {...props} />
    </Suspense>
  );
}

/** The map's stops from the trip and, when there is one, its budget. */
export function mapStops(stops: readonly StopRecord[], budget: BudgetResult | null): MapStop[] {
  const lowest = budget ? lowestChargeByStop(budget.soc, stops.length) : [];
  const reserve = budget?.headline.reservePct ?? 0;
  return stops.map((record, i) => {
    const low = lowest[i] ?? null;
    return {
      id: record.id,
      name: record.stop.name,
      lat: record.stop.lat,
      lon: record.stop.lon,
      lowestSocPct: low,
      tone: budget ? chargeTone(low, reserve) : null,
    };
  });
}
