// The battery walk: steps through the prepared hours in UTC and books every watt-hour so the balance closes:
//   solarUsed + vehicle + hookup + generator + short = acLoad + dcLoad + inverterLoss + chargerLoss + batteryLoss + Δstored
// Each step runs the same named stages: serve the AC load (hookup, generator, inverter), offer the charging sources
// (solar, vehicle, charger), cover the DC demand in merit order, then discharge or charge the battery. The physics
// lives in the model files; this file only orders it. Rule-driven or routine generators step in quarter hours so a
// mid-hour start is caught.
import type { FuelModel } from '../schemas/rig';
import { batteryModel, CHEMISTRY, type BatteryModel, type ChemistryPreset } from './battery';
import { CONTINUOUS_SHARE, defaultFuelModel, fuelUse } from './generator';
import { chargerDcW } from './hookup';
import { inverterDraw } from './inverter';
import { propaneKgFromHeatWh } from './fuel';
import { walkRestart } from './start-state';
import type { StepLoads } from './climate';
import { QUARTERS, type Prepared } from './prepare';
import { vehicleChargeW } from './vehicle-charging';

export const LEDGER_COLUMNS = [
  'solarAvailableWh',
  'solarUsedWh',
  'solarWastedWh',
  'acLoadWh',
  'dcLoadWh',
  'inverterLossWh',
  'chargerLossWh',
  'batteryLossWh',
  'hookupWh',
  'vehicleWh',
  'generatorWh',
  'generatorH',
  'generatorFuel',
  'propaneBurnedKg',
  'batteryFlowWh',
  'storedWh',
  'socPct',
  'energyShortWh',
  'propaneLeftKg',
  'coldBlocked',
] as const;
export type LedgerColumn = (typeof LEDGER_COLUMNS)[number];
export type LedgerColumns = Record<LedgerColumn, Float64Array>;

type FuelKind = 'propane' | 'petrol' | 'diesel';

export type GeneratorPlan =
  | { kind: 'none' }
  | { kind: 'rule'; startBelow: number; stopAbove: number; ratedW: number; model: FuelModel; fuelKind: FuelKind }
  | { kind: 'routine'; ratedW: number; model: FuelModel; fuelKind: FuelKind };

export type Scenario = {
  solarW: Float64Array;
  solarScale: number;
  capacityWh: number;
  hookupW: Float64Array;
  generator: GeneratorPlan;
  /** The loads, heating and cooling under this scenario's sky. */
  loads: StepLoads;
};

export type WalkResult = {
  socPct: Float64Array;
  lowestSocPct: number;
  lowestIndex: number;
  energyShortWh: number;
  generatorHours: number;
};

export function generatorPlanFor(p: Prepared): GeneratorPlan {
  const g = p.input.rig.generator;
  if (!g || g.mode.kind === 'off') return { kind: 'none' };
  const model = g.fuelModel ?? defaultFuelModel(g.ratedW, g.fuel);
  const base = { ratedW: g.ratedW, model, fuelKind: g.fuel };
  if (g.mode.kind === 'routine') return { kind: 'routine', ...base };
  return { kind: 'rule', startBelow: g.mode.startBelowSocPct / 100, stopAbove: g.mode.stopAboveSocPct / 100, ...base };
}

export function newLedger(n: number): LedgerColumns {
  // One ArrayBuffer for all the columns (one allocation, not twenty) and an object literal with a fixed shape.
  const buf = new ArrayBuffer(n * 8 * LEDGER_COLUMNS.length);
  let k = 0;
  const col = (): Float64Array => new Float64Array(buf, 8 * n * k++, n);
  return {
    solarAvailableWh: col(),
    solarUsedWh: col(),
    solarWastedWh: col(),
    acLoadWh: col(),
    dcLoadWh: col(),
    inverterLossWh: col(),
    chargerLossWh: col(),
    batteryLossWh: col(),
    hookupWh: col(),
    vehicleWh: col(),
    generatorWh: col(),
    generatorH: col(),
    generatorFuel: col(),
    propaneBurnedKg: col(),
    batteryFlowWh: col(),
    storedWh: col(),
    socPct: col(),
    energyShortWh: col(),
    propaneLeftKg: col(),
    coldBlocked: col(),
  };
}

/** The rig's fixed figures for one walk. */
type Rig = {
  p: Prepared;
  s: Scenario;
  chem: ChemistryPreset;
  battery: BatteryModel;
  capacityWh: number;
  chargeV: number;
  hasInverter: boolean;
  /** DC the inverter draws for an AC output while on for a share of the step. */
  inverterDraw: (acW: number, onShare: number) => number;
  inverterAlwaysOn: boolean;
  chargerAmps: number;
  chargerEfficiency: number;
  vehicleW: number;
  gen: GeneratorPlan;
  genCapW: number;
  /** Fuel burned by the generator for a run of some hours delivering some Wh, in the fuel's unit. */
  fuelUse: (hours: number, outWh: number) => number;
};

/**
 * One step's flows. The `…W` fields are the stage results of the (sub-)step being run; the Wh fields add up over
 * the quarters of a step and are what the ledger books. One object reused for the whole walk: no allocation.
 */
type Flows = {
  acW: number;
  dcW: number;
  hookAcW: number;
  genAcW: number;
  invAcW: number;
  invDcW: number;
  hookSpareW: number;
  chargerW: number;
  vehicleW: number;
  solarToLoadW: number;
  vehicleToLoadW: number;
  chargerToLoadW: number;
  demandW: number;
  solarToBatWh: number;
  vehicleToBatWh: number;
  chargerToBatWh: number;
  /** Energy the (sub-)step could not supply: AC loads with no inverter, and what an empty battery cannot give. */
  shortWh: number;
  // booked per step
  solarUsed: number;
  vehicle: number;
  hookup: number;
  generator: number;
  acLoad: number;
  dcLoad: number;
  invLoss: number;
  chgLoss: number;
  batLoss: number;
  short: number;
  flow: number;
  fuel: number;
  cold: number;
};

function newFlows(): Flows {
  return {
    acW: 0,
    dcW: 0,
    hookAcW: 0,
    genAcW: 0,
    invAcW: 0,
    invDcW: 0,
    hookSpareW: 0,
    chargerW: 0,
    vehicleW: 0,
    solarToLoadW: 0,
    vehicleToLoadW: 0,
    chargerToLoadW: 0,
    demandW: 0,
    solarToBatWh: 0,
    vehicleToBatWh: 0,
    chargerToBatWh: 0,
    shortWh: 0,
    solarUsed: 0,
    vehicle: 0,
    hookup: 0,
    generator: 0,
    acLoad: 0,
    dcLoad: 0,
    invLoss: 0,
    chgLoss: 0,
    batLoss: 0,
    short: 0,
    flow: 0,
    fuel: 0,
    cold: 0,
  };
}

function startStep(f: Flows): void {
  f.solarUsed = f.vehicle = f.hookup = f.generator = f.acLoad = f.dcLoad = 0;
  f.invLoss = f.chgLoss = f.batLoss = f.short = f.flow = f.fuel = f.cold = 0;
}

function rigOf(p: Prepared, s: Scenario): Rig {
  const rig = p.input.rig;
  const chem = CHEMISTRY[rig.battery.chemistry];
  const chargeV = rig.battery.nominalV * chem.chargeVoltageRatio;
  const gen = s.generator;
  return {
    p,
    s,
    chem,
    battery: batteryModel(chem, s.capacityWh, rig.battery.nominalV, s.loads),
    capacityWh: s.capacityWh,
    chargeV,
    hasInverter: rig.inverter !== null,
    inverterDraw: rig.inverter ? inverterDraw(rig.inverter) : () => 0,
    inverterAlwaysOn: rig.inverter?.mode === 'always',
    chargerAmps: rig.shoreCharger?.amps ?? 0,
    chargerEfficiency: rig.shoreCharger?.efficiency ?? 1,
    vehicleW: rig.vehicleCharger ? vehicleChargeW(rig.vehicleCharger.kind, rig.vehicleCharger.amps, chargeV) : 0,
    gen,
    genCapW: gen.kind !== 'none' ? gen.ratedW * CONTINUOUS_SHARE : 0,
    fuelUse: gen.kind !== 'none' ? fuelUse(gen.model, gen.fuelKind) : () => 0,
  };
}

/** Stage 1: the AC load goes to the hookup first, then a running generator, and the rest through the inverter
 * (its part-load curve plus idle draw while on). */
function serveAc(r: Rig, i: number, genOn: boolean, f: Flows): void {
  const p = r.p;
  const hookW = r.s.hookupW[i] ?? 0;
  const genCapW = genOn ? r.genCapW : 0;
  f.hookAcW = Math.min(f.acW, hookW);
  f.genAcW = Math.min(f.acW - f.hookAcW, genCapW);
  f.invAcW = f.acW - f.hookAcW - f.genAcW;
  f.hookSpareW = hookW - f.hookAcW;
  // On for the whole step when AC loads use it or it is always on; otherwise for its set hours, if any.
  const onShare = f.invAcW > 0 || r.inverterAlwaysOn || (p.acStandbyOn[i] ?? 0) > 0 ? 1 : (p.inverterOnShare[i] ?? 0);
  f.invDcW = r.inverterDraw(f.invAcW, onShare);
  // Without an inverter nothing can run AC loads off the battery: they go unserved.
  f.chargerW =
    r.chargerAmps > 0
      ? chargerDcW(f.hookSpareW + (genCapW - f.genAcW), r.chargerAmps, r.chargeV, r.chargerEfficiency)
      : 0;
}

/** Stage 2: solar, then the vehicle, then the charger cover the DC demand (DC loads and the inverter). */
function coverDemand(r: Rig, i: number, solarW: number, f: Flows): void {
  f.vehicleW = r.vehicleW * (r.p.onRoadShare[i] ?? 0);
  let demand = f.dcW + f.invDcW;
  f.solarToLoadW = Math.min(solarW, demand);
  demand -= f.solarToLoadW;
  f.vehicleToLoadW = Math.min(f.vehicleW, demand);
  demand -= f.vehicleToLoadW;
  f.chargerToLoadW = Math.min(f.chargerW, demand);
  demand -= f.chargerToLoadW;
  f.demandW = demand;
}

/**
 * Stage 3a: the battery gives what is left of the demand (Peukert on each load's running current) down to what the
 * cold holds back, or runs short. Returns the stored energy.
 */
function discharge(r: Rig, i: number, dtH: number, stored: number, f: Flows): number {
  const need = f.demandW * dtH;
  const removal = r.battery.removalWh(need, i, f.dcW, f.invDcW);
  const floor = r.battery.coldFloorWh(i);
  const available = Math.max(0, stored - floor);
  if (removal <= available) {
    f.batLoss += removal - need;
    f.flow -= need;
    return stored - removal;
  }
  const delivered = need * (available / removal);
  f.shortWh += need - delivered;
  f.batLoss += available - delivered;
  f.flow -= delivered;
  return stored - available;
}

/** Stage 3b: what the sources have left charges the battery, up to what it accepts. Returns the stored energy. */
function charge(r: Rig, i: number, dtH: number, stored: number, solarW: number, f: Flows): number {
  const cold = (r.s.loads.battery.chargeBlocked[i] ?? 0) === 1;
  const acceptWh = cold ? 0 : r.battery.acceptWh(stored, dtH);
  let room = acceptWh;
  f.solarToBatWh = Math.min((solarW - f.solarToLoadW) * dtH, room);
  room -= f.solarToBatWh;
  f.vehicleToBatWh = Math.min((f.vehicleW - f.vehicleToLoadW) * dtH, room);
  room -= f.vehicleToBatWh;
  f.chargerToBatWh = Math.min((f.chargerW - f.chargerToLoadW) * dtH, room);
  const flow = f.solarToBatWh + f.vehicleToBatWh + f.chargerToBatWh;
  const loss = flow * (1 - r.chem.chargeEfficiency);
  f.flow += flow;
  f.batLoss += loss;
  if (cold && solarW + f.vehicleW + f.chargerW > f.solarToLoadW + f.vehicleToLoadW + f.chargerToLoadW) f.cold = 1;
  return Math.min(r.capacityWh, stored + flow - loss);
}

/** Stage 4: book the (sub-)step's flows, including what the charger took from the hookup and the generator. */
function book(r: Rig, dtH: number, genOn: boolean, f: Flows): void {
  const chargerDcWh = f.chargerToLoadW * dtH + f.chargerToBatWh;
  const chargerAcWh = chargerDcWh / r.chargerEfficiency;
  const chargerFromHookWh = Math.min(chargerAcWh, f.hookSpareW * dtH);
  const genOutWh = f.genAcW * dtH + (chargerAcWh - chargerFromHookWh);
  f.solarUsed += f.solarToLoadW * dtH + f.solarToBatWh;
  f.vehicle += f.vehicleToLoadW * dtH + f.vehicleToBatWh;
  f.hookup += f.hookAcW * dtH + chargerFromHookWh;
  f.generator += genOutWh;
  f.acLoad += f.acW * dtH;
  f.dcLoad += f.dcW * dtH;
  f.invLoss += f.invDcW > 0 ? (f.invDcW - f.invAcW) * dtH : 0;
  f.chgLoss += chargerAcWh - chargerDcWh;
  f.short += f.shortWh;
  if (genOn) f.fuel += r.fuelUse(dtH, genOutWh);
}

/** One step (or quarter step) of dtH hours with the generator on or off; returns the new stored energy. */
function runStep(r: Rig, i: number, dtH: number, stored: number, genOn: boolean, solarW: number, f: Flows): number {
  const stepH = r.p.stepH[i] ?? 1;
  f.acW = (r.s.loads.acWh[i] ?? 0) / stepH;
  f.dcW = (r.s.loads.dcWh[i] ?? 0) / stepH;
  f.solarToBatWh = f.vehicleToBatWh = f.chargerToBatWh = 0;
  serveAc(r, i, genOn, f);
  f.shortWh = r.hasInverter ? 0 : f.invAcW * dtH;
  coverDemand(r, i, solarW, f);
  const next = f.demandW > 0 ? discharge(r, i, dtH, stored, f) : charge(r, i, dtH, stored, solarW, f);
  book(r, dtH, genOn, f);
  return next;
}

function decideGenerator(gen: GeneratorPlan, allowed: boolean, running: boolean, soc: number): boolean {
  if (!allowed) return false;
  if (gen.kind === 'routine') return true;
  if (gen.kind !== 'rule') return false;
  return running ? soc < gen.stopAbove : soc < gen.startBelow;
}

function generatorMask(r: Rig, i: number): number {
  if (r.gen.kind === 'rule') return r.p.genAllowed[i] ?? 0;
  if (r.gen.kind === 'routine') return r.p.genRoutine[i] ?? 0;
  return 0;
}

function writeLedger(l: LedgerColumns, i: number, f: Flows, solarAvailWh: number, genH: number, more: Extra): void {
  l.solarAvailableWh[i] = solarAvailWh;
  l.solarUsedWh[i] = f.solarUsed;
  l.solarWastedWh[i] = Math.max(0, solarAvailWh - f.solarUsed);
  l.acLoadWh[i] = f.acLoad;
  l.dcLoadWh[i] = f.dcLoad;
  l.inverterLossWh[i] = f.invLoss;
  l.chargerLossWh[i] = f.chgLoss;
  l.batteryLossWh[i] = f.batLoss;
  l.hookupWh[i] = f.hookup;
  l.vehicleWh[i] = f.vehicle;
  l.generatorWh[i] = f.generator;
  l.generatorH[i] = genH;
  l.generatorFuel[i] = f.fuel;
  l.propaneBurnedKg[i] = more.propaneKg;
  l.batteryFlowWh[i] = f.flow;
  l.storedWh[i] = more.stored;
  l.socPct[i] = (more.stored / more.capacityWh) * 100;
  l.energyShortWh[i] = f.short;
  l.propaneLeftKg[i] = more.propaneLeft;
  l.coldBlocked[i] = f.cold;
}

type Extra = { propaneKg: number; stored: number; capacityWh: number; propaneLeft: number };

export function walk(p: Prepared, s: Scenario, ledger: LedgerColumns | null): WalkResult {
  const r = rigOf(p, s);
  const rig = p.input.rig;
  const f = newFlows();
  const extra: Extra = { propaneKg: 0, stored: 0, capacityWh: r.capacityWh, propaneLeft: 0 };
  const socPct = new Float64Array(p.n);
  let stored = (rig.battery.initialSocPct / 100) * r.capacityWh;
  let propane = rig.propaneTanks.reduce((sum, t) => sum + (t.propaneKg * t.fillPct) / 100, 0);
  let lowest = stored / r.capacityWh;
  let lowestIndex = 0;
  let shortWh = 0;
  let genHours = 0;
  let genRunning = false;
  const restart = walkRestart(p);
  for (let i = 0; i < p.n; i++) {
    if (i === restart?.index) {
      // Everything from here is measured from the reading: what ran short or burned before it is behind us.
      stored = (restart.socPct / 100) * r.capacityWh;
      if (restart.propaneKg !== null) propane = restart.propaneKg;
      lowest = stored / r.capacityWh;
      lowestIndex = i;
      shortWh = 0;
      genHours = 0;
      genRunning = false;
    }
    startStep(f);
    const dtH = p.stepH[i] ?? 1;
    const solarW = (s.solarW[i] ?? 0) * s.solarScale;
    const mask = generatorMask(r, i);
    let genH = 0;
    if (mask === 0) {
      genRunning = false;
      stored = runStep(r, i, dtH, stored, false, solarW, f);
    } else {
      const q = dtH / QUARTERS;
      for (let k = 0; k < QUARTERS; k++) {
        genRunning = decideGenerator(r.gen, (mask & (1 << k)) !== 0, genRunning, stored / r.capacityWh);
        if (genRunning) genH += q;
        stored = runStep(r, i, q, stored, genRunning, solarW, f);
        if (stored / r.capacityWh < lowest) {
          lowest = stored / r.capacityWh;
          lowestIndex = i;
        }
      }
    }
    if (stored / r.capacityWh < lowest) {
      lowest = stored / r.capacityWh;
      lowestIndex = i;
    }
    const heatKg = propaneKgFromHeatWh(s.loads.propaneHeatWh[i] ?? 0);
    const genKg = r.gen.kind !== 'none' && r.gen.fuelKind === 'propane' ? f.fuel : 0;
    propane = Math.max(0, propane - heatKg - genKg);
    socPct[i] = (stored / r.capacityWh) * 100;
    shortWh += f.short;
    genHours += genH;
    if (ledger) {
      extra.propaneKg = heatKg + genKg;
      extra.stored = stored;
      extra.propaneLeft = propane;
      writeLedger(ledger, i, f, solarW * dtH, genH, extra);
    }
  }
  return { socPct, lowestSocPct: lowest * 100, lowestIndex, energyShortWh: shortWh, generatorHours: genHours };
}
