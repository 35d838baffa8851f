// Solar available at the battery bus for every step of one sky scenario: clear sky × sky clearness, split by
// Erbs, shaded by the site's exposure, transposed onto each array (Hay–Davies or isotropic, plus ground
// reflection), through the module and controller models. The sky-independent geometry (incidence, beam ratio,
// shading) is computed once per trip and reused by every scenario; the inner loop allocates nothing.
import { CHEMISTRY } from './battery';
import { controllerLimitW, pwmFactor } from './charge-controller';
import { erbsDiffuseFraction } from './decomposition';
import { SAMPLES, type Prepared } from './prepare';
import { effectiveNoctC } from './pv-module';
import { beamFactor, diffuseFactor } from './site-exposure';
import { shiftSky, SKY_CLEARNESS } from './sky-outlook';
import { cosIncidence } from './transposition';

const RAD = Math.PI / 180;
const SIMPSON = [1 / 6, 4 / 6, 1 / 6] as const;
const MIN_COS_ZENITH = 0.065; // as in decomposition.ts
const MAX_ZENITH_DEG = 87;

export type SolarSeries = {
  /** Controller output available, W (step average). */
  availableW: Float64Array;
  /** Plane-of-array irradiance of the first array (or GHI), W/m² (step average), for the ledger. */
  poaWm2: Float64Array;
};

type ArrayConst = { ratedW: number; tilted: boolean; iso: number; ground: number; noct: number; gamma: number; derate: number; convert: number };

type Geometry = {
  m: number;
  arrays: ArrayConst[];
  cosZ: Float64Array; // per sample
  beamF: Float64Array; // per sample
  diffF: Float64Array; // per step
  cosInc: Float64Array; // per sample × array, clamped at 0
  rb: Float64Array; // per sample × array, Hay–Davies beam ratio
  capW: number;
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
      ratedW: a.ratedW, tilted: tilt > 0, iso: (1 + Math.cos(tilt * RAD)) / 2, ground: (1 - Math.cos(tilt * RAD)) / 2,
      noct: effectiveNoctC(a.noctC, a.fit), gamma: a.gammaPctPerC / 100, derate: a.derate, convert,
    };
  });
  return { arrays, capW: ctrl ? controllerLimitW(ctrl, chargeV) : 0 };
}

function geometry(p: Prepared): Geometry {
  const cached = geometryCache.get(p);
  if (cached) return cached;
  const { arrays, capW } = arrayConstants(p);
  const m = arrays.length;
  const ns = p.n * SAMPLES;
  const g: Geometry = {
    m, arrays, capW, cosZ: new Float64Array(ns), beamF: new Float64Array(ns), diffF: new Float64Array(p.n),
    cosInc: new Float64Array(ns * m), rb: new Float64Array(ns * m),
  };
  const solar = p.input.rig.solarArrays;
  for (let i = 0; i < p.n; i++) {
    const where = p.where[i] ?? -1;
    const exp = where >= 0 ? (p.exposures[where] ?? p.openExposure) : p.openExposure;
    g.diffF[i] = diffuseFactor(exp);
    for (let s = 0; s < SAMPLES; s++) {
      const k = i * SAMPLES + s;
      const alt = p.alt[k] ?? -90;
      if (alt <= 0) continue;
      const az = p.az[k] ?? 180;
      const cz = Math.cos((90 - alt) * RAD);
      g.cosZ[k] = cz;
      g.beamF[k] = beamFactor(exp, alt, az);
      for (let j = 0; j < m; j++) {
        const a = solar[j];
        const tilt = a && a.mounting === 'tilted' ? a.tiltDeg : 0;
        const ci = Math.max(0, cosIncidence(90 - alt, az, tilt, a?.azimuthDeg ?? 180));
        g.cosInc[k * m + j] = ci;
        g.rb[k * m + j] = ci / Math.max(cz, 0.01745);
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
  const availableW = new Float64Array(p.n);
  const poaWm2 = new Float64Array(p.n);
  if (g.m === 0) return { availableW, poaWm2 };
  for (let i = 0; i < p.n; i++) {
    if ((p.alt[i * SAMPLES + 1] ?? -90) <= -8) continue;
    const f = clearness[p.stopOf[i] ?? 0] ?? 1;
    const dniExtra = p.dniExtra[i] ?? 1361;
    const diffF = g.diffF[i] ?? 1;
    const ambient = p.ambientC[i] ?? 20;
    let w = 0;
    let poaFirst = 0;
    for (let s = 0; s < SAMPLES; s++) {
      const k = i * SAMPLES + s;
      const cz = g.cosZ[k] ?? 0;
      const ghiSky = (p.ghiClear[k] ?? 0) * f;
      if (cz <= 0 || ghiSky <= 0) continue;
      // Erbs split (decomposition.ts), then the site's shading of beam and diffuse.
      const kt = Math.min(2, ghiSky / (dniExtra * Math.max(cz, MIN_COS_ZENITH)));
      const low = 90 - (p.alt[k] ?? 0) > MAX_ZENITH_DEG;
      const dhiSky = low ? ghiSky : erbsDiffuseFraction(kt) * ghiSky;
      const dniSky = low ? 0 : Math.max(0, (ghiSky - dhiSky) / cz);
      const dni = dniSky * (g.beamF[k] ?? 1);
      const dhi = dhiSky * diffF;
      const ghi = dni * cz + dhi;
      const ai = dni / dniExtra;
      let sampleW = 0;
      for (let j = 0; j < g.m; j++) {
        const a = g.arrays[j];
        if (!a) continue;
        let poa = ghi;
        if (a.tilted) {
          const sky = hayDavies ? dhi * (ai * (g.rb[k * g.m + j] ?? 0) + (1 - ai) * a.iso) : dhi * a.iso;
          poa = dni * (g.cosInc[k * g.m + j] ?? 0) + sky + ghi * rho * a.ground;
        }
        if (j === 0) poaFirst += (SIMPSON[s] ?? 0) * poa;
        const cell = ambient + ((a.noct - 20) / 800) * poa;
        sampleW += Math.max(0, a.ratedW * (poa / 1000) * (1 + a.gamma * (cell - 25)) * a.derate) * a.convert;
      }
      w += (SIMPSON[s] ?? 0) * Math.min(sampleW, g.capW);
    }
    availableW[i] = w;
    poaWm2[i] = poaFirst;
  }
  return { availableW, poaWm2 };
}
