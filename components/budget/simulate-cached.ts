import { toBudgetResult, type BudgetResult } from '@/shared/budget-result';
import { checkFixes, simulateTrip } from '@/shared/engine';
import type { FlagFixes, SimulationResult } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';

/** A run in the browser: the engine's result (with its ledger) and the same as the server's budget body gives it. */
export type Simulated = { result: SimulationResult | null; budget: BudgetResult | null; error: string | null };
export type Checked = { fixes: FlagFixes[] | null; error: string | null };

const KEEP = 4;

/** A few recent answers keyed by their input, so re-rendering a screen never runs the engine again. */
function recent<T>(cache: Map<string, T>, key: string, make: () => T): T {
  const hit = cache.get(key);
  if (hit) return hit;
  const value = make();
  cache.set(key, value);
  if (cache.size > KEEP) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return value;
}

const message = (error: unknown, otherwise: string): string => (error instanceof Error ? error.message : otherwise);

// A budget runs in ~50–150 ms on a phone; checking its fixes walks the trip dozens of times more.
const simulated = new Map<string, Simulated>();
const checked = new Map<string, Checked>();

export function simulateCached(input: EngineInputDraft): Simulated {
  return recent(simulated, JSON.stringify(input), () => {
    try {
      const result = simulateTrip(input);
      return { result, budget: toBudgetResult(result), error: null };
    } catch (error) {
      return { result: null, budget: null, error: message(error, 'The plan could not be simulated.') };
    }
  });
}

export function checkFixesCached(input: EngineInputDraft, key = JSON.stringify(input)): Checked {
  return recent(checked, key, () => {
    try {
      return { fixes: checkFixes(input), error: null };
    } catch (error) {
      return { fixes: null, error: message(error, 'The fixes could not be checked.') };
    }
  });
}
