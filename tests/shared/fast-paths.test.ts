// The engine's hot loops use allocation-free or Intl-light versions of a few library calls. Each must give the
// very same numbers and strings as the call it stands in for, so these compare them bit for bit over many inputs.
import { IANAZone } from 'luxon';
import { describe, expect, it } from 'vitest';
import { sunPosition } from '@/shared/engine';
import { sunPositionInto } from '@/shared/engine/sun-position';
import { climateLoads } from '@/shared/engine/climate';
import { prepare } from '@/shared/engine/prepare';
import { solarSeries } from '@/shared/engine/solar';
import { localLabel, utcIsoString, zoneOffsetMin } from '@/shared/engine/time-grid';
import { engineInputSchema } from '@/shared/schemas/engine-input';
import { GOLDEN_CASES } from './golden-inputs';

// A fixed pseudo-random sequence (LCG), so a failure can be replayed.
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1_664_525) + 1_013_904_223) >>> 0;
    return s / 4_294_967_296;
  };
}

describe('fast paths against the calls they replace', () => {
  it('when the sun is placed without allocating, then altitude and azimuth equal suncalc bit for bit', () => {
    const rnd = lcg(7);
    const out = new Float64Array(3);
    let mismatches = 0;
    for (let i = 0; i < 20_000; i++) {
      // 1900–2100, fractional milliseconds included (Date truncates them; the fast path must too).
      const ms = Date.UTC(1900, 0, 1) + rnd() * 200 * 365.25 * 86_400_000;
      const lat = rnd() * 180 - 90;
      const lon = rnd() * 360 - 180;
      const ref = sunPosition(ms, lat, lon);
      sunPositionInto(ms, lat, lon, out, 0);
      if (!Object.is(out[0], ref.altitudeDeg) || !Object.is(out[1], ref.azimuthDeg)) mismatches++;
    }
    expect(mismatches).toBe(0);
  });

  it('when zone offsets are read from Intl format(), then they equal luxon IANAZone.offset for every zone', () => {
    const rnd = lcg(11);
    const zones = Intl.supportedValuesOf('timeZone');
    let mismatches = 0;
    for (const name of zones) {
      const zone = IANAZone.create(name);
      for (let k = 0; k < 12; k++) {
        const ms = Math.floor(Date.UTC(1880, 0, 1) + rnd() * 200 * 365.25 * 86_400_000);
        if (!Object.is(zoneOffsetMin(zone, ms), zone.offset(ms))) mismatches++;
      }
    }
    expect(zones.length).toBeGreaterThan(300);
    expect(mismatches).toBe(0);
    expect(zoneOffsetMin(IANAZone.create('Not/AZone'), 0)).toBeNaN();
  });

  it('when ISO labels are built without Date, then they equal toISOString and the Date-built local label', () => {
    const rnd = lcg(3);
    const viaDate = (utcMs: number, offsetMin: number): string => {
      const wall = new Date(utcMs + offsetMin * 60_000).toISOString().slice(0, 16);
      const abs = Math.abs(offsetMin);
      return `${wall}${offsetMin < 0 ? '-' : '+'}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
    };
    const offsets = [0, 60, -420, 570, 630, 765, -210, 345, -0.5];
    let mismatches = 0;
    for (let i = 0; i < 20_000; i++) {
      let ms = Math.floor(rnd() * 2.6e14) - 1e13; // 1653–10208: both sides of the fast path's range
      if (i % 3 === 0) ms = Math.round(ms / 3_600_000) * 3_600_000;
      if (i % 7 === 0) ms += 0.5;
      const off = offsets[i % offsets.length] ?? 0;
      if (utcIsoString(ms) !== new Date(ms).toISOString()) mismatches++;
      if (localLabel(ms, off) !== viaDate(ms, off)) mismatches++;
    }
    for (const ms of [0, 951_782_400_000, 951_868_800_000, 253_402_300_799_999, 253_402_300_800_000]) {
      if (utcIsoString(ms) !== new Date(ms).toISOString()) mismatches++;
    }
    expect(mismatches).toBe(0);
  });

  it('when the sky band copies the planned loads where its sky is unchanged, then they equal loads worked out afresh', () => {
    let compared = 0;
    for (const [name, draft] of Object.entries(GOLDEN_CASES)) {
      const p = prepare(engineInputSchema.parse(draft));
      if (p.thermostats.length === 0) continue;
      const planned = solarSeries(p, 0);
      const like = {
        cabinSolarW: planned.cabinSolarW,
        ambientC: p.ambientC,
        loads: climateLoads(p, planned.cabinSolarW),
      };
      for (const shift of [-1, 1]) {
        const band = solarSeries(p, shift);
        const copied = climateLoads(p, band.cabinSolarW, p.ambientC, like);
        const afresh = climateLoads(p, band.cabinSolarW, p.ambientC);
        const columns = [
          'acWh',
          'dcWh',
          'propaneHeatWh',
          'acRunningW',
          'acSurgeExtraW',
          'acStandbyOn',
          'cabinC',
        ] as const;
        for (const c of columns) expect(Array.from(copied[c]), `${name} ${shift} ${c}`).toEqual(Array.from(afresh[c]));
        for (const [j, run] of afresh.thermostatRun) {
          expect(Array.from(copied.thermostatRun.get(j) ?? []), `${name} ${shift} run ${j}`).toEqual(Array.from(run));
        }
        expect(copied.heavy.map((h) => Array.from(h.runningWh))).toEqual(
          afresh.heavy.map((h) => Array.from(h.runningWh)),
        );
        expect(Array.from(copied.battery.capacityShare)).toEqual(Array.from(afresh.battery.capacityShare));
        compared++;
      }
    }
    // The benchmark trips (a roof air conditioner and heaters) and the demo trips have thermostat-run appliances.
    expect(compared).toBeGreaterThan(4);
  });
});
