// What the check-in card shows, worked out without React: the headline sentence and the chart's three series
// (the plan as made, the readings as points, the forecast from the latest reading).
import { DateTime } from 'luxon';
import type { Reforecast } from '@/shared/engine/reforecast';
import type { BudgetResult } from '@/shared/budget-result';
import type { CheckInRecord } from '@/shared/schemas/check-in';

/** "Tue 18:00" in the offset the time carries. */
export function weekdayTime(iso: string): string {
  const t = DateTime.fromISO(iso, { setZone: true });
  return t.isValid ? t.toFormat('ccc HH:mm') : iso;
}

const pct = (v: number) => `${Math.round(v)} %`;

/** "lowest ahead 33 % on Thu 07:00": the figure the headline, the stay what-if and a calibration all quote. */
export function lowestAheadText(re: Reforecast): string {
  const h = re.result.headline;
  return `lowest ahead ${pct(h.lowestSocPct)} on ${weekdayTime(h.lowestAtLocal)}`;
}

/** "From your check-in Tue 18:00 at 68 %: lowest ahead 33 % on Thu 07:00". */
export function reforecastHeadline(re: Reforecast): string {
  return `From your check-in ${weekdayTime(re.fromLocal)} at ${pct(re.from.socPct)}: ${lowestAheadText(re)}`;
}

export type ChartPoint = { x: number; soc: number };
export type ReadingPoint = ChartPoint & { id: string };
export type ReforecastChart = {
  /** The plan as made, every hour of the trip. */
  plan: ChartPoint[];
  /** The forecast from the latest reading to the end of the trip. */
  ahead: ChartPoint[];
  readings: ReadingPoint[];
  /** Hours on the x axis (0 … last). */
  last: number;
  reservePct: number;
};

/** The hour of the plan a time falls in (the first hour starting at or after it), or -1 outside the trip. */
export function hourOf(plan: BudgetResult, iso: string): number {
  const ms = Date.parse(iso);
  return plan.soc.utc.findIndex((utc) => Date.parse(utc) >= ms);
}

export function reforecastChart(
  plan: BudgetResult,
  re: Reforecast | undefined,
  checkIns: readonly CheckInRecord[],
): ReforecastChart {
  const readings: ReadingPoint[] = [];
  for (const c of checkIns) {
    const x = hourOf(plan, c.checkIn.at);
    if (x >= 0) readings.push({ id: c.id, x, soc: c.checkIn.socPct });
  }
  return {
    plan: plan.soc.socPct.map((soc, x) => ({ x, soc })),
    // The reading itself starts the forecast line, so the line leaves from the point.
    ahead: re
      ? [
          { x: re.index, soc: re.from.socPct },
          ...re.result.ledger.slice(re.index).map((row, k) => ({ x: re.index + k + 1, soc: row.socPct })),
        ]
      : [],
    readings,
    last: plan.soc.socPct.length,
    reservePct: plan.headline.reservePct,
  };
}
