// The routine editor's time logic: one-hour cells on a 24-hour strip <-> the routine windows the engine reads.
// Pure and free of React so every rule (midnight wrap, short windows, day types) is unit tested.
import { snapMinute } from '@/components/ui/time-of-day-field.types';
import type { DaySelector, RoutineWindow } from '@/shared/schemas/common';

export const HOURS = 24;
export type Cells = boolean[];

/** The strips the editor offers; windows for particular trip days are kept but edited nowhere else. */
export type StripKey = 'all' | 'camp' | 'travel';

export function selectorFor(key: StripKey): DaySelector {
  return key === 'all' ? { kind: 'all' } : { kind: 'day-type', dayType: key };
}

export function stripOf(days: DaySelector | undefined): StripKey | null {
  if (!days || days.kind === 'all') return 'all';
  if (days.kind === 'day-type') return days.dayType;
  return null;
}

/** Hours a window touches (a 10-minute window at 07:30 lights the 07 cell); may wrap past midnight. */
export function hoursOfWindow(w: Pick<RoutineWindow, 'startHour' | 'startMinute' | 'minutes'>): number[] {
  const start = w.startHour * 60 + (w.startMinute ?? 0);
  const end = start + Math.min(w.minutes, HOURS * 60);
  const hours: number[] = [];
  for (let h = Math.floor(start / 60); h * 60 < end; h++) hours.push(h % HOURS);
  return [...new Set(hours)];
}

/** Smallest comfortable width of an hour cell, px (a thumb; the cell is 48 px tall). */
export const MIN_CELL_WIDTH = 42;

/**
 * How many hour cells go in one row of a strip `width` px wide: the most (of the ways 24 divides into rows) that
 * keep every cell at least MIN_CELL_WIDTH wide. Six while the width is not known yet.
 */
export function cellsPerRow(width: number, gap: number): number {
  if (width <= 0) return 6;
  return [12, 8, 6, 4, 3].find((n) => (width - gap * (n - 1)) / n >= MIN_CELL_WIDTH) ?? 3;
}

export function cellsFor(windows: RoutineWindow[], key: StripKey): Cells {
  const cells: Cells = new Array<boolean>(HOURS).fill(false);
  for (const w of windows) if (stripOf(w.days) === key) for (const h of hoursOfWindow(w)) cells[h] = true;
  return cells;
}

/** Runs of lit cells as [startHour, length]; a run lit across midnight is one run. */
export function runsOf(cells: Cells): [number, number][] {
  if (cells.every(Boolean)) return [[0, HOURS]];
  const runs: [number, number][] = [];
  // Start scanning just after an unlit cell so a run that wraps midnight is never split.
  const offset = cells.findIndex((c) => !c) + 1;
  let start = -1;
  for (let k = 0; k <= HOURS; k++) {
    const h = (offset + k) % HOURS;
    const on = k < HOURS && cells[h] === true;
    if (on && start < 0) start = k;
    if (!on && start >= 0) {
      runs.push([(offset + start) % HOURS, k - start]);
      start = -1;
    }
  }
  return runs.sort((a, b) => a[0] - b[0]);
}

const sameHours = (a: number[], b: number[]) => a.length === b.length && a.every((h) => b.includes(h));

/**
 * Windows for one strip from its cells. A run that matches an existing window's hours keeps that window
 * (its start minute and its minutes), so a 10-minute hair dryer stays 10 minutes when another cell changes.
 */
export function windowsFromCells(cells: Cells, key: StripKey, previous: RoutineWindow[]): RoutineWindow[] {
  const mine = previous.filter((w) => stripOf(w.days) === key);
  return runsOf(cells).map(([startHour, length]) => {
    const hours = Array.from({ length }, (_, i) => (startHour + i) % HOURS);
    const kept = mine.find((w) => sameHours(hoursOfWindow(w), hours));
    return kept ?? { days: selectorFor(key), startHour, startMinute: 0, minutes: length * 60 };
  });
}

/** Replace one strip's windows, leaving the other strips' (and particular days') windows as they were. */
export function withStrip(windows: RoutineWindow[], key: StripKey, cells: Cells): RoutineWindow[] {
  const others = windows.filter((w) => stripOf(w.days) !== key);
  return [...others, ...windowsFromCells(cells, key, windows)];
}

export function toggleCell(windows: RoutineWindow[], key: StripKey, hour: number): RoutineWindow[] {
  const cells = cellsFor(windows, key);
  cells[hour] = !cells[hour];
  return withStrip(windows, key, cells);
}

/** A drag from one cell to another paints every cell between them with the first cell's new state. */
export function paintRange(
  windows: RoutineWindow[],
  key: StripKey,
  from: number,
  to: number,
  on: boolean,
): RoutineWindow[] {
  const cells = cellsFor(windows, key);
  const [a, b] = from <= to ? [from, to] : [to, from];
  for (let h = a; h <= b; h++) cells[h] = on;
  return withStrip(windows, key, cells);
}

/** A window's length may be anything from a minute to a whole day. */
export const MAX_MINUTES = HOURS * 60;
/** Start times move in five-minute steps. */
export const START_STEP_MINUTES = 5;

/** A new length for one window; its start stays where it is (the strip then lights the hours it now touches). */
export function setLength(windows: RoutineWindow[], index: number, minutes: number): RoutineWindow[] {
  return windows.map((w, i) =>
    i === index ? { ...w, minutes: Math.max(1, Math.min(MAX_MINUTES, Math.round(minutes))) } : w,
  );
}

/** A new start for one window, on the five-minute step; its length stays as it is. */
export function setStart(windows: RoutineWindow[], index: number, hour: number, minute: number): RoutineWindow[] {
  const startMinute = snapMinute(minute, START_STEP_MINUTES);
  const startHour = Math.max(0, Math.min(HOURS - 1, Math.round(hour)));
  return windows.map((w, i) => (i === index ? { ...w, startHour, startMinute } : w));
}

/** Energy per day a routine uses, Wh, for a load drawing `watts` with a duty cycle, on the given strip. */
export function dailyWh(windows: RoutineWindow[], key: StripKey, watts: number, dutyCycle: number): number {
  const minutes = windows
    .filter((w) => stripOf(w.days) === key || stripOf(w.days) === 'all')
    .reduce((s, w) => s + w.minutes, 0);
  return (Math.min(minutes, HOURS * 60) / 60) * watts * dutyCycle;
}

/** "10 min", "1 h", "2 h 30 min". */
export function formatLength(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

const DAYS_IN_WORDS: Record<StripKey, string> = { all: 'every day', camp: 'camp days', travel: 'travel days' };

function daysInWords(days: DaySelector | undefined): string {
  const key = stripOf(days);
  if (key) return DAYS_IN_WORDS[key];
  const indexes = days?.kind === 'trip-days' ? days.dayIndexes : [];
  return `trip day${indexes.length === 1 ? '' : 's'} ${indexes.map((d) => d + 1).join(', ')}`;
}

/** The window in words, as the editor's preview says it: "07:30–07:40, 10 min, every day". */
export function describeWindow(w: RoutineWindow): string {
  return `${formatWindow(w)}, ${formatLength(w.minutes)}, ${daysInWords(w.days)}`;
}

export function formatWindow(w: RoutineWindow): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  const start = w.startHour * 60 + (w.startMinute ?? 0);
  const end = (start + w.minutes) % (HOURS * 60);
  return `${pad(w.startHour)}:${pad(w.startMinute ?? 0)}–${pad(Math.floor(end / 60))}:${pad(end % 60)}`;
}
