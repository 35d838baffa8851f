// The chart readout's solar words: what the panels could give, what was used and what was wasted, and why little was
// used when the battery was full (so a full battery in July never reads as a broken array).
import type { LedgerRow } from '@/shared/engine/result-types';
import { FULL_SOC_PCT } from '@/components/ledger/day-net';

export type SolarReadout = { availableWh: number; usedWh: number; wastedWh: number; batteryFull: boolean };

export function solarReadout(row: Pick<LedgerRow, 'solarAvailableWh' | 'solarUsedWh' | 'solarWastedWh' | 'socPct'>) {
  return {
    availableWh: row.solarAvailableWh,
    usedWh: row.solarUsedWh,
    wastedWh: row.solarWastedWh,
    batteryFull: row.socPct >= FULL_SOC_PCT && row.solarWastedWh > 0.5,
  } satisfies SolarReadout;
}
