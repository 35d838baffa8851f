// Inverter: AC output through the PVWatts v5 part-load efficiency curve (Dobos 2014, PVWatts Version 5 Manual,
// NREL/TP-6A20-62641): with ζ = P_dc/P_dc0, η = (η_nom/η_ref)·(−0.0162ζ − 0.0059/ζ + 0.9858), η_ref 0.9637, the
// output capped at the rating. The rig's "efficiency" is η_nom and its rating the AC output at full load, so
// P_dc0 = rating/η_nom. The curve's −0.0059/ζ term is the conversion loss that makes light loads expensive. The idle
// draw of the controls comes on top while the inverter is on: all the time, only in hours with AC load (as people
// switch it on for them), or in set hours (and whenever AC loads run). Overload checks against rating and surge.

export const PVWATTS_ETA_REF = 0.9637;
const A = 0.0162;
const B = 0.0059;
const C = 0.9858;

/** AC output from DC input, W (PVWatts v5, pvlib's inverter.pvwatts). */
export function pvwattsAcW(dcW: number, dc0W: number, etaNom: number): number {
  if (!(dcW > 0)) return 0;
  const zeta = dcW / dc0W;
  const eta = (etaNom / PVWATTS_ETA_REF) * (-A * zeta - B / zeta + C);
  return Math.max(0, Math.min(etaNom * dc0W, eta * dcW));
}

/**
 * DC input that gives acW of output on the same curve, W: P_ac = k(−Aζ² + Cζ − B) with k = (η_nom/η_ref)·P_dc0
 * solved for the smaller root. Beyond the rating (an overload, flagged elsewhere) the curve is carried on.
 */
export function pvwattsDcW(acW: number, ratedAcW: number, etaNom: number): number {
  if (!(acW > 0)) return 0;
  const dc0 = ratedAcW / etaNom;
  const c = B + acW / ((etaNom / PVWATTS_ETA_REF) * dc0);
  const root = Math.sqrt(Math.max(0, C * C - 4 * A * c));
  return ((2 * c) / (C + root)) * dc0;
}

export type InverterSpec = { ratedW: number; efficiency: number; idleW: number };

/** DC power drawn from the battery to deliver acW while the inverter is on for `onShare` of the step, W. */
export function inverterDcDrawW(inv: InverterSpec, acW: number, onShare: number): number {
  return pvwattsDcW(acW, inv.ratedW, inv.efficiency) + inv.idleW * onShare;
}

/** inverterDcDrawW for one inverter, for a walk that asks it every step. */
export function inverterDraw(inv: InverterSpec): (acW: number, onShare: number) => number {
  return (acW, onShare) => inverterDcDrawW(inv, acW, onShare);
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
