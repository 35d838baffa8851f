// The solar loop in solar.ts folds the models together for speed (geometry shared by the sky scenarios, the Erbs
// fraction written out, transposition and module terms inlined). Here every step of a day is recomputed through
// the published-model functions one after the other — sun position (suncalc) → extraterrestrial → clear sky →
// sky outlook → Erbs → site exposure → transposition → incidence losses → PV module → controller, weighted by the
// engine's Simpson samples over the hour —
// and the two must agree to 1e-9 relative (the inlined sums are grouped differently, so not always bit for bit).
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import {
  ambientC,
  beamFactor,
  CHEMISTRY,
  controllerLimitW,
  arrayOutput,
  dayOfYearUtc,
  diffuseFactor,
  effectiveNoctC,
  erbs,
  extraterrestrialW,
  haurwitzGhi,
  ineichenPerez,
  kastenYoungAirMass,
  noctCellTempC,
  poaComponents,
  cosIncidence,
  martinRuizDiffuse,
  martinRuizIam,
  pressureRatio,
  resolveExposure,
  shiftSky,
  SKY_CLEARNESS,
  sunPositionWithTrue,
} from '@/shared/engine';
import { prepare } from '@/shared/engine/prepare';
import { solarSeries } from '@/shared/engine/solar';
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '@/shared/schemas';

/** Controller output at one instant through the model functions, for the stop the rig is at. */
function chainW(
  input: EngineInput,
  stopIndex: number,
  utcMs: number,
  dayOfYear: number,
  ambient: number,
  skyShift: number,
  withIam = true,
): { watts: number; poaFirst: number } {
  const stop = input.trip.stops[stopIndex];
  if (!stop) throw new Error('no stop');
  const { rig, options } = input;
  const sun = sunPositionWithTrue(utcMs, stop.lat, stop.lon);
  const zenith = 90 - sun.altitudeDeg;
  const dniExtra = extraterrestrialW(dayOfYear, options.solarConstantWm2);
  let ghiClear = 0;
  if (sun.altitudeDeg > 0) {
    ghiClear =
      stop.linkeTurbidity === undefined
        ? haurwitzGhi(zenith)
        : ineichenPerez({
            zenithDeg: zenith,
            airMassAbsolute: kastenYoungAirMass(zenith) * pressureRatio(stop.elevationM),
            linkeTurbidity: stop.linkeTurbidity,
            elevationM: stop.elevationM,
            dniExtra,
          }).ghi;
  }
  const ghiSky = ghiClear * SKY_CLEARNESS[shiftSky(stop.skyOutlook, skyShift)];
  const split = erbs(ghiSky, 90 - sun.trueAltitudeDeg, dniExtra); // Erbs takes the true zenith
  const exposure = resolveExposure(stop.exposure);
  const dni = split.dni * beamFactor(exposure, sun.altitudeDeg, sun.azimuthDeg);
  const dhi = split.dhi * diffuseFactor(exposure);
  const ghi = dni * Math.cos(zenith * (Math.PI / 180)) + dhi;
  const chargeV = rig.battery.nominalV * CHEMISTRY[rig.battery.chemistry].chargeVoltageRatio;
  const ctrl = rig.controller;
  if (!ctrl) return { watts: 0, poaFirst: 0 };
  let watts = 0;
  let poaFirst = 0;
  rig.solarArrays.forEach((a, j) => {
    const tilt = a.mounting === 'tilted' ? a.tiltDeg : 0;
    const c = poaComponents({
      ghi,
      dni,
      dhi,
      dniExtra,
      zenithDeg: zenith,
      sunAzDeg: sun.azimuthDeg,
      tiltDeg: tilt,
      surfaceAzDeg: a.azimuthDeg,
      reflectance: options.groundReflectance,
      model: options.transposition,
    });
    const poa = c.beam + c.circumsolar + c.isotropic + c.ground;
    const cosTheta = cosIncidence(zenith, sun.azimuthDeg, tilt, a.azimuthDeg);
    const diffuseIam = martinRuizDiffuse(tilt);
    const effective = withIam
      ? (c.beam + c.circumsolar) * martinRuizIam(cosTheta) + c.isotropic * diffuseIam.sky + c.ground * diffuseIam.ground
      : poa;
    if (j === 0) poaFirst = poa;
    const cell = noctCellTempC(ambient, poa, effectiveNoctC(a.noctC, a.fit));
    watts += arrayOutput(ctrl, a, chargeV)(effective, cell);
  });
  return { watts: Math.min(watts, controllerLimitW(ctrl, chargeV)), poaFirst };
}

function closeTo(actual: number, expected: number): boolean {
  return Math.abs(actual - expected) <= 1e-9 * Math.max(Math.abs(expected), 1e-6);
}

type Case = { name: string; draft: EngineInputDraft; shifts: number[] };

const stop = (o: Record<string, unknown>): EngineInputDraft['trip']['stops'][number] => ({
  name: 'Site',
  lat: 44.5,
  lon: -110.6,
  timeZone: 'America/Denver',
  arriveAt: '2027-06-20T06:00Z',
  departAt: '2027-06-22T06:00Z',
  lowC: 6,
  highC: 28,
  ...o,
});

const rigOf = (o: Record<string, unknown>): EngineInputDraft['rig'] => ({
  name: 'Rig',
  battery: { chemistry: 'lifepo4', capacityAh: 300, nominalV: 12.8 },
  ...o,
});

const CASES: Case[] = [
  {
    name: 'flat array, MPPT, open site, Hay–Davies, clear, Haurwitz',
    draft: {
      trip: { name: 'T', stops: [stop({ skyOutlook: 'clear' })], drives: [] },
      rig: rigOf({
        solarArrays: [{ ratedW: 600, mounting: 'flat', fit: 'flush' }],
        controller: { kind: 'mppt', maxAmps: 80 },
      }),
      options: { transposition: 'hay-davies' },
    },
    shifts: [0, 1],
  },
  {
    name: 'tilted and flat arrays, PWM, custom horizon with canopy, isotropic, hazy, Ineichen–Perez',
    draft: {
      trip: {
        name: 'T',
        stops: [
          stop({
            lat: -33.9,
            lon: 18.4,
            timeZone: 'Africa/Johannesburg',
            arriveAt: '2027-03-10T02:00Z',
            departAt: '2027-03-12T02:00Z',
            elevationM: 900,
            linkeTurbidity: 3.5,
            skyOutlook: 'hazy',
            exposure: { kind: 'custom', horizonDeg: [5, 10, 30, 45, 20, 10, 15, 25], canopyTransmittance: 0.3 },
          }),
        ],
        drives: [],
      },
      rig: rigOf({
        battery: { chemistry: 'agm', capacityAh: 200, nominalV: 12 },
        solarArrays: [
          { ratedW: 200, mounting: 'tilted', tiltDeg: 35, azimuthDeg: 20, fit: 'racked', vmpV: 19 },
          { ratedW: 150, mounting: 'flat', fit: 'flush', vmpV: 17.5 },
        ],
        controller: { kind: 'pwm', maxAmps: 40 },
      }),
      options: { transposition: 'isotropic', groundReflectance: 0.3 },
    },
    shifts: [0, -1],
  },
  {
    name: 'tilted array, MPPT capped by its current, partial-shade preset, Hay–Davies, broken cloud',
    draft: {
      trip: {
        name: 'T',
        stops: [
          stop({
            lat: 51.2,
            lon: 7.1,
            timeZone: 'Europe/Berlin',
            arriveAt: '2027-07-01T03:00Z',
            departAt: '2027-07-03T03:00Z',
            skyOutlook: 'broken-cloud',
            exposure: { kind: 'preset', preset: 'partial-shade' },
          }),
        ],
        drives: [],
      },
      rig: rigOf({
        solarArrays: [{ ratedW: 900, mounting: 'tilted', tiltDeg: 50, azimuthDeg: 200, fit: 'racked' }],
        controller: { kind: 'mppt', maxAmps: 12 },
      }),
      options: { transposition: 'hay-davies' },
    },
    shifts: [0, -1, 1],
  },
];

describe('fast solar loop against the chain of model functions', () => {
  for (const c of CASES) {
    for (const shift of c.shifts) {
      it(`when ${c.name} (sky shift ${shift}), then every hour of the first day matches within 1e-9`, () => {
        const input = engineInputSchema.parse(c.draft);
        const p = prepare(input);
        const fast = solarSeries(p, 0);
        const series = shift === 0 ? fast : solarSeries(p, shift);
        const s = input.trip.stops[0];
        if (!s) throw new Error('no stop');
        let daylight = 0;
        for (let i = 0; i < 24; i++) {
          const t = p.startMs[i] ?? 0;
          const stepH = p.stepH[i] ?? 1;
          const local = DateTime.fromMillis(t, { zone: s.timeZone });
          const ambient = ambientC(s.lowC, s.highC, (local.hour * 60 + local.minute + stepH * 30) / 60);
          let expectW = 0;
          let expectPoa = 0;
          // The engine's own sample instants and Simpson weights for the step (finer where the sun crosses the
          // horizon; their spacing is checked on its own in sun-sampling.test.ts).
          for (let k = p.sun.start[i] ?? 0; k < (p.sun.start[i + 1] ?? 0); k++) {
            const r = chainW(input, 0, p.sun.atMs[k] ?? 0, dayOfYearUtc(t), ambient, shift);
            expectW += (p.sun.weight[k] ?? 0) * r.watts;
            expectPoa += (p.sun.weight[k] ?? 0) * r.poaFirst;
          }
          if (expectW > 0) daylight++;
          const gotW = series.availableW[i] ?? Number.NaN;
          const gotPoa = series.poaWm2[i] ?? Number.NaN;
          expect(closeTo(gotW, expectW), `step ${i}: ${gotW} W vs ${expectW} W`).toBe(true);
          expect(closeTo(gotPoa, expectPoa), `step ${i}: ${gotPoa} W/m² vs ${expectPoa} W/m²`).toBe(true);
        }
        expect(daylight).toBeGreaterThan(8); // the day really has sun in it, so the comparison is not of zeros
      });
    }
  }

  it('when the controller current is small, then the cap is what binds at midday in the chain and the loop alike', () => {
    const c = CASES[2];
    if (!c) throw new Error('missing case');
    const input = engineInputSchema.parse(c.draft);
    const p = prepare(input);
    const capW = 12 * 12.8 * CHEMISTRY.lifepo4.chargeVoltageRatio;
    const series = solarSeries(p, 0);
    expect(Math.max(...series.availableW)).toBeCloseTo(capW, 9);
  });

  it.each([
    [45, -1, '2027-06-21', 'Europe/Paris'],
    [57, -5, '2027-09-15', 'Europe/London'],
    [33.4, -113, '2027-04-06', 'America/Phoenix'],
  ] as const)(
    'when flat panels at %s° N spend a clear day, then incidence losses take 2.7–7.3 % of the day (Martin & Ruiz)',
    (lat, lon, date, zone) => {
      const input = engineInputSchema.parse({
        trip: {
          name: 'T',
          stops: [stop({ lat, lon, timeZone: zone, arriveAt: `${date}T00:00Z`, departAt: `${date}T23:59Z` })],
          drives: [],
        },
        rig: rigOf({ solarArrays: [{ ratedW: 1000, mounting: 'flat' }], controller: { kind: 'mppt', maxAmps: 500 } }),
      });
      let withIam = 0;
      let without = 0;
      for (let t = Date.parse(`${date}T00:00Z`); t < Date.parse(`${date}T23:59Z`); t += 300_000) {
        withIam += chainW(input, 0, t, dayOfYearUtc(t), 20, 0, true).watts;
        without += chainW(input, 0, t, dayOfYearUtc(t), 20, 0, false).watts;
      }
      const loss = 1 - withIam / without;
      expect(loss).toBeGreaterThan(0.027);
      expect(loss).toBeLessThan(0.073);
    },
  );
});
