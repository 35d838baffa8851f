// Site exposure: a horizon of obstruction elevations per compass sector blocks the beam when the sun is below
// it, the canopy lets a share of that beam through, and diffuse light is cut to the visible sky. The sky view of
// a flat panel under a horizon of elevation h is the mean of cos²h over the sectors (isotropic sky).
// Presets are planning values (common practice / from memory): deep forest is calibrated so a flat panel
// harvests about 5 % of an open site's day, the trade's rule of thumb for heavy canopy.
import type { SiteExposure, SitePreset } from '../schemas/trip';

const RAD = Math.PI / 180;

export type ResolvedExposure = {
  horizonDeg: readonly number[];
  canopyTransmittance: number;
  skyViewFraction: number;
};

type PresetShape = { horizonDeg: number; canopyTransmittance: number };

const PRESETS: Readonly<Record<SitePreset, PresetShape>> = {
  open: { horizonDeg: 0, canopyTransmittance: 1 },
  // from memory: scattered trees hide a low sun and pass about half of it through the gaps
  'light-cover': { horizonDeg: 15, canopyTransmittance: 0.5 },
  // from memory: a tree line that hides the sun below 40° and lets about a third through
  'partial-shade': { horizonDeg: 40, canopyTransmittance: 0.3 },
  // common practice: a closed canopy cuts a day's harvest to about 5 %; the closed ceiling (85°) and 4.5 %
  // transmittance give 4–6 % of open for flat panels across seasons and skies
  'deep-forest': { horizonDeg: 85, canopyTransmittance: 0.045 },
};

export function skyViewFromHorizon(horizonDeg: readonly number[]): number {
  if (horizonDeg.length === 0) return 1;
  let sum = 0;
  for (const h of horizonDeg) sum += Math.cos(h * RAD) ** 2;
  return sum / horizonDeg.length;
}

export function resolveExposure(exposure: SiteExposure): ResolvedExposure {
  if (exposure.kind === 'custom') {
    return {
      horizonDeg: exposure.horizonDeg,
      canopyTransmittance: exposure.canopyTransmittance,
      skyViewFraction: exposure.skyViewFraction ?? skyViewFromHorizon(exposure.horizonDeg),
    };
  }
  const p = PRESETS[exposure.preset];
  const horizonDeg = new Array<number>(16).fill(p.horizonDeg);
  return { horizonDeg, canopyTransmittance: p.canopyTransmittance, skyViewFraction: skyViewFromHorizon(horizonDeg) };
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
  return altitudeDeg >= horizonAt(e.horizonDeg, azimuthDeg) ? 1 : e.canopyTransmittance;
}

/** Share of sky diffuse reaching the panel: the open sky plus what filters through the obstruction. */
export function diffuseFactor(e: ResolvedExposure): number {
  return e.skyViewFraction + (1 - e.skyViewFraction) * e.canopyTransmittance;
}
