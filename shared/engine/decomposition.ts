// Beam/diffuse split by the Erbs, Klein & Duffie (1982) correlation of diffuse fraction on clearness index.
import type { Irradiance } from './clear-sky';

const RAD = Math.PI / 180;
const MIN_COS_ZENITH = 0.065; // keeps the clearness index finite at grazing sun
const MAX_ZENITH_DEG = 87;

export function erbsDiffuseFraction(kt: number): number {
  if (kt <= 0.22) return 1 - 0.09 * kt;
  if (kt <= 0.8) return 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
  return 0.165;
}

/** Split GHI into DNI and DHI; dniExtra is the extraterrestrial normal irradiance for the day. */
export function erbs(ghi: number, zenithDeg: number, dniExtra: number): Irradiance & { kt: number } {
  if (ghi <= 0) return { ghi: 0, dni: 0, dhi: 0, kt: 0 };
  const cz = Math.cos(zenithDeg * RAD);
  const kt = Math.min(2, Math.max(0, ghi / (dniExtra * Math.max(cz, MIN_COS_ZENITH))));
  const dhi = erbsDiffuseFraction(kt) * ghi;
  const dni = zenithDeg > MAX_ZENITH_DEG || cz <= 0 ? 0 : Math.max(0, (ghi - dhi) / cz);
  return { ghi, dni, dhi: zenithDeg > MAX_ZENITH_DEG ? ghi : dhi, kt };
}
