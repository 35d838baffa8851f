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

type DayTest = (dayIndex: number, dayType: DayType) => boolean;

const anyDay: DayTest = () => true;

/** A selector as a test that costs the same whatever the length of its day list (a bitmap, not a list scan). */
function dayTest(sel: DaySelector): DayTest {
  if (sel.kind === 'all') return anyDay;
  if (sel.kind === 'day-type') return (_dayIndex, dayType) => dayType === sel.dayType;
  let last = 0;
  for (const d of sel.dayIndexes) last = Math.max(last, d);
  const selected = new Uint8Array(last + 1);
  for (const d of sel.dayIndexes) if (d >= 0) selected[d] = 1;
  return (dayIndex) => selected[dayIndex] === 1;
}

// The windows of an appliance are read at every step: their day tests are built once per list of windows.
const dayTestsOf = new WeakMap<readonly RoutineWindow[], readonly DayTest[]>();

function dayTests(windows: readonly RoutineWindow[]): readonly DayTest[] {
  let tests = dayTestsOf.get(windows);
  if (!tests) {
    tests = windows.map((w) => dayTest(w.days));
    dayTestsOf.set(windows, tests);
  }
  return tests;
}

function overlap(aStart: number, aEnd: number, bStart: number, bEnd: number): number {
  return Math.max(0, Math.min(aEnd, bEnd) - Math.max(aStart, bStart));
}

/**
 * Minutes of the window inside [minuteOfDay, minuteOfDay + duration). A window that started yesterday and
 * crosses midnight counts against yesterday's day selector.
 */
function minutesInStep(w: RoutineWindow, selected: DayTest, step: LocalStep, prevDayType: DayType): number {
  const ws = w.startHour * 60 + w.startMinute;
  const we = ws + w.minutes;
  const s = step.minuteOfDay;
  const e = s + step.durationMin;
  let total = 0;
  if (selected(step.dayIndex, step.dayType)) {
    total += overlap(ws, we, s, e) + overlap(ws + DAY_MIN, we + DAY_MIN, s, e);
  }
  if (selected(step.dayIndex - 1, prevDayType)) total += overlap(ws - DAY_MIN, we - DAY_MIN, s, e);
  return Math.min(total, step.durationMin);
}

/** Share of the step covered by any of the windows (windows are assumed not to overlap each other). */
export function windowsShare(windows: readonly RoutineWindow[], step: LocalStep, prevDayType: DayType): number {
  const tests = dayTests(windows);
  let minutes = 0;
  for (let k = 0; k < windows.length; k++) {
    const w = windows[k];
    if (w) minutes += minutesInStep(w, tests[k] ?? anyDay, step, prevDayType);
  }
  return Math.min(1, minutes / step.durationMin);
}
