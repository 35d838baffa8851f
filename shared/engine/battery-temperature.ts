// A battery in the cold: its temperature is the cabin's when it sits inside the living space (held up by the
// heating, from the heat balance) and the air's when it sits outside. A cold battery delivers less of its rated
// capacity (rated at 25 °C): lead-acid about 80 % at 0 °C and 65 % at −20 °C, LiFePO4 about 90 % and 70 %
// (CHECK-VALUES §7, common practice, from memory), linear between those points, full from 25 °C up (no bonus for
// heat), falling on at the same slope below −20 °C. The charge held back is not lost: it comes back as the battery
// warms. And no lithium cell may be charged below 0 °C (cell makers' data sheets).
import type { Chemistry } from '../schemas/rig';

type Point = readonly [tempC: number, share: number];

const COLD_CAPACITY: Readonly<Record<'leadAcid' | 'lithium', readonly Point[]>> = {
  leadAcid: [
    [-20, 0.65],
    [0, 0.8],
    [25, 1],
  ],
  lithium: [
    [-20, 0.7],
    [0, 0.9],
    [25, 1],
  ],
};

/** Share of the rated capacity the battery can deliver at tempC. */
export function coldCapacityShare(chemistry: Chemistry, tempC: number): number {
  const curve = COLD_CAPACITY[chemistry === 'lifepo4' ? 'lithium' : 'leadAcid'];
  const [first, mid, last] = curve as [Point, Point, Point];
  if (tempC >= last[0]) return 1;
  const [a, b] = tempC >= mid[0] ? [mid, last] : [first, mid];
  return Math.max(0, a[1] + ((b[1] - a[1]) * (tempC - a[0])) / (b[0] - a[0]));
}

export function batteryTemperatureC(insideCabin: boolean, cabinC: number, ambientC: number): number {
  return insideCabin ? cabinC : ambientC;
}

/** Lithium cells must not be charged below 0 °C. */
export function chargeBlockedByCold(lithium: boolean, batteryC: number): boolean {
  return lithium && batteryC < 0;
}

export type BatteryClimate = {
  /** Battery temperature per step, °C. */
  batteryC: Float64Array;
  /** Share of the rated capacity it can deliver per step. */
  capacityShare: Float64Array;
  /** 1 where charging is held off for the cold. */
  chargeBlocked: Uint8Array;
};

/** The battery's temperature, deliverable share and cold-charge rule for every step. */
export function batteryClimate(
  chemistry: Chemistry,
  insideCabin: boolean,
  cabinC: Float64Array,
  ambientC: Float64Array,
): BatteryClimate {
  const n = cabinC.length;
  const out: BatteryClimate = {
    batteryC: new Float64Array(n),
    capacityShare: new Float64Array(n),
    chargeBlocked: new Uint8Array(n),
  };
  const lithium = chemistry === 'lifepo4';
  for (let i = 0; i < n; i++) {
    const t = batteryTemperatureC(insideCabin, cabinC[i] ?? 20, ambientC[i] ?? 20);
    out.batteryC[i] = t;
    out.capacityShare[i] = coldCapacityShare(chemistry, t);
    out.chargeBlocked[i] = chargeBlockedByCold(lithium, t) ? 1 : 0;
  }
  return out;
}
