// Which weather a stop needs: the same calendar dates in each of the last N years that the archive already holds,
// and the forecast for the days of the stop inside the forecast's horizon. Pure date arithmetic in UTC.

const DAY_MS = 86_400_000;
const HOUR_MS = 3_600_000;
/** The archive is a few days behind real time: a year is only asked for once its dates are this far past. */
export const ARCHIVE_LAG_DAYS = 7;
/** Days ahead the forecast reaches (today counts as the first). */
export const FORECAST_HORIZON_DAYS = 16;

export type WeatherPlace = { latE1: number; lonE1: number };
export type DateRange = { startDate: string; endDate: string };
/** One past year's copy of the stop's dates: `shiftYears` back from the stop's own year. */
export type RecordRange = DateRange & { shiftYears: number };
export type StopWeatherRanges = { place: WeatherPlace; record: RecordRange[]; forecast: DateRange | null };

export type StopPlaceAndTime = { lat: number; lon: number; arriveAt: string; departAt: string };

/** The place on a 0.1° grid (about 11 km): finer than the services' own grids, so nothing is lost by sharing. */
export function weatherPlace(lat: number, lon: number): WeatherPlace {
  return { latE1: Math.round(lat * 10), lonE1: Math.round(lon * 10) };
}

const dateOf = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** A date moved back whole years, 29 February landing on the 28th in a common year. */
export function shiftDate(date: string, years: number): string {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const target = y - years;
  const lastDay = new Date(Date.UTC(target, m, 0)).getUTCDate();
  return `${String(target).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(Math.min(d, lastDay)).padStart(2, '0')}`;
}

/**
 * The UTC dates whose hourly values cover the stop: a value stamped T is the hour ending at T, so the last hour
 * that ends at departure may be stamped on the next day.
 */
export function stopDates(stop: StopPlaceAndTime): DateRange {
  const arrive = Date.parse(stop.arriveAt);
  const depart = Date.parse(stop.departAt);
  return { startDate: dateOf(arrive), endDate: dateOf(Math.ceil(depart / HOUR_MS) * HOUR_MS) };
}

export function stopWeatherRanges(stop: StopPlaceAndTime, today: Date, years: number): StopWeatherRanges {
  const dates = stopDates(stop);
  const latestFull = dateOf(today.getTime() - ARCHIVE_LAG_DAYS * DAY_MS);
  const record: RecordRange[] = [];
  // From the nearest year whose dates the archive holds, back `years` years.
  let shift = 0;
  while (shiftDate(dates.endDate, shift) > latestFull) shift += 1;
  for (let i = 0; i < years; i++, shift++)
    record.push({
      shiftYears: shift,
      startDate: shiftDate(dates.startDate, shift),
      endDate: shiftDate(dates.endDate, shift),
    });
  const firstForecast = dateOf(today.getTime());
  const lastForecast = dateOf(today.getTime() + (FORECAST_HORIZON_DAYS - 1) * DAY_MS);
  const from = dates.startDate > firstForecast ? dates.startDate : firstForecast;
  const to = dates.endDate < lastForecast ? dates.endDate : lastForecast;
  return {
    place: weatherPlace(stop.lat, stop.lon),
    record,
    forecast: from <= to ? { startDate: from, endDate: to } : null,
  };
}

/** Whether any day of a stop lies inside the forecast's horizon from today. */
export function insideForecastHorizon(stop: Pick<StopPlaceAndTime, 'arriveAt' | 'departAt'>, today: Date): boolean {
  return stopWeatherRanges({ ...stop, lat: 0, lon: 0 }, today, 0).forecast !== null;
}

/** Days in an inclusive range of dates. */
export function daysIn(range: DateRange): number {
  return Math.round((Date.parse(range.endDate) - Date.parse(range.startDate)) / DAY_MS) + 1;
}
