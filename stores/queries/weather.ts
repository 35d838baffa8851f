import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { TripDetail } from '@/shared/schemas/api';
import type { EngineWeather } from '@/shared/schemas/engine-weather';
import type { TripWeather } from '@/shared/schemas/weather';
import { apiFetch } from './api-client';
import { tripKeys } from './trips';

/** While any stop's record is loading, ask again this often. */
const LOADING_POLL_MS = 2500;

export const weatherKeys = {
  trip: tripKeys.weather,
  /** The recorded years themselves, for the stops as they stand (a moved stop reads other years). */
  record: (tripId: string, stops?: string) =>
    stops === undefined
      ? ([...tripKeys.root, 'weather-record', tripId] as const)
      : ([...tripKeys.root, 'weather-record', tripId, stops] as const),
};

/** What changes a budget: how many years and forecast days each stop has. */
function fingerprint(w: TripWeather | undefined): string {
  return w ? w.stops.map((s) => `${s.stopId}:${s.state}:${s.yearsReady}:${s.forecastDays}`).join('|') : '';
}

/**
 * Each stop's weather record, asked again while any is loading. When more of it arrives the budget is computed on
 * it, so the budget is fetched again.
 */
export function useTripWeatherQuery(tripId: string) {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: weatherKeys.trip(tripId),
    queryFn: () => apiFetch<TripWeather>(`/api/trips/${encodeURIComponent(tripId)}/weather`),
    refetchInterval: (q) => (q.state.data?.stops.some((s) => s.state === 'loading') ? LOADING_POLL_MS : false),
  });
  const seen = useRef<string | null>(null);
  const now = fingerprint(query.data);
  useEffect(() => {
    if (!now) return;
    if (seen.current !== null && seen.current !== now) {
      void queryClient.invalidateQueries({ queryKey: tripKeys.budget(tripId) });
      void queryClient.invalidateQueries({ queryKey: weatherKeys.record(tripId) });
    }
    seen.current = now;
  }, [now, queryClient, tripId]);
  return query;
}

/** Where and when each stop is: what decides which recorded years the server hands back. */
function stopsSignature(detail: TripDetail): string {
  return detail.stops.map((r) => `${r.stop.lat},${r.stop.lon},${r.stop.arriveAt},${r.stop.departAt}`).join('|');
}

/**
 * The recorded years and forecast the server's budget runs on, fetched only when `enabled` (the browser runs the
 * engine itself for what-ifs and "what it would take", and must run it on the same years).
 */
export function useTripRecordQuery(detail: TripDetail, enabled: boolean) {
  const tripId = detail.trip.id;
  return useQuery({
    queryKey: weatherKeys.record(tripId, stopsSignature(detail)),
    queryFn: () =>
      apiFetch<{ weather: EngineWeather | null }>(`/api/trips/${encodeURIComponent(tripId)}/weather/record`),
    enabled,
    staleTime: 5 * 60_000,
  });
}
