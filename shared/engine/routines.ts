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

export function daySelected(sel: DaySelector, dayIndex: number, dayType: DayType): boolean {
  if (sel.kind === 'all') return true;
  if (sel.kind === 'trip-days') return sel.dayIndexes.includes(dayIndex);
  return sel.dayType === dayType;
}

function overlap(aStart: number, aEnd: number, bStart: number, bEnd: number): number {
  return Math.max(0, Math.min(aEnd, bEnd) - Math.max(aStart, bStart));
}

/**
 * Minutes of the window inside [minuteOfDay, minuteOfDay + duration). A window that started yesterday and
 * crosses midnight counts against yesterday's day selector.
 */
export function windowMinutesInStep(w: RoutineWindow, step: LocalStep, prevDayType: DayType): number {
  const ws = w.startHour * 60 + w.startMinute;
  const we = ws + w.minutes;
  const s = step.minuteOfDay;
  const e = s + step.durationMin;
  let total = 0;
  if (daySelected(w.days, step.dayIndex, step.dayType)) {
    total += overlap(ws, we, s, e) + overlap(ws + DAY_MIN, we + DAY_MIN, s, e);
  }
  if (daySelected(w.days, step.dayIndex - 1, prevDayType)) total += overlap(ws - DAY_MIN, we - DAY_MIN, s, e);
  return Math.min(total, step.durationMin);
}

/** Share of the step covered by any of the windows (windows are assumed not to overlap each other). */
export function windowsShare(windows: readonly RoutineWindow[], step: LocalStep, prevDayType: DayType): number {
  let minutes = 0;
  for (const w of windows) minutes += windowMinutesInStep(w, step, prevDayType);
  return Math.min(1, minutes / step.durationMin);
}
