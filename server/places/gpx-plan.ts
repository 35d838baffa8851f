// Turns a read GPX file into the stops and drives it stands for: each waypoint a stop (its zone from tz-lookup,
// its times from the file or spread over the trip's nights), each stretch of track between two waypoints a drive
// measured along the track. Pure: the route decides what to save.
import { DateTime } from 'luxon';
import tzlookup from 'tz-lookup';
import { roundKm, suggestedHours } from '@/shared/geo/drive-estimate';
import { greatCircleKm, pathLengthKm, type LatLon } from '@/shared/geo/great-circle';
import type { GpxPreview } from '@/shared/schemas/gpx';
import { stopSchema, type Drive, type Stop } from '@/shared/schemas/trip';
import { GpxError, type GpxFile, type GpxPoint, type GpxWaypoint } from './gpx-read';

type TripDates = { startDate: string; endDate: string; timeZone: string };
type Leg = { distanceKm: number; source: 'track' | 'great-circle'; movingHours: number | null };

/** Arrive mid-afternoon, leave mid-morning: the usual campground check-in and check-out (common practice). */
const ARRIVE = { hour: 15, minute: 0 };
const DEPART = { hour: 10, minute: 0 };
/** A waypoint further than this from the track gets a warning: the track may not pass it at all. */
const FAR_FROM_TRACK_KM = 2;
/** Below this speed a track point is the rig standing still (parked, at lights), not driving. */
const MOVING_KMH = 3;
/** Placeholder temperatures, the same as a new stop's in the editor; the person sets the real ones. */
const DEFAULT_LOW_C = 8;
const DEFAULT_HIGH_C = 18;

const refuse = (message: string) => new GpxError(message);

const flatDistance = (a: LatLon, b: LatLon, cosLat: number) => {
  const dLat = a.lat - b.lat;
  const dLon = (a.lon - b.lon) * cosLat;
  return dLat * dLat + dLon * dLon;
};

/** The index of the line's point nearest each waypoint, never going back along the line. */
function matchWaypoints(line: GpxPoint[], waypoints: GpxWaypoint[]): number[] {
  const matches: number[] = [];
  let from = 0;
  for (const waypoint of waypoints) {
    const cosLat = Math.cos((waypoint.lat * Math.PI) / 180);
    let best = from;
    let bestD = Infinity;
    for (let j = from; j < line.length; j += 1) {
      const point = line[j];
      if (!point) continue;
      const d = flatDistance(point, waypoint, cosLat);
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    }
    matches.push(best);
    from = best;
  }
  return matches;
}

/** Time spent moving between two points of the track, h, or null when the track carries no times. */
function movingHours(points: GpxPoint[]): number | null {
  if (points.length < 2 || points.some((p) => p.time === null)) return null;
  let hours = 0;
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (!a || !b || a.time === null || b.time === null) continue;
    const dtH = (b.time - a.time) / 3_600_000;
    if (dtH > 0 && greatCircleKm(a, b) / dtH >= MOVING_KMH) hours += dtH;
  }
  return hours;
}

function planLegs(file: GpxFile, warnings: string[]): Leg[] {
  const { waypoints, line } = file;
  const straight = (i: number): Leg => {
    const a = waypoints[i];
    const b = waypoints[i + 1];
    return { distanceKm: a && b ? greatCircleKm(a, b) * 1.3 : 0, source: 'great-circle', movingHours: null };
  };
  if (line.length < 2) return waypoints.slice(1).map((_w, i) => straight(i));
  const matches = matchWaypoints(line, waypoints);
  waypoints.forEach((waypoint, i) => {
    const point = line[matches[i] ?? 0];
    const off = point ? greatCircleKm(point, waypoint) : 0;
    if (off > FAR_FROM_TRACK_KM)
      warnings.push(
        `“${waypoint.name ?? `Waypoint ${i + 1}`}” is ${off.toFixed(1)} km from the ${file.lineKind ?? 'track'}; its drives are measured from the nearest point on it.`,
      );
  });
  return waypoints.slice(1).map((_w, i) => {
    const start = matches[i] ?? 0;
    const end = matches[i + 1] ?? start;
    const points = line.slice(start, end + 1);
    return { distanceKm: pathLengthKm(points), source: 'track', movingHours: movingHours(points) };
  });
}

function zoneAt(waypoint: GpxWaypoint, fallback: string): string {
  try {
    return tzlookup(waypoint.lat, waypoint.lon);
  } catch {
    return fallback;
  }
}

const iso = (t: DateTime) => t.toISO({ suppressMilliseconds: true, suppressSeconds: true }) ?? '';
const atLocal = (date: string, time: { hour: number; minute: number }, zone: string) =>
  DateTime.fromISO(date, { zone }).set({ ...time, second: 0, millisecond: 0 });

function cleanName(waypoint: GpxWaypoint, i: number): string {
  // Control characters have no place in a name; GPX allows them, the screens do not.
  const name = (waypoint.name ?? '').replace(/\p{Cc}+/gu, ' ').trim();
  return (name || `Waypoint ${i + 1}`).slice(0, 120);
}

type Times = { arrive: DateTime; depart: DateTime }[];

function timesFromFile(file: GpxFile, names: string[], zones: string[], hours: number[], trip: TripDates): Times {
  const arrivals = file.waypoints.map((w, i) => DateTime.fromISO(w.time ?? '', { zone: zones[i] }));
  for (let i = 1; i < arrivals.length; i += 1) {
    const gapH = ((arrivals[i]?.toMillis() ?? 0) - (arrivals[i - 1]?.toMillis() ?? 0)) / 3_600_000;
    if (gapH < 1)
      throw refuse(
        `The waypoints “${names[i - 1]}” and “${names[i]}” are less than an hour apart or out of order; a stop needs time to stay.`,
      );
  }
  return arrivals.map((arrive, i) => {
    const next = arrivals[i + 1];
    if (next) {
      const gapH = (next.toMillis() - arrive.toMillis()) / 3_600_000;
      // Leave with time to drive there, but stay at least an hour.
      const driveH = Math.min(hours[i] ?? 0, gapH - 1);
      hours[i] = driveH;
      return { arrive, depart: next.minus({ minutes: Math.round(driveH * 60) }) };
    }
    const lastDay = atLocal(trip.endDate, { hour: 11, minute: 0 }, arrive.zoneName ?? trip.timeZone);
    return { arrive, depart: lastDay > arrive.plus({ hours: 1 }) ? lastDay : arrive.plus({ hours: 18 }) };
  });
}

function spreadOverTrip(count: number, zones: string[], hours: number[], trip: TripDates): Times {
  const start = DateTime.fromISO(trip.startDate, { zone: trip.timeZone });
  const nights = Math.round(DateTime.fromISO(trip.endDate, { zone: trip.timeZone }).diff(start, 'days').days);
  if (count > Math.max(1, nights))
    throw refuse(
      `The file has ${count} places to stay but the trip has ${nights} ${nights === 1 ? 'night' : 'nights'}: make the trip at least ${count} nights long first, or give the waypoints times.`,
    );
  const times: Times = [];
  let day = trip.startDate;
  for (let i = 0; i < count; i += 1) {
    const zone = zones[i] ?? trip.timeZone;
    const stay = nights === 0 ? 0 : Math.floor(nights / count) + (i < nights % count ? 1 : 0);
    const previous = times[i - 1];
    const earliest = atLocal(day, ARRIVE, zone);
    // A long drive arrives later than mid-afternoon: after leaving and driving, rounded up to the quarter hour.
    const afterDrive = previous
      ? previous.depart.plus({ minutes: Math.ceil(((hours[i - 1] ?? 0) * 60) / 15) * 15 })
      : earliest;
    const arrive = DateTime.max(earliest, afterDrive.setZone(zone));
    const leaveDay = DateTime.fromISO(day).plus({ days: stay }).toISODate() ?? day;
    const depart = stay === 0 ? arrive.plus({ hours: 8 }) : atLocal(leaveDay, DEPART, zone);
    times.push({ arrive, depart });
    day = leaveDay;
  }
  return times;
}

export function planGpxImport(file: GpxFile, trip: TripDates, speedKmh: number, replaces: number): GpxPreview {
  const warnings: string[] = [];
  const legs = planLegs(file, warnings);
  const zones = file.waypoints.map((w) => zoneAt(w, trip.timeZone));
  const hours = legs.map((leg) => leg.movingHours ?? suggestedHours(leg.distanceKm, speedKmh));
  const timed = file.waypoints.every((w) => w.time !== null);
  if (!timed && file.waypoints.some((w) => w.time !== null))
    warnings.push('Only some waypoints have times, so all the stops are spread over the trip’s nights instead.');
  const names = file.waypoints.map(cleanName);
  const times = timed
    ? timesFromFile(file, names, zones, hours, trip)
    : spreadOverTrip(file.waypoints.length, zones, hours, trip);

  const stops: { stop: Stop; notes: string }[] = file.waypoints.map((waypoint, i) => {
    const time = times[i];
    const parsed = stopSchema.safeParse({
      name: names[i],
      lat: waypoint.lat,
      lon: waypoint.lon,
      elevationM: Math.min(6000, Math.max(-500, Math.round(waypoint.elevationM ?? 0))),
      timeZone: zones[i],
      arriveAt: time ? iso(time.arrive) : '',
      departAt: time ? iso(time.depart) : '',
      lowC: DEFAULT_LOW_C,
      highC: DEFAULT_HIGH_C,
    });
    if (!parsed.success)
      throw refuse(`“${names[i]}” cannot become a stop: ${parsed.error.issues[0]?.message ?? 'bad values'}.`);
    return { stop: parsed.data, notes: 'Imported from a GPX file.' };
  });
  const drives: Drive[] = legs.map((leg, i) => ({
    hoursOnRoad: Math.max(0, Math.round((hours[i] ?? 0) * 100) / 100),
    vehicleCharging: true,
    distanceKm: roundKm(leg.distanceKm),
    distanceSource: leg.source,
    roadFactor: 1.3,
    averageSpeedKmh: speedKmh,
    hoursSource: leg.movingHours === null ? 'suggested' : 'typed',
  }));
  return {
    name: file.name,
    timing: timed ? 'from-file' : 'spread',
    lineKind: file.lineKind,
    lineKm: file.line.length >= 2 ? roundKm(pathLengthKm(file.line)) : null,
    stops,
    drives,
    replaces,
    warnings,
  };
}
