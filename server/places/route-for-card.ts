import type { StopRow } from '@/db/schema/stops';
import type { SimulationResult } from '@/shared/engine/result-types';
import { lowestChargeByStop } from '@/shared/route-charge';
import type { TripSummary } from '@/shared/schemas/trip-summary';

/** What a trip card's small map needs: where each stop is and how low the battery gets there. */
export function routeForCard(rows: StopRow[], budget: SimulationResult | null | undefined): TripSummary['route'] {
  const lowest = budget ? lowestChargeByStop(budget.ledger, rows.length) : [];
  return rows.map((row, i) => ({ lat: row.lat, lon: row.lon, lowestSocPct: lowest[i] ?? null }));
}
