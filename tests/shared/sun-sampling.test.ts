// Sampling the sun in the hours where it rises or sets: the engine's samples must integrate the hour's clear-sky
// irradiance as a fine (ten-second) integration of the same models does. Three samples (start, middle, end) were
// off by up to about a tenth of such an hour's energy.
import { describe, expect, it } from 'vitest';
import { haurwitzGhi, sunPosition } from '@/shared/engine';
import { prepare } from '@/shared/engine/prepare';
import { engineInputSchema } from '@/shared/schemas';
import { simpleTrip } from './trip-builder';

/** Mean Haurwitz GHI over [t0, t0 + 1 h), by ten-second steps. */
function fineMean(t0: number, lat: number, lon: number): number {
  let sum = 0;
  const steps = 360;
  for (let q = 0; q < steps; q++) {
    const alt = sunPosition(t0 + (q + 0.5) * 10_000, lat, lon).altitudeDeg;
    sum += alt > 0 ? haurwitzGhi(90 - alt) : 0;
  }
  return sum / steps;
}

const SITES = [
  { lat: 45, lon: 0, arrive: '2027-06-21T00:00Z' },
  { lat: 57.2, lon: -4.8, arrive: '2027-09-14T00:00Z' },
  { lat: -34, lon: 139, arrive: '2027-10-02T00:00Z' },
  { lat: 64, lon: -21, arrive: '2027-12-20T00:00Z' },
];

describe('sun samples in sunrise and sunset hours', () => {
  it('when the sun crosses the horizon inside an hour, then the samples integrate its irradiance within 1 % of a fine integration', () => {
    let crossings = 0;
    for (const site of SITES) {
      const depart = new Date(Date.parse(site.arrive) + 2 * 86_400_000).toISOString();
      const p = prepare(engineInputSchema.parse(simpleTrip({ ...site, depart })));
      for (let i = 0; i < p.n; i++) {
        const t = p.startMs[i] ?? 0;
        const altStart = sunPosition(t, site.lat, site.lon).altitudeDeg;
        const altEnd = sunPosition(t + 3_600_000, site.lat, site.lon).altitudeDeg;
        if (altStart > 0 === altEnd > 0) continue;
        crossings++;
        let sampled = 0;
        for (let k = p.sun.start[i] ?? 0; k < (p.sun.start[i + 1] ?? 0); k++)
          sampled += (p.sun.weight[k] ?? 0) * (p.sun.ghiClear[k] ?? 0);
        const fine = fineMean(t, site.lat, site.lon);
        // Within 1 % of the hour's energy, or 0.2 W/m² where the hour holds almost nothing.
        expect(Math.abs(sampled - fine), `${site.arrive} step ${i}`).toBeLessThan(Math.max(0.01 * fine, 0.2));
      }
    }
    expect(crossings).toBeGreaterThanOrEqual(14);
  });

  it('when a step is fully lit, then it keeps three Simpson samples (start, middle, end)', () => {
    const p = prepare(engineInputSchema.parse(simpleTrip()));
    const noon = 12; // 12:00–13:00 UTC at 45° N, 0° E in June
    expect((p.sun.start[noon + 1] ?? 0) - (p.sun.start[noon] ?? 0)).toBe(3);
    expect([...p.sun.weight.slice(p.sun.start[noon], p.sun.start[noon + 1])]).toEqual([1 / 6, 4 / 6, 1 / 6]);
  });

  it('when a step is dark, then it has no samples', () => {
    const p = prepare(engineInputSchema.parse(simpleTrip()));
    expect((p.sun.start[1] ?? 0) - (p.sun.start[0] ?? 0)).toBe(0); // 00:00–01:00 UTC
  });
});
