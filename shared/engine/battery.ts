// Battery: chemistry presets (efficiencies, recommended depth of discharge, charge-current limit, taper near full),
// Peukert (1897) for discharge-rate losses applied to the current while each load runs, and charge acceptance.
//
// Presets are common practice (CHECK-VALUES §7, confidence S): round trip LiFePO4 92–98 %, lead-acid 78–85 %;
// usable depth lead-acid ≈ 50 %, LiFePO4 80–100 %; Peukert AGM 1.05–1.15, flooded 1.2–1.6, lithium ≈ 1.05.
// Lead-acid capacity is rated at the 20-hour rate, which is already what the battery delivers at that rate, so its
// discharge efficiency is 1 and its whole round-trip loss sits on the charge side (a second cut on discharge would
// count the same loss twice); faster discharge costs more through Peukert's law.
import type { Chemistry } from '../schemas/rig';

export type ChemistryPreset = {
  chargeEfficiency: number;
  dischargeEfficiency: number;
  /** Recommended depth of discharge; the default reserve is 100 % minus this. */
  recommendedDodPct: number;
  /** Maximum charge current as a multiple of capacity (C-rate). */
  maxChargeC: number;
  /** SoC above which acceptance tapers (lithium near full; lead-acid above its absorption point). */
  taperStartSoc: number;
  peukertK: number;
  /** Mean charging voltage over nominal (e.g. 13.6 V on a 12.8 V LiFePO4 bank). */
  chargeVoltageRatio: number;
  lithium: boolean;
};

export const CHEMISTRY: Readonly<Record<Chemistry, ChemistryPreset>> = {
  lifepo4: {
    chargeEfficiency: 0.98,
    dischargeEfficiency: 0.98,
    recommendedDodPct: 80,
    maxChargeC: 0.5,
    taperStartSoc: 0.95,
    peukertK: 1.05,
    chargeVoltageRatio: 1.06,
    lithium: true,
  },
  agm: {
    chargeEfficiency: 0.84,
    dischargeEfficiency: 1,
    recommendedDodPct: 50,
    maxChargeC: 0.2,
    taperStartSoc: 0.8,
    peukertK: 1.1,
    chargeVoltageRatio: 1.1,
    lithium: false,
  },
  flooded: {
    chargeEfficiency: 0.81,
    dischargeEfficiency: 1,
    recommendedDodPct: 50,
    maxChargeC: 0.15,
    taperStartSoc: 0.75,
    peukertK: 1.25,
    chargeVoltageRatio: 1.1,
    lithium: false,
  },
};

/** Peukert run time, h, for capacity C (Ah) rated at H hours, exponent k, current I (A). */
export function peukertRuntimeH(capacityAh: number, ratedHours: number, k: number, currentA: number): number {
  return ratedHours * Math.pow(capacityAh / (currentA * ratedHours), k);
}

/**
 * Charge removed per unit delivered at current I compared with the 20-hour rate: (I / I20)^(k−1).
 * Below the rated current no bonus is credited (a conservative planning choice).
 */
export function peukertFactor(currentA: number, capacityAh: number, k: number): number {
  const i20 = capacityAh / 20;
  return currentA <= i20 ? 1 : Math.pow(currentA / i20, k - 1);
}

/** A load that can draw more than the 20-hour current while it runs: its battery-side current, its running energy. */
export type HeavyLoad = {
  circuit: 'ac' | 'dc';
  /** Battery current while it runs, A (through the inverter for AC loads). */
  currentA: number;
  /** Energy per step while running, Wh on its own circuit (AC Wh for AC loads). */
  runningWh: Float64Array;
};

/**
 * Per step, the Peukert factor of the DC loads and of the AC loads taken together: each load's running energy at
 * the factor for its own running current, the rest (standby, small loads) at 1. A fridge cycling on and off draws
 * its running current while it runs, so that is the current the law is applied to, not the hour's average.
 */
export function stepPeukertFactors(
  heavy: readonly HeavyLoad[],
  dcWh: Float64Array,
  acWh: Float64Array,
  capacityAh: number,
  k: number,
): { dc: Float64Array; ac: Float64Array } {
  const n = dcWh.length;
  const dcExtra = new Float64Array(n);
  const acExtra = new Float64Array(n);
  for (const load of heavy) {
    const extra = peukertFactor(load.currentA, capacityAh, k) - 1;
    if (extra <= 0) continue;
    const into = load.circuit === 'dc' ? dcExtra : acExtra;
    for (let i = 0; i < n; i++) into[i] = (into[i] ?? 0) + (load.runningWh[i] ?? 0) * extra;
  }
  for (let i = 0; i < n; i++) {
    const dc = dcWh[i] ?? 0;
    const ac = acWh[i] ?? 0;
    dcExtra[i] = dc > 0 ? 1 + (dcExtra[i] ?? 0) / dc : 1;
    acExtra[i] = ac > 0 ? 1 + (acExtra[i] ?? 0) / ac : 1;
  }
  return { dc: dcExtra, ac: acExtra };
}

/** The charge-acceptance terms for one step length: they depend only on the chemistry and the step. */
export type Acceptance = { rate: number; taperStartSoc: number; taperGain: number; tail: number };

export function acceptanceFor(p: ChemistryPreset, dtH: number): Acceptance {
  const rate = p.maxChargeC * dtH * p.chargeEfficiency; // share of capacity per step at full current
  const k = p.maxChargeC / (1 - p.taperStartSoc); // taper time constant, 1/h
  const tail = 1 - Math.exp(-k * dtH);
  return { rate, taperStartSoc: p.taperStartSoc, taperGain: (1 - p.taperStartSoc) * tail, tail };
}

/**
 * Most energy (stored terms, as a share of capacity) the battery can take in one step from `soc`: a constant
 * current limit up to the taper point, then an exponential taper toward full. Written so that soc + limit is
 * nondecreasing in soc — a fuller battery never ends the step emptier.
 */
export function acceptedShare(soc: number, a: Acceptance): number {
  if (soc < a.taperStartSoc) return Math.max(0, Math.min(a.rate, a.taperStartSoc - soc + a.taperGain));
  return Math.max(0, (1 - soc) * a.tail);
}

/** acceptedShare for a step of dtH hours. */
export function acceptanceLimitShare(soc: number, dtH: number, p: ChemistryPreset): number {
  return acceptedShare(soc, acceptanceFor(p, dtH));
}

/** The battery of one walk: what a step's demand removes from it and what it can take in, from its stored Wh. */
export type BatteryModel = {
  capacityWh: number;
  /** Stored energy removed to deliver needWh in step i, where dcW of DC loads and acDcW of inverter draw ask it. */
  removalWh(needWh: number, i: number, dcW: number, acDcW: number): number;
  /** Most energy the sources may offer the terminals in dtH hours (before the charge loss). */
  acceptWh(storedWh: number, dtH: number): number;
  /** Stored energy the cold holds back in step i: the battery cannot deliver below it. */
  coldFloorWh(i: number): number;
};

type StepLoads = {
  heavy: readonly HeavyLoad[];
  dcWh: Float64Array;
  acWh: Float64Array;
  /** Share of the rated capacity the battery can deliver in each step (battery-temperature.ts). */
  battery: { capacityShare: Float64Array };
};

// Most walks of one trip (the sky band, the solar, generator and hookup levers) share a capacity: work its factors
// out once per set of loads and capacity.
const factorCache = new WeakMap<StepLoads, Map<number, { dc: Float64Array; ac: Float64Array }>>();

function factorsFor(loads: StepLoads, capacityAh: number, k: number): { dc: Float64Array; ac: Float64Array } {
  let byCapacity = factorCache.get(loads);
  if (!byCapacity) factorCache.set(loads, (byCapacity = new Map()));
  let f = byCapacity.get(capacityAh);
  if (!f) byCapacity.set(capacityAh, (f = stepPeukertFactors(loads.heavy, loads.dcWh, loads.acWh, capacityAh, k)));
  return f;
}

export function batteryModel(
  chem: ChemistryPreset,
  capacityWh: number,
  nominalV: number,
  loads: StepLoads,
): BatteryModel {
  const factors = factorsFor(loads, capacityWh / nominalV, chem.peukertK);
  const hour = acceptanceFor(chem, 1);
  const quarter = acceptanceFor(chem, 0.25);
  return {
    capacityWh,
    removalWh(needWh, i, dcW, acDcW) {
      const peukert = ((factors.dc[i] ?? 1) * dcW + (factors.ac[i] ?? 1) * acDcW) / (dcW + acDcW);
      return (needWh / chem.dischargeEfficiency) * peukert;
    },
    acceptWh(storedWh, dtH) {
      const a = dtH === 1 ? hour : dtH === 0.25 ? quarter : acceptanceFor(chem, dtH);
      return (acceptedShare(storedWh / capacityWh, a) * capacityWh) / chem.chargeEfficiency;
    },
    coldFloorWh(i) {
      return capacityWh * (1 - (loads.battery.capacityShare[i] ?? 1));
    },
  };
}
