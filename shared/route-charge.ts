// How each stop of a route fares in the budget, for the map's markers and the trip sheet: the lowest state of
// charge reached while there, and a tone for it. Ember: below the reserve; sunlit: within 15 points above it,
// so a cloudier week than planned would break it; pine: comfortable.
import type { LedgerRow } from './engine/result-types';

export type ChargeTone = 'pine' | 'sunlit' | 'ember';

/** Points above the reserve that still count as close to it. */
export const CLOSE_TO_RESERVE_POINTS = 15;

/** The lowest charge at each stop, in route order; null for a stop the ledger never reaches. */
export function lowestChargeByStop(ledger: readonly LedgerRow[], stopCount: number): (number | null)[] {
  const lowest: (number | null)[] = Array.from({ length: stopCount }, () => null);
  for (const row of ledger) {
    if (row.where.kind !== 'stop') continue;
    const i = row.where.stopIndex;
    if (i < 0 || i >= stopCount) continue;
    const known = lowest[i];
    lowest[i] = known === null || known === undefined ? row.socPct : Math.min(known, row.socPct);
  }
  return lowest;
}

export function chargeTone(lowestPct: number | null, reservePct: number): ChargeTone | null {
  if (lowestPct === null) return null;
  if (lowestPct < reservePct) return 'ember';
  if (lowestPct < reservePct + CLOSE_TO_RESERVE_POINTS) return 'sunlit';
  return 'pine';
}
