// The trip's time grid: one-hour steps in UTC from the first arrival to the last departure, each placed at a
// stop or on a drive, with its local time from the place's IANA zone (luxon). Offsets are looked up once per
// day-long block and bisected only where a daylight-saving change falls, so the hot loops never call luxon and
// no hour is dropped or doubled (the walk is in UTC; local time only labels the steps).
import { IANAZone } from 'luxon';
import type { Trip } from '../schemas/trip';

export const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

export type Segment =
  | { kind: 'stop'; index: number; startMs: number; endMs: number }
  | { kind: 'drive'; index: number; startMs: number; endMs: number; roadEndMs: number };

export function buildSegments(trip: Trip): Segment[] {
  const segs: Segment[] = [];
  trip.stops.forEach((stop, i) => {
    const startMs = Date.parse(stop.arriveAt);
    const endMs = Date.parse(stop.departAt);
    segs.push({ kind: 'stop', index: i, startMs, endMs });
    const next = trip.stops[i + 1];
    const drive = trip.drives[i];
    if (next && drive) {
      const nextMs = Date.parse(next.arriveAt);
      // Time on the road sits at the start of the gap; any rest is a roadside pause.
      segs.push({
        kind: 'drive',
        index: i,
        startMs: endMs,
        endMs: nextMs,
        roadEndMs: endMs + drive.hoursOnRoad * HOUR_MS,
      });
    }
  });
  return segs;
}

export type TimeGrid = {
  n: number;
  startMs: Float64Array;
  stepH: Float64Array;
};

export function buildGrid(trip: Trip): TimeGrid {
  const first = trip.stops[0];
  const last = trip.stops[trip.stops.length - 1];
  const t0 = first ? Date.parse(first.arriveAt) : 0;
  const t1 = last ? Date.parse(last.departAt) : 0;
  const n = Math.max(1, Math.ceil((t1 - t0) / HOUR_MS - 1e-9));
  const startMs = new Float64Array(n);
  const stepH = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    startMs[i] = t0 + i * HOUR_MS;
    stepH[i] = Math.min(1, (t1 - (t0 + i * HOUR_MS)) / HOUR_MS);
  }
  return { n, startMs, stepH };
}

// luxon's IANAZone.offset reads the zone's wall clock through Intl's formatToParts; format() gives the same
// fields from the same formatter about three times faster (luxon itself parses it this way where formatToParts
// is missing). zoneOffsetMin repeats luxon's arithmetic on those fields, so the offsets are the same numbers, and
// falls back to luxon for anything it cannot read.
const formatters = new Map<string, Intl.DateTimeFormat | null>();
const WALL_CLOCK = /(\d+)\/(\d+)\/(\d+) (AD|BC),? (\d+):(\d+):(\d+)/;

function formatterFor(zoneName: string): Intl.DateTimeFormat | null {
  let dtf = formatters.get(zoneName);
  if (dtf === undefined) {
    try {
      dtf = new Intl.DateTimeFormat('en-US', {
        hour12: false,
        timeZone: zoneName,
        year: 'numeric',
        month: '2-digit',
        day: '2-digit',
        hour: '2-digit',
        minute: '2-digit',
        second: '2-digit',
        era: 'short',
      });
    } catch {
      dtf = null;
    }
    formatters.set(zoneName, dtf);
  }
  return dtf;
}

/** The zone's UTC offset in minutes at an instant, as luxon's IANAZone.offset computes it. */
export function zoneOffsetMin(zone: IANAZone, utcMs: number): number {
  const dtf = formatterFor(zone.name);
  const date = new Date(utcMs);
  const m = dtf && !Number.isNaN(date.getTime()) ? WALL_CLOCK.exec(dtf.format(date).replace(/\u200E/g, '')) : null;
  if (!m) return zone.offset(utcMs);
  const int = (k: number): number => parseInt(m[k] ?? '', 10);
  let year = int(3);
  const month = int(1);
  const day = int(2);
  const hour = int(5);
  if (m[4] === 'BC') year = -Math.abs(year) + 1;
  let asUtc = Date.UTC(year, month - 1, day, hour === 24 ? 0 : hour, int(6), int(7), 0);
  if (year < 100 && year >= 0) {
    const d = new Date(asUtc);
    d.setUTCFullYear(year, month - 1, day);
    asUtc = +d;
  }
  let asTs = +date;
  const over = asTs % 1000;
  asTs -= over >= 0 ? over : 1000 + over;
  return (asUtc - asTs) / (60 * 1000);
}

/** Offsets in minutes for steps [from, to) that share one zone. */
export function fillOffsets(zoneName: string, ms: Float64Array, from: number, to: number, out: Float64Array): void {
  const zone = IANAZone.create(zoneName);
  const at = (i: number): number => zoneOffsetMin(zone, ms[i] ?? 0);
  const fill = (a: number, b: number, oa: number, ob: number): void => {
    if (oa === ob) {
      for (let i = a; i <= b; i++) out[i] = oa;
      return;
    }
    if (b - a <= 1) {
      out[a] = oa;
      out[b] = ob;
      return;
    }
    const m = (a + b) >> 1;
    const om = at(m);
    fill(a, m, oa, om);
    fill(m, b, om, ob);
  };
  const block = Math.max(1, Math.floor(DAY_MS / HOUR_MS) - 1); // a zone never changes twice inside a block
  let a = from;
  let oa = at(a);
  while (a < to - 1) {
    const b = Math.min(to - 1, a + block);
    const ob = at(b);
    fill(a, b, oa, ob);
    a = b;
    oa = ob;
  }
  if (from === to - 1) out[from] = oa;
}

const TWO_DIGITS = Array.from({ length: 100 }, (_, i) => String(i).padStart(2, '0'));
const LAST_MS = 253_402_300_800_000; // 10000-01-01T00:00Z: four-digit years only

/** The civil date of a day number since 1970 (Hinnant's days-to-civil), month 1–12. */
function civilDate(days: number): { year: number; month: number; day: number } {
  const z = days + 719_468;
  const era = Math.floor(z / 146_097);
  const doe = z - era * 146_097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36_524) - Math.floor(doe / 146_096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

/** YYYY-MM-DDT of a day number since 1970. */
function isoDate(days: number): string {
  const { year, month, day } = civilDate(days);
  return `${String(year).padStart(4, '0')}-${TWO_DIGITS[month] ?? ''}-${TWO_DIGITS[day] ?? ''}T`;
}

// Steps come hour after hour, so the date part is usually the previous call's.
let lastDays = Number.NaN;
let lastDate = '';

/**
 * "HH:MM" and a tail (":00.000Z", "+01:00", or nothing) for each minute of the day, built the first time a label
 * asks for it: a label is then its date and one of these, one join instead of four.
 */
const clockTables = new Map<string, string[]>();

function clockWith(minuteOfDay: number, tail: string): string {
  let table = clockTables.get(tail);
  if (!table) clockTables.set(tail, (table = []));
  return (table[minuteOfDay] ??=
    `${TWO_DIGITS[Math.floor(minuteOfDay / 60)] ?? ''}:${TWO_DIGITS[minuteOfDay % 60] ?? ''}${tail}`);
}

/** YYYY-MM-DDTHH:MM of a UTC instant, as new Date(ms).toISOString() spells it, followed by a tail. */
function isoMinutes(ms: number, tail = ''): string {
  const days = Math.floor(ms / DAY_MS);
  if (days !== lastDays) {
    lastDays = days;
    lastDate = isoDate(days);
  }
  return lastDate + clockWith(Math.floor((ms - days * DAY_MS) / 60_000), tail);
}

/** Whole milliseconds from 1970 to 9999: the fast path; anything else goes through Date, as before. */
const plainInstant = (ms: number): boolean => Number.isInteger(ms) && ms >= 0 && ms < LAST_MS;

/** new Date(ms).toISOString() without the Date (the ledger labels every step). */
export function utcIsoString(ms: number): string {
  if (!plainInstant(ms)) return new Date(ms).toISOString();
  const rest = ms - Math.floor(ms / 60_000) * 60_000;
  if (rest === 0) return isoMinutes(ms, ':00.000Z');
  const sec = Math.floor(rest / 1000);
  const milli = rest - sec * 1000;
  return `${isoMinutes(ms)}:${TWO_DIGITS[sec] ?? ''}.${String(milli).padStart(3, '0')}Z`;
}

const offsetSuffixes = new Map<number, string>();

function offsetSuffix(offsetMin: number): string {
  let text = offsetSuffixes.get(offsetMin);
  if (text === undefined) {
    const sign = offsetMin < 0 ? '-' : '+';
    const abs = Math.abs(offsetMin);
    const hh = String(Math.floor(abs / 60)).padStart(2, '0');
    const mm = String(abs % 60).padStart(2, '0');
    text = `${sign}${hh}:${mm}`;
    offsetSuffixes.set(offsetMin, text);
  }
  return text;
}

/** A local wall-clock label such as 2027-09-12T14:00+01:00, built without Date's local getters. */
export function localLabel(utcMs: number, offsetMin: number): string {
  const wallMs = utcMs + offsetMin * 60_000;
  const suffix = offsetSuffix(offsetMin);
  return plainInstant(wallMs) ? isoMinutes(wallMs, suffix) : `${new Date(wallMs).toISOString().slice(0, 16)}${suffix}`;
}

export function localDayNumber(utcMs: number, offsetMin: number): number {
  return Math.floor((utcMs + offsetMin * 60_000) / DAY_MS);
}

export function localMinuteOfDay(utcMs: number, offsetMin: number): number {
  const local = utcMs + offsetMin * 60_000;
  return (local - Math.floor(local / DAY_MS) * DAY_MS) / 60_000;
}

/** Local calendar month, 0 (January) to 11. */
export function localMonth(utcMs: number, offsetMin: number): number {
  return civilDate(localDayNumber(utcMs, offsetMin)).month - 1;
}
