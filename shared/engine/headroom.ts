// Headroom finder: the smallest extra battery, extra solar, generator time inside the allowed hours, or number
// of hookup nights that keeps the lowest charge at or above the reserve (and never runs the battery empty).
// Each lever is a monotone search (bisection) over battery walks that reuse one precomputed trip.
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '../schemas/engine-input';
import { defaultFuelModel } from './generator';
import { ASSUMED_GENERATOR_W, hookupSupplyFor, UNKNOWN_COUNTRY_HOOKUP } from './fixes';
import { prepare, type Prepared } from './prepare';
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

export type HeadroomResult = {
  reservePct: number;
  baselineLowestSocPct: number;
  baselineEnergyShortWh: number;
  needed: boolean;
  levers: HeadroomLever[];
};

type Search = { p: Prepared; base: Scenario; reservePct: number };

const ok = (r: WalkResult, reservePct: number): boolean =>
  r.lowestSocPct >= reservePct - 1e-6 && r.energyShortWh <= 1e-6;

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
  const baseWh = s.base.capacityWh;
  const run = (ah: number): WalkResult => walk(s.p, { ...s.base, capacityWh: baseWh + ah * nominalV }, null);
  const found = bisect((ah) => ok(run(ah), s.reservePct), baseWh / nominalV, (16 * baseWh) / nominalV, 1);
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
  const run = (w: number): WalkResult => walk(s.p, { ...s.base, solarScale: 1 + w / ratedW }, null);
  const cap = ratedW * 10;
  const found = bisect((w) => ok(run(w), s.reservePct), ratedW, cap, 5);
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
  const run = (margin: number): WalkResult =>
    walk(s.p, { ...s.base, generator: generatorPlanAt(s, Math.min(100, s.reservePct + margin)) }, null);
  const maxMargin = 100 - s.reservePct;
  const found = bisect((m) => ok(run(m), s.reservePct), Math.max(1, maxMargin / 4), maxMargin, 0.5);
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
  const run = (k: number): WalkResult => {
    const hookupW = Float64Array.from(s.base.hookupW);
    for (const night of order.slice(0, Math.ceil(k))) {
      const h = supplyAt(night.stopIndex);
      for (const i of night.steps) hookupW[i] = h.amps * h.volts;
    }
    return walk(s.p, { ...s.base, hookupW }, null);
  };
  const found = bisect((k) => ok(run(k), s.reservePct), 1, order.length, 1);
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

/** Search a validated input (no parsing): every trial below is a battery walk over one precomputed trip. */
export function findHeadroomParsed(input: EngineInput): HeadroomResult {
  const p = prepare(input);
  const base = plannedScenario(p, solarSeries(p, 0));
  const reservePct = reservePctOf(input);
  const baseline = walk(p, base, null);
  const s: Search = { p, base, reservePct };
  const needed = !ok(baseline, reservePct);
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
    baselineLowestSocPct: baseline.lowestSocPct,
    baselineEnergyShortWh: baseline.energyShortWh,
    needed,
    levers,
  };
}
