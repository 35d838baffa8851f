// Beam/diffuse split by the Erbs, Klein & Duffie (1982) correlation of diffuse fraction on clearness index,
// fed the true (unrefracted) zenith as the correlation was fitted and as pvlib applies it.
import type { Irradiance } from './clear-sky';

const RAD = Math.PI / 180;
const MIN_COS_ZENITH = 0.065; // keeps the clearness index finite at grazing sun
const MAX_ZENITH_DEG = 87;
const COS_MAX_ZENITH = Math.cos(MAX_ZENITH_DEG * RAD);

export function erbsDiffuseFraction(kt: number): number {
  if (kt <= 0.22) return 1 - 0.09 * kt;
  // 0.9511 − 0.1604 kt + 4.388 kt² − 16.638 kt³ + 12.336 kt⁴, in Horner's form
  if (kt <= 0.8) return 0.9511 + kt * (-0.1604 + kt * (4.388 + kt * (-16.638 + kt * 12.336)));
  return 0.165;
}

/** Beam normal and diffuse horizontal parts of a GHI, W/m². */
export type Split = { dni: number; dhi: number; kt: number };

/** Split GHI into `out` for the cosine of the true zenith; beyond 87° all of it is diffuse. Allocates nothing. */
export function erbsInto(ghi: number, cosZenith: number, dniExtra: number, out: Split): void {
  if (!(ghi > 0)) {
    out.dni = out.dhi = out.kt = 0;
    return;
  }
  const kt = Math.min(2, Math.max(0, ghi / (dniExtra * Math.max(cosZenith, MIN_COS_ZENITH))));
  const grazing = cosZenith < COS_MAX_ZENITH;
  const dhi = grazing ? ghi : erbsDiffuseFraction(kt) * ghi;
  out.kt = kt;
  out.dhi = dhi;
  out.dni = grazing ? 0 : Math.max(0, (ghi - dhi) / cosZenith);
}

/** Split GHI into DNI and DHI; zenithDeg is the true zenith, dniExtra the extraterrestrial normal irradiance. */
export function erbs(ghi: number, zenithDeg: number, dniExtra: number): Irradiance & { kt: number } {
  const out: Split = { dni: 0, dhi: 0, kt: 0 };
  erbsInto(ghi, Math.cos(zenithDeg * RAD), dniExtra, out);
  return { ghi: ghi > 0 ? ghi : 0, dni: out.dni, dhi: out.dhi, kt: out.kt };
}

/** erbsInto for a loop over many samples. */
export function erbsSplitter(): (ghi: number, cosZenith: number, dniExtra: number, out: Split) => void {
  return (ghi, cosZenith, dniExtra, out) => erbsInto(ghi, cosZenith, dniExtra, out);
}
