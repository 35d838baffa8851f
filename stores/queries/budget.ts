import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import type { BudgetResponse, LedgerResponse } from '@/shared/schemas/budget-response';
import type { FlagFixes, LedgerRow } from '@/shared/engine/result-types';
import { fromLedgerColumns } from '@/shared/ledger-columns';
import type { ActivityEntry, Member } from '@/shared/schemas/api';
import { apiFetch } from './api-client';
import { STALE } from './stale';
import { tripKeys } from './trips';

export type { BudgetResponse, LedgerResponse };

const budgetQuery = (tripId: string) =>
  queryOptions({
    queryKey: tripKeys.budget(tripId),
    queryFn: () => apiFetch<BudgetResponse>(`/api/trips/${encodeURIComponent(tripId)}/budget`),
    staleTime: STALE.SECONDS.THIRTY,
  });

export function useBudgetQuery(tripId: string) {
  return useQuery(budgetQuery(tripId));
}

/**
 * Starts the budget's request as soon as a trip opens. The screens that read it live in a chunk of their own, and on a
 * slow link waiting for that chunk before asking would add its download to the headline's time.
 */
export function prefetchBudget(queryClient: QueryClient, tripId: string): void {
  void queryClient.prefetchQuery(budgetQuery(tripId));
}

/** The ledger as the screens read it: the engine's rows again, or the reason there are none. */
export type LedgerRows = { version: number; rows: LedgerRow[] | null; reason?: string };

/** Turns the columns the server sends into rows; once per response (react-query keeps a `select`'s result). */
export function ledgerRowsOf(response: LedgerResponse): LedgerRows {
  const { version, ledger, reason } = response;
  return { version, rows: ledger ? fromLedgerColumns(ledger) : null, ...(reason === undefined ? {} : { reason }) };
}

/** The hourly ledger, fetched only while a screen that shows it is open (`enabled`). */
export function useLedgerQuery(tripId: string, enabled = true) {
  return useQuery({
    queryKey: tripKeys.ledger(tripId),
    queryFn: () => apiFetch<LedgerResponse>(`/api/trips/${encodeURIComponent(tripId)}/ledger`),
    select: ledgerRowsOf,
    enabled,
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
