import type { StopRow } from '@/db/schema/stops';
import type { TripSummary } from '@/shared/schemas/trip-summary';

/**
 * What a trip card's small map needs: where each stop is and how low the battery gets there (from the last budget
 * computed, which the list never waits for; none yet, the markers are drawn without a tone).
 */
export function routeForCard(rows: StopRow[], lowestByStop: readonly (number | null)[] | null): TripSummary['route'] {
  return rows.map((row, i) => ({ lat: row.lat, lon: row.lon, lowestSocPct: lowestByStop?.[i] ?? null }));
}
