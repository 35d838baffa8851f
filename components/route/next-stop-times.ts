// A new stop's suggested stay, so a route can be laid out by typing place names alone: arrive mid-afternoon on
// the day the last stop is left (or the trip's first day), leave mid-morning the next day (common campground
// check-in and check-out times).
import { DateTime } from 'luxon';
import type { Stop } from '@/shared/schemas/trip';

const LOCAL = 'yyyy-MM-dd HH:mm';

type TripDates = { startDate: string; endDate: string; timeZone: string };

export function nextStopTimes(trip: TripDates, stops: Pick<Stop, 'departAt'>[]): { arrive: string; depart: string } {
  const zone = trip.timeZone;
  const lastDeparture = stops
    .map((s) => DateTime.fromISO(s.departAt, { setZone: true }).setZone(zone))
    .reduce<DateTime | null>((latest, t) => (!latest || t > latest ? t : latest), null);
  const day = lastDeparture ? lastDeparture.startOf('day') : DateTime.fromISO(trip.startDate, { zone });
  let arrive = day.set({ hour: 15, minute: 0 });
  // Left the last stop after mid-afternoon: arrive a couple of hours after leaving, on the quarter hour.
  if (lastDeparture && lastDeparture.plus({ hours: 1 }) > arrive) {
    const later = lastDeparture.plus({ hours: 2 }).startOf('minute');
    arrive = later.plus({ minutes: (15 - (later.minute % 15)) % 15 });
  }
  const depart = arrive.plus({ days: 1 }).set({ hour: 10, minute: 0 });
  return { arrive: arrive.toFormat(LOCAL), depart: depart.toFormat(LOCAL) };
}
