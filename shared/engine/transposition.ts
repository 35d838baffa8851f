// Plane-of-array irradiance: angle of incidence (Duffie & Beckman eq. 1.6.3 in vector form), isotropic sky
// (Liu & Jordan 1963), Hay & Davies (1980) anisotropic sky, and ground-reflected light.
const RAD = Math.PI / 180;

/** cos of the angle of incidence on one surface, for a loop over many sun positions: its tilt's sine and cosine
 * worked out once. Azimuths clockwise from north. */
export function incidenceOn(tiltDeg: number, surfaceAzDeg: number): (zenithDeg: number, sunAzDeg: number) => number {
  const b = tiltDeg * RAD;
  const cosB = Math.cos(b);
  const sinB = Math.sin(b);
  return (zenithDeg, sunAzDeg) => {
    const z = zenithDeg * RAD;
    return Math.cos(z) * cosB + Math.sin(z) * sinB * Math.cos((sunAzDeg - surfaceAzDeg) * RAD);
  };
}

/** cos of the angle of incidence on a surface; azimuths clockwise from north. */
export function cosIncidence(zenithDeg: number, sunAzDeg: number, tiltDeg: number, surfaceAzDeg: number): number {
  return incidenceOn(tiltDeg, surfaceAzDeg)(zenithDeg, sunAzDeg);
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

/** Hay–Davies' isotropic part: the share 1 − ai of the diffuse spread over the sky, ai = DNI/DNI_extra. */
export function hayDaviesIsotropic(dhi: number, ai: number, skyView: number): number {
  return Math.max(dhi * (1 - ai) * skyView, 0);
}

/** Hay–Davies' circumsolar part: the share ai of the diffuse arriving from the sun's direction, like beam. */
export function hayDaviesCircumsolar(dhi: number, ai: number, rb: number): number {
  return Math.max(dhi * ai * rb, 0);
}

/** Hay–Davies sky diffuse from anisotropy index ai = DNI/DNI_extra, beam ratio rb and the tilt's sky view. */
export function hayDaviesSky(dhi: number, ai: number, rb: number, skyView: number): number {
  return hayDaviesIsotropic(dhi, ai, skyView) + hayDaviesCircumsolar(dhi, ai, rb);
}

export function hayDaviesSkyDiffuse(i: HayDaviesInput): number {
  const cosT = Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const ai = i.dniExtra > 0 ? i.dni / i.dniExtra : 0;
  return hayDaviesSky(i.dhi, ai, beamRatio(cosT, Math.cos(i.zenithDeg * RAD)), skyViewOfTilt(i.tiltDeg));
}

export type PoaInput = HayDaviesInput & { ghi: number; reflectance: number; model: 'hay-davies' | 'isotropic' };

/** Plane-of-array irradiance by where it comes from, W/m²: the beam, circumsolar and isotropic sky, the ground. */
export type PoaComponents = { beam: number; circumsolar: number; isotropic: number; ground: number };

export function poaComponents(i: PoaInput): PoaComponents {
  const cosT = Math.max(cosIncidence(i.zenithDeg, i.sunAzDeg, i.tiltDeg, i.surfaceAzDeg), 0);
  const view = skyViewOfTilt(i.tiltDeg);
  const ai = i.model === 'hay-davies' && i.dniExtra > 0 ? i.dni / i.dniExtra : 0;
  return {
    beam: i.dni * cosT,
    circumsolar: hayDaviesCircumsolar(i.dhi, ai, beamRatio(cosT, Math.cos(i.zenithDeg * RAD))),
    isotropic: hayDaviesIsotropic(i.dhi, ai, view),
    ground: groundReflected(i.ghi, i.reflectance, i.tiltDeg),
  };
}

/** Total plane-of-array irradiance; a flat panel sees GHI. */
export function planeOfArray(i: PoaInput): number {
  const c = poaComponents(i);
  return c.beam + c.circumsolar + c.isotropic + c.ground;
}

/** One sample's irradiance on a surface: the beam with the circumsolar part, isotropic sky, ground, W/m². */
export type SurfaceParts = { beam: number; sky: number; ground: number };

/**
 * The transposition of one fixed surface, for a loop over many samples: given the beam, diffuse and global
 * irradiance, the anisotropy index (0 for the isotropic model), the cosine of incidence and the beam ratio, it
 * fills `into`. Hay–Davies with ai = DNI/DNI_extra; isotropic with ai = 0.
 */
export function surfaceTransposer(
  tiltDeg: number,
  reflectance: number,
): (dni: number, dhi: number, ghi: number, ai: number, cosInc: number, rb: number, into: SurfaceParts) => void {
  const skyView = skyViewOfTilt(tiltDeg);
  const groundView = groundViewOfTilt(tiltDeg);
  return (dni, dhi, ghi, ai, cosInc, rb, into) => {
    into.beam = dni * cosInc + hayDaviesCircumsolar(dhi, ai, rb);
    into.sky = hayDaviesIsotropic(dhi, ai, skyView);
    into.ground = ghi * reflectance * groundView;
  };
}
