// simulateTrip: validate the input, precompute the trip once, walk the battery hour by hour under the planned
// sky (full ledger) and, together, under one sky level better and one worse (state of charge only). With recorded
// years, the trip is walked once per year (record-years.ts) and the planned run is the median year. Flags come with
// their causes but no fixes: checking fixes walks the trip dozens of times more, so it is its own step
// (check-fixes.ts), asked for only when someone looks at the flags.
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '../schemas/engine-input';
import { CHEMISTRY } from './battery';
import { climateLoads, type LoadsLike, type StepLoads } from './climate';
import { localIso, utcIso, whereAt } from './describe';
import { buildFlags, isShortfall } from './flags';
import { fuelUnit } from './fuel';
import { prepare, type Prepared } from './prepare';
import type { BandRun, DaySheet, Flag, Headline, LedgerRow, SimulationResult } from './result-types';
import { runRecordYears, type YearRuns } from './record-years';
import { effectiveSources, forecastOnlySky, skyChoices, type StepSky } from './recorded-sky';
import { solarSeries, type SolarSeries } from './solar';
import { localLabel, utcIsoString } from './time-grid';
import { generatorPlanFor, newLedger, walk, type LedgerColumns, type Scenario, type WalkResult } from './walk';

export function reservePctOf(input: EngineInput): number {
  const b = input.rig.battery;
  return b.reservePct ?? 100 - CHEMISTRY[b.chemistry].recommendedDodPct;
}

export function capacityWhOf(input: EngineInput): number {
  return input.rig.battery.capacityAh * input.rig.battery.nominalV;
}

/** The walk's scenario under a solar series; `like`: loads under another sky to copy where the sky is the same. */
export function plannedScenario(p: Prepared, solar: SolarSeries, ambientC = p.ambientC, like?: LoadsLike): Scenario {
  return {
    solarW: solar.availableW,
    solarScale: 1,
    capacityWh: capacityWhOf(p.input),
    hookupW: p.hookupW,
    generator: generatorPlanFor(p),
    loads: climateLoads(p, solar.cabinSolarW, ambientC, like),
  };
}

function ledgerRows(
  p: Prepared,
  l: LedgerColumns,
  solar: SolarSeries,
  loads: StepLoads,
  ambientC: Float64Array,
): LedgerRow[] {
  const rows: LedgerRow[] = new Array<LedgerRow>(p.n);
  // Columns read into locals once: the loop builds one object per hour and nothing else.
  const { stepH, sunAltMid, startMs, offsetMin } = p;
  const poa = solar.poaWm2;
  const {
    solarAvailableWh,
    solarUsedWh,
    solarWastedWh,
    acLoadWh,
    dcLoadWh,
    inverterLossWh,
    chargerLossWh,
    batteryLossWh,
    hookupWh,
    vehicleWh,
    generatorWh,
    generatorH,
    generatorFuel,
    propaneBurnedKg,
    batteryFlowWh,
    storedWh,
    socPct,
    energyShortWh,
    propaneLeftKg,
  } = l;
  for (let i = 0; i < p.n; i++) {
    const t = startMs[i] ?? 0;
    rows[i] = {
      index: i,
      utc: utcIsoString(t),
      local: localLabel(t, offsetMin[i] ?? 0),
      where: whereAt(p, i),
      stepH: stepH[i] ?? 1,
      sunAltitudeDeg: sunAltMid[i] ?? 0,
      irradianceWm2: poa[i] ?? 0,
      ambientC: ambientC[i] ?? 0,
      cabinC: loads.cabinC[i] ?? 0,
      batteryC: loads.battery.batteryC[i] ?? 0,
      batteryCapacityPct: (loads.battery.capacityShare[i] ?? 1) * 100,
      solarAvailableWh: solarAvailableWh[i] ?? 0,
      solarUsedWh: solarUsedWh[i] ?? 0,
      solarWastedWh: solarWastedWh[i] ?? 0,
      acLoadWh: acLoadWh[i] ?? 0,
      dcLoadWh: dcLoadWh[i] ?? 0,
      inverterLossWh: inverterLossWh[i] ?? 0,
      chargerLossWh: chargerLossWh[i] ?? 0,
      batteryLossWh: batteryLossWh[i] ?? 0,
      hookupWh: hookupWh[i] ?? 0,
      vehicleWh: vehicleWh[i] ?? 0,
      generatorWh: generatorWh[i] ?? 0,
      generatorH: generatorH[i] ?? 0,
      generatorFuel: generatorFuel[i] ?? 0,
      propaneBurnedKg: propaneBurnedKg[i] ?? 0,
      batteryFlowWh: batteryFlowWh[i] ?? 0,
      storedWh: storedWh[i] ?? 0,
      socPct: socPct[i] ?? 0,
      energyShortWh: energyShortWh[i] ?? 0,
      propaneLeftKg: propaneLeftKg[i] ?? 0,
    };
  }
  return rows;
}

function emptyDay(p: Prepared, i: number): DaySheet {
  return {
    dayIndex: p.dayIndex[i] ?? 0,
    date: localLabel(p.startMs[i] ?? 0, p.offsetMin[i] ?? 0).slice(0, 10),
    stopIndexes: [],
    travel: p.travelDay[i] === 1,
    harvestWh: 0,
    solarAvailableWh: 0,
    useWh: 0,
    sourcesWh: 0,
    lossesWh: 0,
    netWh: 0,
    hookupWh: 0,
    vehicleWh: 0,
    generatorWh: 0,
    generatorHours: 0,
    generatorFuel: 0,
    propaneUsedKg: 0,
    lowestSocPct: 100,
    endSocPct: 0,
    energyShortWh: 0,
  };
}

function daySheets(p: Prepared, l: LedgerColumns): DaySheet[] {
  const days: DaySheet[] = [];
  let d: DaySheet | undefined;
  for (let i = 0; i < p.n; i++) {
    if (!d || d.dayIndex !== p.dayIndex[i]) {
      d = emptyDay(p, i);
      days.push(d);
    }
    const w = p.where[i] ?? -1;
    if (w >= 0 && !d.stopIndexes.includes(w)) d.stopIndexes.push(w);
    d.harvestWh += l.solarUsedWh[i] ?? 0;
    d.solarAvailableWh += l.solarAvailableWh[i] ?? 0;
    d.useWh += (l.acLoadWh[i] ?? 0) + (l.dcLoadWh[i] ?? 0);
    d.hookupWh += l.hookupWh[i] ?? 0;
    d.vehicleWh += l.vehicleWh[i] ?? 0;
    d.generatorWh += l.generatorWh[i] ?? 0;
    d.generatorHours += l.generatorH[i] ?? 0;
    d.generatorFuel += l.generatorFuel[i] ?? 0;
    d.propaneUsedKg += l.propaneBurnedKg[i] ?? 0;
    d.lowestSocPct = Math.min(d.lowestSocPct, l.socPct[i] ?? 0);
    d.endSocPct = l.socPct[i] ?? 0;
    d.energyShortWh += l.energyShortWh[i] ?? 0;
    d.lossesWh += (l.inverterLossWh[i] ?? 0) + (l.chargerLossWh[i] ?? 0) + (l.batteryLossWh[i] ?? 0);
  }
  for (const day of days) {
    day.sourcesWh = day.harvestWh + day.hookupWh + day.vehicleWh + day.generatorWh;
    day.netWh = day.sourcesWh - day.useWh - day.lossesWh;
  }
  return days;
}

function sum(a: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] ?? 0;
  return s;
}

function headline(p: Prepared, l: LedgerColumns, r: WalkResult): Headline {
  const input = p.input;
  const capacityWh = capacityWhOf(input);
  const reservePct = reservePctOf(input);
  const solarUsedWh = sum(l.solarUsedWh);
  const hookupWh = sum(l.hookupWh);
  const vehicleWh = sum(l.vehicleWh);
  const generatorWh = sum(l.generatorWh);
  const sources = solarUsedWh + hookupWh + vehicleWh + generatorWh;
  const totalH = sum(p.stepH);
  const drawWh = sum(l.acLoadWh) + sum(l.dcLoadWh) + sum(l.inverterLossWh);
  const dailyDraw = totalH > 0 ? (drawWh / totalH) * 24 : 0;
  const gen = input.rig.generator;
  const propaneStartKg = input.rig.propaneTanks.reduce((s, t) => s + (t.propaneKg * t.fillPct) / 100, 0);
  // A lowest at the very start (nothing ever drew the battery down) is reported at the first step.
  const low = r.lowestIndex;
  return {
    capacityWh,
    reservePct,
    lowestSocPct: r.lowestSocPct,
    lowestAtUtc: utcIso(p, low),
    lowestAtLocal: localIso(p, low),
    lowestWhere: whereAt(p, low),
    energyShortWh: r.energyShortWh,
    daysOfAutonomy: dailyDraw > 0 ? (capacityWh * (1 - reservePct / 100)) / dailyDraw : Number.POSITIVE_INFINITY,
    solarFraction: sources > 0 ? solarUsedWh / sources : 0,
    solarUsedWh,
    solarWastedWh: sum(l.solarWastedWh),
    hookupWh,
    vehicleWh,
    generatorHours: r.generatorHours,
    generatorFuel: gen ? { fuel: gen.fuel, amount: sum(l.generatorFuel), unit: fuelUnit(gen.fuel) } : null,
    propaneStartKg,
    propaneLeftKg: l.propaneLeftKg[p.n - 1] ?? propaneStartKg,
  };
}

function bandRun(p: Prepared, shift: -1 | 1, planned: LoadsLike): BandRun {
  const r = walk(p, plannedScenario(p, solarSeries(p, shift), p.ambientC, planned), null);
  const socPct = new Array<number>(p.n);
  for (let i = 0; i < p.n; i++) socPct[i] = r.socPct[i] ?? 0;
  return { skyShift: shift, socPct, lowestSocPct: r.lowestSocPct };
}

/** The planned run's scenario under a sky: the preset's when there is no recorded or forecast one. */
function scenarioUnder(p: Prepared, sky: StepSky | undefined): { solar: SolarSeries; scenario: Scenario } {
  const solar = solarSeries(p, 0, sky);
  return { solar, scenario: plannedScenario(p, solar, sky?.ambientC) };
}

/** One recorded year's run: the solar series and scenario it walked, and the walk's result. */
type YearRunBuilt = { solar: SolarSeries; scenario: Scenario; result: WalkResult };

/** The planned run of a trip and what flags and fixes read of it: the walk under the planned sky, with its ledger. */
export type PlannedRun = {
  p: Prepared;
  solar: SolarSeries;
  planned: Scenario;
  l: LedgerColumns;
  r: WalkResult;
  sky: StepSky | undefined;
  years: YearRuns<YearRunBuilt> | undefined;
  sources: ReturnType<typeof effectiveSources>;
  capacityWh: number;
  reservePct: number;
  flags: Flag[];
};

/** Prepare the trip, run its recorded years (if any), walk the planned run and find its flags (without fixes). */
export function planTrip(input: EngineInput): PlannedRun {
  const p = prepare(input);
  const weather = input.weather;
  const choices = skyChoices(input.trip.stops);
  const sources = effectiveSources(weather, choices);
  const reservePct = reservePctOf(input);
  // With a record, the trip runs once per recorded year and the planned run is the median year's, reused as built.
  const years =
    weather && weather.years.length > 0
      ? runRecordYears(p, weather, choices, reservePct, (sky): YearRunBuilt => {
          const under = scenarioUnder(p, sky);
          return { ...under, result: walk(p, under.scenario, null) };
        })
      : undefined;
  const forecastOnly = years ? undefined : forecastOnlySky(p, weather, choices);
  const sky = years?.median.sky ?? forecastOnly;
  const { solar, scenario: planned } = years?.median.run ?? scenarioUnder(p, sky);
  const l = newLedger(p.n);
  const r = walk(p, planned, l);
  const capacityWh = capacityWhOf(input);
  const flags = buildFlags({ p, l, loads: planned.loads, capacityWh, reservePct });
  return { p, solar, planned, l, r, sky, years, sources, capacityWh, reservePct, flags };
}

/** Simulate a validated input (no parsing); exposed for callers that already hold an EngineInput. */
export function simulateParsed(input: EngineInput): SimulationResult {
  const { p, solar, planned, l, r, sky, years, sources, flags } = planTrip(input);
  // The headline's energy short is the flags' own figures added up, so the page shows one number for one thing.
  const energyShortWh = flags.reduce((s, f) => (isShortfall(f) ? s + f.energyShortWh : s), 0);
  // The band's walks run before the ledger rows are built: the rows are the result's largest part, and a garbage
  // collection during the walks would have to copy every one of them.
  const like = { cabinSolarW: solar.cabinSolarW, ambientC: sky?.ambientC ?? p.ambientC, loads: planned.loads };
  const band = input.options.skyBand && !years ? { better: bandRun(p, -1, like), worse: bandRun(p, 1, like) } : null;
  return {
    ledger: ledgerRows(p, l, solar, planned.loads, sky?.ambientC ?? p.ambientC),
    days: daySheets(p, l),
    headline: { ...headline(p, l, r), energyShortWh },
    flags,
    band,
    chance: years?.chance ?? null,
    socBand: years?.socBand ?? null,
    skies: { sources, assumedStops: sources.filter((s) => s === 'preset').length },
  };
}

/** Validate and simulate. Invalid input throws a ZodError listing each bad field. */
export function simulateTrip(input: EngineInputDraft): SimulationResult {
  return simulateParsed(engineInputSchema.parse(input));
}
