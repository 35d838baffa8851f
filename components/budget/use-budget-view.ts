import type { SimulationResult } from '@/shared/engine/result-types';
import type { TripDetail } from '@/shared/schemas/api';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { useBudgetQuery } from '@/stores/queries/budget';
import { useTripRecordQuery } from '@/stores/queries/weather';
import { anyWhatIf, useWhatIf } from '@/stores/what-if-store';
import { simulateCached } from './simulate-cached';
import { applyWhatIf, withRecord } from './what-if';

export type BudgetView =
  | { state: 'loading' }
  | { state: 'error'; error: unknown; retry: () => void }
  | { state: 'empty'; reason: string }
  | { state: 'ready'; result: SimulationResult; whatIf: boolean };

/** The server's budget, or — while what-ifs are on — the same engine run in the browser on the changed input. */
export function useBudgetView(detail: TripDetail): BudgetView {
  const whatIf = useWhatIf(detail.trip.id);
  const budget = useBudgetQuery(detail.trip.id);
  const on = anyWhatIf(whatIf);
  // What-ifs run on the same recorded years as the server's budget, so the change is all that differs.
  const record = useTripRecordQuery(detail, on);
  if (on) {
    const input = withRecord(toEngineInput(detail), record.data?.weather);
    if (!input) return { state: 'empty', reason: 'Add a stop to see a budget.' };
    if (record.isPending && record.fetchStatus === 'fetching') return { state: 'loading' };
    const sim = simulateCached(applyWhatIf(input, whatIf));
    return sim.result
      ? { state: 'ready', result: sim.result, whatIf: true }
      : { state: 'empty', reason: sim.error ?? '' };
  }
  if (budget.isPending) return { state: 'loading' };
  if (budget.isError) return { state: 'error', error: budget.error, retry: () => void budget.refetch() };
  if (!budget.data.result)
    return { state: 'empty', reason: budget.data.reason ?? 'Add a stop and an appliance to see a budget.' };
  return { state: 'ready', result: budget.data.result, whatIf: false };
}
