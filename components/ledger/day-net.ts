// Whether a day's net is a warning: it took more than it gave, and it did not end with a full battery (a day that
// ends full only gave back less because the battery had no room).
import type { DaySheet } from '@/shared/engine/result-types';

/** Charge at or above this counts as full (the ledger rounds to whole per cent). */
export const FULL_SOC_PCT = 99.5;

export function netIsWarning(day: Pick<DaySheet, 'netWh' | 'endSocPct'>): boolean {
  return day.netWh < -0.5 && day.endSocPct < FULL_SOC_PCT;
}
