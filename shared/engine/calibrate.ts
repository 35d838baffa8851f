// "Use what we saw": fit one stop's sky openness and a scale on every load to check-ins by least squares
// (Levenberg–Marquardt on two parameters, Jacobian by finite differences; Marquardt 1963). The residuals are the
// charge the walk predicts at each later reading, started from the first reading, against the charge read, and the
// day's harvest the walk predicts against the charge controller's history (in % of the bank, so both weigh alike).
// The fit only proposes: callers show it as a before/after and apply it when the traveller accepts.
import { LOAD_SCALE_RANGE } from '../schemas/api';
import type { Appliance } from '../schemas/appliance';
import type { EngineInput } from '../schemas/engine-input';
import type { SiteExposure } from '../schemas/trip';
import type { Reading } from './reforecast';
import { capacityWhOf, simulateParsed } from './simulate';
import { SITE_PRESETS, skyViewFromHorizon } from './site-exposure';

export type CalibrationReading = Reading & { harvestWh: number | null };

export type CalibrationFit = { opennessPct: number; loadScale: number; rmsPct: number };
export type Calibration = {
  stopIndex: number;
  before: CalibrationFit;
  after: CalibrationFit;
  /** The plan with the fitted openness and load scale, ready to simulate or save. */
  input: EngineInput;
};

const OPENNESS_RANGE = [0, 100] as const;
const MAX_STEPS = 40;
const DAY_MS = 86_400_000;
/** Two numbers are fitted, so at least two residuals are needed (fewer leave the fit undetermined). */
export const FIT_MIN_RESIDUALS = 2;
/** A canopy of unknown density is taken as a mid-range stand's (the partial-shade preset's index). */
const UNKNOWN_LEAF_AREA_INDEX = SITE_PRESETS['partial-shade'].leafAreaIndex;

/** A stop's exposure with the fitted openness: a canopy keeping the leaf-area index the exposure stood for. */
export function calibratedExposure(exposure: SiteExposure, opennessPct: number): SiteExposure {
  const leafAreaIndex =
    exposure.kind === 'canopy'
      ? exposure.leafAreaIndex
      : exposure.kind === 'preset'
        ? SITE_PRESETS[exposure.preset].leafAreaIndex
        : UNKNOWN_LEAF_AREA_INDEX;
  const deciduous = exposure.kind === 'canopy' ? exposure.deciduous : false;
  return { kind: 'canopy', skyOpennessPct: opennessPct, leafAreaIndex, deciduous };
}

/** An appliance's draws with the fitted load scale (running and standby alike). */
export function scaledDraws(
  appliance: Pick<Appliance, 'runningW' | 'standbyW'>,
  loadScale: number,
): { runningW: number; standbyW: number } {
  return { runningW: appliance.runningW * loadScale, standbyW: appliance.standbyW * loadScale };
}

/** The plan with one stop's sky openness and every appliance's draw scaled: the two things a fit may change. */
export function withCalibration(
  input: EngineInput,
  stopIndex: number,
  opennessPct: number,
  loadScale: number,
): EngineInput {
  const stops = input.trip.stops.map((stop, i) =>
    i === stopIndex ? { ...stop, exposure: calibratedExposure(stop.exposure, opennessPct) } : stop,
  );
  const appliances = input.appliances.map((a) => ({ ...a, ...scaledDraws(a, loadScale) }));
  return { ...input, trip: { ...input.trip, stops }, appliances };
}

// The coarse grid the descent starts from (besides the plan's own values): open to closed sky, a half to 2.5 times
// the loads.
const SEED_OPENNESS = [10, 30, 60, 100] as const;
const SEED_LOAD_SCALES = [0.5, 0.75, 1, 1.5, 2.5] as const;
// Forward-difference steps: half a percent of openness, half a percent of load.
const DIFF_STEPS: readonly [number, number] = [0.5, 0.005];

/** Residuals of a plan against the readings (all in % of the bank), walked from the first reading. */
export function residuals(input: EngineInput, readings: readonly CalibrationReading[]): number[] {
  const [first, ...rest] = readings;
  if (!first) return [];
  const capacityWh = capacityWhOf(input);
  const result = simulateParsed({
    ...input,
    options: { ...input.options, skyBand: false },
    startState: { at: first.at, socPct: first.socPct, propaneKg: null },
  });
  const stepStart = (iso: string) => result.ledger.findIndex((row) => Date.parse(row.utc) >= Date.parse(iso));
  const out: number[] = [];
  for (const r of rest) {
    const i = stepStart(r.at);
    // The charge at a step's start is the one the step before ended with.
    const predicted = i > 0 ? result.ledger[i - 1]?.socPct : undefined;
    if (predicted !== undefined) out.push(predicted - r.socPct);
  }
  for (const r of readings) {
    if (r.harvestWh === null) continue;
    const i = stepStart(r.at);
    const row = result.ledger[i];
    if (!row) continue;
    // Yesterday in the place's own calendar.
    const yesterday = new Date(Date.parse(`${row.local.slice(0, 10)}T00:00Z`) - DAY_MS).toISOString().slice(0, 10);
    const day = result.days.find((d) => d.date === yesterday);
    // A day before the first reading was walked from the plan's own start, not from what was seen: leave it out.
    if (day && Date.parse(`${yesterday}T00:00Z`) >= Date.parse(first.at) - DAY_MS)
      out.push(((day.harvestWh - r.harvestWh) / capacityWh) * 100);
  }
  return out;
}

export const rms = (r: readonly number[]) =>
  r.length > 0 ? Math.sqrt(r.reduce((s, v) => s + v * v, 0) / r.length) : 0;
const clamp = (v: number, [lo, hi]: readonly [number, number]) => Math.min(hi, Math.max(lo, v));

/** The openness a stop's exposure stands for now: a preset's named point, a horizon's sky view. */
export function opennessOf(exposure: SiteExposure): number {
  if (exposure.kind === 'canopy') return exposure.skyOpennessPct;
  if (exposure.kind === 'preset') return SITE_PRESETS[exposure.preset].skyOpennessPct;
  return (exposure.skyViewFraction ?? skyViewFromHorizon(exposure.horizonDeg)) * 100;
}

/** Fit the stop's openness and the load scale to the readings. Undefined when there are too few readings. */
export function calibrate(
  input: EngineInput,
  stopIndex: number,
  readings: readonly CalibrationReading[],
): Calibration | undefined {
  const steps = calibrationSteps(input, stopIndex, readings);
  let next = steps.next();
  while (!next.done) next = steps.next();
  return next.value;
}

/**
 * The fit as a generator that pauses after each walk of the plan, so a screen can run it in slices between frames
 * (a fit walks the plan some tens to hundreds of times) and stay responsive; `calibrate` runs it straight through.
 */
export function* calibrationSteps(
  input: EngineInput,
  stopIndex: number,
  readings: readonly CalibrationReading[],
): Generator<void, Calibration | undefined> {
  const stop = input.trip.stops[stopIndex];
  if (!stop) return undefined;
  const sorted = [...readings].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const at = (p: readonly [number, number]) => residuals(withCalibration(input, stopIndex, p[0], p[1]), sorted);
  let p: [number, number] = [opennessOf(stop.exposure), 1];
  let r = at(p);
  if (r.length < FIT_MIN_RESIDUALS) return undefined;
  const before: CalibrationFit = { opennessPct: p[0], loadScale: p[1], rmsPct: rms(residuals(input, sorted)) };
  yield;
  // Where the plan runs the battery flat (or fills it) the charge stops answering to either number, and a descent
  // started there stalls against a bound. Start it from the best point of a coarse grid instead.
  for (const opennessPct of SEED_OPENNESS)
    for (const loadScale of SEED_LOAD_SCALES) {
      const q: [number, number] = [opennessPct, loadScale];
      const rq = at(q);
      if (rms(rq) < rms(r)) [p, r] = [q, rq];
      yield;
    }
  let lambda = 1e-2;
  for (let step = 0; step < MAX_STEPS; step++) {
    // Jacobian columns by forward differences.
    const cols: number[][] = [];
    for (const [k, h] of DIFF_STEPS.entries()) {
      const q: [number, number] = [...p];
      q[k] = (q[k] ?? 0) + h;
      cols.push(at(q).map((v, i) => (v - (r[i] ?? 0)) / h));
      yield;
    }
    const [a, b] = cols;
    if (!a || !b) break;
    let jaa = 0;
    let jab = 0;
    let jbb = 0;
    let ga = 0;
    let gb = 0;
    for (let i = 0; i < r.length; i++) {
      const ai = a[i] ?? 0;
      const bi = b[i] ?? 0;
      const ri = r[i] ?? 0;
      jaa += ai * ai;
      jab += ai * bi;
      jbb += bi * bi;
      ga += ai * ri;
      gb += bi * ri;
    }
    let improved = false;
    for (let tries = 0; tries < 8 && !improved; tries++) {
      const m11 = jaa * (1 + lambda);
      const m22 = jbb * (1 + lambda);
      const det = m11 * m22 - jab * jab;
      if (det === 0) break;
      const da = -(m22 * ga - jab * gb) / det;
      const db = -(m11 * gb - jab * ga) / det;
      const q: [number, number] = [clamp(p[0] + da, OPENNESS_RANGE), clamp(p[1] + db, LOAD_SCALE_RANGE)];
      const rq = at(q);
      yield;
      if (rms(rq) < rms(r)) {
        const moved = Math.abs(q[0] - p[0]) + Math.abs(q[1] - p[1]) * 100;
        p = q;
        r = rq;
        lambda = Math.max(1e-6, lambda / 3);
        improved = true;
        if (moved < 1e-4) step = MAX_STEPS;
      } else lambda *= 4;
    }
    if (!improved) break;
  }
  return {
    stopIndex,
    before,
    after: { opennessPct: p[0], loadScale: p[1], rmsPct: rms(r) },
    input: withCalibration(input, stopIndex, p[0], p[1]),
  };
}
