// suncalc (the engine's sun position) against astronomy-engine, a high-precision reference, over 800
// deterministic place/time pairs from 65° S to 65° N, 2020–2035. Only pairs with the sun more than 5° up are
// compared (the engine's harvest comes from there, and refraction models differ near the horizon); both sides
// are refraction-corrected: suncalc's altitude is apparent, and astronomy-engine's Horizon(..., 'normal') adds
// its standard refraction. Measured when written: max |Δaltitude| 0.0146°, max |Δazimuth|·cos(altitude) 0.0130°.
import * as Astronomy from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { sunPosition, sunPositionWithTrue } from '@/shared/engine';

const BOUND_DEG = 0.02; // the measured maxima above, rounded up

/** A fixed linear congruential generator so the pairs are the same on every run. */
function lcg(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 1103515245 + 12345) % 2147483648;
    return s / 2147483648;
  };
}

type Pair = { lat: number; lon: number; ms: number };

/** Pairs from 65° S to 65° N, 2020–2035, whose reference altitude (refracted or not) is above `minAltDeg`. */
function pairs(count: number, seed: number, minAltDeg: number, refraction: 'normal' | undefined): Pair[] {
  const rnd = lcg(seed);
  const out: Pair[] = [];
  while (out.length < count) {
    const lat = -65 + 130 * rnd();
    const lon = -180 + 360 * rnd();
    const ms = Date.UTC(2020, 0, 1) + rnd() * 15 * 365.25 * 86_400_000;
    if (reference({ lat, lon, ms }, refraction).altitude > minAltDeg) out.push({ lat, lon, ms });
  }
  return out;
}

function reference(p: Pair, refraction: 'normal' | undefined): Astronomy.HorizontalCoordinates {
  const d = new Date(p.ms);
  const obs = new Astronomy.Observer(p.lat, p.lon, 0);
  const eq = Astronomy.Equator(Astronomy.Body.Sun, d, obs, true, true);
  return Astronomy.Horizon(d, obs, eq.ra, eq.dec, refraction);
}

describe('suncalc against astronomy-engine', () => {
  const sample = pairs(800, 12345, 5, 'normal');

  it('when 800 sunlit pairs span 65° S to 65° N, then the tropics and both high latitudes are covered', () => {
    expect(sample.some((p) => Math.abs(p.lat) < 23.44)).toBe(true);
    expect(sample.some((p) => p.lat > 60)).toBe(true);
    expect(sample.some((p) => p.lat < -60)).toBe(true);
  });

  it(`when compared pair by pair, then altitude and azimuth agree within ${BOUND_DEG}°`, () => {
    let maxAlt = 0;
    let maxAz = 0;
    for (const p of sample) {
      const ref = reference(p, 'normal');
      const ours = sunPosition(p.ms, p.lat, p.lon);
      maxAlt = Math.max(maxAlt, Math.abs(ours.altitudeDeg - ref.altitude));
      const dAz = Math.abs(ours.azimuthDeg - ref.azimuth);
      // Azimuth error as an angle on the sky (it grows without meaning near the zenith).
      maxAz = Math.max(maxAz, Math.min(dAz, 360 - dAz) * Math.cos((ref.altitude * Math.PI) / 180));
    }
    expect(maxAlt).toBeLessThan(BOUND_DEG);
    expect(maxAz).toBeLessThan(BOUND_DEG);
  });

  it('when the true (unrefracted) altitude is read, then it matches astronomy-engine without refraction within 0.02°, down to the horizon', () => {
    let maxAlt = 0;
    for (const p of pairs(300, 777, -3, undefined)) {
      const ref = reference(p, undefined);
      maxAlt = Math.max(maxAlt, Math.abs(sunPositionWithTrue(p.ms, p.lat, p.lon).trueAltitudeDeg - ref.altitude));
    }
    expect(maxAlt).toBeLessThan(BOUND_DEG);
  });

  it('when the sun sits on the horizon, then the apparent altitude is about half a degree above the true one', () => {
    // Sunrise at Greenwich on the equinox: refraction at the horizon is about 0.5–0.6° (standard atmosphere).
    let ms = Date.UTC(2027, 2, 20, 5, 0);
    while (sunPositionWithTrue(ms, 51.48, 0).trueAltitudeDeg < 0) ms += 10_000;
    const s = sunPositionWithTrue(ms, 51.48, 0);
    expect(s.altitudeDeg - s.trueAltitudeDeg).toBeGreaterThan(0.4);
    expect(s.altitudeDeg - s.trueAltitudeDeg).toBeLessThan(0.7);
  });
});
