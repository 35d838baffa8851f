import { simulateTrip } from '@/shared/engine';
import { toBudgetResult, type BudgetResult } from '@/shared/budget-result';
import type { SimulationResult } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';

/** A run in the browser: the engine's result (with its ledger) and the same as the server's budget body gives it. */
export type Simulated = { result: SimulationResult | null; budget: BudgetResult | null; error: string | null };

// A few recent runs keyed by their input: re-rendering a screen must not re-run the engine (~50–150 ms).
const cache = new Map<string, Simulated>();
const KEEP = 4;

export function simulateCached(input: EngineInputDraft): Simulated {
  const key = JSON.stringify(input);
  const hit = cache.get(key);
  if (hit) return hit;
  let value: Simulated;
  try {
    const result = simulateTrip(input);
    value = { result, budget: toBudgetResult(result), error: null };
  } catch (error) {
    value = {
      result: null,
      budget: null,
      error: error instanceof Error ? error.message : 'The plan could not be simulated.',
    };
  }
  cache.set(key, value);
  if (cache.size > KEEP) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return value;
}
