// Site exposure: what the pitch's surroundings let through. The primary input is the sky openness o (0–100 %, the
// share of the sky hemisphere not blocked, cosine-weighted as a hemispherical canopy photo or a phone app measures
// it) with the canopy's leaf-area index L. Diffuse light is scaled by the openness (isotropic sky). The beam passes
// freely where the sky is open overhead and through the canopy by Beer–Lambert, τ = exp(−G·L / sin h) with
// spherical leaf angles G = 0.5 (Campbell & Norman 1998, An Introduction to Environmental Biophysics, ch. 15).
//
// Geometry of the gap: a canopy of leaf-area index L alone passes τ_d(L) = 2∫ exp(−G·L/cos θ)·cos θ·sin θ dθ of the
// diffuse light (C&N eq. 15.5). An openness above that is an opening in the canopy; it is placed overhead, a clear
// cap above elevation h0 with cos² h0 = g, where o = g + (1 − g)·τ_d(L). An openness below τ_d(L) means the canopy is
// denser than L says: the index is raised until τ_d matches it. Deciduous cover loses its leaves in the leaf-off
// months of its hemisphere (northern November–April, southern May–October; from memory, temperate broadleaf), down
// to the bare wood's area index 0.7 (from memory: stems and branches 0.5–1).
//
// The presets are named points on that scale (common practice / from memory), calibrated so that deep forest
// harvests about 5 % of an open site over a day (the trade's rule of thumb for heavy canopy) and light cover and
// partial shade where they stood. A custom horizon (obstruction elevation per compass sector, with a fixed beam
// transmittance through it) is kept for terrain and buildings.
import type { SiteExposure, SitePreset } from '../schemas/trip';

const RAD = Math.PI / 180;
/** Spherical leaf-angle distribution: leaves project half their area in any direction. */
export const LEAF_PROJECTION = 0.5;
export const WOODY_AREA_INDEX = 0.7;

export type CanopyPoint = { skyOpennessPct: number; leafAreaIndex: number };

export const SITE_PRESETS: Readonly<Record<SitePreset, CanopyPoint>> = {
  open: { skyOpennessPct: 100, leafAreaIndex: 0 },
  // Scattered trees round the pitch: about 97–99 % of an open day.
  'light-cover': { skyOpennessPct: 97, leafAreaIndex: 1 },
  // A tree line or thin stand: about 70–80 %.
  'partial-shade': { skyOpennessPct: 72, leafAreaIndex: 3 },
  // Closed canopy: 4.5–5.5 % of an open day across seasons and skies.
  'deep-forest': { skyOpennessPct: 5.5, leafAreaIndex: 5 },
};

export type ResolvedExposure = {
  /** Obstruction elevation per compass sector (sectors centred on N, clockwise), degrees. */
  horizonDeg: readonly number[];
  /** Below the obstruction the beam passes a canopy of this index (Beer–Lambert), or, when null, a fixed share. */
  leafAreaIndex: number | null;
  canopyTransmittance: number;
  /** Share of sky diffuse reaching a flat panel: the sky openness. */
  diffuse: number;
};

/** Beam transmittance of a canopy of leaf-area index L for a sun h degrees high (Campbell & Norman eq. 15.1). */
export function canopyBeamTransmittance(leafAreaIndex: number, altitudeDeg: number): number {
  const sinH = Math.sin(altitudeDeg * RAD);
  return sinH > 0 ? Math.exp((-LEAF_PROJECTION * leafAreaIndex) / sinH) : 0;
}

/** Diffuse transmittance of a canopy of leaf-area index L (C&N eq. 15.5), by Simpson's rule over the zenith angle. */
export function canopyDiffuseTransmittance(leafAreaIndex: number): number {
  if (leafAreaIndex <= 0) return 1;
  const intervals = 180;
  const h = Math.PI / 2 / intervals;
  let sum = 0;
  for (let q = 0; q <= intervals; q++) {
    const theta = q * h;
    const c = Math.cos(theta);
    const f = c > 1e-12 ? Math.exp((-LEAF_PROJECTION * leafAreaIndex) / c) * c * Math.sin(theta) : 0;
    sum += f * (q === 0 || q === intervals ? 1 : q % 2 === 1 ? 4 : 2);
  }
  return (2 * sum * h) / 3;
}

/** The leaf-area index whose diffuse transmittance is `openness` (bisection; transmittance falls with the index). */
function indexForOpenness(openness: number): number {
  let lo = 0;
  let hi = 20;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (canopyDiffuseTransmittance(mid) > openness) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** Leaf-off months (0 = January) of deciduous cover at a latitude. */
export function leafOff(month: number, lat: number): boolean {
  const northern = month >= 10 || month <= 3; // November–April
  return lat >= 0 ? northern : !northern;
}

const SECTORS = 16;

/** An openness and leaf-area index as an exposure: a clear cap overhead, canopy below its edge. */
export function canopyExposure(skyOpennessPct: number, leafAreaIndex: number): ResolvedExposure {
  const o = Math.min(1, Math.max(0, skyOpennessPct / 100));
  let lai = Math.max(0, leafAreaIndex);
  let tauD = canopyDiffuseTransmittance(lai);
  if (o < tauD) {
    lai = indexForOpenness(o);
    tauD = canopyDiffuseTransmittance(lai);
  }
  const gap = tauD < 1 ? Math.min(1, Math.max(0, (o - tauD) / (1 - tauD))) : 1;
  const edgeDeg = Math.acos(Math.sqrt(gap)) / RAD;
  return {
    horizonDeg: new Array<number>(SECTORS).fill(edgeDeg),
    leafAreaIndex: lai,
    canopyTransmittance: 0,
    diffuse: o,
  };
}

/** The same canopy with its leaves off: the opening is unchanged, the canopy thins to its bare wood. */
function withoutLeaves(skyOpennessPct: number, leafAreaIndex: number): ResolvedExposure {
  const leafy = canopyExposure(skyOpennessPct, leafAreaIndex);
  const lai = Math.min(leafy.leafAreaIndex ?? 0, WOODY_AREA_INDEX);
  const gap = Math.cos((leafy.horizonDeg[0] ?? 0) * RAD) ** 2;
  const opennessPct = 100 * (gap + (1 - gap) * canopyDiffuseTransmittance(lai));
  return { ...canopyExposure(opennessPct, lai), horizonDeg: leafy.horizonDeg };
}

export function skyViewFromHorizon(horizonDeg: readonly number[]): number {
  if (horizonDeg.length === 0) return 1;
  let sum = 0;
  for (const h of horizonDeg) sum += Math.cos(h * RAD) ** 2;
  return sum / horizonDeg.length;
}

/** An exposure resolved for the season: `month` (0–11) and latitude decide whether deciduous cover is bare. */
export function resolveExposure(exposure: SiteExposure, month = 6, lat = 45): ResolvedExposure {
  if (exposure.kind === 'custom') {
    const view = exposure.skyViewFraction ?? skyViewFromHorizon(exposure.horizonDeg);
    return {
      horizonDeg: exposure.horizonDeg,
      leafAreaIndex: null,
      canopyTransmittance: exposure.canopyTransmittance,
      diffuse: view + (1 - view) * exposure.canopyTransmittance,
    };
  }
  const point = exposure.kind === 'preset' ? SITE_PRESETS[exposure.preset] : exposure;
  const bare = exposure.kind === 'canopy' && exposure.deciduous && leafOff(month, lat);
  return bare
    ? withoutLeaves(point.skyOpennessPct, point.leafAreaIndex)
    : canopyExposure(point.skyOpennessPct, point.leafAreaIndex);
}

/** Obstruction elevation in the compass sector that contains the azimuth (sectors centred on N, clockwise). */
export function horizonAt(horizonDeg: readonly number[], azimuthDeg: number): number {
  const n = horizonDeg.length;
  if (n === 0) return 0;
  const width = 360 / n;
  const idx = Math.floor(((((azimuthDeg + width / 2) % 360) + 360) % 360) / width) % n;
  return horizonDeg[idx] ?? 0;
}

/** Share of the beam reaching the panel. */
export function beamFactor(e: ResolvedExposure, altitudeDeg: number, azimuthDeg: number): number {
  if (altitudeDeg >= horizonAt(e.horizonDeg, azimuthDeg)) return 1;
  return e.leafAreaIndex === null ? e.canopyTransmittance : canopyBeamTransmittance(e.leafAreaIndex, altitudeDeg);
}

/** Share of sky diffuse reaching the panel. */
export function diffuseFactor(e: ResolvedExposure): number {
  return e.diffuse;
}
