// Headroom finder: the smallest extra battery, extra solar, generator time inside the allowed hours, or number
// of hookup nights that keeps the lowest charge at or above the reserve (and never runs the battery empty).
// With recorded years it aims at a confidence: the change must hold in at least 9 of 10 of those years
// (HOLD_CONFIDENCE), each year keeping its own sky, air and solar series. Each lever is a monotone search
// (bisection) over battery walks that reuse one precomputed trip.
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '../schemas/engine-input';
import { defaultFuelModel } from './generator';
import { ASSUMED_GENERATOR_W, hookupSupplyFor, UNKNOWN_COUNTRY_HOOKUP } from './fixes';
import { prepare, type Prepared } from './prepare';
import { recordYearSkies } from './record-years';
import { forecastOnlySky, skyChoices } from './recorded-sky';
import { plannedScenario, reservePctOf } from './simulate';
import { solarSeries } from './solar';
import { walk, type GeneratorPlan, type Scenario, type WalkResult } from './walk';

export type HeadroomLever = {
  lever: 'battery' | 'solar' | 'generator' | 'hookup';
  status: 'not-needed' | 'found' | 'cannot-fix' | 'not-applicable';
  amount: number;
  unit: 'Ah' | 'W' | 'h' | 'nights';
  resultingLowestSocPct: number;
  text: string;
  params: Record<string, number | string | boolean | number[]>;
};

/** The share of recorded years a change must hold in: 9 of 10 (a bad year in ten may still dip below). */
export const HOLD_CONFIDENCE = { held: 9, of: 10 } as const;

/** What the search aimed at on recorded years: hold in `held` of `of`; `years` run, `baselineHeld` of them hold now. */
export type HeadroomConfidence = { held: number; of: number; years: number; baselineHeld: number };

export type HeadroomResult = {
  reservePct: number;
  /** null: no recorded years, the one planned sky must hold. */
  confidence: HeadroomConfidence | null;
  baselineLowestSocPct: number;
  baselineEnergyShortWh: number;
  needed: boolean;
  levers: HeadroomLever[];
};

/**
 * bases: the planned scenario, or one per recorded year, worst year first (so a failing change is found out
 * early). need: how many of them must hold.
 */
type Search = { p: Prepared; bases: Scenario[]; need: number; reservePct: number };
type Change = (base: Scenario) => Scenario;

const ok = (r: WalkResult, reservePct: number): boolean =>
  r.lowestSocPct >= reservePct - 1e-6 && r.energyShortWh <= 1e-6;

/** Whether enough years hold under the change; stops walking as soon as the answer is known. */
function holds(s: Search, change: Change): boolean {
  const allowedFailures = s.bases.length - s.need;
  let passed = 0;
  let failed = 0;
  for (const base of s.bases) {
    if (ok(walk(s.p, change(base), null), s.reservePct)) passed += 1;
    else failed += 1;
    if (passed >= s.need) return true;
    if (failed > allowedFailures) return false;
  }
  return passed >= s.need;
}

/** The walk of the year at the confidence (the need-th best) under the change: the one the answer is about. */
function atConfidence(s: Search, change: Change): WalkResult {
  const runs = s.bases.map((base) => walk(s.p, change(base), null));
  runs.sort((a, b) => a.lowestSocPct - b.lowestSocPct);
  return runs[s.bases.length - s.need] ?? runs[0] ?? walk(s.p, change(s.bases[0] as Scenario), null);
}

/** Smallest x in [0, hi] with pass(x), to within tol; null if even the cap fails. Grows hi by doubling. */
function bisect(pass: (x: number) => boolean, start: number, cap: number, tol: number): number | null {
  let hi = start;
  while (!pass(hi)) {
    if (hi >= cap) return null;
    hi = Math.min(cap, hi * 2);
  }
  let lo = 0;
  while (hi - lo > tol) {
    const mid = (lo + hi) / 2;
    if (pass(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

function batteryLever(s: Search): HeadroomLever {
  const nominalV = s.p.input.rig.battery.nominalV;
  const baseWh = s.bases[0]?.capacityWh ?? 0;
  const change =
    (ah: number): Change =>
    (base) => ({ ...base, capacityWh: baseWh + ah * nominalV });
  const run = (ah: number): WalkResult => atConfidence(s, change(ah));
  const found = bisect((ah) => holds(s, change(ah)), baseWh / nominalV, (16 * baseWh) / nominalV, 1);
  if (found === null)
    return {
      lever: 'battery',
      status: 'cannot-fix',
      amount: 0,
      unit: 'Ah',
      resultingLowestSocPct: run((16 * baseWh) / nominalV).lowestSocPct,
      text: 'even 16 times the battery does not hold the reserve',
      params: {},
    };
  const ah = Math.ceil(found / 5) * 5;
  const r = run(ah);
  return {
    lever: 'battery',
    status: 'found',
    amount: ah,
    unit: 'Ah',
    resultingLowestSocPct: r.lowestSocPct,
    text: `${ah} Ah more battery at ${nominalV} V (${((ah * nominalV) / 1000).toFixed(2)} kWh)`,
    params: { extraAh: ah, extraWh: Math.round(ah * nominalV) },
  };
}

function solarLever(s: Search): HeadroomLever {
  const ratedW = s.p.input.rig.solarArrays.reduce((sum, a) => sum + a.ratedW, 0);
  if (ratedW === 0)
    return {
      lever: 'solar',
      status: 'not-applicable',
      amount: 0,
      unit: 'W',
      resultingLowestSocPct: Number.NaN,
      text: 'the rig has no solar array to extend',
      params: {},
    };
  const change =
    (w: number): Change =>
    (base) => ({ ...base, solarScale: 1 + w / ratedW });
  const run = (w: number): WalkResult => atConfidence(s, change(w));
  const cap = ratedW * 10;
  const found = bisect((w) => holds(s, change(w)), ratedW, cap, 5);
  if (found === null)
    return {
      lever: 'solar',
      status: 'cannot-fix',
      amount: 0,
      unit: 'W',
      resultingLowestSocPct: run(cap).lowestSocPct,
      text: `even ${cap} W more solar does not hold the reserve (the shortfall falls at night or in shade)`,
      params: {},
    };
  const w = Math.ceil(found / 10) * 10;
  return {
    lever: 'solar',
    status: 'found',
    amount: w,
    unit: 'W',
    resultingLowestSocPct: run(w).lowestSocPct,
    text: `${w} W more solar on the same mounting (with matching controller capacity)`,
    params: { extraW: w },
  };
}

function generatorPlanAt(s: Search, startBelowPct: number): GeneratorPlan {
  const g = s.p.input.rig.generator;
  const ratedW = g?.ratedW ?? ASSUMED_GENERATOR_W;
  const fuelKind = g?.fuel ?? 'petrol';
  const stopAbove = g?.mode.kind === 'rule' ? g.mode.stopAboveSocPct : 90;
  return {
    kind: 'rule',
    startBelow: startBelowPct / 100,
    stopAbove: Math.min(100, Math.max(stopAbove, startBelowPct + 5)) / 100,
    ratedW,
    model: g?.fuelModel ?? defaultFuelModel(ratedW, fuelKind),
    fuelKind,
  };
}

function generatorLever(s: Search): HeadroomLever {
  const anyHours = s.p.input.trip.stops.some((st) => st.generatorHours !== null);
  if (!anyHours || !s.p.input.rig.shoreCharger) {
    return {
      lever: 'generator',
      status: 'not-applicable',
      amount: 0,
      unit: 'h',
      resultingLowestSocPct: Number.NaN,
      text: anyHours ? 'the rig has no charger for a generator to feed' : 'no stop allows a generator',
      params: {},
    };
  }
  // More margin in the start threshold means earlier, longer runs; search the threshold above the reserve.
  const change =
    (margin: number): Change =>
    (base) => ({ ...base, generator: generatorPlanAt(s, Math.min(100, s.reservePct + margin)) });
  const run = (margin: number): WalkResult => atConfidence(s, change(margin));
  const maxMargin = 100 - s.reservePct;
  const found = bisect((m) => holds(s, change(m)), Math.max(1, maxMargin / 4), maxMargin, 0.5);
  const assumed = !s.p.input.rig.generator;
  if (found === null)
    return {
      lever: 'generator',
      status: 'cannot-fix',
      amount: 0,
      unit: 'h',
      resultingLowestSocPct: run(maxMargin).lowestSocPct,
      text: 'running the generator through every allowed hour still does not hold the reserve',
      params: {},
    };
  const r = run(found);
  const hours = Math.ceil(r.generatorHours * 2) / 2;
  const startBelow = Math.round(s.reservePct + found);
  return {
    lever: 'generator',
    status: 'found',
    amount: hours,
    unit: 'h',
    resultingLowestSocPct: r.lowestSocPct,
    text: `${hours} h in all of ${assumed ? `a ${ASSUMED_GENERATOR_W} W portable generator` : 'generator'} inside the allowed hours, started below ${startBelow} %`,
    params: { hours, startBelowSocPct: startBelow, assumedGenerator: assumed },
  };
}

type Night = { stopIndex: number; dayIndex: number; steps: number[] };

/** Evening-to-morning nights (18:00–09:00 local) at stops that have no hookup. */
function candidateNights(p: Prepared): Night[] {
  const nights = new Map<string, Night>();
  for (let i = 0; i < p.n; i++) {
    const w = p.where[i] ?? -1;
    if (w < 0 || (p.hookupW[i] ?? 0) > 0) continue;
    const hour = (p.minuteOfDay[i] ?? 0) / 60;
    if (hour >= 9 && hour < 18) continue;
    const day = (p.dayIndex[i] ?? 0) - (hour < 9 ? 1 : 0);
    const key = `${w}:${day}`;
    const night = nights.get(key) ?? { stopIndex: w, dayIndex: day, steps: [] };
    night.steps.push(i);
    nights.set(key, night);
  }
  return [...nights.values()];
}

function firstBreach(r: WalkResult, reservePct: number): number {
  const i = r.socPct.findIndex((v) => v < reservePct - 1e-6);
  return i < 0 ? r.lowestIndex : i;
}

function hookupLever(s: Search, baseline: WalkResult): HeadroomLever {
  const nights = candidateNights(s.p);
  if (nights.length === 0)
    return {
      lever: 'hookup',
      status: 'not-applicable',
      amount: 0,
      unit: 'nights',
      resultingLowestSocPct: Number.NaN,
      text: 'every night already has a hookup',
      params: {},
    };
  // Nights just before the first breach help most; take them latest-first, then the later ones in order.
  const breach = firstBreach(baseline, s.reservePct);
  const startOf = (n: Night): number => n.steps[0] ?? 0;
  const before = nights.filter((n) => startOf(n) <= breach).sort((a, b) => startOf(b) - startOf(a));
  const after = nights.filter((n) => startOf(n) > breach).sort((a, b) => startOf(a) - startOf(b));
  const order = [...before, ...after];
  const supplyAt = (stopIndex: number) => hookupSupplyFor(s.p, stopIndex) ?? UNKNOWN_COUNTRY_HOOKUP;
  // Every year shares the plan's hookups: the nights are laid on them once per trial.
  const change = (k: number): Change => {
    const hookupW = Float64Array.from(s.bases[0]?.hookupW ?? s.p.hookupW);
    for (const night of order.slice(0, Math.ceil(k))) {
      const h = supplyAt(night.stopIndex);
      for (const i of night.steps) hookupW[i] = h.amps * h.volts;
    }
    return (base) => ({ ...base, hookupW });
  };
  const run = (k: number): WalkResult => atConfidence(s, change(k));
  const found = bisect((k) => holds(s, change(k)), 1, order.length, 1);
  if (found === null)
    return {
      lever: 'hookup',
      status: 'cannot-fix',
      amount: 0,
      unit: 'nights',
      resultingLowestSocPct: run(order.length).lowestSocPct,
      text: 'a hookup every night still does not hold the reserve',
      params: {},
    };
  const k = Math.ceil(found);
  const chosen = order.slice(0, k);
  const stops = [...new Set(chosen.map((n) => n.stopIndex + 1))].sort((a, b) => a - b);
  const h = supplyAt((stops[0] ?? 1) - 1);
  return {
    lever: 'hookup',
    status: 'found',
    amount: k,
    unit: 'nights',
    resultingLowestSocPct: run(k).lowestSocPct,
    text: `${k === 1 ? 'a hookup night' : `${k} hookup nights`} (${h.amps} A) at stop ${stops.join(', ')}`,
    params: { nights: k, stopNumbers: stops, amps: h.amps, volts: h.volts },
  };
}

function notNeeded(lever: HeadroomLever['lever'], unit: HeadroomLever['unit'], lowest: number): HeadroomLever {
  return {
    lever,
    status: 'not-needed',
    amount: 0,
    unit,
    resultingLowestSocPct: lowest,
    text: 'none needed: the plan holds the reserve',
    params: {},
  };
}

/** Validate and search. Invalid input throws a ZodError listing each bad field. */
export function findHeadroom(draft: EngineInputDraft): HeadroomResult {
  return findHeadroomParsed(engineInputSchema.parse(draft));
}

/**
 * The scenarios the search must hold in: one per recorded year (worst first) with how many must hold, else the one
 * planned sky (a forecast's where there is one).
 */
function searchBases(p: Prepared): { bases: Scenario[]; need: number; years: number } {
  const weather = p.input.weather;
  const choices = skyChoices(p.input.trip.stops);
  const skies = weather && weather.years.length > 0 ? recordYearSkies(p, weather, choices) : [];
  if (skies.length === 0) {
    const sky = forecastOnlySky(p, weather, choices);
    return { bases: [plannedScenario(p, solarSeries(p, 0, sky), sky?.ambientC)], need: 1, years: 0 };
  }
  const bases = skies.map((y) => plannedScenario(p, solarSeries(p, 0, y.sky), y.sky.ambientC));
  const lows = bases.map((b) => walk(p, b, null).lowestSocPct);
  const order = bases.map((_, i) => i).sort((a, b) => (lows[a] ?? 0) - (lows[b] ?? 0));
  return {
    bases: order.map((i) => bases[i] as Scenario),
    need: Math.ceil((HOLD_CONFIDENCE.held * bases.length) / HOLD_CONFIDENCE.of),
    years: bases.length,
  };
}

/** Search a validated input (no parsing): every trial below is a battery walk over one precomputed trip. */
export function findHeadroomParsed(input: EngineInput): HeadroomResult {
  const p = prepare(input);
  const { bases, need, years } = searchBases(p);
  const reservePct = reservePctOf(input);
  const s: Search = { p, bases, need, reservePct };
  const unchanged: Change = (base) => base;
  const baseline = atConfidence(s, unchanged);
  const baselineHeld = bases.filter((b) => ok(walk(p, b, null), reservePct)).length;
  const needed = baselineHeld < need;
  const levers = needed
    ? [batteryLever(s), solarLever(s), generatorLever(s), hookupLever(s, baseline)]
    : (
        [
          ['battery', 'Ah'],
          ['solar', 'W'],
          ['generator', 'h'],
          ['hookup', 'nights'],
        ] as const
      ).map(([l, u]) => notNeeded(l, u, baseline.lowestSocPct));
  return {
    reservePct,
    confidence: years > 0 ? { ...HOLD_CONFIDENCE, years, baselineHeld } : null,
    baselineLowestSocPct: baseline.lowestSocPct,
    baselineEnergyShortWh: baseline.energyShortWh,
    needed,
    levers,
  };
}
