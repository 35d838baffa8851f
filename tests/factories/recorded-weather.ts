import { syntheticHourly, syntheticSite } from '@/server/weather/synthetic-weather';
import type { EngineInputDraft } from '@/shared/schemas';
import type { EngineWeather } from '@/shared/schemas/engine-weather';
import { shiftDate, stopDates } from '@/shared/weather-ranges';

const HOUR_MS = 3_600_000;

/** A plan with `years` past years of the local fake's synthetic weather at each stop, laid on the trip's calendar. */
export function withSyntheticRecord(draft: EngineInputDraft, years: number): EngineInputDraft {
  const stops = draft.trip.stops;
  const weather: EngineWeather = {
    years: Array.from({ length: years }, (_, k) => ({
      year: 2025 - k,
      stops: stops.map((stop) => {
        const dates = stopDates(stop);
        const series = syntheticHourly(
          syntheticSite(stop.lat, stop.lon),
          shiftDate(dates.startDate, k + 1),
          shiftDate(dates.endDate, k + 1),
        );
        return {
          startMs: Date.parse(`${dates.startDate}T00:00:00Z`) - HOUR_MS,
          ghiWm2: series.ghi,
          tempC: series.tempC,
        };
      }),
    })),
    forecast: stops.map(() => null),
  };
  return { ...draft, weather };
}
