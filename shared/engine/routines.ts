// Routine windows in the stop's local time: how many minutes of a window fall inside a step.
import type { DaySelector, DayType, RoutineWindow } from '../schemas/common';

const DAY_MIN = 1440;

export type LocalStep = {
  /** Local minute of day at the step's start (0–1439). */
  minuteOfDay: number;
  /** Trip day index (0 = the first local day of the trip). */
  dayIndex: number;
  dayType: DayType;
  durationMin: number;
};

/** Days a window runs on, as data read at every step: null for every day, a day type, or a bitmap of trip days. */
type WindowDays = null | DayType | Uint8Array;

/** A window with its start and end in minutes of the day, worked out once per list of windows. */
type CompiledWindow = { start: number; end: number; days: WindowDays };

/** A bitmap, so a look-up costs the same whatever the length of the day list (a list scan per step did not). */
function windowDays(sel: DaySelector): WindowDays {
  if (sel.kind === 'all') return null;
  if (sel.kind === 'day-type') return sel.dayType;
  let last = 0;
  for (const d of sel.dayIndexes) last = Math.max(last, d);
  const selected = new Uint8Array(last + 1);
  for (const d of sel.dayIndexes) if (d >= 0) selected[d] = 1;
  return selected;
}

function runsOn(days: WindowDays, dayIndex: number, dayType: DayType): boolean {
  if (days === null) return true;
  if (typeof days === 'string') return days === dayType;
  return days[dayIndex] === 1;
}

/**
 * A list of windows compiled once, and for each time of day a step can start at (and its length), the windows that
 * touch it. A step then reads only those: a window outside the step adds exactly nothing, whatever its days.
 */
type CompiledWindows = {
  windows: readonly CompiledWindow[];
  touching: Map<number | string, readonly CompiledWindow[]>;
};

const compiledOf = new WeakMap<readonly RoutineWindow[], CompiledWindows>();

function compiled(windows: readonly RoutineWindow[]): CompiledWindows {
  let list = compiledOf.get(windows);
  if (!list) {
    list = {
      windows: windows.map((w) => {
        const start = w.startHour * 60 + w.startMinute;
        return { start, end: start + w.minutes, days: windowDays(w.days) };
      }),
      touching: new Map(),
    };
    compiledOf.set(windows, list);
  }
  return list;
}

function overlap(aStart: number, aEnd: number, bStart: number, bEnd: number): number {
  return Math.max(0, Math.min(aEnd, bEnd) - Math.max(aStart, bStart));
}

/** Whether the window, yesterday's or today's, overlaps [s, e) at all, on whatever days it runs. */
function touches(w: CompiledWindow, s: number, e: number): boolean {
  return (
    overlap(w.start, w.end, s, e) > 0 ||
    overlap(w.start + DAY_MIN, w.end + DAY_MIN, s, e) > 0 ||
    overlap(w.start - DAY_MIN, w.end - DAY_MIN, s, e) > 0
  );
}

function touchingStep(list: CompiledWindows, step: LocalStep): readonly CompiledWindow[] {
  const s = step.minuteOfDay;
  const d = step.durationMin;
  // Whole minutes and steps shorter than a day (nearly every step) key a number; anything else a string.
  const key = Number.isInteger(s) && Number.isInteger(d) && d < DAY_MIN ? s * DAY_MIN + d : `${s}|${d}`;
  let found = list.touching.get(key);
  if (!found) {
    found = list.windows.filter((w) => touches(w, s, s + d));
    list.touching.set(key, found);
  }
  return found;
}

/**
 * Minutes of the window inside [minuteOfDay, minuteOfDay + duration). A window that started yesterday and
 * crosses midnight counts against yesterday's day selector.
 */
function minutesInStep(w: CompiledWindow, step: LocalStep, prevDayType: DayType): number {
  const ws = w.start;
  const we = w.end;
  const s = step.minuteOfDay;
  const e = s + step.durationMin;
  let total = 0;
  if (runsOn(w.days, step.dayIndex, step.dayType)) {
    total += overlap(ws, we, s, e) + overlap(ws + DAY_MIN, we + DAY_MIN, s, e);
  }
  if (runsOn(w.days, step.dayIndex - 1, prevDayType)) total += overlap(ws - DAY_MIN, we - DAY_MIN, s, e);
  return Math.min(total, step.durationMin);
}

/**
 * Share of the step covered by any of the windows (windows are assumed not to overlap each other). Only the windows
 * that touch the step are read, and reading stops once the step is covered: more minutes cannot raise a share of 1.
 */
export function windowsShare(windows: readonly RoutineWindow[], step: LocalStep, prevDayType: DayType): number {
  const touching = touchingStep(compiled(windows), step);
  const full = step.durationMin;
  let minutes = 0;
  for (let k = 0; k < touching.length && minutes < full; k++) {
    const w = touching[k];
    if (w) minutes += minutesInStep(w, step, prevDayType);
  }
  return Math.min(1, minutes / full);
}
