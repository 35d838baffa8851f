// The trip run once per recorded year: the same precomputed trip (steps, sun, loads, geometry) under each year's
// sky and air, with only the solar series, the weather-dependent loads and the battery walk worked out per year.
// From the runs: the share of years whose lowest charge stays at or above the reserve, the median, a bad (1 in 10)
// and the worst year, and the 10th–90th percentile of state of charge step by step.
import type { EngineWeather } from '../schemas/engine-weather';
import type { Prepared } from './prepare';
import { seriesForRun, stepSky, type StepSky } from './recorded-sky';
import type { PlanChance, YearLow } from './result-types';
import type { WalkResult } from './walk';

export type YearRuns = {
  chance: PlanChance;
  /** The median year's sky: the planned run's. */
  medianSky: StepSky;
  socBand: { p10: number[]; p90: number[] };
  /** Every year run, in the record's order: fixes are checked under each of them. */
  skies: { year: number; sky: StepSky }[];
};

/** The p-quantile (0–1) of sorted values, linear between neighbours. */
function quantile(sorted: Float64Array, q: number): number {
  const at = q * (sorted.length - 1);
  const lo = Math.floor(at);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return (sorted[lo] ?? 0) + ((sorted[hi] ?? 0) - (sorted[lo] ?? 0)) * (at - lo);
}

/**
 * Runs every year that has a record for at least one stop whose sky is from the record; undefined when none has.
 * `run` walks the trip under one year's sky without a ledger.
 */
export function runRecordYears(
  p: Prepared,
  weather: EngineWeather,
  reservePct: number,
  run: (sky: StepSky) => WalkResult,
): YearRuns | undefined {
  const temps = weather.stops.map((s) => s.recordedTemperature);
  const years: { year: number; sky: StepSky; result: WalkResult }[] = [];
  weather.years.forEach((y, index) => {
    const series = seriesForRun(weather, index);
    const hasRecord = weather.stops.some((s, w) => s.source === 'record' && y.stops[w]);
    if (!hasRecord) return;
    const sky = stepSky(p, series, temps);
    years.push({ year: y.year, sky, result: run(sky) });
  });
  const ranked = [...years].sort((a, b) => a.result.lowestSocPct - b.result.lowestSocPct || a.year - b.year);
  // The lower median; the bad year is the one that 1 year in 10 does as badly as or worse than.
  const medianIndex = Math.floor((ranked.length - 1) / 2);
  const median = ranked[medianIndex];
  if (!median) return undefined;
  const low = (i: number): YearLow => {
    const r = ranked[Math.min(ranked.length - 1, Math.max(0, i))] ?? ranked[0];
    return { year: r?.year ?? 0, lowestSocPct: r?.result.lowestSocPct ?? 0 };
  };
  const badIndex = Math.ceil(ranked.length / 10) - 1;
  // A float's last bit must not turn a charge that sits on the reserve into a year that fails.
  const held = years.filter((y) => y.result.lowestSocPct >= reservePct - 1e-9).length;
  const p10 = new Array<number>(p.n);
  const p90 = new Array<number>(p.n);
  const column = new Float64Array(years.length);
  for (let i = 0; i < p.n; i++) {
    for (let y = 0; y < years.length; y++) column[y] = years[y]?.result.socPct[i] ?? 0;
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
    medianSky: median.sky,
    socBand: { p10, p90 },
    skies: years.map((y) => ({ year: y.year, sky: y.sky })),
  };
}
