// Words and labels for results: where a step is, and local times for cause texts.
import type { Prepared } from './prepare';
import type { Where } from './result-types';
import { localLabel, utcIsoString } from './time-grid';

export function whereAt(p: Prepared, i: number): Where {
  const w = p.where[i] ?? 0;
  return w >= 0 ? { kind: 'stop', stopIndex: w } : { kind: 'drive', driveIndex: -w - 1 };
}

export function whereText(p: Prepared, where: Where): string {
  const stops = p.input.trip.stops;
  if (where.kind === 'stop') return `stop ${where.stopIndex + 1} (${stops[where.stopIndex]?.name ?? '?'})`;
  const from = stops[where.driveIndex]?.name ?? '?';
  const to = stops[where.driveIndex + 1]?.name ?? '?';
  return `the drive from ${from} to ${to}`;
}

export function utcIso(p: Prepared, i: number): string {
  return utcIsoString(p.startMs[i] ?? 0);
}

export function localIso(p: Prepared, i: number): string {
  return localLabel(p.startMs[i] ?? 0, p.offsetMin[i] ?? 0);
}

export function hhmm(hour: number): string {
  return `${String(hour % 24).padStart(2, '0')}:00`;
}

export function kwh(wh: number): string {
  return `${(wh / 1000).toFixed(1)} kWh`;
}

/** Round up to the next half unit. */
export function ceilHalf(x: number): number {
  return Math.ceil(x * 2 - 1e-9) / 2;
}
