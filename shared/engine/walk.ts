// The battery walk: steps through the prepared hours in UTC, covering AC loads from hookup, generator or
// inverter, DC loads from solar, vehicle, charger or battery, and books every watt-hour so the balance closes:
//   solarUsed + vehicle + hookup + generator + short = acLoad + dcLoad + inverterLoss + chargerLoss + batteryLoss + Δstored
// Rule-driven or routine generators step in quarter hours so a mid-hour start is caught.
import type { FuelModel } from '../schemas/rig';
import { CHEMISTRY, type ChemistryPreset } from './battery';
import { CONTINUOUS_SHARE, defaultFuelModel } from './generator';
import { kwhPerFuelUnit, PROPANE_KWH_PER_KG } from './fuel';
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

export type GeneratorPlan =
  | { kind: 'none' }
  | {
      kind: 'rule';
      startBelow: number;
      stopAbove: number;
      ratedW: number;
      model: FuelModel;
      propane: boolean;
      fuelKind: 'propane' | 'petrol' | 'diesel';
    }
  | { kind: 'routine'; ratedW: number; model: FuelModel; propane: boolean; fuelKind: 'propane' | 'petrol' | 'diesel' };

export type Scenario = {
  solarW: Float64Array;
  solarScale: number;
  capacityWh: number;
  hookupW: Float64Array;
  generator: GeneratorPlan;
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
  const model = g.fuelModel ?? defaultFuelModel(g.ratedW);
  const base = { ratedW: g.ratedW, model, propane: g.fuel === 'propane', fuelKind: g.fuel };
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

/** Mutable per-step flows, reused across steps to keep the loop free of allocations. */
type Flow = {
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

function zeroFlow(f: Flow): void {
  f.solarUsed = f.vehicle = f.hookup = f.generator = f.acLoad = f.dcLoad = 0;
  f.invLoss = f.chgLoss = f.batLoss = f.short = f.flow = f.fuel = f.cold = 0;
}

/** Acceptance terms of acceptanceLimitShare (battery.ts) for one step length, computed once per length. */
type Acceptance = { dtH: number; rate: number; taperGain: number; tail: number };

type Ctx = {
  p: Prepared;
  chem: ChemistryPreset;
  cap: number;
  chargeV: number;
  nominalV: number;
  capacityAh: number;
  invEff: number;
  invIdle: number;
  invAlways: boolean;
  hasInverter: boolean;
  chgAmps: number;
  chgEff: number;
  vehW: number;
  heated: boolean;
  gen: GeneratorPlan;
  // Constants of the helpers the step inlines (peukertFactor, acceptanceLimitShare, chargerDcW, generatorFuel),
  // each computed by the same expression the helper uses, so the arithmetic per step is unchanged.
  i20: number;
  peukertExp: number;
  taperStart: number;
  chgCapW: number;
  genCapW: number;
  fuelPerKwh: number;
  idleFuelKwhPerH: number;
  fuelKwhPerKwhOut: number;
  full: Acceptance;
  quarter: Acceptance;
  other: Acceptance;
  /** The last Peukert current and factor: a step's quarters draw the same current, so the power is taken once. */
  lastCurrentA: number;
  lastPeukert: number;
};

function acceptance(chem: ChemistryPreset, dtH: number): Acceptance {
  const rate = chem.maxChargeC * dtH * chem.chargeEfficiency;
  const k = chem.maxChargeC / (1 - chem.taperStartSoc);
  const tail = 1 - Math.exp(-k * dtH);
  return { dtH, rate, taperGain: (1 - chem.taperStartSoc) * tail, tail };
}

function acceptanceFor(c: Ctx, dtH: number): Acceptance {
  if (dtH === c.full.dtH) return c.full;
  if (dtH === c.quarter.dtH) return c.quarter;
  if (dtH !== c.other.dtH) c.other = acceptance(c.chem, dtH);
  return c.other;
}

/** One step of dtH hours with the generator on or off; returns the new stored energy, books flows into f. */
function step(
  c: Ctx,
  i: number,
  dtH: number,
  stored: number,
  genOn: boolean,
  solarW: number,
  hookW: number,
  f: Flow,
): number {
  const p = c.p;
  const stepH = p.stepH[i] ?? 1;
  const acW = (p.acWh[i] ?? 0) / stepH;
  const dcW = (p.dcWh[i] ?? 0) / stepH;
  const genCap = genOn ? c.genCapW : 0;
  const hookAc = Math.min(acW, hookW);
  const genAc = Math.min(acW - hookAc, genCap);
  const invAc = acW - hookAc - genAc;
  let unserved = 0;
  let invDc = 0;
  if (c.hasInverter) {
    const on = invAc > 0 || c.invAlways || (p.acStandbyOn[i] ?? 0) > 0;
    invDc = on ? invAc / c.invEff + c.invIdle : 0;
  } else unserved = invAc;
  const hookSpare = hookW - hookAc;
  const genSpare = genCap - genAc;
  // chargerDcW in hookup.ts
  const chgMax = c.chgAmps > 0 ? Math.max(0, Math.min(c.chgCapW, (hookSpare + genSpare) * c.chgEff)) : 0;
  const vehW = c.vehW * (p.onRoadShare[i] ?? 0);
  let demand = dcW + invDc;
  const solarToLoad = Math.min(solarW, demand);
  demand -= solarToLoad;
  const vehToLoad = Math.min(vehW, demand);
  demand -= vehToLoad;
  const chgToLoad = Math.min(chgMax, demand);
  demand -= chgToLoad;
  let solarToBat = 0,
    vehToBat = 0,
    chgToBat = 0,
    batLoss = 0,
    short = unserved * dtH,
    flow = 0;
  let next = stored;
  if (demand > 0) {
    const need = demand * dtH;
    // peukertFactor in battery.ts
    const currentA = demand / c.nominalV;
    let peukert = 1;
    if (currentA > c.i20) {
      if (currentA !== c.lastCurrentA) {
        c.lastCurrentA = currentA;
        c.lastPeukert = Math.pow(currentA / c.i20, c.peukertExp);
      }
      peukert = c.lastPeukert;
    }
    const removal = (need / c.chem.dischargeEfficiency) * peukert;
    if (removal <= stored) {
      next = stored - removal;
      batLoss = removal - need;
      flow = -need;
    } else {
      const delivered = need * (stored / removal);
      short += need - delivered;
      batLoss = stored - delivered;
      flow = -delivered;
      next = 0;
    }
  } else {
    const soc = stored / c.cap;
    // chargeBlockedByCold and acceptanceLimitShare in battery.ts
    const cold = c.chem.lithium && !c.heated && (p.ambientC[i] ?? 20) < 0;
    let share = 0;
    if (!cold) {
      const acc = acceptanceFor(c, dtH);
      share =
        soc < c.taperStart
          ? Math.max(0, Math.min(acc.rate, c.taperStart - soc + acc.taperGain))
          : Math.max(0, (1 - soc) * acc.tail);
    }
    const limitIn = cold ? 0 : (share * c.cap) / c.chem.chargeEfficiency;
    let room = limitIn;
    solarToBat = Math.min((solarW - solarToLoad) * dtH, room);
    room -= solarToBat;
    vehToBat = Math.min((vehW - vehToLoad) * dtH, room);
    room -= vehToBat;
    chgToBat = Math.min((chgMax - chgToLoad) * dtH, room);
    flow = solarToBat + vehToBat + chgToBat;
    batLoss = flow * (1 - c.chem.chargeEfficiency);
    next = Math.min(c.cap, stored + flow - batLoss);
    if (cold && solarW + vehW + chgMax > solarToLoad + vehToLoad + chgToLoad) f.cold = 1;
  }
  const chgDc = chgToLoad * dtH + chgToBat;
  const chgAc = chgDc / c.chgEff;
  const chgFromHook = Math.min(chgAc, hookSpare * dtH);
  const genOut = genAc * dtH + (chgAc - chgFromHook);
  f.solarUsed += solarToLoad * dtH + solarToBat;
  f.vehicle += vehToLoad * dtH + vehToBat;
  f.hookup += hookAc * dtH + chgFromHook;
  f.generator += genOut;
  f.acLoad += acW * dtH;
  f.dcLoad += dcW * dtH;
  f.invLoss += invDc > 0 ? (invDc - invAc) * dtH : 0;
  f.chgLoss += chgAc - chgDc;
  f.batLoss += batLoss;
  f.short += short;
  f.flow += flow;
  // generatorFuel in generator.ts
  if (genOn && c.gen.kind !== 'none')
    f.fuel += (c.idleFuelKwhPerH * dtH + c.fuelKwhPerKwhOut * (genOut / 1000)) / c.fuelPerKwh;
  return next;
}

function context(p: Prepared, s: Scenario): Ctx {
  const rig = p.input.rig;
  const chem = CHEMISTRY[rig.battery.chemistry];
  const chargeV = rig.battery.nominalV * chem.chargeVoltageRatio;
  const capacityAh = s.capacityWh / rig.battery.nominalV;
  const chgAmps = rig.shoreCharger?.amps ?? 0;
  const gen = s.generator;
  return {
    p,
    chem,
    cap: s.capacityWh,
    chargeV,
    nominalV: rig.battery.nominalV,
    capacityAh,
    invEff: rig.inverter?.efficiency ?? 1,
    invIdle: rig.inverter?.idleW ?? 0,
    invAlways: rig.inverter?.mode === 'always',
    hasInverter: rig.inverter !== null,
    chgAmps,
    chgEff: rig.shoreCharger?.efficiency ?? 1,
    vehW: rig.vehicleCharger
      ? vehicleChargeW(rig.vehicleCharger.kind, rig.vehicleCharger.amps, rig.battery.nominalV * chem.chargeVoltageRatio)
      : 0,
    heated: rig.battery.heatedSpace,
    gen,
    i20: capacityAh / 20,
    peukertExp: chem.peukertK - 1,
    taperStart: chem.taperStartSoc,
    chgCapW: chgAmps * chargeV,
    genCapW: gen.kind !== 'none' ? gen.ratedW * CONTINUOUS_SHARE : 0,
    fuelPerKwh: gen.kind !== 'none' ? kwhPerFuelUnit(gen.fuelKind) : 1,
    idleFuelKwhPerH: gen.kind !== 'none' ? gen.model.idleFuelKwhPerH : 0,
    fuelKwhPerKwhOut: gen.kind !== 'none' ? gen.model.fuelKwhPerKwhOut : 0,
    full: acceptance(chem, 1),
    quarter: acceptance(chem, 1 / QUARTERS),
    other: acceptance(chem, Number.NaN),
    lastCurrentA: Number.NaN,
    lastPeukert: 1,
  };
}

function writeLedger(
  l: LedgerColumns,
  i: number,
  f: Flow,
  solarAvailWh: number,
  genH: number,
  propaneKg: number,
  stored: number,
  cap: number,
  propaneLeft: number,
): void {
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
  l.propaneBurnedKg[i] = propaneKg;
  l.batteryFlowWh[i] = f.flow;
  l.storedWh[i] = stored;
  l.socPct[i] = (stored / cap) * 100;
  l.energyShortWh[i] = f.short;
  l.propaneLeftKg[i] = propaneLeft;
  l.coldBlocked[i] = f.cold;
}

export function walk(p: Prepared, s: Scenario, ledger: LedgerColumns | null): WalkResult {
  const c = context(p, s);
  const rig = p.input.rig;
  const f: Flow = {
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
  const socPct = new Float64Array(p.n);
  let stored = (rig.battery.initialSocPct / 100) * c.cap;
  let propane = rig.propaneTanks.reduce((sum, t) => sum + (t.propaneKg * t.fillPct) / 100, 0);
  let lowest = stored / c.cap;
  let lowestIndex = 0;
  let shortWh = 0;
  let genHours = 0;
  let genRunning = false;
  const quarters = QUARTERS; // module-local copies of imported bindings for the loop
  const propaneKwhPerKg = PROPANE_KWH_PER_KG;
  for (let i = 0; i < p.n; i++) {
    zeroFlow(f);
    const dtH = p.stepH[i] ?? 1;
    const solarW = (s.solarW[i] ?? 0) * s.solarScale;
    const hookW = s.hookupW[i] ?? 0;
    const mask = c.gen.kind === 'rule' ? (p.genAllowed[i] ?? 0) : c.gen.kind === 'routine' ? (p.genRoutine[i] ?? 0) : 0;
    let genH = 0;
    if (mask === 0) {
      genRunning = false;
      stored = step(c, i, dtH, stored, false, solarW, hookW, f);
    } else {
      const q = dtH / quarters;
      for (let k = 0; k < quarters; k++) {
        const allowed = (mask & (1 << k)) !== 0;
        genRunning = decideGenerator(c.gen, allowed, genRunning, stored / c.cap);
        if (genRunning) genH += q;
        stored = step(c, i, q, stored, genRunning, solarW, hookW, f);
        if (stored / c.cap < lowest) {
          lowest = stored / c.cap;
          lowestIndex = i;
        }
      }
    }
    if (stored / c.cap < lowest) {
      lowest = stored / c.cap;
      lowestIndex = i;
    }
    const heatKg = (p.heatWh[i] ?? 0) / 1000 / propaneKwhPerKg; // propaneKgFromHeatWh in fuel.ts
    const genKg = c.gen.kind !== 'none' && c.gen.propane ? f.fuel : 0;
    propane = Math.max(0, propane - heatKg - genKg);
    socPct[i] = (stored / c.cap) * 100;
    shortWh += f.short;
    genHours += genH;
    if (ledger) writeLedger(ledger, i, f, solarW * dtH, genH, heatKg + genKg, stored, c.cap, propane);
  }
  return { socPct, lowestSocPct: lowest * 100, lowestIndex, energyShortWh: shortWh, generatorHours: genHours };
}

function decideGenerator(gen: GeneratorPlan, allowed: boolean, running: boolean, soc: number): boolean {
  if (!allowed) return false;
  if (gen.kind === 'routine') return true;
  if (gen.kind !== 'rule') return false;
  return running ? soc < gen.stopAbove : soc < gen.startBelow;
}
