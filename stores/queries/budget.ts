import { useQuery } from '@tanstack/react-query';
import type { SimulationResult } from '@/shared/engine/result-types';
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
