import type { SimulationResult } from '@/shared/engine/result-types';
import type { TripDetail } from '@/shared/schemas/api';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { useBudgetQuery } from '@/stores/queries/budget';
import { anyWhatIf, useWhatIf } from '@/stores/what-if-store';
import { simulateCached } from './simulate-cached';
import { applyWhatIf } from './what-if';

export type BudgetView =
  | { state: 'loading' }
  | { state: 'error'; error: unknown; retry: () => void }
  | { state: 'empty'; reason: string }
  /** `version` is the server budget's (null for a what-if); `input` is what a what-if ran (null for the server's). */
  | {
      state: 'ready';
      result: SimulationResult;
      whatIf: boolean;
      version: number | null;
      input: EngineInputDraft | null;
    };

/** The server's budget, or — while what-ifs are on — the same engine run in the browser on the changed input. */
export function useBudgetView(detail: TripDetail): BudgetView {
  const whatIf = useWhatIf(detail.trip.id);
  const budget = useBudgetQuery(detail.trip.id);
  if (anyWhatIf(whatIf)) {
    const input = toEngineInput(detail);
    if (!input) return { state: 'empty', reason: 'Add a stop to see a budget.' };
    const changed = applyWhatIf(input, whatIf);
    const sim = simulateCached(changed);
    return sim.result
      ? { state: 'ready', result: sim.result, whatIf: true, version: null, input: changed }
      : { state: 'empty', reason: sim.error ?? '' };
  }
  if (budget.isPending) return { state: 'loading' };
  if (budget.isError) return { state: 'error', error: budget.error, retry: () => void budget.refetch() };
  if (!budget.data.result)
    return { state: 'empty', reason: budget.data.reason ?? 'Add a stop and an appliance to see a budget.' };
  return { state: 'ready', result: budget.data.result, whatIf: false, version: budget.data.version, input: null };
}
