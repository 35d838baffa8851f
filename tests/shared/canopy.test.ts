// Site exposure as a continuous sky openness with a canopy's leaf-area index: beam through the canopy by
// Beer–Lambert (Campbell & Norman 1998, ch. 15; CHECK-VALUES §11, C), diffuse by the openness, the presets as named
// points on that scale, and bare deciduous cover in its hemisphere's leaf-off months.
import { describe, expect, it } from 'vitest';
import {
  canopyBeamTransmittance,
  canopyDiffuseTransmittance,
  leafOff,
  resolveExposure,
  SITE_PRESETS,
  simulateTrip,
} from '@/shared/engine';
import type { SiteExposure } from '@/shared/schemas/trip';
import { simpleTrip } from './trip-builder';

describe('Beer–Lambert through a canopy (Campbell & Norman 1998, C)', () => {
  it('when LAI is 3 with spherical leaves, then the beam passes 0.2231 with the sun overhead and 0.0498 at 60° from it', () => {
    expect(canopyBeamTransmittance(3, 90)).toBeCloseTo(0.2231, 4);
    expect(canopyBeamTransmittance(3, 30)).toBeCloseTo(0.0498, 4);
  });

  it('when LAI is 3, then the diffuse transmittance is 2·E3(1.5) = 0.11348 (exponential integral, Abramowitz & Stegun table 5.1, C)', () => {
    // E3(x) = ½·[e^−x·(1 − x) + x²·E1(x)], E1(1.5) = 0.1000195824.
    const e3 = 0.5 * (Math.exp(-1.5) * (1 - 1.5) + 2.25 * 0.1000195824);
    expect(canopyDiffuseTransmittance(3)).toBeCloseTo(2 * e3, 5);
    expect(canopyDiffuseTransmittance(0)).toBe(1);
  });

  it('when the openness is given, then the diffuse share is exactly that openness', () => {
    for (const o of [0, 5, 30, 72, 100])
      expect(
        resolveExposure({ kind: 'canopy', skyOpennessPct: o, leafAreaIndex: 3, deciduous: false }).diffuse,
      ).toBeCloseTo(o / 100, 12);
  });
});

/** A clear midsummer day's available solar for 1 kW of flat panels at 45° N, under an exposure. */
function dayWh(exposure: SiteExposure, arrive = '2027-06-21T00:00Z', lat = 45): number {
  const depart = new Date(Date.parse(arrive) + 86_400_000).toISOString();
  const t = simpleTrip({ solarW: 1000, capacityAh: 2000, initialSocPct: 10, lat, arrive, depart });
  const stops = t.trip.stops.map((s) => ({ ...s, exposure }));
  return simulateTrip({ ...t, trip: { ...t.trip, stops } }).ledger.reduce((s, r) => s + r.solarAvailableWh, 0);
}

describe('a continuous scale', () => {
  const open = dayWh({ kind: 'preset', preset: 'open' });
  const share = (o: number, lai = 3) =>
    dayWh({ kind: 'canopy', skyOpennessPct: o, leafAreaIndex: lai, deciduous: false }) / open;

  it('when the openness rises from 0 to 100 %, then the day’s harvest rises with it, with no gap between partial shade and deep forest', () => {
    const shares = [0, 5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100].map((o) => share(o));
    for (let k = 1; k < shares.length; k++) expect(shares[k]).toBeGreaterThan(shares[k - 1] ?? 0);
    // Every step of 10 points of openness moves the harvest by less than a fifth of an open day.
    for (let k = 2; k < shares.length; k++) expect((shares[k] ?? 0) - (shares[k - 1] ?? 0)).toBeLessThan(0.2);
    expect(shares.at(-1)).toBeCloseTo(1, 9);
    expect(shares.filter((s) => s > 0.1 && s < 0.6).length).toBeGreaterThanOrEqual(3);
  });

  it('when the same openness is an opening overhead in a thick canopy rather than a thin canopy all round, then the midday sun passes the opening and the day gives more', () => {
    // A thick canopy passes little itself, so 40 % openness must be a wide gap above it; a thin one passes much of
    // the sky itself, leaving only a small gap, and the high sun goes through leaves.
    expect(share(40, 5)).toBeGreaterThan(share(40, 1));
    const thick = resolveExposure({ kind: 'canopy', skyOpennessPct: 40, leafAreaIndex: 5, deciduous: false });
    const thin = resolveExposure({ kind: 'canopy', skyOpennessPct: 40, leafAreaIndex: 1, deciduous: false });
    expect(thick.horizonDeg[0]).toBeLessThan(thin.horizonDeg[0] ?? 0);
  });

  it.each([
    ['light-cover', 0.96, 1],
    ['partial-shade', 0.7, 0.85],
    ['deep-forest', 0.035, 0.065],
  ] as const)(
    'when the %s preset is used, then it is its named point on the scale and harvests %f–%f of an open day',
    (preset, lo, hi) => {
      const s = dayWh({ kind: 'preset', preset }) / open;
      expect(s).toBeGreaterThan(lo);
      expect(s).toBeLessThan(hi);
      expect(s).toBeCloseTo(share(SITE_PRESETS[preset].skyOpennessPct, SITE_PRESETS[preset].leafAreaIndex), 12);
    },
  );
});

describe('deciduous cover', () => {
  it.each([
    [0, 45, true],
    [3, 45, true],
    [6, 45, false],
    [10, 45, true],
    [0, -35, false],
    [6, -35, true],
  ])(
    'when the month is %d at latitude %d, then leaf-off is %s (northern Nov–Apr, southern May–Oct; from memory)',
    (month, lat, off) => {
      expect(leafOff(month, lat)).toBe(off);
    },
  );

  const forest = (deciduous: boolean): SiteExposure => ({
    kind: 'canopy',
    skyOpennessPct: 5.5,
    leafAreaIndex: 5,
    deciduous,
  });

  it('when a deciduous forest is bare in a northern January, then it lets through far more than an evergreen one', () => {
    const jan = '2027-01-15T00:00Z';
    expect(dayWh(forest(true), jan)).toBeGreaterThan(3 * dayWh(forest(false), jan));
  });

  it('when a deciduous forest is in leaf in a northern July, then it gives what an evergreen one does', () => {
    expect(dayWh(forest(true), '2027-07-15T00:00Z')).toBeCloseTo(dayWh(forest(false), '2027-07-15T00:00Z'), 9);
  });

  it('when the forest is south of the equator, then its leaves fall in July and not in January', () => {
    expect(dayWh(forest(true), '2027-07-15T00:00Z', -35)).toBeGreaterThan(
      3 * dayWh(forest(false), '2027-07-15T00:00Z', -35),
    );
    expect(dayWh(forest(true), '2027-01-15T00:00Z', -35)).toBeCloseTo(
      dayWh(forest(false), '2027-01-15T00:00Z', -35),
      9,
    );
  });
});
