// A recorded (or forecast) sky on the trip's steps. Each step's recorded GHI, averaged over the step, becomes a
// clearness against the engine's own clear-sky GHI over the same step (the same samples the solar chain uses), so
// clearness × clear sky gives back the recorded GHI exactly, and Erbs, the site's shading, transposition and the
// panel model then treat it as they treat a preset. Recorded air temperatures replace the low/high curve where the
// stop keeps them.
import type { EngineWeather, HourlySky, SkySource } from '../schemas/engine-weather';
import type { Stop, StopSkySource } from '../schemas/trip';
import type { Prepared } from './prepare';
import { HOUR_MS } from './time-grid';

/**
 * Recorded GHI can pass the clear-sky model's (cloud edges, thin-air sites, the model's own error) but a ratio
 * far past it comes from a near-zero clear sky at the horizon, where it means nothing: capped here.
 */
export const MAX_RECORDED_CLEARNESS = 1.5;

export type StepSky = {
  /** Per step: clearness against the clear sky; NaN where the stop's preset applies. */
  clearness: Float64Array;
  /** Per step: outside air, °C. */
  ambientC: Float64Array;
};

/** The mean of a series over [fromMs, toMs), or NaN when any hour it touches is missing. */
function meanOver(values: readonly (number | null)[], startMs: number, fromMs: number, toMs: number): number {
  const first = Math.floor((fromMs - startMs) / HOUR_MS);
  const last = Math.ceil((toMs - startMs) / HOUR_MS) - 1;
  if (first < 0 || last >= values.length || last < first) return Number.NaN;
  let sum = 0;
  for (let h = first; h <= last; h++) {
    const v = values[h];
    if (v === null || v === undefined) return Number.NaN;
    const overlap = Math.min(toMs, startMs + (h + 1) * HOUR_MS) - Math.max(fromMs, startMs + h * HOUR_MS);
    sum += v * overlap;
  }
  return sum / (toMs - fromMs);
}

/** A stop's own choice: where its sky comes from, and whether recorded air temperatures replace its low/high. */
export type SkyChoice = { source: StopSkySource; recordedTemperature: boolean };

export const skyChoices = (stops: readonly Stop[]): SkyChoice[] =>
  stops.map((s) => ({ source: s.skySource, recordedTemperature: !s.ownTemperatures }));

/** The steps' sky and air from one series per stop (null: that stop keeps its preset and its low/high). */
export function stepSky(p: Prepared, series: readonly (HourlySky | null)[], recordedTemperature: readonly boolean[]) {
  const clearness = new Float64Array(p.n).fill(Number.NaN);
  const ambientC = p.ambientC.slice();
  const { start, weight, ghiClear } = p.sun;
  for (let i = 0; i < p.n; i++) {
    const w = p.stopOf[i] ?? 0;
    const s = series[w];
    if (!s) continue;
    const from = p.startMs[i] ?? 0;
    const to = from + (p.stepH[i] ?? 1) * HOUR_MS;
    let clearMean = 0;
    for (let k = start[i] ?? 0; k < (start[i + 1] ?? 0); k++) clearMean += (weight[k] ?? 0) * (ghiClear[k] ?? 0);
    const recorded = meanOver(s.ghiWm2, s.startMs, from, to);
    if (!Number.isNaN(recorded))
      clearness[i] = clearMean > 0 ? Math.min(MAX_RECORDED_CLEARNESS, recorded / clearMean) : 0;
    if (recordedTemperature[w] ?? true) {
      const air = meanOver(s.tempC, s.startMs, from, to);
      if (!Number.isNaN(air)) ambientC[i] = air;
    }
  }
  return { clearness, ambientC } satisfies StepSky;
}

/** A record with the forecast's hours laid over it: where the forecast has a value, it is the sky. */
function withForecast(record: HourlySky, forecast: HourlySky): HourlySky {
  const ghiWm2 = record.ghiWm2.slice();
  const tempC = record.tempC.slice();
  const offset = Math.round((record.startMs - forecast.startMs) / HOUR_MS);
  for (let h = 0; h < ghiWm2.length; h++) {
    const g = forecast.ghiWm2[h + offset];
    const t = forecast.tempC[h + offset];
    if (g !== null && g !== undefined) ghiWm2[h] = g;
    if (t !== null && t !== undefined) tempC[h] = t;
  }
  return { startMs: record.startMs, ghiWm2, tempC };
}

/**
 * One run's series per stop: the year's record with any forecast hours over it, the forecast alone, or none (the
 * preset), as each stop's source says. yearIndex null: no recorded year (the forecast alone).
 */
export function seriesForRun(
  weather: EngineWeather,
  choices: readonly SkyChoice[],
  yearIndex: number | null,
): (HourlySky | null)[] {
  return choices.map((stop, w) => {
    const forecast = weather.forecast[w] ?? null;
    if (stop.source === 'forecast') return forecast;
    if (stop.source === 'preset') return null;
    const record = yearIndex === null ? null : (weather.years[yearIndex]?.stops[w] ?? null);
    if (record && forecast) return withForecast(record, forecast);
    return record ?? forecast;
  });
}

/**
 * Where each stop's sky really comes from: its preset when chosen; else the forecast where it has one, else the
 * record (when chosen), else its preset.
 */
export function effectiveSources(weather: EngineWeather | null, choices: readonly SkyChoice[]): SkySource[] {
  return choices.map((choice, w): SkySource => {
    const chosen = choice.source;
    if (chosen === 'preset') return 'preset';
    if (weather?.forecast[w]) return 'forecast';
    if (chosen === 'record' && weather?.years.some((y) => y.stops[w])) return 'record';
    return 'preset';
  });
}
