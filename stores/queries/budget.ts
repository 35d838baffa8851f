import { useQuery } from '@tanstack/react-query';
import type { FlagFixes, SimulationResult } from '@/shared/engine/result-types';
import type { ActivityEntry, Member } from '@/shared/schemas/api';
import { apiFetch } from './api-client';
import { STALE } from './stale';
import { tripKeys } from './trips';

export type BudgetResponse = { version: number; result: SimulationResult | null; reason?: string };

export function useBudgetQuery(tripId: string) {
  return useQuery({
    queryKey: tripKeys.budget(tripId),
    queryFn: () => apiFetch<BudgetResponse>(`/api/trips/${encodeURIComponent(tripId)}/budget`),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export type BudgetFixesResponse = { version: number; fixes: FlagFixes[]; reason?: string };

/** Keyed under the budget, so whatever refreshes the budget refreshes its fixes too. */
export const budgetFixesKey = (tripId: string, version: number) =>
  [...tripKeys.budget(tripId), 'fixes', version] as const;

/**
 * The checked fixes of the budget's flags: asked for only when the flags are on screen (`enabled`), and kept per
 * budget version, so fixes of an older budget are never shown against a newer one's flags.
 */
export function useBudgetFixesQuery(tripId: string, version: number | null, enabled: boolean) {
  return useQuery({
    queryKey: budgetFixesKey(tripId, version ?? -1),
    queryFn: () => apiFetch<BudgetFixesResponse>(`/api/trips/${encodeURIComponent(tripId)}/budget/fixes`),
    enabled: enabled && version !== null,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useActivityQuery(tripId: string) {
  return useQuery({
    queryKey: tripKeys.activity(tripId),
    queryFn: () => apiFetch<{ entries: ActivityEntry[] }>(`/api/trips/${encodeURIComponent(tripId)}/activity`),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useMembersQuery(tripId: string) {
  return useQuery({
    queryKey: tripKeys.members(tripId),
    queryFn: () => apiFetch<{ members: Member[] }>(`/api/trips/${encodeURIComponent(tripId)}/members`),
    staleTime: STALE.MINUTES.ONE,
  });
}
