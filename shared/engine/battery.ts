// Battery: chemistry presets (efficiencies, recommended depth of discharge, charge-current limit, taper near
// full), Peukert (1897) for discharge-rate losses, and the no-charging-below-0 °C rule for lithium.
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

// Common practice (CHECK-VALUES §7, confidence S): round trip LiFePO4 92–98 %, lead-acid 78–85 %; usable depth
// lead-acid ≈ 50 %, LiFePO4 80–100 %; Peukert AGM 1.05–1.15, flooded 1.2–1.6, lithium ≈ 1.05.
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
    chargeEfficiency: 0.9,
    dischargeEfficiency: 0.93,
    recommendedDodPct: 50,
    maxChargeC: 0.2,
    taperStartSoc: 0.8,
    peukertK: 1.1,
    chargeVoltageRatio: 1.1,
    lithium: false,
  },
  flooded: {
    chargeEfficiency: 0.88,
    dischargeEfficiency: 0.92,
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

/** Lithium cells must not be charged below 0 °C (cell makers' data sheets). */
export function chargeBlockedByCold(lithium: boolean, heatedSpace: boolean, ambientC: number): boolean {
  return lithium && !heatedSpace && ambientC < 0;
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
