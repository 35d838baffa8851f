import type { Db } from '@/db/client';
import { findTrip, loadTripDetail } from '@/db/queries/trips';
import { simulateParsed } from '@/shared/engine';
import type { SimulationResult } from '@/shared/engine';
import { engineInputSchema } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';

export type BudgetAnswer = { revision: number; result: SimulationResult | null; reason?: string };

const CACHE_LIMIT = 200;

/**
 * Runs the engine for a trip and keeps the answer per (trip, revision): any change to the trip
 * bumps its revision, so a cached budget is never stale and needs no invalidation.
 */
export function createBudgetService(db: Db, onError: (error: unknown, tripId: string) => void = () => undefined) {
  const cache = new Map<string, BudgetAnswer>();

  function compute(tripId: string, revision: number): BudgetAnswer {
    const detail = loadTripDetail(db, tripId, 'viewer');
    const draft = detail ? toEngineInput(detail) : null;
    if (!draft) return { revision, result: null, reason: 'Add a stop to see the budget.' };
    const parsed = engineInputSchema.safeParse(draft);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      return {
        revision,
        result: null,
        reason: `The plan cannot be simulated yet: ${issue?.path.join('.')} ${issue?.message}`,
      };
    }
    try {
      return { revision, result: simulateParsed(parsed.data) };
    } catch (error) {
      // An engine fault must not take the trip's pages down with it; say so and log it.
      onError(error, tripId);
      return { revision, result: null, reason: 'The budget could not be computed for this plan. Please report it.' };
    }
  }

  return {
    /** The budget at the trip's current revision, or undefined when the trip does not exist. */
    forTrip(tripId: string): BudgetAnswer | undefined {
      const trip = findTrip(db, tripId);
      if (!trip) return undefined;
      const key = `${tripId}:${trip.revision}`;
      const cached = cache.get(key);
      if (cached) return cached;
      const answer = compute(tripId, trip.revision);
      if (cache.size >= CACHE_LIMIT) {
        const oldest = cache.keys().next().value;
        if (oldest !== undefined) cache.delete(oldest);
      }
      cache.set(key, answer);
      return answer;
    },
  };
}

export type BudgetService = ReturnType<typeof createBudgetService>;
