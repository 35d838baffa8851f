// Plane-of-array irradiance: angle of incidence (Duffie & Beckman eq. 1.6.3 in vector form), isotropic sky
// (Liu & Jordan 1963), Hay & Davies (1980) anisotropic sky, and ground-reflected light.
const RAD = Math.PI / 180;

/** cos of the angle of incidence on a surface; azimuths clockwise from north. */
export function cosIncidence(zenithDeg: number, sunAzDeg: number, tiltDeg: number, surfaceAzDeg: number): number {
  const z = zenithDeg * RAD;
  const b = tiltDeg * RAD;
  return Math.cos(z) * Math.cos(b) + Math.sin(z) * Math.sin(b) * Math.cos((sunAzDeg - surfaceAzDeg) * RAD);
}

export function isotropicSkyDiffuse(dhi: number, tiltDeg: number): number {
  return (dhi * (1 + Math.cos(tiltDeg * RAD))) / 2;
}

export function groundReflected(ghi: number, reflectance: number, tiltDeg: number): number {
  return (ghi * reflectance * (1 - Math.cos(tiltDeg * RAD))) / 2;
}

export type HayDaviesInput = {
  dhi: number;
  dni: number;
  dniExtra: number;
  zenithDeg: number;
  sunAzDeg: number;
  tiltDeg: number;
  surfaceAzDeg: number;
};

export function hayDaviesSkyDiffuse(i: HayDaviesInput): number {
  const cosT = Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const rb = cosT / Math.max(Math.cos(i.zenithDeg * RAD), 0.01745); // floor near the horizon, as pvlib does
  const ai = i.dniExtra > 0 ? i.dni / i.dniExtra : 0;
  const iso = Math.max(i.dhi * (1 - ai) * ((1 + Math.cos(i.tiltDeg * RAD)) / 2), 0);
  return iso + Math.max(i.dhi * ai * rb, 0);
}

export type PoaInput = HayDaviesInput & { ghi: number; reflectance: number; model: 'hay-davies' | 'isotropic' };

/** Total plane-of-array irradiance; a flat panel simply sees GHI. */
export function planeOfArray(i: PoaInput): number {
  if (i.tiltDeg === 0) return i.ghi;
  const beam = i.dni * Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const sky = i.model === 'hay-davies' ? hayDaviesSkyDiffuse(i) : isotropicSkyDiffuse(i.dhi, i.tiltDeg);
  return beam + sky + groundReflected(i.ghi, i.reflectance, i.tiltDeg);
}
