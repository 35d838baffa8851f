import { describe, expect, it } from 'vitest';
import { duration } from '@/components/format/duration';
import { driveToForm, formToDrive, shownHours } from '@/components/route/drive-form-values';
import {
  basemapPaths,
  fitProjection,
  pointToLatLon,
  projectStops,
  scaleBar,
  visibleExtent,
} from '@/components/route/route-map-geometry';
import type { LedgerRow } from '@/shared/engine/result-types';
import { greatCircleKm } from '@/shared/geo/great-circle';
import { chargeTone, lowestChargeByStop } from '@/shared/route-charge';
import { socTrack } from '@/shared/budget-result';
import type { Drive } from '@/shared/schemas/trip';

const highland = [
  { lat: 56.98, lon: -5.12 },
  { lat: 57.16, lon: -4.79 },
  { lat: 57.58, lon: -5.78 },
  { lat: 57.42, lon: -4.48 },
];
const size = { width: 600, height: 400, padding: 36 };

describe('route map geometry', () => {
  it('when the stops are fitted, then every one lands inside the padded box', () => {
    const projection = fitProjection(highland, size);
    if (!projection) throw new Error('no projection');
    for (const p of projectStops(highland, projection)) {
      expect(p.x).toBeGreaterThanOrEqual(size.padding - 0.5);
      expect(p.x).toBeLessThanOrEqual(size.width - size.padding + 0.5);
      expect(p.y).toBeGreaterThanOrEqual(size.padding - 0.5);
      expect(p.y).toBeLessThanOrEqual(size.height - size.padding + 0.5);
    }
  });

  it('when there is a single stop, then the map still has a scale and the stop sits in the middle', () => {
    const projection = fitProjection([{ lat: 57, lon: -5 }], size);
    const [p] = projection ? projectStops([{ lat: 57, lon: -5 }], projection) : [];
    expect(p?.x).toBeCloseTo(300, 0);
    // Mercator stretches latitude, so the middle of the range is a hair off the middle of the map.
    expect(p?.y).toBeCloseTo(200, -1);
  });

  it('when the map has no width yet or no stops, then there is no projection', () => {
    expect(fitProjection(highland, { width: 0, height: 400, padding: 36 })).toBeNull();
    expect(fitProjection([], size)).toBeNull();
  });

  it('when a stop is projected and read back, then it is the same place to about a metre', () => {
    const projection = fitProjection(highland, size);
    if (!projection) throw new Error('no projection');
    projectStops(highland, projection).forEach((p, i) => {
      const back = pointToLatLon(projection, p.x, p.y);
      expect(greatCircleKm(back ?? { lat: 0, lon: 0 }, highland[i] ?? { lat: 0, lon: 0 })).toBeLessThan(0.002);
    });
  });

  it('when the basemap extent is worked out, then it covers the whole screen on the half-degree grid', () => {
    const projection = fitProjection(highland, size);
    if (!projection) throw new Error('no projection');
    const box = visibleExtent(projection, size);
    if (!box) throw new Error('no extent');
    for (const v of [box.west, box.south, box.east, box.north]) expect(Number.isInteger(v * 2)).toBe(true);
    const corners = [projection.invert?.([0, 0]), projection.invert?.([size.width, size.height])];
    expect(box.west).toBeLessThanOrEqual(corners[0]?.[0] ?? 0);
    expect(box.north).toBeGreaterThanOrEqual(corners[0]?.[1] ?? 0);
    expect(box.east).toBeGreaterThanOrEqual(corners[1]?.[0] ?? 0);
    expect(box.south).toBeLessThanOrEqual(corners[1]?.[1] ?? 0);
  });

  it('when land and borders are drawn, then each ring is one closed subpath and each border an open one', () => {
    const projection = fitProjection(highland, size);
    if (!projection) throw new Error('no projection');
    const ring: [number, number][] = [
      [-5.5, 56.8],
      [-5, 56.8],
      [-5, 57.2],
      [-5.5, 56.8],
    ];
    const paths = basemapPaths(
      { detail: '10m', bbox: [-6, 56.5, -4, 58], land: [ring, ring], borders: [ring.slice(0, 2)] },
      projection,
    );
    expect(paths.land.match(/M/g)).toHaveLength(2);
    expect(paths.land.match(/Z/g)).toHaveLength(2);
    expect(paths.borders).not.toContain('Z');
  });

  it('when the scale bar is chosen, then it is a round length that fits and matches the map', () => {
    const projection = fitProjection(highland, size);
    if (!projection) throw new Error('no projection');
    const bar = scaleBar(projection, size, 150);
    if (!bar) throw new Error('no bar');
    expect(bar.px).toBeLessThanOrEqual(150);
    expect(bar.px).toBeGreaterThan(150 / 5);
    expect(String(bar.km)).toMatch(/^[125]0*$/);
    const mid = size.height / 2;
    const a = pointToLatLon(projection, 100, mid);
    const b = pointToLatLon(projection, 100 + bar.px, mid);
    expect(greatCircleKm(a ?? { lat: 0, lon: 0 }, b ?? { lat: 0, lon: 0 })).toBeCloseTo(bar.km, 0);
  });
});

describe('a stop’s charge on the map', () => {
  const row = (stopIndex: number, socPct: number) => ({ where: { kind: 'stop', stopIndex }, socPct }) as LedgerRow;
  const drive = { where: { kind: 'drive', driveIndex: 0 }, socPct: 1 } as LedgerRow;

  it('when the ledger is read, then each stop gets its own lowest charge and drives do not count', () => {
    const track = socTrack([row(0, 80), row(0, 60), drive, row(1, 40), row(1, 55)]);
    expect(lowestChargeByStop(track, 3)).toEqual([60, 40, null]);
  });

  it.each([
    [10, 20, 'ember'],
    [20, 20, 'sunlit'],
    [34.9, 20, 'sunlit'],
    [35, 20, 'pine'],
    [null, 20, null],
  ] as const)('when the lowest is %s and the reserve %s, then the tone is %s', (low, reserve, tone) => {
    expect(chargeTone(low, reserve)).toBe(tone);
  });
});

describe('editing a drive', () => {
  const suggested: Drive = {
    hoursOnRoad: 1.5,
    vehicleCharging: true,
    distanceKm: 100,
    distanceSource: 'great-circle',
    roadFactor: 1.3,
    averageSpeedKmh: 70,
    hoursSource: 'suggested',
  };

  it('when the account uses US units, then distance and speed are shown in miles', () => {
    const form = driveToForm(suggested, 'us');
    expect(form.distance).toBeCloseTo(62.14, 2);
    expect(form.speed).toBeCloseTo(43.5, 1);
  });

  it('when the distance is changed and the time follows the suggestion, then the time shown follows it', () => {
    const form = { ...driveToForm(suggested, 'metric'), distance: 210 };
    expect(shownHours(suggested, form, false, 'metric')).toBe(3);
  });

  it('when a time was typed, then a changed distance leaves the time alone', () => {
    const form = { ...driveToForm(suggested, 'metric'), distance: 210 };
    expect(shownHours(suggested, form, true, 'metric')).toBe(1.5);
    expect(shownHours({ ...suggested, hoursSource: 'typed' }, form, false, 'metric')).toBe(1.5);
  });

  it('when a distance is typed in miles, then it is sent in km and marked as typed', () => {
    const form = { ...driveToForm(suggested, 'us'), distance: 100 };
    const sent = formToDrive(suggested, form, { distance: true, hours: false }, 'us');
    expect(sent.distanceKm).toBeCloseTo(160.9, 1);
    expect(sent.distanceSource).toBe('typed');
    expect(sent.hoursSource).toBe('suggested');
  });

  it('when only the hours change, then they are sent as typed and the distance keeps its source', () => {
    const sent = formToDrive(
      suggested,
      { ...driveToForm(suggested, 'metric'), hours: 2 },
      { distance: false, hours: true },
      'metric',
    );
    expect(sent).toMatchObject({ hoursOnRoad: 2, hoursSource: 'typed', distanceSource: 'great-circle' });
  });

  it.each([
    [1.75, '1 h 45 min'],
    [0.5, '30 min'],
    [3, '3 h'],
  ])('when %f h on the road is shown, then it reads "%s"', (hours, text) => {
    expect(duration(hours)).toBe(text);
  });
});
