import { DateTime } from 'luxon';

/** "Tue 14 Sep, 06:00" from an engine local ISO string (it carries its own offset). */
export function localMoment(iso: string): string {
  const t = DateTime.fromISO(iso, { setZone: true });
  return t.isValid ? t.toFormat('ccc d LLL, HH:mm') : iso;
}

export function localDay(iso: string): string {
  const t = DateTime.fromISO(iso, { setZone: true });
  return t.isValid ? t.toFormat('ccc d LLL') : iso;
}

export function localHour(iso: string): string {
  const t = DateTime.fromISO(iso, { setZone: true });
  return t.isValid ? t.toFormat('HH:mm') : iso;
}
