// The budget as the server sends it: everything the engine returns but the hourly ledger, which goes separately
// (`…/ledger`, as columns) and only to the screens that show it. In its place, a compact state-of-charge track
// (time, charge and place of each hour) is enough for the chart, the route's markers and the check-in chart.
import type { LedgerRow, SimulationResult } from './engine/result-types';
import { whereColumns, type WhereColumns } from './ledger-columns';

/**
 * The budget's wire format: in its ETags and the key of the app's saved query cache, so neither a browser's HTTP
 * cache nor a device's saved copy hands an answer of an older shape (rows inside the budget) to screens reading this one.
 */
export const BUDGET_FORMAT = 2;

/** Each ledger hour's start (UTC and local, as the ledger gives them), state of charge and place. */
export type SocTrack = { utc: string[]; local: string[]; socPct: number[] } & WhereColumns;

export type BudgetResult = Omit<SimulationResult, 'ledger'> & { soc: SocTrack };

export function socTrack(rows: readonly LedgerRow[]): SocTrack {
  return {
    utc: rows.map((row) => row.utc),
    local: rows.map((row) => row.local),
    socPct: rows.map((row) => row.socPct),
    ...whereColumns(rows),
  };
}

export function toBudgetResult(result: SimulationResult): BudgetResult {
  const { ledger, ...rest } = result;
  return { ...rest, soc: socTrack(ledger) };
}
