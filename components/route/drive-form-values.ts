// A drive as its row edits it: distance and speed in the account's units, hours as typed, and what to send.
import {
  DEFAULT_ROAD_FACTOR,
  defaultTowingSpeedKmh,
  distanceInUnits,
  speedInUnits,
  suggestedHours,
} from '@/shared/geo/drive-estimate';
import type { Drive } from '@/shared/schemas/trip';
import { fromDisplay, type UnitSystem } from '@/shared/units';

export type DriveFormValues = {
  distance: number | null;
  hours: number | null;
  speed: number | null;
  roadFactor: number | null;
};

const two = (v: number) => Math.round(v * 100) / 100;

export function driveToForm(drive: Drive, units: UnitSystem): DriveFormValues {
  return {
    distance:
      drive.distanceKm === null || drive.distanceKm === undefined
        ? null
        : two(distanceInUnits(drive.distanceKm, units).value),
    hours: drive.hoursOnRoad,
    speed: two(speedInUnits(drive.averageSpeedKmh ?? defaultTowingSpeedKmh(units), units).value),
    roadFactor: drive.roadFactor ?? DEFAULT_ROAD_FACTOR,
  };
}

/**
 * The time shown while editing: it follows the distance and speed as they are typed, unless the person typed a
 * time (now, or before: the drive's hours are then its own).
 */
export function shownHours(
  drive: Drive,
  values: DriveFormValues,
  hoursTyped: boolean,
  units: UnitSystem,
): number | null {
  if (hoursTyped || drive.hoursSource !== 'suggested') return values.hours;
  if (values.distance === null || values.speed === null) return values.hours;
  return suggestedHours(fromDisplay(values.distance, 'distance', units), fromDisplay(values.speed, 'distance', units));
}

/** The drive to send: only what was changed is marked as typed. */
export function formToDrive(
  drive: Drive,
  values: DriveFormValues,
  changed: { distance: boolean; hours: boolean },
  units: UnitSystem,
): Drive {
  const next: Drive = { ...drive };
  if (values.speed !== null) next.averageSpeedKmh = two(fromDisplay(values.speed, 'distance', units));
  if (values.roadFactor !== null) next.roadFactor = values.roadFactor;
  if (changed.distance && values.distance !== null) {
    next.distanceKm = Math.round(fromDisplay(values.distance, 'distance', units) * 10) / 10;
    next.distanceSource = 'typed';
  }
  if (changed.hours && values.hours !== null) {
    next.hoursOnRoad = values.hours;
    next.hoursSource = 'typed';
  }
  return next;
}
