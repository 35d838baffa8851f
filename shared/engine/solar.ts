// Solar available at the battery bus for every step of one sky scenario: clear sky × sky clearness, split by
// Erbs, shaded by the site's exposure, transposed onto each array (Hay–Davies or isotropic, plus ground
// reflection), through the module and controller models. The sky-independent geometry (incidence, beam ratio,
// shading) is computed once per trip and reused by every scenario; the inner loop allocates nothing.
import { CHEMISTRY } from './battery';
import { controllerLimitW, pwmFactor } from './charge-controller';
import { SAMPLES, type Prepared } from './prepare';
import { effectiveNoctC } from './pv-module';
import { beamFactor, diffuseFactor } from './site-exposure';
import { shiftSky, SKY_CLEARNESS } from './sky-outlook';

const RAD = Math.PI / 180;
const SIMPSON = [1 / 6, 4 / 6, 1 / 6] as const;
const MIN_COS_ZENITH = 0.065; // as in decomposition.ts
const MAX_ZENITH_DEG = 87;
// A module-local copy: an imported binding in the innermost loops costs a lookup per use once compiled.
const S = SAMPLES;

export type SolarSeries = {
  /** Controller output available, W (step average). */
  availableW: Float64Array;
  /** Plane-of-array irradiance of the first array (or GHI), W/m² (step average), for the ledger. */
  poaWm2: Float64Array;
};

type ArrayConst = {
  ratedW: number;
  tilted: boolean;
  iso: number;
  ground: number;
  noct: number;
  gamma: number;
  derate: number;
  convert: number;
};

type Geometry = {
  m: number;
  arrays: ArrayConst[];
  cosZ: Float64Array; // per sample
  beamF: Float64Array; // per sample
  diffF: Float64Array; // per step
  cosInc: Float64Array; // per sample × array, clamped at 0 (tilted arrays only; flat arrays take GHI)
  rb: Float64Array; // per sample × array, Hay–Davies beam ratio (tilted arrays only)
  capW: number;
  /** The planned sky's series, kept so the band can copy the steps whose sky the shift leaves unchanged. */
  planned: SolarSeries | null;
};

const geometryCache = new WeakMap<Prepared, Geometry>();

function arrayConstants(p: Prepared): { arrays: ArrayConst[]; capW: number } {
  const rig = p.input.rig;
  const chargeV = rig.battery.nominalV * CHEMISTRY[rig.battery.chemistry].chargeVoltageRatio;
  const ctrl = rig.controller;
  const arrays = rig.solarArrays.map((a) => {
    const tilt = a.mounting === 'flat' ? 0 : a.tiltDeg;
    const convert = !ctrl ? 0 : ctrl.kind === 'mppt' ? ctrl.efficiency : pwmFactor(chargeV, a.vmpV);
    return {
      ratedW: a.ratedW,
      tilted: tilt > 0,
      iso: (1 + Math.cos(tilt * RAD)) / 2,
      ground: (1 - Math.cos(tilt * RAD)) / 2,
      noct: effectiveNoctC(a.noctC, a.fit),
      gamma: a.gammaPctPerC / 100,
      derate: a.derate,
      convert,
    };
  });
  return { arrays, capW: ctrl ? controllerLimitW(ctrl, chargeV) : 0 };
}

function geometry(p: Prepared): Geometry {
  const cached = geometryCache.get(p);
  if (cached) return cached;
  const { arrays, capW } = arrayConstants(p);
  const m = arrays.length;
  const ns = p.n * S;
  // One buffer for the per-sample columns; cos of the zenith comes from the precomputation (same numbers).
  const buf = new ArrayBuffer(8 * (ns + p.n + 2 * ns * m));
  const g: Geometry = {
    m,
    arrays,
    capW,
    cosZ: p.cosZ,
    beamF: new Float64Array(buf, 0, ns),
    diffF: new Float64Array(buf, 8 * ns, p.n),
    cosInc: new Float64Array(buf, 8 * (ns + p.n), ns * m),
    rb: new Float64Array(buf, 8 * (ns + p.n + ns * m), ns * m),
    planned: null,
  };
  // cosIncidence (transposition.ts) term for term, with the panel's and the sun's sines and cosines taken once.
  const panels = p.input.rig.solarArrays
    .map((a, j) => {
      const b = (a.mounting === 'tilted' ? a.tiltDeg : 0) * RAD;
      return { j, cosB: Math.cos(b), sinB: Math.sin(b), azimuthDeg: a.azimuthDeg };
    })
    .filter((panel) => arrays[panel.j]?.tilted);
  const stopDiffuse = p.exposures.map((e) => diffuseFactor(e));
  // Above the highest obstruction the beam is never blocked, so beamFactor's sector look-up is only needed below it.
  const stopTop = p.exposures.map((e) => Math.max(...e.horizonDeg));
  const openTop = Math.max(...p.openExposure.horizonDeg);
  const openDiffuse = diffuseFactor(p.openExposure);
  const { alt: alts, az: azs, cosZ } = p;
  const { beamF, cosInc, rb } = g;
  for (let i = 0; i < p.n; i++) {
    const where = p.where[i] ?? -1;
    const exp = where >= 0 ? (p.exposures[where] ?? p.openExposure) : p.openExposure;
    g.diffF[i] = where >= 0 ? (stopDiffuse[where] ?? openDiffuse) : openDiffuse;
    const top = where >= 0 ? (stopTop[where] ?? openTop) : openTop;
    for (let s = 0; s < S; s++) {
      const k = i * S + s;
      const alt = alts[k] ?? -90;
      if (alt <= 0) continue;
      const az = azs[k] ?? 180;
      beamF[k] = alt >= top ? 1 : beamFactor(exp, alt, az);
      if (panels.length === 0) continue;
      const cz = cosZ[k] ?? 0;
      const sz = Math.sin((90 - alt) * RAD);
      for (const panel of panels) {
        const ci = Math.max(0, cz * panel.cosB + sz * panel.sinB * Math.cos((az - panel.azimuthDeg) * RAD));
        cosInc[k * m + panel.j] = ci;
        rb[k * m + panel.j] = ci / Math.max(cz, 0.01745);
      }
    }
  }
  geometryCache.set(p, g);
  return g;
}

/** skyShift: 0 the planned sky, −1 one level better, +1 one level worse. */
export function solarSeries(p: Prepared, skyShift: number): SolarSeries {
  const g = geometry(p);
  const stops = p.input.trip.stops;
  const opt = p.input.options;
  const hayDavies = opt.transposition === 'hay-davies';
  const rho = opt.groundReflectance;
  const clearness = stops.map((s) => SKY_CLEARNESS[shiftSky(s.skyOutlook, skyShift)]);
  const planned = skyShift === 0 ? null : g.planned;
  // A stop whose sky the shift leaves as planned (clear made better, overcast made worse) gives the planned figures.
  const same = stops.map((s, w) => planned !== null && clearness[w] === SKY_CLEARNESS[s.skyOutlook]);
  const availableW = new Float64Array(p.n);
  const poaWm2 = new Float64Array(p.n);
  const series = { availableW, poaWm2 };
  if (skyShift === 0) g.planned = series;
  if (g.m === 0) return series;
  const { alt: alts, ghiClear, dniExtra: dniExtras, ambientC, stopOf } = p;
  const { cosZ, beamF, diffF, cosInc, rb, arrays, m, capW } = g;
  for (let i = 0; i < p.n; i++) {
    if ((alts[i * S + 1] ?? -90) <= -8) continue;
    const w = stopOf[i] ?? 0;
    if (planned && same[w]) {
      availableW[i] = planned.availableW[i] ?? 0;
      poaWm2[i] = planned.poaWm2[i] ?? 0;
      continue;
    }
    const f = clearness[w] ?? 1;
    const dniExtra = dniExtras[i] ?? 1361;
    const diff = diffF[i] ?? 1;
    const ambient = ambientC[i] ?? 20;
    let watts = 0;
    let poaFirst = 0;
    for (let s = 0; s < S; s++) {
      const k = i * S + s;
      const cz = cosZ[k] ?? 0;
      const ghiSky = (ghiClear[k] ?? 0) * f;
      if (cz <= 0 || ghiSky <= 0) continue;
      // Erbs split (decomposition.ts, the diffuse fraction written out), then the site's shading of beam and diffuse.
      const kt = Math.min(2, ghiSky / (dniExtra * Math.max(cz, MIN_COS_ZENITH)));
      const low = 90 - (alts[k] ?? 0) > MAX_ZENITH_DEG;
      const diffuseShare =
        kt <= 0.22
          ? 1 - 0.09 * kt
          : kt <= 0.8
            ? 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4
            : 0.165;
      const dhiSky = low ? ghiSky : diffuseShare * ghiSky;
      const dniSky = low ? 0 : Math.max(0, (ghiSky - dhiSky) / cz);
      const dni = dniSky * (beamF[k] ?? 1);
      const dhi = dhiSky * diff;
      const ghi = dni * cz + dhi;
      const ai = dni / dniExtra;
      let sampleW = 0;
      for (let j = 0; j < m; j++) {
        const a = arrays[j];
        if (!a) continue;
        let poa = ghi;
        if (a.tilted) {
          const sky = hayDavies ? dhi * (ai * (rb[k * m + j] ?? 0) + (1 - ai) * a.iso) : dhi * a.iso;
          poa = dni * (cosInc[k * m + j] ?? 0) + sky + ghi * rho * a.ground;
        }
        if (j === 0) poaFirst += (SIMPSON[s] ?? 0) * poa;
        const cell = ambient + ((a.noct - 20) / 800) * poa;
        sampleW += Math.max(0, a.ratedW * (poa / 1000) * (1 + a.gamma * (cell - 25)) * a.derate) * a.convert;
      }
      watts += (SIMPSON[s] ?? 0) * Math.min(sampleW, capW);
    }
    availableW[i] = watts;
    poaWm2[i] = poaFirst;
  }
  return series;
}
