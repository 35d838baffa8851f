// Incidence angle modifier: the share of light reaching the cells through the module's glass, by Martin & Ruiz
// (2001), "Calculation of the PV modules angular losses under field conditions by means of an analytical model",
// Solar Energy Materials & Solar Cells 70. Beam: IAM(θ) = (1 − exp(−cos θ / a_r)) / (1 − exp(−1 / a_r)), zero
// from 90°. Sky and ground-reflected diffuse: the paper's closed-form approximations of the integrals over the
// visible sky and ground, with c1 = 4/(3π) ≈ 0.4244 and c2 = 0.5·a_r − 0.154 (as pvlib applies them). a_r = 0.16 is the
// paper's value for ordinary glass-covered crystalline silicon.

export const MARTIN_RUIZ_AR = 0.16;
const C1 = 0.4244; // 4/(3π) as the paper rounds it
const RAD = Math.PI / 180;

/** Beam IAM from the cosine of the angle of incidence, for one a_r: its normalising term worked out once. */
export function martinRuizIamOf(aR = MARTIN_RUIZ_AR): (cosIncidence: number) => number {
  const atNormal = 1 - Math.exp(-1 / aR);
  return (cosIncidence) => (cosIncidence > 0 ? (1 - Math.exp(-cosIncidence / aR)) / atNormal : 0);
}

/** Beam IAM from the cosine of the angle of incidence. */
export function martinRuizIam(cosIncidence: number, aR = MARTIN_RUIZ_AR): number {
  return martinRuizIamOf(aR)(cosIncidence);
}

function diffuseIam(trigTerm: number, aR: number): number {
  const c2 = 0.5 * aR - 0.154;
  return 1 - Math.exp((-(C1 + c2 * trigTerm) * trigTerm) / aR);
}

/** IAMs for isotropic sky diffuse and for ground-reflected light on a surface tilted tiltDeg (0–180°). */
export function martinRuizDiffuse(tiltDeg: number, aR = MARTIN_RUIZ_AR): { sky: number; ground: number } {
  const beta = tiltDeg * RAD;
  const sinBeta = tiltDeg < 90 ? Math.sin(beta) : Math.sin(Math.PI - beta);
  // At 180° no sky is seen and at 0° no ground: the terms are 0/0 there and their limits are 0.
  const sky = tiltDeg >= 180 ? 0 : diffuseIam(sinBeta + (Math.PI - beta - sinBeta) / (1 + Math.cos(beta)), aR);
  const ground = tiltDeg <= 0 ? 0 : diffuseIam(sinBeta + (beta - sinBeta) / (1 - Math.cos(beta)), aR);
  return { sky, ground };
}

/**
 * One surface's glass, for a loop over many samples: the beam's IAM at an angle of incidence (fixed by the
 * geometry, so worked out once per sample and shared by every sky), and the sky and ground diffuse IAMs for the
 * surface's tilt. What passes is beam × beamIam + sky × skyIam + ground × groundIam.
 */
export type Glass = { beamIam: (cosInc: number) => number; skyIam: number; groundIam: number };

export function glassOf(tiltDeg: number): Glass {
  const diffuse = martinRuizDiffuse(tiltDeg);
  return { beamIam: martinRuizIamOf(), skyIam: diffuse.sky, groundIam: diffuse.ground };
}

/** Glass that passes everything: the check that leaves incidence losses out. */
export const CLEAR_GLASS: Glass = { beamIam: () => 1, skyIam: 1, groundIam: 1 };
