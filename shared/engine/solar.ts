// Solar available at the battery bus for every step of one sky scenario: clear sky × sky clearness, split by
// Erbs, shaded by the site's exposure, transposed onto each array (Hay–Davies or isotropic, plus ground
// reflection), through the glass (Martin & Ruiz incidence losses: beam and circumsolar at the angle of incidence,
// sky and ground diffuse by their integrals), the module and the controller models. The sky-independent geometry (incidence, beam ratio,
// shading) is computed once per trip and reused by every scenario; the inner loop calls the models and allocates
// nothing.
import { CHEMISTRY } from './battery';
import { arrayOutput, controllerLimitW, type ArrayOutput } from './charge-controller';
import { erbsInto, type Split } from './decomposition';
import { martinRuizDiffuse, martinRuizIam } from './iam';
import { SAMPLES, type Prepared } from './prepare';
import { effectiveNoctC, noctCellTempC } from './pv-module';
import { beamFactor, diffuseFactor } from './site-exposure';
import { shiftSky, SKY_CLEARNESS } from './sky-outlook';
import {
  beamRatio,
  cosIncidence,
  groundViewOfTilt,
  hayDaviesCircumsolar,
  hayDaviesIsotropic,
  skyViewOfTilt,
} from './transposition';

const SIMPSON = [1 / 6, 4 / 6, 1 / 6] as const;

export type SolarSeries = {
  /** Controller output available, W (step average). */
  availableW: Float64Array;
  /** Plane-of-array irradiance of the first array (or GHI), W/m² (step average), for the ledger. */
  poaWm2: Float64Array;
};

type ArrayModel = {
  skyView: number;
  groundView: number;
  /** Incidence modifiers of sky and ground diffuse for the array's tilt. */
  skyIam: number;
  groundIam: number;
  noctC: number;
  output: ArrayOutput;
};

type Geometry = {
  m: number;
  arrays: ArrayModel[];
  cosZ: Float64Array; // per sample
  beamF: Float64Array; // per sample
  diffF: Float64Array; // per step
  cosInc: Float64Array; // per sample × array, clamped at 0
  rb: Float64Array; // per sample × array, Hay–Davies beam ratio
  capW: number;
  /** The planned sky's series, kept so the band can copy the steps whose sky the shift leaves unchanged. */
  planned: SolarSeries | null;
};

const geometryCache = new WeakMap<Prepared, Geometry>();

function arrayModels(p: Prepared): { arrays: ArrayModel[]; capW: number } {
  const rig = p.input.rig;
  const chargeV = rig.battery.nominalV * CHEMISTRY[rig.battery.chemistry].chargeVoltageRatio;
  const ctrl = rig.controller;
  const arrays = rig.solarArrays.map((a) => {
    const tilt = a.mounting === 'flat' ? 0 : a.tiltDeg;
    const iam = martinRuizDiffuse(tilt);
    return {
      skyView: skyViewOfTilt(tilt),
      groundView: groundViewOfTilt(tilt),
      skyIam: iam.sky,
      groundIam: iam.ground,
      noctC: effectiveNoctC(a.noctC, a.fit),
      output: ctrl ? arrayOutput(ctrl, a, chargeV) : () => 0,
    };
  });
  return { arrays, capW: ctrl ? controllerLimitW(ctrl, chargeV) : 0 };
}

function geometry(p: Prepared): Geometry {
  const cached = geometryCache.get(p);
  if (cached) return cached;
  const { arrays, capW } = arrayModels(p);
  const m = arrays.length;
  const ns = p.n * SAMPLES;
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
  const panels = p.input.rig.solarArrays.map((a, j) => ({
    j,
    tiltDeg: a.mounting === 'tilted' ? a.tiltDeg : 0,
    azimuthDeg: a.azimuthDeg,
  }));
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
    for (let q = 0; q < SAMPLES; q++) {
      const k = i * SAMPLES + q;
      const alt = alts[k] ?? -90;
      if (alt <= 0) continue;
      const az = azs[k] ?? 180;
      beamF[k] = alt >= top ? 1 : beamFactor(exp, alt, az);
      for (const panel of panels) {
        const ci = Math.max(0, cosIncidence(90 - alt, az, panel.tiltDeg, panel.azimuthDeg));
        cosInc[k * m + panel.j] = ci;
        rb[k * m + panel.j] = beamRatio(ci, cosZ[k] ?? 0);
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
  const split: Split = { dni: 0, dhi: 0, kt: 0 };
  for (let i = 0; i < p.n; i++) {
    if ((alts[i * SAMPLES + 1] ?? -90) <= -8) continue;
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
    for (let q = 0; q < SAMPLES; q++) {
      const k = i * SAMPLES + q;
      const cz = cosZ[k] ?? 0;
      const ghiSky = (ghiClear[k] ?? 0) * f;
      if (cz <= 0 || ghiSky <= 0) continue;
      erbsInto(ghiSky, cz, dniExtra, split);
      // The site's shading of beam and diffuse.
      const dni = split.dni * (beamF[k] ?? 1);
      const dhi = split.dhi * diff;
      const ghi = dni * cz + dhi;
      const ai = hayDavies ? dni / dniExtra : 0; // isotropic sky: no circumsolar share
      let sampleW = 0;
      for (let j = 0; j < m; j++) {
        const a = arrays[j];
        if (!a) continue;
        // Plane-of-array irradiance (for the cell temperature and the ledger) and what passes the glass (for power).
        // A flat array is the tilt-0 case: it sees the GHI.
        const ci = cosInc[k * m + j] ?? 0;
        const beam = dni * ci + hayDaviesCircumsolar(dhi, ai, rb[k * m + j] ?? 0);
        const isotropic = hayDaviesIsotropic(dhi, ai, a.skyView);
        const ground = ghi * rho * a.groundView;
        const poa = beam + isotropic + ground;
        const effective = beam * martinRuizIam(ci) + isotropic * a.skyIam + ground * a.groundIam;
        if (j === 0) poaFirst += (SIMPSON[q] ?? 0) * poa;
        sampleW += a.output(effective, noctCellTempC(ambient, poa, a.noctC));
      }
      watts += (SIMPSON[q] ?? 0) * Math.min(sampleW, capW);
    }
    availableW[i] = watts;
    poaWm2[i] = poaFirst;
  }
  return series;
}
