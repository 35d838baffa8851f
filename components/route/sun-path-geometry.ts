// Geometry for the sun-path picture: a polar view of the sky with the zenith in the middle, north up,
// and the horizon (altitude 0) on the rim. Pure, so the picture's maths is testable.
import { DateTime } from 'luxon';
import { getPosition } from 'suncalc';
import { canopyBeamTransmittance, resolveExposure } from '@/shared/engine/site-exposure';
import type { SiteExposure } from '@/shared/schemas/trip';

export type Pt = { x: number; y: number };

export function polar(altitudeDeg: number, azimuthDeg: number, cx: number, cy: number, radius: number): Pt {
  const r = (radius * (90 - Math.max(0, Math.min(90, altitudeDeg)))) / 90;
  const a = (azimuthDeg * Math.PI) / 180;
  return { x: cx + r * Math.sin(a), y: cy - r * Math.cos(a) };
}

/**
 * The obstruction as a closed outline: each compass sector drawn at its elevation (for a canopy, the edge of the open
 * sky overhead), with the share of a sun just below that edge (at most 45° up) that still reaches the panels.
 */
export function horizonOutline(
  exposure: SiteExposure,
  cx: number,
  cy: number,
  radius: number,
): { points: Pt[]; canopyTransmittance: number } {
  const e = resolveExposure(exposure);
  const edge = Math.max(...e.horizonDeg);
  const n = e.horizonDeg.length;
  const width = 360 / n;
  const points: Pt[] = [];
  e.horizonDeg.forEach((h, i) => {
    const from = i * width - width / 2;
    for (let k = 0; k <= 4; k++) points.push(polar(h, from + (width * k) / 4, cx, cy, radius));
  });
  const through =
    e.leafAreaIndex === null ? e.canopyTransmittance : canopyBeamTransmittance(e.leafAreaIndex, Math.min(45, edge));
  return { points, canopyTransmittance: edge > 0 ? through : 1 };
}

export type SunTrack = { label: string; points: Pt[]; hours: { hour: number; at: Pt }[] };

/** The sun above the horizon through one local day, every ten minutes, with a mark on each whole hour. */
export function sunTrack(
  dateIso: string,
  zone: string,
  lat: number,
  lon: number,
  cx: number,
  cy: number,
  radius: number,
): SunTrack {
  const day = DateTime.fromISO(dateIso, { zone }).startOf('day');
  const points: Pt[] = [];
  const hours: { hour: number; at: Pt }[] = [];
  for (let m = 0; m <= 24 * 60; m += 10) {
    const t = day.plus({ minutes: m });
    const p = getPosition(t.toJSDate(), lat, lon);
    if (p.altitude <= 0) continue;
    const at = polar(p.altitude, p.azimuth, cx, cy, radius);
    points.push(at);
    if (m % 60 === 0) hours.push({ hour: t.hour, at });
  }
  return { label: day.toFormat('d LLL'), points, hours };
}

export const pathOf = (points: Pt[], close = false): string =>
  points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ') +
  (close && points.length > 0 ? ' Z' : '');
