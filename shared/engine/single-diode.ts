// Single-diode model of a PV module: I = I_L − I_0·(exp((V + I·R_s)/a) − 1) − (V + I·R_s)/R_sh, with a = n·N_s·kT/q.
// Its five parameters are moved from reference conditions to the irradiance and cell temperature by De Soto,
// Klein & Beckman (2006), "Improvement and validation of a model for photovoltaic array performance", Solar
// Energy 80. The equation is solved by Newton's method on the current (and on the voltage for V_oc), which
// converges from above because the right-hand side is concave and decreasing; checked against pvlib's Lambert-W
// solution (CHECK-VALUES §5a).
//
// Typical parameters per module class (fitted here to a typical datasheet of the class — Isc, Voc, Imp, Vmp, with
// R_sh chosen — from memory, common practice; α_sc +0.05 %/K of Isc, silicon band gap 1.121 eV and
// dE_g/dT −0.0002677 /K as De Soto give them):
// - 36 cells, the "12 V" panel: 100 W, Vmp 18.0 V, Imp 5.56 A, Voc 21.6 V, Isc 5.94 A, R_sh 200 Ω;
// - 60/72 cells, the house panel: 300 W (60 cells), Vmp 32.5 V, Imp 9.23 A, Voc 39.8 V, Isc 9.77 A, R_sh 400 Ω;
//   a 72-cell module is the same cell in a longer string.

/** The five parameters at one operating condition; a = n·N_s·V_th in volts. */
export type DiodeParams = { iL: number; i0: number; rs: number; rsh: number; a: number };

/** Parameters at reference conditions (1000 W/m², 25 °C) and how they move (De Soto et al. 2006). */
export type DeSotoReference = {
  iLRef: number;
  i0Ref: number;
  rs: number;
  rshRef: number;
  aRef: number;
  /** Short-circuit current temperature coefficient, A/K. */
  alphaSc: number;
  egRefEv?: number;
  dEgdT?: number;
};

const BOLTZMANN_EV_PER_K = 8.617333262e-5; // CODATA 2018
const T_REF_K = 298.15;
const G_REF = 1000;

/** De Soto's translation of the reference parameters to an effective irradiance (W/m²) and cell temperature (°C). */
export function deSotoParams(ref: DeSotoReference, effIrradianceWm2: number, cellC: number): DiodeParams {
  const egRef = ref.egRefEv ?? 1.121;
  const dEgdT = ref.dEgdT ?? -0.0002677;
  const tK = cellC + 273.15;
  const eg = egRef * (1 + dEgdT * (tK - T_REF_K));
  const ratio = effIrradianceWm2 / G_REF;
  return {
    iL: ratio * (ref.iLRef + ref.alphaSc * (tK - T_REF_K)),
    i0:
      ref.i0Ref *
      (tK / T_REF_K) ** 3 *
      Math.exp(egRef / (BOLTZMANN_EV_PER_K * T_REF_K) - eg / (BOLTZMANN_EV_PER_K * tK)),
    rs: ref.rs,
    rsh: ref.rshRef / ratio,
    a: ref.aRef * (tK / T_REF_K),
  };
}

/** Current at terminal voltage v, A (negative beyond the open-circuit voltage). */
export function currentAt(p: DiodeParams, v: number): number {
  if (!(p.iL > 0)) return 0;
  let i = p.iL; // above the root: the iteration comes down to it without overshooting
  for (let k = 0; k < 100; k++) {
    const e = Math.exp((v + i * p.rs) / p.a);
    const g = p.iL - p.i0 * (e - 1) - (v + i * p.rs) / p.rsh - i;
    const dg = -(p.i0 * p.rs * e) / p.a - p.rs / p.rsh - 1;
    const step = g / dg;
    i -= step;
    if (Math.abs(step) <= 1e-13 * Math.max(1, Math.abs(i))) break;
  }
  return i;
}

/** Open-circuit voltage, V. */
export function openCircuitV(p: DiodeParams): number {
  if (!(p.iL > 0)) return 0;
  let v = p.a * Math.log(p.iL / p.i0 + 1); // where the diode alone carries I_L: at or above the root
  for (let k = 0; k < 100; k++) {
    const e = Math.exp(v / p.a);
    const h = p.iL - p.i0 * (e - 1) - v / p.rsh;
    const dh = -(p.i0 * e) / p.a - 1 / p.rsh;
    const step = h / dh;
    v -= step;
    if (Math.abs(step) <= 1e-13 * Math.max(1, v)) break;
  }
  return v;
}

/** dP/dV at v (P = V·I): positive below the maximum power point, negative above it. */
function powerSlope(p: DiodeParams, v: number): number {
  const i = currentAt(p, v);
  const g = (p.i0 / p.a) * Math.exp((v + i * p.rs) / p.a) + 1 / p.rsh;
  return i - (v * g) / (1 + p.rs * g);
}

export type OperatingPoint = { v: number; i: number; p: number };

/** The maximum power point, by bisection on the sign of dP/dV between 0 and V_oc. */
export function maxPowerPoint(p: DiodeParams): OperatingPoint {
  let lo = 0;
  let hi = openCircuitV(p);
  for (let k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
    const mid = (lo + hi) / 2;
    if (powerSlope(p, mid) > 0) lo = mid;
    else hi = mid;
  }
  const v = (lo + hi) / 2;
  const i = currentAt(p, v);
  return { v, i, p: v * i };
}

export type ModuleClass = DeSotoReference & { cells: number };

/** The module classes above, their reference parameters fitted to the datasheet figures listed in the header. */
export const MODULE_CLASSES = {
  cells36: {
    cells: 36,
    iLRef: 5.9447,
    i0Ref: 2.7318e-10,
    rs: 0.15732,
    rshRef: 200,
    aRef: 0.90813,
    alphaSc: 0.0005 * 5.94,
  },
  cells60: {
    cells: 60,
    iLRef: 9.7773,
    i0Ref: 2.5081e-11,
    rs: 0.29822,
    rshRef: 400,
    aRef: 1.4918,
    alphaSc: 0.0005 * 9.77,
  },
} as const satisfies Record<string, ModuleClass>;
