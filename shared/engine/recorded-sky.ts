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

/**
 * Which hours of a series each step reads, with the share of the step each covers: worked out once per trip and
 * series start, so every recorded year reads its values without any time arithmetic. hour −1: the step reaches
 * before the series.
 */
type HourSpans = { start: Int32Array; hour: Int32Array; share: Float64Array };

/** What every year shares: each step's clear-sky GHI (the solar chain's own samples) and the hour spans. */
type SharedSteps = { clearMean: Float64Array; spans: Map<number, HourSpans> };

const sharedCache = new WeakMap<Prepared, SharedSteps>();

function sharedSteps(p: Prepared): SharedSteps {
  const cached = sharedCache.get(p);
  if (cached) return cached;
  const clearMean = new Float64Array(p.n);
  const { start, weight, ghiClear } = p.sun;
  for (let i = 0; i < p.n; i++) {
    let sum = 0;
    for (let k = start[i] ?? 0; k < (start[i + 1] ?? 0); k++) sum += (weight[k] ?? 0) * (ghiClear[k] ?? 0);
    clearMean[i] = sum;
  }
  const shared = { clearMean, spans: new Map<number, HourSpans>() };
  sharedCache.set(p, shared);
  return shared;
}

function hourSpans(p: Prepared, shared: SharedSteps, seriesStartMs: number): HourSpans {
  const cached = shared.spans.get(seriesStartMs);
  if (cached) return cached;
  const start = new Int32Array(p.n + 1);
  const hours: number[] = [];
  const shares: number[] = [];
  for (let i = 0; i < p.n; i++) {
    start[i] = hours.length;
    const from = p.startMs[i] ?? 0;
    const to = from + (p.stepH[i] ?? 1) * HOUR_MS;
    const first = Math.floor((from - seriesStartMs) / HOUR_MS);
    const last = Math.ceil((to - seriesStartMs) / HOUR_MS) - 1;
    if (first < 0) {
      hours.push(-1);
      shares.push(0);
      continue;
    }
    for (let h = first; h <= last; h++) {
      const overlap = Math.min(to, seriesStartMs + (h + 1) * HOUR_MS) - Math.max(from, seriesStartMs + h * HOUR_MS);
      hours.push(h);
      shares.push(overlap / (to - from));
    }
  }
  start[p.n] = hours.length;
  const spans = { start, hour: Int32Array.from(hours), share: Float64Array.from(shares) };
  shared.spans.set(seriesStartMs, spans);
  return spans;
}

/** The mean of a series over step i, or NaN when any hour it touches is missing. */
function stepMean(values: readonly (number | null)[], spans: HourSpans, i: number): number {
  const { start, hour, share } = spans;
  const to = start[i + 1] ?? 0;
  let sum = 0;
  for (let k = start[i] ?? 0; k < to; k++) {
    const h = hour[k] ?? -1;
    const v = h < 0 ? undefined : values[h];
    if (v === null || v === undefined) return Number.NaN;
    sum += v * (share[k] ?? 0);
  }
  return sum;
}

/** A stop's own choice: where its sky comes from, and whether recorded air temperatures replace its low/high. */
export type SkyChoice = { source: StopSkySource; recordedTemperature: boolean };

export const skyChoices = (stops: readonly Stop[]): SkyChoice[] =>
  stops.map((s) => ({ source: s.skySource, recordedTemperature: !s.ownTemperatures }));

/** The steps' sky and air from one series per stop (null: that stop keeps its preset and its low/high). */
export function stepSky(p: Prepared, series: readonly (HourlySky | null)[], recordedTemperature: readonly boolean[]) {
  const clearness = new Float64Array(p.n).fill(Number.NaN);
  const ambientC = p.ambientC.slice();
  const shared = sharedSteps(p);
  const { clearMean } = shared;
  const spansOf = series.map((s) => (s ? hourSpans(p, shared, s.startMs) : null));
  for (let i = 0; i < p.n; i++) {
    const w = p.stopOf[i] ?? 0;
    const s = series[w];
    const spans = spansOf[w];
    if (!s || !spans) continue;
    const clear = clearMean[i] ?? 0;
    const recorded = stepMean(s.ghiWm2, spans, i);
    if (!Number.isNaN(recorded)) clearness[i] = clear > 0 ? Math.min(MAX_RECORDED_CLEARNESS, recorded / clear) : 0;
    if (recordedTemperature[w] ?? true) {
      const air = stepMean(s.tempC, spans, i);
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

/** The forecast alone as a sky, when no recorded year runs but some stop's sky is from a forecast. */
export function forecastOnlySky(p: Prepared, weather: EngineWeather | null, choices: readonly SkyChoice[]) {
  if (!weather || !effectiveSources(weather, choices).includes('forecast')) return undefined;
  return stepSky(
    p,
    seriesForRun(weather, choices, null),
    choices.map((s) => s.recordedTemperature),
  );
}
