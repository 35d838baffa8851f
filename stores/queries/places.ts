// Place search, nearest towns and the map's background, all from the server's offline gazetteer and atlas.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { Basemap, BasemapQuery, NearbyPlacesResponse, PlaceSearchResponse } from '@/shared/schemas/places';
import { apiFetch } from './api-client';
import { STALE } from './stale';

export const placeKeys = {
  root: ['places'] as const,
  search: (q: string) => [...placeKeys.root, 'search', q] as const,
  near: (lat: number, lon: number) => [...placeKeys.root, 'near', lat, lon] as const,
  basemap: (box: BasemapQuery) => [...placeKeys.root, 'basemap', box.west, box.south, box.east, box.north] as const,
};

/** Suggestions for what is typed; the caller debounces. The last answer stays on screen while the next loads. */
export function usePlaceSearchQuery(q: string) {
  const text = q.trim();
  return useQuery({
    queryKey: placeKeys.search(text),
    queryFn: () => apiFetch<PlaceSearchResponse>(`/api/places?q=${encodeURIComponent(text)}&limit=6`),
    enabled: text.length >= 2,
    staleTime: STALE.MINUTES.FIVE,
    placeholderData: keepPreviousData,
    retry: false,
  });
}

/** The towns nearest a point (rounded to about 100 m, so a dragged pin does not ask for every pixel). */
export function useNearbyPlacesQuery(point: { lat: number; lon: number } | null) {
  const lat = point ? Math.round(point.lat * 1000) / 1000 : 0;
  const lon = point ? Math.round(point.lon * 1000) / 1000 : 0;
  return useQuery({
    queryKey: placeKeys.near(lat, lon),
    queryFn: () => apiFetch<NearbyPlacesResponse>(`/api/places/near?lat=${lat}&lon=${lon}&limit=3`),
    enabled: point !== null,
    staleTime: STALE.MINUTES.FIVE,
    retry: false,
  });
}

/** Land and borders for an extent; the land does not move, so an answer is kept for a day. */
export function useBasemapQuery(box: BasemapQuery | null) {
  return useQuery({
    queryKey: box ? placeKeys.basemap(box) : [...placeKeys.root, 'basemap', 'none'],
    queryFn: () =>
      apiFetch<Basemap>(
        `/api/places/basemap?west=${box?.west}&south=${box?.south}&east=${box?.east}&north=${box?.north}`,
      ),
    enabled: box !== null,
    staleTime: STALE.DAYS.ONE,
    gcTime: STALE.DAYS.ONE,
    retry: 1,
  });
}
