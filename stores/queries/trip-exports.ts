// A trip's route in and out: GPX import (preview first), GPX and calendar downloads, calendar subscriptions.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TripDetail } from '@/shared/schemas/api';
import type { CalendarFeed, CalendarFeedList } from '@/shared/schemas/calendar';
import type { GpxPreview } from '@/shared/schemas/gpx';
import { API_BASE_URL } from '../client-env';
import { apiFetch } from './api-client';
import { STALE } from './stale';
import { invalidateTrip, tripKeys } from './trips';

const base = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}`;
const GPX_HEADERS = { 'Content-Type': 'application/gpx+xml' };

export const tripExportKeys = {
  feeds: (tripId: string) => [...tripKeys.root, 'calendar-feeds', tripId] as const,
};

/** Where the browser downloads a trip's file from (the session cookie goes with it: same origin). */
export const tripFileUrl = (tripId: string, file: 'export.gpx' | 'calendar.ics') =>
  `${API_BASE_URL}${base(tripId)}/${file}`;

export function useGpxPreviewMutation(tripId: string) {
  return useMutation({
    mutationFn: (text: string) =>
      apiFetch<GpxPreview>(`${base(tripId)}/gpx/preview`, { method: 'POST', body: text, headers: GPX_HEADERS }),
  });
}

export function useGpxImportMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ text, tripVersion, replace }: { text: string; tripVersion: number; replace: boolean }) =>
      apiFetch<TripDetail>(`${base(tripId)}/gpx/import?tripVersion=${tripVersion}&replace=${replace}`, {
        method: 'POST',
        body: text,
        headers: GPX_HEADERS,
      }),
    onSuccess: () => invalidateTrip(queryClient, tripId),
  });
}

export function useCalendarFeedsQuery(tripId: string, enabled: boolean) {
  return useQuery({
    queryKey: tripExportKeys.feeds(tripId),
    queryFn: () => apiFetch<CalendarFeedList>(`${base(tripId)}/calendar-feeds`),
    enabled,
    staleTime: STALE.MINUTES.ONE,
    retry: false,
  });
}

export function useCalendarFeedCreateMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<CalendarFeed>(`${base(tripId)}/calendar-feeds`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tripExportKeys.feeds(tripId) }),
  });
}

export function useCalendarFeedRevokeMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (feedId: string) =>
      apiFetch<void>(`${base(tripId)}/calendar-feeds/${encodeURIComponent(feedId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tripExportKeys.feeds(tripId) }),
  });
}
