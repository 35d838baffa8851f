// Inverter: AC output over a constant conversion efficiency plus an idle draw while it is on (this captures
// the poor light-load efficiency of off-grid units, common practice per CHECK-VALUES §9), and overload checks.

/** DC power drawn from the battery to deliver acW, W. */
export function inverterDcDrawW(acW: number, efficiency: number, idleW: number, on: boolean): number {
  return on ? acW / efficiency + idleW : 0;
}

/** DC current at a bus voltage, A (I = P / V). A 3000 W load on a 12 V bank draws about 250 A. */
export function dcCurrentA(powerW: number, busV: number): number {
  return powerW / busV;
}

export type OverloadCheck = { running: boolean; surge: boolean };

/** Running watts above the rating, or a start-up surge (with the rest running) above the surge rating. */
export function checkOverload(
  runningW: number,
  largestSurgeExtraW: number,
  ratedW: number,
  surgeW: number,
): OverloadCheck {
  return { running: runningW > ratedW, surge: runningW + largestSurgeExtraW > surgeW };
}
