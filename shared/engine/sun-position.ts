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

/** The sun's position with its true (unrefracted) altitude too, degrees. */
export function sunPositionWithTrue(
  utcMs: number,
  lat: number,
  lon: number,
): SunPosition & { trueAltitudeDeg: number } {
  const out = new Float64Array(3);
  sunPositionInto(utcMs, lat, lon, out, 0);
  return { altitudeDeg: out[0] ?? 0, azimuthDeg: out[1] ?? 0, trueAltitudeDeg: out[2] ?? 0 };
}

// The same arithmetic as suncalc 2's getPosition, operation for operation, so the results are bit-identical
// (tests compare the two), but without the Date and the two objects suncalc allocates per call: the trip's
// precomputation asks for thousands of positions. Constants are spelled as suncalc spells them.
const DAY_MS = 864e5;
const J1970 = 2440588;
const J2000 = 2451545;

/** suncalc's ΔT polynomial (Espenak & Meeus), seconds, for days d since J2000. */
function deltaT(d: number): number {
  const y = 2e3 + d / 365.2425;
  let t: number;
  if (y < 1920) {
    t = y - 1900;
    return -2.79 + t * (1.494119 + t * (-0.0598939 + t * (0.0061966 - t * 197e-6)));
  }
  if (y < 1941) {
    t = y - 1920;
    return 21.2 + t * (0.84493 + t * (-0.0761 + t * 0.0020936));
  }
  if (y < 1961) {
    t = y - 1950;
    return 29.07 + t * (0.407 + t * (-1 / 233 + t / 2547));
  }
  if (y < 1986) {
    t = y - 1975;
    return 45.45 + t * (1.067 + t * (-1 / 260 - t / 718));
  }
  if (y < 2005) {
    t = y - 2e3;
    return 63.86 + t * (0.3345 + t * (-0.060374 + t * (0.0017275 + t * (651814e-9 + t * 2373599e-11))));
  }
  if (y < 2050) {
    t = y - 2e3;
    return 62.92 + t * (0.32217 + t * 0.005589);
  }
  t = (y - 1820) / 100;
  return -20 + 32 * t * t - 0.5628 * (2150 - y);
}

let lastLat = Number.NaN;
let sinPhi = 0;
let cosPhi = 1;

/**
 * sunPosition into out[k] (altitude, degrees, refraction-corrected), out[k + 1] (azimuth from north) and out[k + 2]
 * (the true altitude, before refraction: what the decomposition is fed).
 */
export function sunPositionInto(utcMs: number, lat: number, lon: number, out: Float64Array, k: number): void {
  // new Date(ms).valueOf() truncates fractional milliseconds and is NaN beyond ±8.64e15 ms.
  const ms = Math.abs(utcMs) <= 8.64e15 ? Math.trunc(utcMs) + 0 : Number.NaN;
  const lw = RAD * -lon;
  if (!Object.is(lat, lastLat)) {
    // A stop's steps share one latitude: its sine and cosine are the same numbers every time.
    lastLat = lat;
    const phi = RAD * lat;
    sinPhi = Math.sin(phi);
    cosPhi = Math.cos(phi);
  }
  const d = ms / DAY_MS - 0.5 + J1970 - J2000;
  const dTT = d + deltaT(d) / 86400;
  const t = dTT / 36525;
  const L0 = RAD * (280.46646 + t * (36000.76983 + t * 3032e-7));
  const M = RAD * (357.52911 + t * (35999.05029 - t * 1537e-7));
  const sinM = Math.sin(M);
  const cosM = Math.cos(M);
  const C =
    RAD *
    ((1.914602 - t * (0.004817 + t * 14e-6)) * sinM +
      (0.019993 - 101e-6 * t) * 2 * sinM * cosM +
      289e-6 * sinM * (3 - 4 * sinM * sinM));
  const Om = RAD * (125.04 - 1934.136 * t);
  const L = L0 + C - RAD * (0.00569 + 0.00478 * Math.sin(Om));
  const e = RAD * (23.439291 - t * (0.0130042 + t * (16e-8 - t * 504e-9))) + RAD * 0.00256 * Math.cos(Om);
  const ra = Math.atan2(Math.cos(e) * Math.sin(L), Math.cos(L));
  const dec = Math.asin(Math.sin(e) * Math.sin(L));
  const H = RAD * (280.46061837 + 360.98564736629 * d) - lw - ra;
  const h = Math.asin(sinPhi * Math.sin(dec) + cosPhi * Math.cos(dec) * Math.cos(H));
  const hr = h < 0 ? 0 : h;
  out[k] = (h + 2967e-7 / Math.tan(hr + 0.00312536 / (hr + 0.08901179))) / RAD;
  out[k + 1] = (Math.atan2(Math.sin(H), Math.cos(H) * sinPhi - Math.tan(dec) * cosPhi) / RAD + 540) % 360;
  out[k + 2] = h / RAD;
}

/** Cooper (1969) declination, degrees, for day of year n (Duffie & Beckman eq. 1.6.1a). */
export function cooperDeclinationDeg(dayOfYear: number): number {
  return 23.45 * Math.sin(((360 * (284 + dayOfYear)) / 365) * RAD);
}

/** Sun zenith and azimuth (from north) from latitude, declination and solar hour angle (negative mornings). */
export function sunFromHourAngle(
  latDeg: number,
  declDeg: number,
  hourAngleDeg: number,
): { zenithDeg: number; azimuthDeg: number } {
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
