// A trip as an iCalendar file (ical-generator): each stop an event from arrival to departure whose description is
// each day's budget in one line, each drive an event, each generator window its own event with the CO caution.
// Times are written in UTC, which every calendar turns into its own local time, across clock changes too.
import ical, { ICalCalendarMethod } from 'ical-generator';
import { DateTime } from 'luxon';
import type { SimulationResult } from '@/shared/engine/result-types';
import { FLAG_TITLE } from '@/shared/flag-titles';
import type { TripDetail } from '@/shared/schemas/api';

type Detail = Pick<TripDetail, 'trip' | 'stops' | 'drives'>;

const GENERATOR_CAUTION =
  'Run the generator outdoors only, never inside, under an awning or near an open window or vent; keep a working CO alarm.';

/** "Mon 13 Sep: lowest charge 62 %, 1 flag (below reserve)" for each day the stop covers. */
function dayLines(stopIndex: number, budget: SimulationResult | null): string[] {
  if (!budget) return ['No budget yet: add appliances to see each day’s charge.'];
  return budget.days
    .filter((day) => day.stopIndexes.includes(stopIndex))
    .map((day) => {
      const flags = budget.flags.filter((flag) => flag.atLocal.slice(0, 10) === day.date);
      const kinds = [...new Set(flags.map((flag) => FLAG_TITLE[flag.kind].toLowerCase()))];
      const label = DateTime.fromISO(day.date).toFormat('ccc d LLL');
      const flagText =
        flags.length === 0
          ? 'no flags'
          : `${flags.length} ${flags.length === 1 ? 'flag' : 'flags'} (${kinds.join(', ')})`;
      return `${label}: lowest charge ${Math.round(day.lowestSocPct)} %, ${flagText}`;
    });
}

/** Runs of hours with the generator on, from the ledger, as start and end instants. */
function generatorWindows(budget: SimulationResult | null): { start: Date; end: Date; stopIndex: number | null }[] {
  const windows: { start: Date; end: Date; stopIndex: number | null }[] = [];
  for (const row of budget?.ledger ?? []) {
    if (row.generatorH <= 0) continue;
    const start = new Date(row.utc);
    const end = new Date(start.getTime() + row.stepH * 3_600_000);
    const last = windows[windows.length - 1];
    if (last && last.end.getTime() === start.getTime()) last.end = end;
    else windows.push({ start, end, stopIndex: row.where.kind === 'stop' ? row.where.stopIndex : null });
  }
  return windows;
}

export function tripToCalendar(detail: Detail, budget: SimulationResult | null, publicUrl: string): string {
  const tripUrl = `${publicUrl}/trips/${encodeURIComponent(detail.trip.id)}`;
  const calendar = ical({
    name: detail.trip.name,
    prodId: { company: 'Trailtally', product: 'Trip plan', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
    // A subscribed calendar asks again after this long.
    ttl: 60 * 60,
  });
  const uid = (kind: string, id: string) => `${kind}-${id}@trailtally`;

  detail.stops.forEach(({ id, stop }, i) => {
    calendar.createEvent({
      id: uid('stop', id),
      start: new Date(stop.arriveAt),
      end: new Date(stop.departAt),
      summary: `${i + 1}. ${stop.name}`,
      description: [
        ...dayLines(i, budget),
        stop.hookup ? `Hookup ${stop.hookup.amps} A at ${stop.hookup.volts} V.` : 'No hookup.',
      ].join('\n'),
      location: { title: stop.name, geo: { lat: stop.lat, lon: stop.lon } },
      url: tripUrl,
    });
  });

  detail.drives.forEach(({ id, drive }, i) => {
    const from = detail.stops[i]?.stop;
    const to = detail.stops[i + 1]?.stop;
    if (!from || !to || drive.hoursOnRoad <= 0) return;
    const start = new Date(from.departAt);
    calendar.createEvent({
      id: uid('drive', id),
      start,
      end: new Date(start.getTime() + drive.hoursOnRoad * 3_600_000),
      summary: `Drive: ${from.name} to ${to.name}`,
      description:
        (drive.distanceKm ? `About ${Math.round(drive.distanceKm)} km, ` : '') +
        `${drive.hoursOnRoad} h on the road${drive.vehicleCharging ? ', charging from the vehicle' : ''}.`,
      url: tripUrl,
    });
  });

  generatorWindows(budget).forEach((window, i) => {
    const where = window.stopIndex === null ? undefined : detail.stops[window.stopIndex]?.stop.name;
    calendar.createEvent({
      id: uid('generator', `${detail.trip.id}-${i}`),
      start: window.start,
      end: window.end,
      summary: `Generator${where ? ` at ${where}` : ''}`,
      description: GENERATOR_CAUTION,
      url: tripUrl,
    });
  });

  return calendar.toString();
}
