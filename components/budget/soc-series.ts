// Chart-ready series from a simulation: plain data, so the Skia chunk stays small and this is testable.
import { DateTime } from 'luxon';
import type { SimulationResult } from '@/shared/engine/result-types';

export type SocPoint = { x: number; soc: number; better: number; worse: number };
export type StopMark = { x: number; stopIndex: number };
export type DayTick = { x: number; label: string };

export type SocSeries = { points: SocPoint[]; stops: StopMark[]; dayTicks: DayTick[]; reservePct: number };

/** `maxTicks` keeps day labels apart on a narrow chart (every second or third day is labelled). */
export function socSeries(result: SimulationResult, maxTicks = 12): SocSeries {
  const band = result.band;
  const points = result.ledger.map((row, i) => ({
    x: i,
    soc: row.socPct,
    better: band?.better.socPct[i] ?? row.socPct,
    worse: band?.worse.socPct[i] ?? row.socPct,
  }));
  const stops: StopMark[] = [];
  let last = -1;
  result.ledger.forEach((row, i) => {
    if (row.where.kind === 'stop' && row.where.stopIndex !== last) {
      stops.push({ x: i, stopIndex: row.where.stopIndex });
      last = row.where.stopIndex;
    }
  });
  const dayTicks: DayTick[] = [];
  let lastDate = '';
  result.ledger.forEach((row, i) => {
    const date = row.local.slice(0, 10);
    if (date !== lastDate) {
      lastDate = date;
      const t = DateTime.fromISO(row.local, { setZone: true });
      dayTicks.push({ x: i, label: t.isValid ? t.toFormat('ccc d') : date });
    }
  });
  const every = Math.max(1, Math.ceil(dayTicks.length / Math.max(1, maxTicks)));
  return {
    points,
    stops,
    dayTicks: dayTicks.filter((_, i) => i % every === 0),
    reservePct: result.headline.reservePct,
  };
}

/** Nearest ledger index for a horizontal position inside the plot area. */
export function indexAt(px: number, left: number, right: number, count: number): number {
  if (count <= 1 || right <= left) return 0;
  const share = (px - left) / (right - left);
  return Math.max(0, Math.min(count - 1, Math.round(share * (count - 1))));
}
