// Chart-ready series from a simulation, the range the chart shows, and where its labels go: plain data and pure
// functions, so the Skia chunk stays small and every layout rule (whole trip by default, labels never overprint)
// is unit tested. Canvas text has no boxes a browser test could compare.
import { DateTime } from 'luxon';
import type { BudgetResult } from '@/shared/budget-result';
import type { Flag } from '@/shared/engine/result-types';

export type SocPoint = { x: number; soc: number; better: number; worse: number };
export type StopMark = { x: number; stopIndex: number };
export type DayStart = { x: number; dayIndex: number; date: string; label: string };
/** Flags at one hour, numbered as the flag list numbers them (from 1). */
export type FlagMark = { x: number; numbers: number[]; danger: boolean };

export type SocSeries = {
  points: SocPoint[];
  /** Each point's local time, as the ledger gives it. */
  locals: string[];
  stops: StopMark[];
  days: DayStart[];
  flags: FlagMark[];
  lowest: { x: number; soc: number };
  reservePct: number;
};

/** Ledger indexes the chart draws, both ends included. */
export type SocRange = { from: number; to: number };

/** The ledger row at or just after an instant (flags and the lowest point carry UTC times). */
function indexAtInstant(utcs: number[], iso: string): number {
  const t = Date.parse(iso);
  const i = utcs.findIndex((u) => u >= t);
  return i < 0 ? Math.max(0, utcs.length - 1) : i;
}

export function flagMarks(flags: Flag[], utcs: number[]): FlagMark[] {
  const byX = new Map<number, FlagMark>();
  flags.forEach((f, i) => {
    const x = indexAtInstant(utcs, f.atUtc);
    const mark = byX.get(x) ?? { x, numbers: [], danger: false };
    mark.numbers.push(i + 1);
    mark.danger ||= f.severity === 'danger';
    byX.set(x, mark);
  });
  return [...byX.values()].sort((a, b) => a.x - b.x);
}

export function socSeries(result: BudgetResult): SocSeries {
  const band = result.band;
  // On recorded years the band is their 10th to 90th percentile, hour by hour; else one preset better and worse.
  const years = result.socBand as BudgetResult['socBand'] | undefined;
  const soc = result.soc;
  const points = soc.socPct.map((socPct, i) => ({
    x: i,
    soc: socPct,
    better: years?.p90[i] ?? band?.better.socPct[i] ?? socPct,
    worse: years?.p10[i] ?? band?.worse.socPct[i] ?? socPct,
  }));
  const stops: StopMark[] = [];
  let lastStop = -1;
  soc.whereKind.forEach((kind, i) => {
    const stopIndex = soc.whereIndex[i] ?? -1;
    if (kind === 's' && stopIndex !== lastStop) {
      stops.push({ x: i, stopIndex });
      lastStop = stopIndex;
    }
  });
  const days: DayStart[] = [];
  soc.local.forEach((local, i) => {
    const date = local.slice(0, 10);
    if (date === days[days.length - 1]?.date) return;
    const t = DateTime.fromISO(local, { setZone: true });
    days.push({ x: i, dayIndex: days.length, date, label: t.isValid ? t.toFormat('ccc d') : date });
  });
  const utcs = soc.utc.map((utc) => Date.parse(utc));
  const lowestX = indexAtInstant(utcs, result.headline.lowestAtUtc);
  return {
    points,
    locals: soc.local,
    stops,
    days,
    flags: flagMarks(result.flags, utcs),
    lowest: { x: lowestX, soc: soc.socPct[lowestX] ?? result.headline.lowestSocPct },
    reservePct: result.headline.reservePct,
  };
}

export function wholeTrip(series: Pick<SocSeries, 'points'>): SocRange {
  return { from: 0, to: Math.max(0, series.points.length - 1) };
}

/** One local day, from its first hour up to the next day's first hour, so the curve reaches the day's end. */
export function dayRange(series: Pick<SocSeries, 'points' | 'days'>, dayIndex: number): SocRange {
  const day = series.days[dayIndex];
  if (!day) return wholeTrip(series);
  const next = series.days[dayIndex + 1];
  return { from: day.x, to: next ? next.x : series.points.length - 1 };
}

export const inRange = (range: SocRange, x: number) => x >= range.from && x <= range.to;

/** A line on the time axis at `x`; its label names the span up to `end` when there is one (a day), else the line. */
export type AxisTick = { x: number; text: string; end?: number };

/**
 * Where the time axis gets a line and a label: each day's start over a long range, labelled in the middle of its
 * day; every six hours when the range is a day or so, where day starts alone would leave the axis bare.
 */
export function axisTicks(series: Pick<SocSeries, 'days' | 'locals'>, range: SocRange): AxisTick[] {
  if (range.to - range.from > 36)
    return series.days
      .filter((d) => inRange(range, d.x))
      .map((d) => ({ x: d.x, text: d.label, end: Math.min(range.to, series.days[d.dayIndex + 1]?.x ?? range.to) }));
  const ticks: AxisTick[] = [];
  for (let x = range.from; x <= range.to; x++) {
    const local = series.locals[x] ?? '';
    const hour = Number(local.slice(11, 13));
    if (local.slice(14, 16) === '00' && hour % 6 === 0) ticks.push({ x, text: local.slice(11, 16) });
  }
  return ticks;
}

export type PlacedLabel = { left: number; width: number; text: string; x: number };

type Placement = {
  scale: (x: number) => number;
  left: number;
  right: number;
  measure: (text: string) => number;
  /** Clear space kept between two labels, px. */
  gap?: number;
};

/**
 * One try at laying out every label given: each where it wants to be (centred on its span, or just right of its
 * mark), nudged apart and inside the ends, or null when that would push a label off the span or mark it names.
 */
function layoutAll(items: AxisTick[], { scale, left, right, measure, gap = 8 }: Placement): PlacedLabel[] | null {
  const labels = items.map((item) => {
    const width = measure(item.text);
    const start = scale(item.x);
    const end = item.end === undefined ? undefined : scale(item.end);
    const wanted = end === undefined ? start + 3 : (start + end) / 2 - width / 2;
    // How far the label may sit from where it wants to be and still clearly name its day (or its mark).
    const slack = end === undefined ? width / 2 : Math.max(0, (end - start) / 2 + width / 2 - 4);
    // Pulling a label in from past an end is always allowed; the slack is measured from there.
    const target = Math.min(Math.max(left, wanted), right - width);
    return { item, width, target, slack, left: target };
  });
  for (let i = 1; i < labels.length; i++) {
    const [a, b] = [labels[i - 1], labels[i]];
    if (a && b) b.left = Math.max(b.left, a.left + a.width + gap);
  }
  for (let i = labels.length - 1; i >= 0; i--) {
    const [a, b] = [labels[i], labels[i + 1]];
    if (a) a.left = Math.min(a.left, b ? b.left - gap - a.width : right - a.width);
  }
  const fits = labels.every((l) => l.left >= left - 1e-9 && Math.abs(l.left - l.target) <= l.slack + 0.5);
  return fits ? labels.map((l) => ({ left: l.left, width: l.width, text: l.item.text, x: l.item.x })) : null;
}

/**
 * Lays labels out along a line, none past the ends and none over another. When they do not all fit, every second
 * one is labelled, then every third, and so on: the axis thins itself evenly to the width it has.
 */
export function placeLabels(items: AxisTick[], placement: Placement): PlacedLabel[] {
  const sorted = [...items].sort((a, b) => a.x - b.x);
  for (let every = 1; every <= sorted.length; every++) {
    const placed = layoutAll(
      sorted.filter((_, i) => i % every === 0),
      placement,
    );
    if (placed) return placed;
  }
  return [];
}

/**
 * Lays the flags' numbers out above the plot. No flag may go unmarked, so a number that would touch the one before
 * it joins that label ("2, 3") instead of being left out.
 */
export function placeFlagLabels(marks: FlagMark[], placement: Placement): (PlacedLabel & { danger: boolean })[] {
  const { scale, left, right, measure, gap = 6 } = placement;
  const fit = (text: string, centre: number) => {
    const width = measure(text);
    return { width, left: Math.min(Math.max(left, centre - width / 2), right - width) };
  };
  const placed: (PlacedLabel & { danger: boolean })[] = [];
  for (const mark of [...marks].sort((a, b) => a.x - b.x)) {
    const text = mark.numbers.join(', ');
    placed.push({ ...fit(text, scale(mark.x)), text, x: mark.x, danger: mark.danger });
    // Join while the newest label touches the one before it; a joined label is wider and may touch the next.
    for (;;) {
      const last = placed[placed.length - 1];
      const before = placed[placed.length - 2];
      if (!last || !before || last.left >= before.left + before.width + gap) break;
      const joined = `${before.text}, ${last.text}`;
      const centre = (scale(before.x) + scale(last.x)) / 2;
      placed.splice(-2, 2, { ...fit(joined, centre), text: joined, x: before.x, danger: before.danger || last.danger });
    }
  }
  return placed;
}

/** Nearest ledger index for a horizontal position inside the plot area, within the range shown. */
export function indexAt(px: number, left: number, right: number, range: SocRange): number {
  const count = range.to - range.from + 1;
  if (count <= 1 || right <= left) return range.from;
  const share = (px - left) / (right - left);
  return range.from + Math.max(0, Math.min(count - 1, Math.round(share * (count - 1))));
}
