// Plane-of-array irradiance: angle of incidence (Duffie & Beckman eq. 1.6.3 in vector form), isotropic sky
// (Liu & Jordan 1963), Hay & Davies (1980) anisotropic sky, and ground-reflected light.
const RAD = Math.PI / 180;

/** cos of the angle of incidence on a surface; azimuths clockwise from north. */
export function cosIncidence(zenithDeg: number, sunAzDeg: number, tiltDeg: number, surfaceAzDeg: number): number {
  const z = zenithDeg * RAD;
  const b = tiltDeg * RAD;
  return Math.cos(z) * Math.cos(b) + Math.sin(z) * Math.sin(b) * Math.cos((sunAzDeg - surfaceAzDeg) * RAD);
}

/** Share of the sky dome a surface tilted tiltDeg sees (isotropic sky). */
export function skyViewOfTilt(tiltDeg: number): number {
  return (1 + Math.cos(tiltDeg * RAD)) / 2;
}

/** Share of the ground a surface tilted tiltDeg sees. */
export function groundViewOfTilt(tiltDeg: number): number {
  return (1 - Math.cos(tiltDeg * RAD)) / 2;
}

export function isotropicSkyDiffuse(dhi: number, tiltDeg: number): number {
  return dhi * skyViewOfTilt(tiltDeg);
}

export function groundReflected(ghi: number, reflectance: number, tiltDeg: number): number {
  return ghi * reflectance * groundViewOfTilt(tiltDeg);
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

/** Hay & Davies' beam ratio: cos of incidence over cos of zenith, the latter floored near the horizon as pvlib does. */
export function beamRatio(cosIncidenceClamped: number, cosZenith: number): number {
  return cosIncidenceClamped / Math.max(cosZenith, 0.01745);
}

/** Hay–Davies sky diffuse from anisotropy index ai = DNI/DNI_extra, beam ratio rb and the tilt's sky view. */
export function hayDaviesSky(dhi: number, ai: number, rb: number, skyView: number): number {
  return Math.max(dhi * (1 - ai) * skyView, 0) + Math.max(dhi * ai * rb, 0);
}

export function hayDaviesSkyDiffuse(i: HayDaviesInput): number {
  const cosT = Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const ai = i.dniExtra > 0 ? i.dni / i.dniExtra : 0;
  return hayDaviesSky(i.dhi, ai, beamRatio(cosT, Math.cos(i.zenithDeg * RAD)), skyViewOfTilt(i.tiltDeg));
}

export type PoaInput = HayDaviesInput & { ghi: number; reflectance: number; model: 'hay-davies' | 'isotropic' };

/** Total plane-of-array irradiance; a flat panel simply sees GHI. */
export function planeOfArray(i: PoaInput): number {
  if (i.tiltDeg === 0) return i.ghi;
  const beam = i.dni * Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const sky = i.model === 'hay-davies' ? hayDaviesSkyDiffuse(i) : isotropicSkyDiffuse(i.dhi, i.tiltDeg);
  return beam + sky + groundReflected(i.ghi, i.reflectance, i.tiltDeg);
}
