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

export const skySourceSchema = z.enum(['record', 'forecast', 'preset']);
export type SkySource = z.infer<typeof skySourceSchema>;

export const engineWeatherSchema = z.object({
  /** Per stop, in trip order: where its sky comes from, and whether recorded temperatures replace its low/high. */
  stops: z
    .array(z.object({ source: skySourceSchema, recordedTemperature: z.boolean().default(true) }))
    .max(LIMITS.stopsPerTrip),
  /** Past years, each with a series per stop (null: that stop has no record for the year). */
  years: z
    .array(z.object({ year: z.number().int(), stops: z.array(hourlySkySchema.nullable()).max(LIMITS.stopsPerTrip) }))
    .max(MAX_RECORD_YEARS),
  /** The forecast per stop (null: none). */
  forecast: z.array(hourlySkySchema.nullable()).max(LIMITS.stopsPerTrip),
});
export type EngineWeather = z.infer<typeof engineWeatherSchema>;
