import { describe, expect, it } from 'vitest';
import { defaultTowingSpeedKmh, planDrive, roadDistanceKm, suggestedHours } from '@/shared/geo/drive-estimate';
import { foldText } from '@/shared/geo/fold-text';
import { EARTH_MEAN_RADIUS_KM, greatCircleKm, pathLengthKm } from '@/shared/geo/great-circle';
import { formatDecimal, formatDms, parseCoordinates } from '@/shared/geo/parse-coordinates';

describe('great-circle distance', () => {
  it('uses the IUGG mean Earth radius (CHECK-VALUES §11: Moritz 2000)', () => {
    expect(EARTH_MEAN_RADIUS_KM).toBe(6371.0088);
  });

  // CHECK-VALUES §11, haversine checks with that radius (arithmetic).
  it.each([
    [{ lat: 0, lon: 0 }, { lat: 0, lon: 1 }, 111.1951],
    [{ lat: 57.0, lon: -5.0 }, { lat: 56.0, lon: -4.0 }, 127.0045],
    [{ lat: 36.12, lon: -115.17 }, { lat: 34.05, lon: -118.24 }, 361.918],
  ])('when measuring %o to %o, then it is %f km', (a, b, km) => {
    expect(greatCircleKm(a, b)).toBeCloseTo(km, 3);
    expect(greatCircleKm(b, a)).toBeCloseTo(km, 3);
  });

  it('when a path has several legs, then its length is the sum of the legs', () => {
    const legs = [
      { lat: 57, lon: -5 },
      { lat: 56, lon: -4 },
      { lat: 56, lon: -3 },
    ];
    expect(pathLengthKm(legs)).toBeCloseTo(127.0045 + greatCircleKm({ lat: 56, lon: -4 }, { lat: 56, lon: -3 }), 3);
    expect(pathLengthKm(legs.slice(0, 1))).toBe(0);
  });

  it('when two points are antipodal, then the distance is half the circumference and not NaN', () => {
    expect(greatCircleKm({ lat: 0, lon: 0 }, { lat: 0, lon: 180 })).toBeCloseTo(Math.PI * EARTH_MEAN_RADIUS_KM, 6);
  });
});

describe('parseCoordinates', () => {
  it.each([
    ['57.12, -5.34', 57.12, -5.34],
    ['57.12 -5.34', 57.12, -5.34],
    ['57.12;-5.34', 57.12, -5.34],
    ['  -33.8688 , 151.2093 ', -33.8688, 151.2093],
    ['57.12N 5.34W', 57.12, -5.34],
    ['57.12 N, 5.34 W', 57.12, -5.34],
    ['N57.12 W5.34', 57.12, -5.34],
    ['n 57.12 w 5.34', 57.12, -5.34],
    ['5.34W 57.12N', 57.12, -5.34],
    ["57°07'N 5°20'W", 57 + 7 / 60, -(5 + 20 / 60)],
    ['57°07′N 5°20′W', 57 + 7 / 60, -(5 + 20 / 60)],
    ["57° 7.2' N, 5° 20.4' W", 57.12, -5.34],
    ['57°07\'12"N 5°20\'24"W', 57 + 7 / 60 + 12 / 3600, -(5 + 20 / 60 + 24 / 3600)],
    ['57°07′12″N 5°20′24″W', 57 + 7 / 60 + 12 / 3600, -(5 + 20 / 60 + 24 / 3600)],
    ["36°07'S 115°10'E", -(36 + 7 / 60), 115 + 10 / 60],
    ['57° -5°', 57, -5],
    ['57.12 −5.34', 57.12, -5.34],
  ])('when given "%s", then it reads %f, %f', (text, lat, lon) => {
    const parsed = parseCoordinates(text);
    expect(parsed).not.toBeNull();
    expect(parsed?.lat).toBeCloseTo(lat, 9);
    expect(parsed?.lon).toBeCloseTo(lon, 9);
  });

  it.each([
    ['a place name', 'Fort William'],
    ['one number', '57.12'],
    ['digits with no separator', '12'],
    ['a latitude past the pole', '91, 10'],
    ['a longitude past the date line', '10, 181'],
    ['two latitudes', '57N 5N'],
    ['sixty minutes', "57°60'N 5°20'W"],
    ['a fraction on degrees with minutes', "57.5°07'N 5°20'W"],
    ['a sign and a hemisphere', '-57.12N 5.34W'],
    ['nothing', '   '],
    ['a name with numbers', 'Route 66 Diner'],
  ])('when given %s, then it is not a coordinate', (_what, text) => {
    expect(parseCoordinates(text)).toBeNull();
  });

  it('when a point is written out, then reading it back gives the same point', () => {
    const point = { lat: 57.12, lon: -5.34 };
    const again = parseCoordinates(formatDecimal(point));
    expect(again?.lat).toBeCloseTo(point.lat, 5);
    expect(formatDms(point)).toBe('57°07′12″N 5°20′24″W');
    const fromDms = parseCoordinates(formatDms(point));
    expect(fromDms?.lat).toBeCloseTo(57.12, 4);
    expect(fromDms?.lon).toBeCloseTo(-5.34, 4);
  });
});

describe('foldText', () => {
  it.each([
    ['Saint-Étienne', 'saint etienne'],
    ['Tromsø', 'tromso'],
    ['Großglockner', 'grossglockner'],
    ['Łódź', 'lodz'],
    ["St John's", 'st johns'],
    ['  FORT   William ', 'fort william'],
    ['Ærøskøbing', 'aeroskobing'],
    ['São Paulo', 'sao paulo'],
  ])('when folding "%s", then it reads "%s"', (text, folded) => {
    expect(foldText(text)).toBe(folded);
  });
});

describe('drive estimates', () => {
  const lochside = { lat: 56.98, lon: -5.12 };
  const pinewood = { lat: 57.16, lon: -4.79 };

  it('when no factor is given, then the road is 1.3 × the great circle (common practice)', () => {
    expect(roadDistanceKm(lochside, pinewood)).toBeCloseTo(greatCircleKm(lochside, pinewood) * 1.3, 9);
    expect(roadDistanceKm(lochside, pinewood, 1.5)).toBeCloseTo(greatCircleKm(lochside, pinewood) * 1.5, 9);
  });

  it('when the account is metric, then towing is 70 km/h; in US units 45 mph (common practice)', () => {
    expect(defaultTowingSpeedKmh('metric')).toBe(70);
    expect(defaultTowingSpeedKmh('us')).toBeCloseTo(72.42048, 5);
  });

  it.each([
    [140, 70, 2],
    [100, 70, 1.5],
    [5, 70, 0.25],
    [0, 70, 0],
  ])('when %f km at %f km/h, then the suggestion is %f h (to the quarter hour)', (km, speed, hours) => {
    expect(suggestedHours(km, speed)).toBe(hours);
  });

  it('when the hours follow the suggestion, then a new distance changes them', () => {
    const drive = { hoursOnRoad: 2, hoursSource: 'suggested' as const, averageSpeedKmh: 70 };
    const planned = planDrive(drive, lochside, pinewood, 24);
    expect(planned.distanceKm).toBeCloseTo(greatCircleKm(lochside, pinewood) * 1.3, 1);
    expect(planned.hoursOnRoad).toBe(suggestedHours(planned.distanceKm ?? 0, 70));
    expect(planned.hoursOnRoad).not.toBe(2);
  });

  it('when someone typed the hours, then a new distance keeps them', () => {
    const planned = planDrive({ hoursOnRoad: 2, hoursSource: 'typed' as const }, lochside, pinewood, 24);
    expect(planned.hoursOnRoad).toBe(2);
  });

  it('when the distance came from a track, then moving the stops keeps it', () => {
    const drive = {
      hoursOnRoad: 1,
      distanceKm: 61.5,
      distanceSource: 'track' as const,
      hoursSource: 'suggested' as const,
    };
    const planned = planDrive(drive, lochside, pinewood, 24);
    expect(planned.distanceKm).toBe(61.5);
    expect(planned.hoursOnRoad).toBe(suggestedHours(61.5, 70));
  });

  it('when the suggestion is longer than the gap between the stops, then it is cut to the gap', () => {
    const far = { lat: 51.5, lon: -0.12 };
    const planned = planDrive({ hoursOnRoad: 0, hoursSource: 'suggested' as const }, lochside, far, 3);
    expect(planned.hoursOnRoad).toBe(3);
  });
});
