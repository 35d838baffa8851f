// The weather service's wire format (an hourly historical-weather archive and an hourly forecast that answer the
// same query and the same JSON), and what the API says about a stop's weather record.
import { z } from 'zod';

/** The hourly variables asked for: global horizontal irradiance (mean of the preceding hour) and air temperature. */
export const WEATHER_VARIABLES = ['shortwave_radiation', 'temperature_2m'] as const;

const calendarDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'A date is written YYYY-MM-DD.')
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
  }, 'That is not a calendar date.');

/** Longest range one request may ask for: a year and a day (a trip's dates in one past year fit in it). */
export const WEATHER_MAX_DAYS_PER_REQUEST = 367;

/** The query both services take (timezone is always UTC here, so the hours line up with the engine's walk). */
export const weatherQuerySchema = z
  .object({
    latitude: z.coerce.number().min(-90).max(90),
    longitude: z.coerce.number().min(-180).max(180),
    start_date: calendarDate,
    end_date: calendarDate,
    hourly: z
      .string()
      .max(200)
      .transform((s) => s.split(','))
      .pipe(z.array(z.enum(WEATHER_VARIABLES)).min(1)),
    timezone: z.enum(['UTC', 'GMT']).default('GMT'),
  })
  .refine((q) => q.end_date >= q.start_date, { message: 'end_date must not be before start_date', path: ['end_date'] })
  .refine((q) => Date.parse(q.end_date) - Date.parse(q.start_date) < WEATHER_MAX_DAYS_PER_REQUEST * 86_400_000, {
    message: `At most ${WEATHER_MAX_DAYS_PER_REQUEST} days per request.`,
    path: ['end_date'],
  });
export type WeatherQuery = z.infer<typeof weatherQuerySchema>;

/** Most hours one answer may carry (a year and a day); longer answers are refused as malformed. */
const MAX_HOURS = WEATHER_MAX_DAYS_PER_REQUEST * 24;
const hourlyValues = z.array(z.number().finite().nullable()).max(MAX_HOURS);

/** The answer: an hourly series in UTC; a value may be null where the record has a gap. */
export const weatherResponseSchema = z
  .object({
    latitude: z.number(),
    longitude: z.number(),
    utc_offset_seconds: z.literal(0),
    hourly: z.object({
      time: z
        .array(z.string().regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/))
        .min(1)
        .max(MAX_HOURS),
      shortwave_radiation: hourlyValues,
      temperature_2m: hourlyValues,
    }),
  })
  .refine(
    (r) =>
      r.hourly.shortwave_radiation.length === r.hourly.time.length &&
      r.hourly.temperature_2m.length === r.hourly.time.length,
    { message: 'Every hourly series must have one value per hour.' },
  );
export type WeatherResponse = z.infer<typeof weatherResponseSchema>;

/** The services' error answer. */
export const weatherErrorSchema = z.object({ error: z.literal(true), reason: z.string().max(2000) });

/**
 * Where a stop's weather record stands. loading: some of its years are still being fetched (yearsReady of
 * yearsWanted so far); ready: every year that could be had is in (yearsReady of them); unavailable: none could be
 * had (the service is down, refused, or answered nonsense) or fetching is turned off, and the stop plans with its
 * preset sky. forecastDays: days of the stop covered by a fetched forecast.
 */
export const stopWeatherStatusSchema = z.object({
  stopId: z.string(),
  state: z.enum(['loading', 'ready', 'unavailable', 'off']),
  yearsReady: z.number().int().min(0),
  yearsWanted: z.number().int().min(0),
  forecastDays: z.number().int().min(0),
});
export type StopWeatherStatus = z.infer<typeof stopWeatherStatusSchema>;

export const tripWeatherSchema = z.object({ stops: z.array(stopWeatherStatusSchema) });
export type TripWeather = z.infer<typeof tripWeatherSchema>;
