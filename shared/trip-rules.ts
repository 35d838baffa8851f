// Rules that tie a stop to its trip: checked by the API (422) and usable by forms before saving.
import { DateTime } from 'luxon';
import type { Schedule } from './schemas/appliance';
import type { RoutineWindow } from './schemas/common';
import { tripDayCount } from './schemas/limits';
import type { GeneratorMode } from './schemas/rig';
import type { Stop } from './schemas/trip';

export type RuleBreach = { field: string; message: string };

type TripDates = { startDate: string; endDate: string; timeZone: string };
type Interval = Pick<Stop, 'name' | 'arriveAt' | 'departAt'>;

const ms = (iso: string) => Date.parse(iso);

/** A stop must lie inside the trip's dates (in the trip's time zone) and overlap no other stop. */
export function checkStopFits(trip: TripDates, stop: Interval, others: Interval[]): RuleBreach | null {
  if (ms(stop.departAt) <= ms(stop.arriveAt)) {
    return { field: 'stop.departAt', message: 'Departure must be after arrival.' };
  }
  const arriveDate = DateTime.fromISO(stop.arriveAt, { zone: trip.timeZone }).toISODate();
  const departDate = DateTime.fromISO(stop.departAt, { zone: trip.timeZone }).toISODate();
  if (arriveDate === null || departDate === null)
    return { field: 'stop.arriveAt', message: 'Not a real date and time.' };
  if (arriveDate < trip.startDate) {
    return { field: 'stop.arriveAt', message: `Arrival is before the trip starts (${trip.startDate}).` };
  }
  if (departDate > trip.endDate) {
    return { field: 'stop.departAt', message: `Departure is after the trip ends (${trip.endDate}).` };
  }
  const clash = others.find(
    (other) => ms(stop.arriveAt) < ms(other.departAt) && ms(other.arriveAt) < ms(stop.departAt),
  );
  if (clash) return { field: 'stop.arriveAt', message: `These dates overlap the stay at ${clash.name}.` };
  return null;
}

/** Every stop of a trip still fits when the trip's own dates change. */
export function checkTripDatesCoverStops(trip: TripDates, stops: Interval[]): RuleBreach | null {
  if (trip.endDate < trip.startDate)
    return { field: 'endDate', message: 'The trip must end on or after its first day.' };
  for (const stop of stops) {
    const breach = checkStopFits(trip, stop, []);
    if (breach)
      return {
        field: breach.field === 'stop.departAt' ? 'endDate' : 'startDate',
        message: `${stop.name}: ${breach.message}`,
      };
  }
  return null;
}

/** Windows that name trip days must name days of this trip: 0 is its first day, its last is one less than its length. */
export function checkWindowDaysInTrip(
  trip: Pick<TripDates, 'startDate' | 'endDate'>,
  windows: readonly RoutineWindow[],
  field: string,
): RuleBreach | null {
  const days = tripDayCount(trip.startDate, trip.endDate);
  for (const [k, window] of windows.entries()) {
    if (window.days.kind !== 'trip-days') continue;
    const outside = window.days.dayIndexes.find((day) => day >= days);
    if (outside !== undefined)
      return {
        field: `${field}.${k}.days.dayIndexes`,
        message: `Day ${outside + 1} is past the trip's last day: this trip has ${days} ${days === 1 ? 'day' : 'days'} (numbered from 0).`,
      };
  }
  return null;
}

/** The windows of an appliance's schedule (a routine's, or a thermostat's active windows). */
export function windowsOfSchedule(schedule: Schedule): { windows: readonly RoutineWindow[]; key: string } {
  if (schedule.kind === 'routine') return { windows: schedule.windows, key: 'windows' };
  if (schedule.kind === 'thermostat') return { windows: schedule.activeWindows ?? [], key: 'activeWindows' };
  return { windows: [], key: 'windows' };
}

export function checkScheduleInTrip(
  trip: Pick<TripDates, 'startDate' | 'endDate'>,
  schedule: Schedule,
  field: string,
): RuleBreach | null {
  const { windows, key } = windowsOfSchedule(schedule);
  return checkWindowDaysInTrip(trip, windows, `${field}.${key}`);
}

export function checkGeneratorInTrip(
  trip: Pick<TripDates, 'startDate' | 'endDate'>,
  mode: GeneratorMode | undefined,
  field: string,
): RuleBreach | null {
  return mode?.kind === 'routine' ? checkWindowDaysInTrip(trip, mode.windows, `${field}.windows`) : null;
}
