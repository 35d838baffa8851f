// "Stay longer or leave early": nights added to (or taken from) one stop, with the traveller's choice of what gives.
// 'shift-rest' moves every later stop by the same nights (the trip grows or shrinks); 'next-stop' takes the nights
// from the next stop (or gives them to it), so the rest of the trip keeps its dates. Wall-clock times are kept in
// each stop's own zone, so a clock change between the old and new dates does not move a departure by an hour.
import { DateTime } from 'luxon';
import type { StayMode } from './schemas/stay';
import type { RuleBreach } from './trip-rules';

type Timed = { name: string; timeZone: string; arriveAt: string; departAt: string };

function plusNights(iso: string, zone: string, nights: number): string {
  const moved = DateTime.fromISO(iso, { zone }).plus({ days: nights });
  return moved.toISO({ suppressMilliseconds: true, suppressSeconds: true }) ?? iso;
}

/** Stops in route order with one stop's stay changed; a breach when a stay would end before it starts. */
export function changeStay<T extends Timed>(
  stops: readonly T[],
  stopIndex: number,
  nights: number,
  mode: StayMode,
): { ok: true; stops: T[] } | { ok: false; breach: RuleBreach } {
  const here = stops[stopIndex];
  if (!here) return { ok: false, breach: { field: 'stopId', message: 'That stop was not found.' } };
  const next = stops[stopIndex + 1];
  if (mode === 'next-stop' && !next)
    return {
      ok: false,
      breach: { field: 'mode', message: 'This is the last stop: there is no next stop to take the nights from.' },
    };
  const changed = stops.map((stop, i): T => {
    if (i === stopIndex) return { ...stop, departAt: plusNights(stop.departAt, stop.timeZone, nights) };
    if (i < stopIndex) return stop;
    if (mode === 'next-stop')
      return i === stopIndex + 1 ? { ...stop, arriveAt: plusNights(stop.arriveAt, stop.timeZone, nights) } : stop;
    return {
      ...stop,
      arriveAt: plusNights(stop.arriveAt, stop.timeZone, nights),
      departAt: plusNights(stop.departAt, stop.timeZone, nights),
    };
  });
  const tooShort = changed.find((s) => Date.parse(s.departAt) <= Date.parse(s.arriveAt));
  if (tooShort)
    return {
      ok: false,
      breach: { field: 'nights', message: `That leaves no time at ${tooShort.name}: choose fewer nights.` },
    };
  return { ok: true, stops: changed };
}

/** The trip's last day once its last stop departs at `departAt`, in the trip's zone. */
export function lastDayOf(departAt: string, tripZone: string): string {
  return DateTime.fromISO(departAt, { zone: tripZone }).toISODate() ?? '';
}
