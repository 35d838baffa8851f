// Recorded and forecast skies handed to the engine. Each series is laid on the trip's own calendar: value h is the
// mean over the hour starting `startMs + h` hours (for a past year, the same calendar hour of that year).
import { z } from 'zod';
import { LIMITS } from './limits';

/** Most hours one series may hold: the longest trip and a day either side. */
const MAX_SERIES_HOURS = (LIMITS.tripDays + 2) * 24;
/** Most past years a budget runs through. */
export const MAX_RECORD_YEARS = 40;

export const hourlySkySchema = z.object({
  startMs: z.number().int(),
  /** Global horizontal irradiance, W/m²; null where the record has a gap (the preset sky fills it). */
  ghiWm2: z.array(z.number().min(0).max(1500).nullable()).max(MAX_SERIES_HOURS),
  /** Air temperature, °C; null where the record has a gap (the stop's low/high curve fills it). */
  tempC: z.array(z.number().min(-90).max(60).nullable()).max(MAX_SERIES_HOURS),
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
