import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { preferencesSchema, type Preferences } from '@/shared/schemas/preferences';
import { setUnits } from '../units-store';
import { apiFetch } from './api-client';
import { STALE } from './stale';

export const preferenceKeys = { root: ['preferences'] as const, mine: () => [...preferenceKeys.root, 'me'] as const };

export function usePreferencesQuery() {
  return useQuery({
    queryKey: preferenceKeys.mine(),
    queryFn: async () => preferencesSchema.parse(await apiFetch<unknown>('/api/me/preferences')),
    staleTime: STALE.MINUTES.FIVE,
    retry: false,
  });
}

/** The server's answer wins over the local copy, so a choice made on the laptop follows to the phone. */
export function useSyncUnitsFromServer(): void {
  const prefs = usePreferencesQuery();
  const units = prefs.data?.units;
  useEffect(() => {
    if (units) setUnits(units);
  }, [units]);
}

export function usePreferencesMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Preferences) => apiFetch<Preferences>('/api/me/preferences', { method: 'PUT', json: body }),
    onMutate: (body) => setUnits(body.units),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: preferenceKeys.mine() }),
  });
}
