// A drive's length and time on the road from where its two stops are. Roads wind: a road trip runs about
// 1.2–1.4 × the great-circle distance (common practice), and a rig towing a caravan or trailer averages
// 60–80 km/h on main roads (common practice); 70 km/h, or 45 mph where the account uses US units.
import { kmToMiles, milesToKm, type UnitSystem } from '../units';
import { greatCircleKm, type LatLon } from './great-circle';

export const DEFAULT_ROAD_FACTOR = 1.3;
export const ROAD_FACTOR_RANGE = { min: 1, max: 3 } as const;
export const SPEED_RANGE_KMH = { min: 5, max: 130 } as const;

/** The usual towing speed in the account's units, stored in km/h. */
export function defaultTowingSpeedKmh(units: UnitSystem): number {
  return units === 'us' ? milesToKm(45) : 70;
}

/** Road distance between two stops: the great circle stretched by the road factor, km. */
export function roadDistanceKm(from: LatLon, to: LatLon, roadFactor = DEFAULT_ROAD_FACTOR): number {
  return greatCircleKm(from, to) * roadFactor;
}

/** Hours on the road at an average speed, to the quarter hour (a plan needs no finer), never 0 for a real move. */
export function suggestedHours(distanceKm: number, speedKmh: number): number {
  if (!(distanceKm > 0) || !(speedKmh > 0)) return 0;
  return Math.max(0.25, Math.round((distanceKm / speedKmh) * 4) / 4);
}

export type DrivePlanFields = {
  hoursOnRoad: number;
  distanceKm?: number | null;
  distanceSource?: 'great-circle' | 'track' | 'typed';
  roadFactor?: number;
  averageSpeedKmh?: number;
  hoursSource?: 'suggested' | 'typed';
};

/**
 * Fills in a drive's distance and time from its stops. A distance from a GPX track or typed by hand is kept;
 * otherwise it follows the stops. The time follows the distance unless someone typed one. Neither may run past
 * the gap between leaving one stop and reaching the next.
 */
export function planDrive<T extends DrivePlanFields>(
  drive: T,
  from: LatLon,
  to: LatLon,
  gapHours: number,
): T & { distanceKm: number } {
  const source = drive.distanceSource ?? 'great-circle';
  const distanceKm =
    source === 'great-circle' || drive.distanceKm === null || drive.distanceKm === undefined
      ? roundKm(roadDistanceKm(from, to, drive.roadFactor ?? DEFAULT_ROAD_FACTOR))
      : drive.distanceKm;
  const gap = Math.max(0, gapHours);
  const hours =
    drive.hoursSource === 'suggested'
      ? suggestedHours(distanceKm, drive.averageSpeedKmh ?? defaultTowingSpeedKmh('metric'))
      : drive.hoursOnRoad;
  return { ...drive, distanceKm, hoursOnRoad: Math.min(hours, gap) };
}

/** Distances are kept to 100 m. */
export const roundKm = (km: number): number => Math.round(km * 10) / 10;

/** A distance in the account's units, for labels: "48 km", "30 mi". */
export function distanceInUnits(km: number, units: UnitSystem): { value: number; unit: 'km' | 'mi' } {
  return units === 'us' ? { value: kmToMiles(km), unit: 'mi' } : { value: km, unit: 'km' };
}

/** A speed in the account's units: km/h or mph. */
export function speedInUnits(kmh: number, units: UnitSystem): { value: number; unit: 'km/h' | 'mph' } {
  return units === 'us' ? { value: kmToMiles(kmh), unit: 'mph' } : { value: kmh, unit: 'km/h' };
}
