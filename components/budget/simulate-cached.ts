import { checkFixes, simulateTrip } from '@/shared/engine';
import type { FlagFixes, SimulationResult } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';

export type Simulated = { result: SimulationResult | null; error: string | null };

// A few recent runs keyed by their input: re-rendering a screen must not re-run the engine (~50–150 ms).
const cache = new Map<string, Simulated>();
const KEEP = 4;

export function simulateCached(input: EngineInputDraft): Simulated {
  const key = JSON.stringify(input);
  const hit = cache.get(key);
  if (hit) return hit;
  let value: Simulated;
  try {
    value = { result: simulateTrip(input), error: null };
  } catch (error) {
    value = { result: null, error: error instanceof Error ? error.message : 'The plan could not be simulated.' };
  }
  cache.set(key, value);
  if (cache.size > KEEP) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return value;
}

export type Checked = { fixes: FlagFixes[] | null; error: string | null };

// The checked fixes of a few recent what-ifs: checking walks the trip dozens of times, so it runs once per input.
const fixesCache = new Map<string, Checked>();

export function checkFixesCached(input: EngineInputDraft, key = JSON.stringify(input)): Checked {
  const hit = fixesCache.get(key);
  if (hit) return hit;
  let value: Checked;
  try {
    value = { fixes: checkFixes(input), error: null };
  } catch (error) {
    value = { fixes: null, error: error instanceof Error ? error.message : 'The fixes could not be checked.' };
  }
  fixesCache.set(key, value);
  if (fixesCache.size > KEEP) {
    const oldest = fixesCache.keys().next().value;
    if (oldest !== undefined) fixesCache.delete(oldest);
  }
  return value;
}
