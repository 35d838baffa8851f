// "Run it only while the generator runs": an appliance's schedule restricted to the hours the rig's generator runs,
// so a running generator carries it instead of the battery and the inverter. The generator's hours are its own
// routine when it keeps one, else each stop's allowed generator hours on the days spent there (a generator run by
// rule only starts inside them). A routine window is cut to those hours; one that falls wholly outside them is moved
// to their start, as long as it was (at most their length). A thermostat is only active inside them.
import { scheduleSchema, type Appliance, type Schedule } from '../schemas/appliance';
import type { DaySelector, RoutineWindow } from '../schemas/common';
import type { Prepared } from './prepare';

const DAY_MIN = 1440;

/** Trip days spent (some hour of them) at a stop. */
export function stopDayIndexes(p: Prepared, stopIndex: number): number[] {
  const days = new Set<number>();
  for (let i = 0; i < p.n; i++) if (p.where[i] === stopIndex) days.add(p.dayIndex[i] ?? 0);
  return [...days].sort((a, b) => a - b);
}

/** The windows the rig's generator may run in, or null when it has none (or it is off, or no stop allows it). */
export function generatorWindows(p: Prepared): RoutineWindow[] | null {
  const g = p.input.rig.generator;
  if (!g || g.mode.kind === 'off') return null;
  if (g.mode.kind === 'routine') return g.mode.windows;
  const windows: RoutineWindow[] = [];
  p.input.trip.stops.forEach((stop, s) => {
    const hours = stop.generatorHours;
    const spanH = hours ? (hours.endHour - hours.startHour + 24) % 24 : 0;
    const dayIndexes = stopDayIndexes(p, s);
    if (!hours || spanH === 0 || dayIndexes.length === 0) return;
    windows.push({
      days: { kind: 'trip-days', dayIndexes },
      startHour: hours.startHour,
      startMinute: 0,
      minutes: spanH * 60,
    });
  });
  return windows.length > 0 ? windows : null;
}

/** Each trip day's type (travel or camp), by day index. */
function dayTypes(p: Prepared): Map<number, 'travel' | 'camp'> {
  const types = new Map<number, 'travel' | 'camp'>();
  for (let i = 0; i < p.n; i++) types.set(p.dayIndex[i] ?? 0, p.travelDay[i] ? 'travel' : 'camp');
  return types;
}

/** The days both selectors name, or null when none. */
function bothDays(a: DaySelector, b: DaySelector, types: Map<number, 'travel' | 'camp'>): DaySelector | null {
  if (a.kind === 'all') return b;
  if (b.kind === 'all') return a;
  if (a.kind === 'day-type' && b.kind === 'day-type') return a.dayType === b.dayType ? a : null;
  const list = (d: DaySelector): number[] =>
    d.kind === 'trip-days'
      ? d.dayIndexes
      : [...types].filter(([, t]) => d.kind === 'day-type' && t === d.dayType).map(([day]) => day);
  const other = new Set(list(b));
  const dayIndexes = list(a).filter((d) => other.has(d));
  return dayIndexes.length > 0 ? { kind: 'trip-days', dayIndexes } : null;
}

/** The parts of the day two windows share, as [start minute, minutes] (a window may cross midnight). */
function sharedTime(a: RoutineWindow, b: RoutineWindow): [number, number][] {
  const a0 = a.startHour * 60 + a.startMinute;
  const b0 = b.startHour * 60 + b.startMinute;
  const parts: [number, number][] = [];
  for (const shift of [-DAY_MIN, 0, DAY_MIN]) {
    const lo = Math.max(a0, b0 + shift);
    const hi = Math.min(a0 + a.minutes, b0 + shift + b.minutes);
    if (hi > lo) parts.push([((lo % DAY_MIN) + DAY_MIN) % DAY_MIN, Math.min(DAY_MIN, hi - lo)]);
  }
  return parts;
}

const at = (days: DaySelector, startMin: number, minutes: number): RoutineWindow => ({
  days,
  startHour: Math.floor(startMin / 60),
  startMinute: startMin % 60,
  minutes,
});

/** Each of the appliance's windows cut to the generator's, or moved into them when it lies wholly outside. */
function restrict(own: RoutineWindow[], gen: RoutineWindow[], types: Map<number, 'travel' | 'camp'>): RoutineWindow[] {
  const out: RoutineWindow[] = [];
  for (const w of own) {
    for (const g of gen) {
      const days = bothDays(w.days, g.days, types);
      if (!days) continue;
      const parts = sharedTime(w, g);
      if (parts.length > 0) for (const [start, minutes] of parts) out.push(at(days, start, minutes));
      else out.push(at(days, g.startHour * 60 + g.startMinute, Math.min(w.minutes, g.minutes)));
    }
  }
  return out;
}

/** The schedule that runs the appliance only while the generator runs, or null when there is none to give. */
export function generatorOnlySchedule(p: Prepared, a: Appliance): Schedule | null {
  const gen = generatorWindows(p);
  if (!gen) return null;
  const types = dayTypes(p);
  const s = a.schedule;
  let next: Schedule;
  if (s.kind === 'thermostat') {
    const activeWindows = s.activeWindows ? restrict(s.activeWindows, gen, types) : gen;
    if (activeWindows.length === 0) return null;
    next = { ...s, activeWindows };
  } else if (s.kind === 'routine') next = { ...s, windows: restrict(s.windows, gen, types) };
  else next = { kind: 'routine', windows: gen };
  // A schedule the API would refuse (too many windows, none left) is no fix.
  return scheduleSchema.safeParse(next).success && JSON.stringify(next) !== JSON.stringify(s) ? next : null;
}

/** The generator's hours as the fix's text names them: "08:00–20:00 at stop 2", or "on its routine". */
export function generatorHoursText(p: Prepared, stopIndex: number): string {
  const g = p.input.rig.generator;
  if (g?.mode.kind === 'routine') return 'on its routine';
  const hours = p.input.trip.stops[stopIndex]?.generatorHours;
  if (!hours) return '';
  const hh = (h: number) => `${String(h).padStart(2, '0')}:00`;
  return `${hh(hours.startHour)}–${hh(hours.endHour)} at stop ${stopIndex + 1}`;
}
