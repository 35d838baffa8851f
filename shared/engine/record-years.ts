// The trip run once per recorded year: the same precomputed trip (steps, sun, loads, geometry) under each year's
// sky and air, with only the solar series, the weather-dependent loads and the battery walk worked out per year.
// From the runs: the share of years whose lowest charge stays at or above the reserve, the median, a bad (1 in 10)
// and the worst year, and the 10th–90th percentile of state of charge step by step.
import type { EngineWeather } from '../schemas/engine-weather';
import type { Prepared } from './prepare';
import { seriesForRun, stepSky, type SkyChoice, type StepSky } from './recorded-sky';
import type { PlanChance, YearLow } from './result-types';
import type { WalkResult } from './walk';

/** One year's run: its sky and whatever the caller's run made of it (at least the walk's result). */
export type YearRun<R extends { result: WalkResult }> = { year: number; sky: StepSky; run: R };

export type YearRuns<R extends { result: WalkResult }> = {
  chance: PlanChance;
  /** Every year run, in the record's order. */
  years: YearRun<R>[];
  /** The median year: the planned run's. */
  median: YearRun<R>;
  socBand: { p10: number[]; p90: number[] };
};

/** The recorded years' skies: every year that has a record for at least one stop whose sky is from the record. */
export function recordYearSkies(
  p: Prepared,
  weather: EngineWeather,
  choices: readonly SkyChoice[],
): { year: number; sky: StepSky }[] {
  const temps = choices.map((s) => s.recordedTemperature);
  const skies: { year: number; sky: StepSky }[] = [];
  weather.years.forEach((y, index) => {
    if (!choices.some((s, w) => s.source === 'record' && y.stops[w])) return;
    skies.push({ year: y.year, sky: stepSky(p, seriesForRun(weather, choices, index), temps) });
  });
  return skies;
}

/** How many of the years' walks keep the lowest charge at or above the reserve. */
export function yearsHeld(results: readonly WalkResult[], reservePct: number): number {
  // A float's last bit must not turn a charge that sits on the reserve into a year that fails.
  return results.filter((r) => r.lowestSocPct >= reservePct - 1e-9).length;
}

/** The p-quantile (0–1) of sorted values, linear between neighbours. */
function quantile(sorted: Float64Array, q: number): number {
  const at = q * (sorted.length - 1);
  const lo = Math.floor(at);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return (sorted[lo] ?? 0) + ((sorted[hi] ?? 0) - (sorted[lo] ?? 0)) * (at - lo);
}

/**
 * Runs every year that has a record for at least one stop whose sky is from the record; undefined when none has.
 * `run` walks the trip under one year's sky without a ledger, and may keep what it built (the solar series, the
 * scenario) for the caller.
 */
export function runRecordYears<R extends { result: WalkResult }>(
  p: Prepared,
  weather: EngineWeather,
  choices: readonly SkyChoice[],
  reservePct: number,
  run: (sky: StepSky) => R,
): YearRuns<R> | undefined {
  const years: YearRun<R>[] = recordYearSkies(p, weather, choices).map((y) => ({ ...y, run: run(y.sky) }));
  const ranked = [...years].sort((a, b) => a.run.result.lowestSocPct - b.run.result.lowestSocPct || a.year - b.year);
  // The lower median; the bad year is the one that 1 year in 10 does as badly as or worse than.
  const medianIndex = Math.floor((ranked.length - 1) / 2);
  const median = ranked[medianIndex];
  if (!median) return undefined;
  const low = (i: number): YearLow => {
    const r = ranked[Math.min(ranked.length - 1, Math.max(0, i))] ?? ranked[0];
    return { year: r?.year ?? 0, lowestSocPct: r?.run.result.lowestSocPct ?? 0 };
  };
  const badIndex = Math.ceil(ranked.length / 10) - 1;
  const held = yearsHeld(
    years.map((y) => y.run.result),
    reservePct,
  );
  const p10 = new Array<number>(p.n);
  const p90 = new Array<number>(p.n);
  const column = new Float64Array(years.length);
  for (let i = 0; i < p.n; i++) {
    for (let y = 0; y < years.length; y++) column[y] = years[y]?.run.result.socPct[i] ?? 0;
    column.sort();
    p10[i] = quantile(column, 0.1);
    p90[i] = quantile(column, 0.9);
  }
  return {
    chance: {
      years: years.length,
      held,
      median: low(medianIndex),
      bad: low(badIndex),
      worst: low(0),
      byYear: ranked.map((_, i) => low(i)),
    },
    years,
    median,
    socBand: { p10, p90 },
  };
}
