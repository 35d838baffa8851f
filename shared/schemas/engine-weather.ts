// Recorded and forecast skies handed to the engine. Each series is laid on the trip's own calendar: value h is the
// mean over the hour starting `startMs + h` hours (for a past year, the same calendar hour of that year).
import { z } from 'zod';
import { LIMITS } from './limits';

/** Most hours one series may hold: the longest trip and a day either side. */
const MAX_SERIES_HOURS = (LIMITS.tripDays + 2) * 24;
/** Most past years a budget runs through. */
export const MAX_RECORD_YEARS = 40;

/**
 * Hourly values from min to max, or null for a gap. Checked in one pass over the array: a budget on 20 years
 * carries tens of thousands of them, and a schema per element cost a tenth of the budget's time.
 */
function hourlyValues(min: number, max: number, what: string) {
  return z.custom<(number | null)[]>(
    (v) =>
      Array.isArray(v) &&
      v.length <= MAX_SERIES_HOURS &&
      v.every((x) => x === null || (typeof x === 'number' && x >= min && x <= max)),
    { error: `Expected at most ${MAX_SERIES_HOURS} hourly ${what} values from ${min} to ${max}, or null for a gap.` },
  );
}

export const hourlySkySchema = z.object({
  startMs: z.number().int(),
  /** Global horizontal irradiance, W/m²; null where the record has a gap (the preset sky fills it). */
  ghiWm2: hourlyValues(0, 1500, 'irradiance'),
  /** Air temperature, °C; null where the record has a gap (the stop's low/high curve fills it). */
  tempC: hourlyValues(-90, 60, 'temperature'),
});
export type HourlySky = z.infer<typeof hourlySkySchema>;

/** Where a stop's sky came from in a budget (a stop asking for the record or forecast may have neither yet). */
export type SkySource = 'record' | 'forecast' | 'preset';

/** What the past holds for a trip's stops. Which of it each stop uses is the stop's own choice (skySource). */
export const engineWeatherSchema = z.object({
  /** Past years, each with a series per stop (null: that stop has no record for the year). */
  years: z
    .array(z.object({ year: z.number().int(), stops: z.array(hourlySkySchema.nullable()).max(LIMITS.stopsPerTrip) }))
    .max(MAX_RECORD_YEARS),
  /** The forecast per stop (null: none). */
  forecast: z.array(hourlySkySchema.nullable()).max(LIMITS.stopsPerTrip),
});
export type EngineWeather = z.infer<typeof engineWeatherSchema>;
