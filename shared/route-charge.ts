// How each stop of a route fares in the budget, for the map's markers and the trip sheet: the lowest state of
// charge reached while there, and a tone for it. Ember: below the reserve; sunlit: within 15 points above it,
// so a cloudier week than planned would break it; pine: comfortable.
import type { SocTrack } from './budget-result';

export type ChargeTone = 'pine' | 'sunlit' | 'ember';

/** Points above the reserve that still count as close to it. */
export const CLOSE_TO_RESERVE_POINTS = 15;

/** The lowest charge at each stop, in route order; null for a stop the ledger never reaches. */
export function lowestChargeByStop(
  track: Pick<SocTrack, 'socPct' | 'whereKind' | 'whereIndex'>,
  stopCount: number,
): (number | null)[] {
  const lowest: (number | null)[] = Array.from({ length: stopCount }, () => null);
  track.socPct.forEach((socPct, hour) => {
    const i = track.whereIndex[hour] ?? -1;
    if (track.whereKind[hour] !== 's' || i < 0 || i >= stopCount) return;
    const known = lowest[i];
    lowest[i] = known === null || known === undefined ? socPct : Math.min(known, socPct);
  });
  return lowest;
}

export function chargeTone(lowestPct: number | null, reservePct: number): ChargeTone | null {
  if (lowestPct === null) return null;
  if (lowestPct < reservePct) return 'ember';
  if (lowestPct < reservePct + CLOSE_TO_RESERVE_POINTS) return 'sunlit';
  return 'pine';
}
