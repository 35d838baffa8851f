// Solar available at the battery bus for every step of one sky scenario: clear sky × sky clearness, split by
// Erbs, shaded by the site's exposure, transposed onto each array, through the module and controller models.
import type { SolarArray } from '../schemas/rig';
import { CHEMISTRY } from './battery';
import { controllerLimitW, controllerOutputW } from './charge-controller';
import { erbs } from './decomposition';
import { SAMPLES, type Prepared } from './prepare';
import { effectiveNoctC, noctCellTempC, pvDcPowerW } from './pv-module';
import { beamFactor, diffuseFactor, type ResolvedExposure } from './site-exposure';
import { shiftSky, SKY_CLEARNESS } from './sky-outlook';
import { planeOfArray } from './transposition';

const RAD = Math.PI / 180;
const SIMPSON = [1 / 6, 4 / 6, 1 / 6] as const;

type ArrayModel = { a: SolarArray; tilt: number; noct: number; gamma: number };

export type SolarSeries = {
  /** Controller output available, W (step average). */
  availableW: Float64Array;
  /** Plane-of-array irradiance of the first array (or GHI), W/m² (step average), for the ledger. */
  poaWm2: Float64Array;
};

function sampleW(p: Prepared, models: readonly ArrayModel[], exp: ResolvedExposure, k: number, i: number, clearness: number): { w: number; poa: number } {
  const alt = p.alt[k] ?? -90;
  if (alt <= 0) return { w: 0, poa: 0 };
  const rig = p.input.rig;
  const opt = p.input.options;
  const az = p.az[k] ?? 180;
  const zen = 90 - alt;
  const dniExtra = p.dniExtra[i] ?? 1361;
  const split = erbs((p.ghiClear[k] ?? 0) * clearness, zen, dniExtra);
  const dni = split.dni * beamFactor(exp, alt, az);
  const dhi = split.dhi * diffuseFactor(exp);
  const ghi = dni * Math.cos(zen * RAD) + dhi;
  const chargeV = rig.battery.nominalV * CHEMISTRY[rig.battery.chemistry].chargeVoltageRatio;
  const ctrl = rig.controller;
  let w = 0;
  let firstPoa = -1;
  for (const m of models) {
    const poa = planeOfArray({ ghi, dni, dhi, dniExtra, zenithDeg: zen, sunAzDeg: az, tiltDeg: m.tilt, surfaceAzDeg: m.a.azimuthDeg, reflectance: opt.groundReflectance, model: opt.transposition });
    if (firstPoa < 0) firstPoa = poa;
    const cell = noctCellTempC(p.ambientC[i] ?? 20, poa, m.noct);
    const dcW = pvDcPowerW(m.a.ratedW, poa, cell, m.gamma, m.a.derate);
    w += ctrl ? controllerOutputW(ctrl, dcW, chargeV, m.a.vmpV) : 0;
  }
  const cap = ctrl ? controllerLimitW(ctrl, chargeV) : 0;
  return { w: Math.min(w, cap), poa: firstPoa < 0 ? ghi : firstPoa };
}

/** skyShift: 0 the planned sky, −1 one level better, +1 one level worse. */
export function solarSeries(p: Prepared, skyShift: number): SolarSeries {
  const stops = p.input.trip.stops;
  const models: ArrayModel[] = p.input.rig.solarArrays.map((a) => ({
    a, tilt: a.mounting === 'flat' ? 0 : a.tiltDeg, noct: effectiveNoctC(a.noctC, a.fit), gamma: a.gammaPctPerC / 100,
  }));
  const availableW = new Float64Array(p.n);
  const poaWm2 = new Float64Array(p.n);
  for (let i = 0; i < p.n; i++) {
    const stopIdx = p.stopOf[i] ?? 0;
    const stop = stops[stopIdx];
    if (!stop || (p.alt[i * SAMPLES + 1] ?? -90) <= -8) continue;
    const where = p.where[i] ?? -1;
    const exp = where >= 0 ? (p.exposures[where] ?? p.openExposure) : p.openExposure;
    const clearness = SKY_CLEARNESS[shiftSky(stop.skyOutlook, skyShift)];
    let w = 0;
    let poa = 0;
    for (let s = 0; s < SAMPLES; s++) {
      const r = sampleW(p, models, exp, i * SAMPLES + s, i, clearness);
      w += (SIMPSON[s] ?? 0) * r.w;
      poa += (SIMPSON[s] ?? 0) * r.poa;
    }
    availableW[i] = w;
    poaWm2[i] = poa;
  }
  return { availableW, poaWm2 };
}
