// Solar available at the battery bus for every step of one sky scenario: clear sky × sky clearness, split by
// Erbs (fed the true zenith), shaded by the site's exposure, transposed onto each array (Hay–Davies or isotropic,
// plus ground reflection), through the glass (Martin & Ruiz incidence losses), the module and the controller.
// A flat array is the tilt-0 case: it sees the GHI. The same irradiance at the pitch gives the cabin its solar gain
// (cabin.ts). The sky-independent geometry (incidence, beam ratio, shading)
// is worked out once per trip and reused by every scenario. The loop over samples calls each model through an
// instance built for the array, and allocates nothing.
import { CHEMISTRY } from './battery';
import { cabinModel, solarGainOf } from './cabin';
import { arrayOutput, controllerLimitW, type ArrayOutput } from './charge-controller';
import { erbsSplitter, type Split } from './decomposition';
import { CLEAR_GLASS, glassOf, type Glass } from './iam';
import type { Prepared } from './prepare';
import type { StepSky } from './recorded-sky';
import { cellTemperatureOf } from './pv-module';
import { beamFactor, diffuseFactor } from './site-exposure';
import { shiftSky, SKY_CLEARNESS } from './sky-outlook';
import { beamRatio, incidenceOn, surfaceTransposer, type SurfaceParts } from './transposition';

export type SolarSeries = {
  /** Controller output available, W (step average). */
  availableW: Float64Array;
  /** Plane-of-array irradiance of the first array (or GHI), W/m² (step average), for the ledger. */
  poaWm2: Float64Array;
  /** Solar gain into the cabin through its roof, walls and windows, W (step average). */
  cabinSolarW: Float64Array;
};

/** One array's chain of models, each an instance built once for the array. */
type ArrayModel = {
  transpose: ReturnType<typeof surfaceTransposer>;
  glass: Glass;
  cellC: ReturnType<typeof cellTemperatureOf>;
  output: ArrayOutput;
};

type Geometry = {
  arrays: ArrayModel[];
  cabinGain: ReturnType<typeof solarGainOf>;
  capW: number;
  /** Per sample: the share of the beam the site lets through. */
  beamF: Float64Array;
  /** Per step: the share of sky diffuse the site lets through. */
  diffF: Float64Array;
  /** Per sample × array: cos of the angle of incidence (clamped at 0) and Hay–Davies' beam ratio. */
  cosInc: Float64Array;
  rb: Float64Array;
  /** Per sample × array: the beam's incidence angle modifier. */
  beamIam: Float64Array;
  /** The planned sky's series, kept so the band can copy the steps whose sky the shift leaves unchanged. */
  planned: SolarSeries | null;
};

const geometryCache = new WeakMap<Prepared, Geometry>();

function arrayModels(p: Prepared): { arrays: ArrayModel[]; capW: number } {
  const rig = p.input.rig;
  const chargeV = rig.battery.nominalV * CHEMISTRY[rig.battery.chemistry].chargeVoltageRatio;
  const ctrl = rig.controller;
  const rho = p.input.options.groundReflectance;
  const arrays = rig.solarArrays.map((a) => {
    const tilt = a.mounting === 'flat' ? 0 : a.tiltDeg;
    return {
      transpose: surfaceTransposer(tilt, rho),
      glass: p.input.options.incidenceLosses ? glassOf(tilt) : CLEAR_GLASS,
      cellC: cellTemperatureOf(a.noctC, a.fit),
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
  const sun = p.sun;
  const ns = sun.weight.length;
  const g: Geometry = {
    arrays,
    cabinGain: solarGainOf(cabinModel(p.input.rig.cabin), p.input.options.groundReflectance),
    capW,
    beamF: new Float64Array(ns),
    diffF: new Float64Array(p.n),
    cosInc: new Float64Array(ns * m),
    rb: new Float64Array(ns * m),
    beamIam: new Float64Array(ns * m),
    planned: null,
  };
  const incidence = p.input.rig.solarArrays.map((a) =>
    incidenceOn(a.mounting === 'tilted' ? a.tiltDeg : 0, a.azimuthDeg),
  );
  for (let i = 0; i < p.n; i++) {
    const exp = p.exposures[p.exposureOf[i] ?? 0] ?? p.exposures[0];
    if (!exp) continue;
    g.diffF[i] = diffuseFactor(exp);
    for (let k = sun.start[i] ?? 0; k < (sun.start[i + 1] ?? 0); k++) {
      const alt = sun.altDeg[k] ?? 0;
      const az = sun.azDeg[k] ?? 0;
      g.beamF[k] = beamFactor(exp, alt, az);
      for (let j = 0; j < m; j++) {
        const cosInc = incidence[j];
        if (!cosInc) continue;
        const ci = Math.max(0, cosInc(90 - alt, az));
        g.cosInc[k * m + j] = ci;
        g.rb[k * m + j] = beamRatio(ci, sun.cosZ[k] ?? 0);
        g.beamIam[k * m + j] = arrays[j]?.glass.beamIam(ci) ?? 0;
      }
    }
  }
  geometryCache.set(p, g);
  return g;
}

/**
 * skyShift: 0 the planned sky, −1 one level better, +1 one level worse. sky: a recorded or forecast sky, whose
 * steps with a clearness replace the preset's and whose air temperatures replace the low/high curve.
 */
export function solarSeries(p: Prepared, skyShift: number, sky?: StepSky): SolarSeries {
  const g = geometry(p);
  const stops = p.input.trip.stops;
  const hayDavies = p.input.options.transposition === 'hay-davies';
  const clearness = stops.map((s) => SKY_CLEARNESS[shiftSky(s.skyOutlook, skyShift)]);
  const planned = skyShift === 0 || sky ? null : g.planned;
  const ambientC = sky?.ambientC ?? p.ambientC;
  const stepClearness = sky?.clearness;
  // A stop whose sky the shift leaves as planned (clear made better, overcast made worse) gives the planned figures.
  const same = stops.map((s, w) => planned !== null && clearness[w] === SKY_CLEARNESS[s.skyOutlook]);
  const availableW = new Float64Array(p.n);
  const poaWm2 = new Float64Array(p.n);
  const cabinSolarW = new Float64Array(p.n);
  const series = { availableW, poaWm2, cabinSolarW };
  if (skyShift === 0 && !sky) g.planned = series;
  const { arrays, capW, beamF, diffF, cosInc, rb, beamIam, cabinGain } = g;
  const m = arrays.length;
  const { start, weight, cosZ, cosZTrue, ghiClear } = p.sun;
  const split: Split = { dni: 0, dhi: 0, kt: 0 };
  const parts: SurfaceParts = { beam: 0, sky: 0, ground: 0 };
  const erbs = erbsSplitter();
  for (let i = 0; i < p.n; i++) {
    const from = start[i] ?? 0;
    const to = start[i + 1] ?? 0;
    if (from === to) continue;
    const w = p.stopOf[i] ?? 0;
    if (planned && same[w]) {
      availableW[i] = planned.availableW[i] ?? 0;
      poaWm2[i] = planned.poaWm2[i] ?? 0;
      cabinSolarW[i] = planned.cabinSolarW[i] ?? 0;
      continue;
    }
    const recorded = stepClearness?.[i] ?? Number.NaN;
    const f = Number.isNaN(recorded) ? (clearness[w] ?? 1) : recorded;
    const dniExtra = p.dniExtra[i] ?? 1361;
    const diff = diffF[i] ?? 1;
    const ambient = ambientC[i] ?? 20;
    let watts = 0;
    let poaFirst = 0;
    let cabinW = 0;
    for (let k = from; k < to; k++) {
      const ghiSky = (ghiClear[k] ?? 0) * f;
      if (ghiSky <= 0) continue;
      erbs(ghiSky, cosZTrue[k] ?? 0, dniExtra, split);
      // The site's shading of beam and diffuse; the beam arrives along the apparent sun direction.
      const dni = split.dni * (beamF[k] ?? 1);
      const dhi = split.dhi * diff;
      const ghi = dni * (cosZ[k] ?? 0) + dhi;
      cabinW += (weight[k] ?? 0) * cabinGain(dni, dhi, ghi, cosZ[k] ?? 0);
      const ai = hayDavies ? dni / dniExtra : 0; // isotropic sky: no circumsolar share
      let sampleW = 0;
      for (let j = 0; j < m; j++) {
        const a = arrays[j];
        if (!a) continue;
        const ci = cosInc[k * m + j] ?? 0;
        a.transpose(dni, dhi, ghi, ai, ci, rb[k * m + j] ?? 0, parts);
        // Plane-of-array irradiance for the cell temperature and the ledger; what passes the glass for power.
        const poa = parts.beam + parts.sky + parts.ground;
        if (j === 0) poaFirst += (weight[k] ?? 0) * poa;
        const passed =
          parts.beam * (beamIam[k * m + j] ?? 0) + parts.sky * a.glass.skyIam + parts.ground * a.glass.groundIam;
        sampleW += a.output(passed, a.cellC(ambient, poa));
      }
      watts += (weight[k] ?? 0) * Math.min(sampleW, capW);
    }
    availableW[i] = watts;
    poaWm2[i] = poaFirst;
    cabinSolarW[i] = cabinW;
  }
  return series;
}
