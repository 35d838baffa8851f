import type { BudgetResult } from '@/shared/budget-result';
import type { LedgerRow } from '@/shared/engine/result-types';
import type { TripDetail } from '@/shared/schemas/api';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { useBudgetQuery, useLedgerQuery } from '@/stores/queries/budget';
import { useTripRecordQuery } from '@/stores/queries/weather';
import { anyWhatIf, useWhatIf, type WhatIf } from '@/stores/what-if-store';
import { simulateCached, type Simulated } from './simulate-cached';
import { applyWhatIf, withRecord } from './what-if';

type Unready =
  { state: 'loading' } | { state: 'error'; error: unknown; retry: () => void } | { state: 'empty'; reason: string };

export type BudgetView =
  | Unready
  /** `version` is the server budget's (null for a what-if); `input` is what a what-if ran (null for the server's). */
  | { state: 'ready'; result: BudgetResult; whatIf: boolean; version: number | null; input: EngineInputDraft | null };

/** The hourly ledger: fetched apart from the budget, only by the screens that show it. */
export type LedgerView = Unready | { state: 'ready'; rows: LedgerRow[] };

type WhatIfRun =
  (Simulated & { input: EngineInputDraft }) | { result: null; budget: null; error: string } | 'loading' | null;

/**
 * While what-ifs are on, the same engine run in the browser on the changed input, on the same recorded years as the
 * server's budget (so the change is all that differs); null when none is on.
 */
function useWhatIfRun(detail: TripDetail, whatIf: WhatIf): WhatIfRun {
  const on = anyWhatIf(whatIf);
  const record = useTripRecordQuery(detail, on);
  if (!on) return null;
  const input = withRecord(toEngineInput(detail), record.data?.weather);
  if (!input) return { result: null, budget: null, error: 'Add a stop to see a budget.' };
  if (record.isPending && record.fetchStatus === 'fetching') return 'loading';
  const changed = applyWhatIf(input, whatIf);
  return { ...simulateCached(changed), input: changed };
}

/** The server's budget, or — while what-ifs are on — the same engine run in the browser on the changed input. */
export function useBudgetView(detail: TripDetail): BudgetView {
  const whatIf = useWhatIf(detail.trip.id);
  const budget = useBudgetQuery(detail.trip.id);
  const sim = useWhatIfRun(detail, whatIf);
  if (sim === 'loading') return { state: 'loading' };
  if (sim)
    return sim.budget && 'input' in sim
      ? { state: 'ready', result: sim.budget, whatIf: true, version: null, input: sim.input }
      : { state: 'empty', reason: sim.error ?? '' };
  if (budget.isPending) return { state: 'loading' };
  if (budget.isError) return { state: 'error', error: budget.error, retry: () => void budget.refetch() };
  if (!budget.data.result)
    return { state: 'empty', reason: budget.data.reason ?? 'Add a stop and an appliance to see a budget.' };
  return { state: 'ready', result: budget.data.result, whatIf: false, version: budget.data.version, input: null };
}

/**
 * The ledger of the budget `useBudgetView` shows: the server's (asked for only while `enabled`), or the rows of the
 * run in the browser while what-ifs are on.
 */
export function useLedgerView(detail: TripDetail, enabled = true): LedgerView {
  const whatIf = useWhatIf(detail.trip.id);
  const sim = useWhatIfRun(detail, whatIf);
  const ledger = useLedgerQuery(detail.trip.id, enabled && !sim);
  if (sim === 'loading') return { state: 'loading' };
  if (sim)
    return sim.result ? { state: 'ready', rows: sim.result.ledger } : { state: 'empty', reason: sim.error ?? '' };
  if (ledger.isPending) return { state: 'loading' };
  if (ledger.isError) return { state: 'error', error: ledger.error, retry: () => void ledger.refetch() };
  if (!ledger.data.rows)
    return { state: 'empty', reason: ledger.data.reason ?? 'Add a stop and an appliance to see a budget.' };
  return { state: 'ready', rows: ledger.data.rows };
}
